namespace CanopyAdvisor.Core.Lamps;

/// <summary>A flat diffuse emitter: I(θ) = Φ cos θ / π on the front hemisphere, none behind (Lambert's cosine law).</summary>
/// <remarks>
/// ∫ cos θ / π dω over the front hemisphere is 1 (the classic result that a Lambertian surface's intensity on its normal
/// is Φ/π). Its full beam angle by the half-intensity definition is 120° (cos 60° = 0.5). Immutable and thread safe.
/// </remarks>
public sealed class LambertianDistribution : BeamDistribution
{
    /// <summary>The one instance (the distribution has no parameters).</summary>
    public static LambertianDistribution Instance { get; } = new();

    /// <inheritdoc />
    public override bool IsAxiallySymmetric => true;

    /// <inheritdoc />
    public override double IntensityPerUnitFlux(double polarRadians, double aroundRadians)
    {
        return IntensityPerUnitFluxAtCosine(Math.Cos(polarRadians), aroundRadians);
    }

    /// <inheritdoc />
    public override double IntensityPerUnitFluxAtCosine(double cosPolar, double aroundRadians) => cosPolar > 0 ? cosPolar / Math.PI : 0.0;
}
