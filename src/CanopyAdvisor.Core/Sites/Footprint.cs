using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Sites;

/// <summary>A rectangle on the ground: one corner, a length along an axis azimuth, and a width to its right.</summary>
/// <remarks>
/// The rectangle spans from <see cref="CornerXM"/>, <see cref="CornerYM"/> a distance <see cref="LengthM"/> along the
/// compass direction <see cref="AxisAzimuth"/> and <see cref="WidthM"/> to the right of that direction (clockwise 90°).
/// </remarks>
/// <param name="CornerXM">East coordinate of the reference corner, metres.</param>
/// <param name="CornerYM">North coordinate of the reference corner, metres.</param>
/// <param name="AxisAzimuth">Compass direction of the length axis (for a glasshouse, the ridge direction).</param>
/// <param name="LengthM">Extent along the axis, metres.</param>
/// <param name="WidthM">Extent to the right of the axis, metres.</param>
public sealed record Footprint(double CornerXM, double CornerYM, Angle AxisAzimuth, double LengthM, double WidthM)
{
    /// <summary>Unit vector along the length axis (horizontal).</summary>
    public Vector3 AxisDirection => new(AxisAzimuth.Sin(), AxisAzimuth.Cos(), 0);

    /// <summary>Unit vector across the width, to the right of the axis (horizontal).</summary>
    public Vector3 WidthDirection => new(AxisAzimuth.Cos(), -AxisAzimuth.Sin(), 0);

    /// <summary>The reference corner at ground level.</summary>
    public Vector3 Corner => new(CornerXM, CornerYM, 0);

    /// <summary>Whether a point's horizontal position lies inside the rectangle (edges included, with a tolerance in metres).</summary>
    public bool Contains(Vector3 point, double toleranceM = 1e-9)
    {
        Vector3 d = point - Corner;
        double along = (d.X * AxisDirection.X) + (d.Y * AxisDirection.Y);
        double across = (d.X * WidthDirection.X) + (d.Y * WidthDirection.Y);
        return along >= -toleranceM && along <= LengthM + toleranceM && across >= -toleranceM && across <= WidthM + toleranceM;
    }
}
