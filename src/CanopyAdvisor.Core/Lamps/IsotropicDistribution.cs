namespace CanopyAdvisor.Core.Lamps;

/// <summary>A source that emits equally in every direction: I = Φ/(4π) (a bare point source; common textbook idealisation).</summary>
/// <remarks>
/// Intensity per unit flux is 1/(4π) sr⁻¹ everywhere, so the integral over the sphere (4π sr) is 1. A lamp with this
/// distribution at height h gives Φ/(4πh²) straight below it (inverse-square law, MODEL.md §3). Immutable and thread safe.
/// </remarks>
public sealed class IsotropicDistribution : BeamDistribution
{
    private const double IntensityValue = 1.0 / (4.0 * Math.PI);

    /// <summary>The one instance (the distribution has no parameters).</summary>
    public static IsotropicDistribution Instance { get; } = new();

    /// <inheritdoc />
    public override bool IsAxiallySymmetric => true;

    /// <inheritdoc />
    public override double IntensityPerUnitFlux(double polarRadians, double aroundRadians) => IntensityValue;

    /// <inheritdoc />
    public override double IntensityPerUnitFluxAtCosine(double cosPolar, double aroundRadians) => IntensityValue;
}
