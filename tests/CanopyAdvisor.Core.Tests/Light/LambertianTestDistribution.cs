using CanopyAdvisor.Core.Lamps;

namespace CanopyAdvisor.Core.Tests.Light;

// Test doubles for the parts other helpers deliver (enclosure, beam distributions, outside light), written
// from the definitions in MODEL.md and the contracts' doc comments, so the light field can be tested alone.

/// <summary>Lambertian beam: I = cos θ / π per unit flux in the forward hemisphere (integral over the sphere = 1).</summary>
internal sealed class LambertianTestDistribution : BeamDistribution
{
    public static LambertianTestDistribution Instance { get; } = new();

    public override bool IsAxiallySymmetric => true;

    public override double IntensityPerUnitFlux(double polarRadians, double aroundRadians) =>
        polarRadians < Math.PI / 2 ? Math.Cos(polarRadians) / Math.PI : 0;
}
