using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Tests.Geometry;

/// <summary>The site frame and compass conventions of MODEL.md §0: x east, y north, z up, azimuth clockwise from north.</summary>
public class DirectionTests
{
    // Expected unit vectors follow from the definition (sin z sin a, sin z cos a, cos z) of MODEL.md §0.
    [Theory]
    [InlineData(0, 90, 0, 1, 0)] // north on the horizon
    [InlineData(90, 90, 1, 0, 0)] // east on the horizon
    [InlineData(180, 90, 0, -1, 0)] // south
    [InlineData(270, 90, -1, 0, 0)] // west
    [InlineData(123, 0, 0, 0, 1)] // zenith: azimuth irrelevant
    public void Azimuth_and_zenith_map_to_the_site_frame(double azimuthDeg, double zenithDeg, double x, double y, double z)
    {
        Vector3 v = Direction.FromAzimuthZenith(Angle.FromDegrees(azimuthDeg), Angle.FromDegrees(zenithDeg));
        Assert.Equal(x, v.X, 12);
        Assert.Equal(y, v.Y, 12);
        Assert.Equal(z, v.Z, 12);
    }

    [Theory]
    [InlineData(0, 10)]
    [InlineData(45, 30)]
    [InlineData(135, 60)]
    [InlineData(200, 89)]
    [InlineData(359.5, 45)]
    public void Azimuth_and_zenith_round_trip(double azimuthDeg, double zenithDeg)
    {
        Vector3 v = Direction.FromAzimuthZenith(Angle.FromDegrees(azimuthDeg), Angle.FromDegrees(zenithDeg));
        Assert.Equal(azimuthDeg, Direction.Azimuth(v).Degrees, 9);
        Assert.Equal(zenithDeg, Direction.Zenith(v).Degrees, 9);
    }

    // The 16-point compass rose: 22.5° sectors centred on each point (common practice in navigation).
    [Theory]
    [InlineData(0, "N")]
    [InlineData(11.2, "N")]
    [InlineData(11.3, "NNE")]
    [InlineData(45, "NE")]
    [InlineData(90, "E")]
    [InlineData(168.7, "SSE")]
    [InlineData(180, "S")]
    [InlineData(247.5, "WSW")]
    [InlineData(348.7, "NNW")]
    [InlineData(348.8, "N")]
    [InlineData(-90, "W")]
    public void Compass_points_have_sixteen_sectors(double azimuthDeg, string expected) =>
        Assert.Equal(expected, Direction.CompassPoint(Angle.FromDegrees(azimuthDeg)));
}
