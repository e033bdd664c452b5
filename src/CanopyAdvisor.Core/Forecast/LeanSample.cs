using CanopyAdvisor.Core.Geometry;
using NodaTime;

namespace CanopyAdvisor.Core.Forecast;

/// <summary>The bench lean at one instant of a forecast's lean track (a value: tracks hold hundreds per bench).</summary>
/// <param name="At">When.</param>
/// <param name="Tilt">Tilt of the bench-mean lean from the vertical, averaged over the nutation period before it.</param>
/// <param name="Azimuth">Compass bearing the mean lean points to, clockwise from north in [0, 360°) (zero when upright).</param>
public readonly record struct LeanSample(Instant At, Angle Tilt, Angle Azimuth)
{
    /// <summary>The sample of a horizontal lean vector (east, north): the horizontal part of the unit base-to-apex direction.</summary>
    /// <param name="at">When.</param>
    /// <param name="east">East component (sin tilt · sin azimuth).</param>
    /// <param name="north">North component (sin tilt · cos azimuth).</param>
    public static LeanSample FromLeanVector(Instant at, double east, double north)
    {
        double s = Math.Min(1.0, Math.Sqrt((east * east) + (north * north)));
        return new LeanSample(at, Angle.FromRadians(Math.Asin(s)), Direction.Azimuth(new Vector3(east, north, 0)));
    }

    /// <summary>The same lean as a <see cref="LeanReading"/> (with its 16-point compass name; made on each call).</summary>
    public LeanReading Lean => new(Tilt, Azimuth, Direction.CompassPoint(Azimuth));
}
