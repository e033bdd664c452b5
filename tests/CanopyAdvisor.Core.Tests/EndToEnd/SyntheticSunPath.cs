using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sky;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.EndToEnd;

/// <summary>
/// An invented, deterministic day of outside light (not a sky model): the sun rises at 04:00 UTC in the north-east,
/// peaks at 12:00 at 58° elevation and sets at 20:00 in the north-west, azimuth sweeping 60° → 300°; beam and sky
/// PAR follow the elevation. <see cref="Mirrored"/> gives the same light with the sun mirrored east–west.
/// </summary>
internal sealed class SyntheticSunPath(bool mirrored) : IOutsideLightSource
{
    public static SyntheticSunPath Original { get; } = new(false);

    public static SyntheticSunPath Mirrored { get; } = new(true);

    public OutsideLight At(Instant time)
    {
        double hour = time.InUtc().TimeOfDay.TickOfDay / (double)NodaConstants.TicksPerHour;
        double phase = (hour - 4) / 16;
        double elevationDeg = 58 * Math.Sin(Math.PI * phase);
        double azimuthDeg = 60 + (240 * phase);
        Vector3 sun = Direction.FromAzimuthZenith(Angle.FromDegrees(azimuthDeg), Angle.FromDegrees(90 - elevationDeg));
        if (mirrored)
        {
            sun = SiteMirror.Point(sun);
        }

        if (elevationDeg <= 0)
        {
            return OutsideLight.Dark(time, sun);
        }

        double s = Math.Sin(elevationDeg * Math.PI / 180);
        double dni = 1600 * Math.Pow(s, 0.6);
        double dhi = 80 + (220 * s);
        return new OutsideLight(time, sun, dni, dhi, (dni * sun.Z) + dhi);
    }
}
