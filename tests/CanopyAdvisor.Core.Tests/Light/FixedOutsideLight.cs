using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sky;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Light;

/// <summary>An outside light source that returns a fixed state at every instant.</summary>
internal sealed class FixedOutsideLight(Vector3 sun, double dni, double dhi) : IOutsideLightSource
{
    public static FixedOutsideLight Night { get; } = new(new Vector3(0, 0, -1), 0, 0);

    public OutsideLight At(Instant time) =>
        new(time, sun, dni, dhi, dhi + (dni * Math.Max(0, sun.Z)));
}
