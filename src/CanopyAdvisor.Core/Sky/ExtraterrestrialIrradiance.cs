namespace CanopyAdvisor.Core.Sky;

/// <summary>Solar irradiance at the top of the atmosphere on a surface facing the sun.</summary>
public static class ExtraterrestrialIrradiance
{
    /// <summary>
    /// I₀ₙ = I_sc (1.000110 + 0.034221 cos Γ + 0.001280 sin Γ + 0.000719 cos 2Γ + 0.000077 sin 2Γ), Γ = 2π(n − 1)/365,
    /// the eccentricity correction of Spencer (1971, Search 2:172), with the solar constant
    /// <see cref="ModelConstants.SolarConstantWattsPerSquareMetre"/>; W m⁻².
    /// </summary>
    /// <param name="dayOfYear">Day of the year, 1…366.</param>
    public static double Spencer(int dayOfYear)
    {
        double gamma = 2.0 * Math.PI * (dayOfYear - 1) / 365.0;
        double factor = 1.000110 + (0.034221 * Math.Cos(gamma)) + (0.001280 * Math.Sin(gamma))
            + (0.000719 * Math.Cos(2 * gamma)) + (0.000077 * Math.Sin(2 * gamma));
        return ModelConstants.SolarConstantWattsPerSquareMetre * factor;
    }

    /// <summary>I₀ₙ = I_sc / R², from the Earth–sun distance R in AU (e.g. SPA's radius vector); W m⁻².</summary>
    public static double FromDistance(double earthSunDistanceAu) =>
        ModelConstants.SolarConstantWattsPerSquareMetre / (earthSunDistanceAu * earthSunDistanceAu);
}
