using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sky;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Light;

/// <summary>Darkness with NaN (a log gap) between two instants.</summary>
internal sealed class GappyOutsideLight(Instant gapStart, Instant gapEnd) : IOutsideLightSource
{
    public OutsideLight At(Instant time) =>
        time >= gapStart && time < gapEnd
            ? new OutsideLight(time, new Vector3(0, 0, -1), double.NaN, double.NaN, double.NaN)
            : OutsideLight.Dark(time, new Vector3(0, 0, -1));
}
