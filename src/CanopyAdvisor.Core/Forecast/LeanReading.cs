using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Forecast;

/// <summary>A lean: tilt of the base-to-apex line from the vertical and the compass direction the top points to.</summary>
/// <param name="Tilt">Tilt from the vertical, 0 to 90°.</param>
/// <param name="Azimuth">Compass bearing the apex points to, clockwise from north in [0, 360°) (zero when upright).</param>
/// <param name="CompassPoint">The nearest of the 16 compass points (<see cref="Direction.CompassPoint"/>), e.g. <c>SSE</c>.</param>
public sealed record LeanReading(Angle Tilt, Angle Azimuth, string CompassPoint)
{
    /// <summary>The lean of a horizontal lean vector (east, north): the horizontal part of the unit base-to-apex direction.</summary>
    /// <param name="east">East component (sin tilt · sin azimuth).</param>
    /// <param name="north">North component (sin tilt · cos azimuth).</param>
    public static LeanReading FromLeanVector(double east, double north) =>
        LeanSample.FromLeanVector(default, east, north).Lean;
}
