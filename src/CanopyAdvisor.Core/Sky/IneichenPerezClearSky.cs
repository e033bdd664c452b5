using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Sky;

/// <summary>
/// Clear-sky irradiance by Ineichen &amp; Perez (2002, "A new airmass independent formulation for the Linke turbidity
/// coefficient", Solar Energy 73:151–157), with the Kasten &amp; Young (1989) air mass.
/// </summary>
/// <remarks>
/// The form documented by pvlib (<c>clearsky.ineichen</c>): with site elevation h (m), fh1 = exp(−h/8000),
/// fh2 = exp(−h/1250), cg1 = 5.09·10⁻⁵ h + 0.868, cg2 = 3.92·10⁻⁵ h + 0.0387 and absolute air mass AM,
/// GHI = cg1 I₀ cos z exp(−cg2 AM (fh1 + fh2 (T_L − 1)));
/// DNI = min(I₀ b exp(−0.09 AM (T_L − 1)), GHI (1 − (0.1 − 0.2 e^−T_L)/(0.1 + 0.882/fh1)) / cos z), b = 0.664 + 0.163/fh1
/// (the second term is the paper's empirical correction, Solar Energy 73:157 and 73:312);
/// DHI = GHI − DNI cos z. The optional factor exp(0.01 AM^1.8) on GHI (Perez's enhancement, pvlib's
/// <c>perez_enhancement</c>) is not applied: with it the MODEL.md check at z = 30° would be 910.44 W m⁻², not 898.74.
/// </remarks>
public static class IneichenPerezClearSky
{
    /// <summary>Clear-sky GHI, DNI and DHI in W m⁻²; all zero when the sun is at or below the horizon.</summary>
    /// <param name="apparentZenith">Refraction-corrected solar zenith angle.</param>
    /// <param name="linkeTurbidity">Linke turbidity T_L (air-mass-2 value; about 2–3 clean air, 4–6 hazy), &gt; 0.</param>
    /// <param name="elevationM">Site elevation, metres.</param>
    /// <param name="extraterrestrialNormalWm2">Extraterrestrial normal irradiance I₀ (e.g. <see cref="ExtraterrestrialIrradiance.Spencer"/>).</param>
    public static SolarIrradiance Calculate(Angle apparentZenith, double linkeTurbidity, double elevationM, double extraterrestrialNormalWm2)
    {
        double cosZenith = apparentZenith.Cos();
        if (!(cosZenith > 0) || apparentZenith.Degrees >= 90.0)
        {
            return SolarIrradiance.None;
        }

        double airMass = AirMass.Absolute(AirMass.KastenYoung(apparentZenith), elevationM);
        double fh1 = Math.Exp(-elevationM / 8000.0);
        double fh2 = Math.Exp(-elevationM / 1250.0);
        double cg1 = (5.09e-5 * elevationM) + 0.868;
        double cg2 = (3.92e-5 * elevationM) + 0.0387;
        double tl = linkeTurbidity;

        double ghi = cg1 * extraterrestrialNormalWm2 * cosZenith * Math.Exp(-cg2 * airMass * (fh1 + (fh2 * (tl - 1.0))));
        ghi = Math.Max(ghi, 0.0);
        double b = 0.664 + (0.163 / fh1);
        double beam = Math.Max(extraterrestrialNormalWm2 * b * Math.Exp(-0.09 * airMass * (tl - 1.0)), 0.0);
        double beamCap = ghi * Math.Max((1.0 - ((0.1 - (0.2 * Math.Exp(-tl))) / (0.1 + (0.882 / fh1)))) / cosZenith, 0.0);
        double dni = Math.Min(beam, beamCap);
        double dhi = ghi - (dni * cosZenith);
        return new SolarIrradiance(ghi, dni, dhi);
    }
}
