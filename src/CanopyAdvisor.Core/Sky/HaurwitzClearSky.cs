using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Sky;

/// <summary>Clear-sky global horizontal irradiance by Haurwitz (1945, J. Meteorology 2:154): needs only the zenith angle.</summary>
public static class HaurwitzClearSky
{
    /// <summary>GHI = 1098 cos z · exp(−0.059 / cos z) W m⁻²; zero when the sun is at or below the horizon.</summary>
    public static double GlobalHorizontalWm2(Angle zenith)
    {
        double cosZenith = zenith.Cos();
        return cosZenith > 0 ? 1098.0 * cosZenith * Math.Exp(-0.059 / cosZenith) : 0.0;
    }
}
