namespace CanopyAdvisor.Core.Geometry;

/// <summary>Conversions between unit vectors in the site frame and compass angles.</summary>
/// <remarks>
/// Azimuth is measured clockwise from north (0 = N, 90° = E); zenith from the vertical (MODEL.md §0).
/// A unit vector with azimuth a and zenith z is (sin z sin a, sin z cos a, cos z).
/// </remarks>
public static class Direction
{
    /// <summary>The unit vector pointing at the given azimuth and zenith angle.</summary>
    public static Vector3 FromAzimuthZenith(Angle azimuth, Angle zenith)
    {
        double sz = zenith.Sin();
        return new Vector3(sz * azimuth.Sin(), sz * azimuth.Cos(), zenith.Cos());
    }

    /// <summary>The compass azimuth of a vector's horizontal part, in [0, 360°); zero for a vertical vector.</summary>
    public static Angle Azimuth(Vector3 v)
    {
        if (v.X == 0 && v.Y == 0)
        {
            return Angle.Zero;
        }

        return Angle.FromRadians(Math.Atan2(v.X, v.Y)).Normalized();
    }

    /// <summary>The angle between a vector and the upward vertical, in [0, 180°].</summary>
    public static Angle Zenith(Vector3 v)
    {
        double horizontal = Math.Sqrt((v.X * v.X) + (v.Y * v.Y));
        return Angle.FromRadians(Math.Atan2(horizontal, v.Z));
    }

    /// <summary>The sixteen compass point names, from north clockwise.</summary>
    public static IReadOnlyList<string> CompassPoints { get; } =
    [
        "N", "NNE", "NE", "ENE", "E", "ESE", "SE", "SSE",
        "S", "SSW", "SW", "WSW", "W", "WNW", "NW", "NNW",
    ];

    /// <summary>The 16-point compass name nearest to an azimuth.</summary>
    public static string CompassPoint(Angle azimuth)
    {
        int index = (int)Math.Round(azimuth.Normalized().Degrees / 22.5) % 16;
        return CompassPoints[index];
    }
}
