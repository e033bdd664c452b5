using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Core.Tests.Light;

public class CanopyAttenuationTests
{
    // One bench: length 1 m running north, width 2 m to the east, sensing depth 0.1 m. The point sits 0.5 m from the
    // front and back edges, 0.2 m from the left (west) edge and 1.8 m from the right (east) edge.
    private static readonly Bench Bench = new("b", new Footprint(0, 0, Angle.Zero, 1, 2), 0.8, new Canopy(0.3, 0.1, 4), 1, 1);
    private static readonly SamplePoint Point = new(0, 0, 0, new Vector3(0.2, 0.5, 1.0), 0.5, 0.5, 0.2, 1.8);

    // Path through a flat layer of thickness t at elevation e: t / sin e through the top; horizontal distance D to
    // an edge along the heading: D / cos e; the shorter wins (Canopy doc, MODEL.md §3). Values hand-computed.
    [Theory]
    [InlineData(0, 90, 0.1)]               // straight up: the sensing depth
    [InlineData(270, 0, 0.2)]              // horizontal west: the 0.2 m to the left edge
    [InlineData(90, 0, 1.8)]               // horizontal east: 1.8 m to the right edge
    [InlineData(0, 0, 0.5)]                // horizontal north: 0.5 m to the back edge
    [InlineData(45, 0, 0.70710678118)]     // horizontal north-east: 0.5 / cos 45°
    [InlineData(270, 30, 0.2)]             // 30° up to the west: top 0.1/sin 30° = 0.2 < edge 0.2/cos 30° = 0.2309
    [InlineData(270, 10, 0.20308532238)]   // 10° up to the west: edge 0.2/cos 10° < top 0.1/sin 10° = 0.5759
    [InlineData(270, -30, 0.23094010768)]  // 30° down to the west: edge only, 0.2/cos 30°
    public void Path_leaves_through_top_or_nearest_edge(double azimuthDeg, double elevationDeg, double expectedM)
    {
        Vector3 u = Direction.FromAzimuthZenith(Angle.FromDegrees(azimuthDeg), Angle.FromDegrees(90 - elevationDeg));
        Assert.Equal(expectedM, CanopyAttenuation.PathLengthM(Bench, Point, u), 9);
    }

    // Bench axes follow the footprint (Footprint doc: width to the right of the axis): with the axis pointing east the
    // left edge is the north side and the front edge the west end. Horizontal paths equal the edge distances.
    [Theory]
    [InlineData(0, 0.3)]    // north: left edge
    [InlineData(180, 0.7)]  // south: right edge
    [InlineData(270, 1.5)]  // west: front edge
    [InlineData(90, 2.5)]   // east: back edge
    public void Edges_follow_a_rotated_bench(double azimuthDeg, double expectedM)
    {
        var bench = new Bench("r", new Footprint(0, 0, Angle.FromDegrees(90), 4, 1), 0.8, new Canopy(0.3, 0.1, 4), 1, 1);
        var point = new SamplePoint(0, 0, 0, new Vector3(1.5, -0.3, 1.0), 1.5, 2.5, 0.3, 0.7);
        Vector3 u = Direction.FromAzimuthZenith(Angle.FromDegrees(azimuthDeg), Angle.RightAngle);
        Assert.Equal(expectedM, CanopyAttenuation.PathLengthM(bench, point, u), 9);
    }

    // Straight down never leaves the layer sideways: infinite path, nothing transmitted through a leafy canopy.
    [Fact]
    public void Straight_down_has_no_way_out()
    {
        Assert.Equal(double.PositiveInfinity, CanopyAttenuation.PathLengthM(Bench, Point, new Vector3(0, 0, -1)));
        Assert.Equal(0, CanopyAttenuation.Transmission(Bench, Point, new Vector3(0, 0, -1)));
        Assert.Equal(1, CanopyAttenuation.Transmission(Bench with { Canopy = new Canopy(0.3, 0.1, 0) }, Point, new Vector3(0, 0, -1)));
    }

    // Beer–Lambert, Monsi & Saeki (1953): T = exp(−G·LAD·path), G = 0.5 (spherical leaves, Ross 1981).
    // LAD 4, path 0.2 m: exp(−0.4) = 0.670320046.
    [Fact]
    public void Transmission_is_beer_lambert_with_spherical_leaf_projection()
    {
        Vector3 west = new(-1, 0, 0);
        Assert.Equal(0.670320046, CanopyAttenuation.Transmission(Bench, Point, west), 9);
    }
}
