namespace CanopyAdvisor.Core.Plants.Growth;

/// <summary>The four multiplicative factors of the elongation rate, each dimensionless.</summary>
/// <param name="Temperature">r(T) of Yan &amp; Hunt (1999), in [0, 1].</param>
/// <param name="Dif">DIF factor, ≥ 0.2.</param>
/// <param name="Shade">Shade-avoidance factor, ≥ 1.</param>
/// <param name="LowLight">Low-light factor, ≥ 1.</param>
public sealed record ElongationFactors(double Temperature, double Dif, double Shade, double LowLight)
{
    /// <summary>The product of the four factors: the elongation rate relative to the crop's reference rate.</summary>
    public double Product => Temperature * Dif * Shade * LowLight;

    /// <summary>The stretch alone: DIF × shade × low light (1 = none), without the temperature factor.</summary>
    public double Stretch => Dif * Shade * LowLight;
}
