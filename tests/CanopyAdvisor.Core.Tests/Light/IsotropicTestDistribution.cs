using CanopyAdvisor.Core.Lamps;

namespace CanopyAdvisor.Core.Tests.Light;

/// <summary>Isotropic source: I = 1 / (4π) per unit flux in every direction.</summary>
internal sealed class IsotropicTestDistribution : BeamDistribution
{
    public static IsotropicTestDistribution Instance { get; } = new();

    public override bool IsAxiallySymmetric => true;

    public override double IntensityPerUnitFlux(double polarRadians, double aroundRadians) => 1 / (4 * Math.PI);
}
