using CanopyAdvisor.Core.Lamps;

namespace CanopyAdvisor.Benchmarks;

/// <summary>Stand-in Lambertian beam, I = cos θ / π.</summary>
public sealed class LambertianBeam : BeamDistribution
{
    /// <inheritdoc />
    public override bool IsAxiallySymmetric => true;

    /// <inheritdoc />
    public override double IntensityPerUnitFlux(double polarRadians, double aroundRadians) =>
        polarRadians < Math.PI / 2 ? Math.Cos(polarRadians) / Math.PI : 0;
}
