using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Sky;

/// <summary>
/// Diffuse fraction of global horizontal irradiance from the clearness index, by Erbs, Klein &amp; Duffie (1982,
/// "Estimation of the diffuse radiation fraction for hourly, daily and monthly-average global radiation",
/// Solar Energy 28:293–302).
/// </summary>
public static class ErbsDecomposition
{
    /// <summary>
    /// Near the horizon cos z is small and DNI = (GHI − DHI)/cos z would amplify any error in GHI; above this zenith
    /// angle all light is taken as diffuse (a guard of this project, not from Erbs et al.; pvlib's <c>erbs</c> uses 87° too).
    /// </summary>
    public static Angle AllDiffuseAboveZenith { get; } = Angle.FromDegrees(87.0);

    /// <summary>
    /// Diffuse fraction DHI/GHI: 1 − 0.09 kt for kt ≤ 0.22; 0.9511 − 0.1604 kt + 4.388 kt² − 16.638 kt³ + 12.336 kt⁴
    /// for 0.22 &lt; kt ≤ 0.80; 0.165 above.
    /// </summary>
    public static double DiffuseFraction(double clearnessIndex)
    {
        double kt = clearnessIndex;
        if (kt <= 0.22)
        {
            return 1.0 - (0.09 * Math.Max(kt, 0.0));
        }

        if (kt <= 0.80)
        {
            return 0.9511 + (kt * (-0.1604 + (kt * (4.388 + (kt * (-16.638 + (kt * 12.336)))))));
        }

        return 0.165;
    }

    /// <summary>
    /// Splits a global horizontal irradiance: kt = GHI / (I₀ₙ cos z), DHI = GHI · fraction(kt), DNI = (GHI − DHI) / cos z.
    /// Beyond <see cref="AllDiffuseAboveZenith"/> (87°), or with the sun below the horizon, all of GHI is diffuse and DNI = 0.
    /// </summary>
    /// <param name="globalHorizontalWm2">Measured or modelled GHI, W m⁻², ≥ 0.</param>
    /// <param name="zenith">Solar zenith angle.</param>
    /// <param name="extraterrestrialNormalWm2">Extraterrestrial normal irradiance I₀ₙ, W m⁻².</param>
    public static DiffuseSplit Split(double globalHorizontalWm2, Angle zenith, double extraterrestrialNormalWm2)
    {
        double ghi = Math.Max(globalHorizontalWm2, 0.0);
        double cosZenith = zenith.Cos();
        double kt = cosZenith > 0 ? ghi / (extraterrestrialNormalWm2 * cosZenith) : 0.0;
        if (zenith > AllDiffuseAboveZenith)
        {
            return new DiffuseSplit(kt, new SolarIrradiance(ghi, 0.0, ghi));
        }

        double dhi = ghi * DiffuseFraction(kt);
        return new DiffuseSplit(kt, new SolarIrradiance(ghi, (ghi - dhi) / cosZenith, dhi));
    }
}
