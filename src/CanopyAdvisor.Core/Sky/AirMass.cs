using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Sky;

/// <summary>Optical air mass: relative by Kasten &amp; Young (1989), absolute by scaling with site pressure.</summary>
public static class AirMass
{
    /// <summary>
    /// Relative optical air mass, AM = 1 / (cos z + 0.50572 (96.07995° − z)^−1.6364), z in degrees
    /// (Kasten &amp; Young 1989, Applied Optics 28:4735). Use the apparent (refraction-corrected) zenith angle.
    /// </summary>
    /// <returns>The air mass; NaN when the sun is below the horizon (z ≥ 90°), where it has no meaning here.</returns>
    public static double KastenYoung(Angle zenith)
    {
        double z = zenith.Degrees;
        if (!(z >= 0.0 && z < 90.0))
        {
            return double.NaN;
        }

        return 1.0 / (zenith.Cos() + (0.50572 * Math.Pow(96.07995 - z, -1.6364)));
    }

    /// <summary>
    /// Standard-atmosphere pressure at an elevation, p = 101325 (1 − 2.25577·10⁻⁵ h)^5.25588 Pa (ISO 2533 troposphere,
    /// as used with the Ineichen–Perez model by pvlib's <c>alt2pres</c> documentation).
    /// </summary>
    public static double StandardPressurePascals(double elevationM) =>
        ModelConstants.StandardPressurePascals * Math.Pow(1.0 - (2.25577e-5 * elevationM), 5.25588);

    /// <summary>Absolute (pressure-corrected) air mass, AM · p / p₀, with p from the standard atmosphere at the elevation.</summary>
    public static double Absolute(double relativeAirMass, double elevationM) =>
        relativeAirMass * StandardPressurePascals(elevationM) / ModelConstants.StandardPressurePascals;
}
