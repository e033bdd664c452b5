using CanopyAdvisor.Core.Lamps;

namespace CanopyAdvisor.Core.Tests.Light;

/// <summary>Records the last (polar, around) asked for, to check the lamp-frame convention.</summary>
internal sealed class RecordingTestDistribution : BeamDistribution
{
    public double LastPolar { get; private set; }

    public double LastAround { get; private set; }

    public override bool IsAxiallySymmetric => false;

    public override double IntensityPerUnitFlux(double polarRadians, double aroundRadians)
    {
        LastPolar = polarRadians;
        LastAround = aroundRadians;
        return 0;
    }
}
