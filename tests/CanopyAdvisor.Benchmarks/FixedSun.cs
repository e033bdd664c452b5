using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sky;
using NodaTime;

namespace CanopyAdvisor.Benchmarks;

/// <summary>Stand-in outside light: a fixed mid-morning sun.</summary>
public sealed class FixedSun : IOutsideLightSource
{
    private static readonly Vector3 Sun = Direction.FromAzimuthZenith(Angle.FromDegrees(140), Angle.FromDegrees(55));

    /// <inheritdoc />
    public OutsideLight At(Instant time) => new(time, Sun, 900, 250, 250 + (900 * Sun.Z));
}
