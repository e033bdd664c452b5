using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Structures;
using static CanopyAdvisor.Core.Tests.Structures.GlasshouseFixtures;

namespace CanopyAdvisor.Core.Tests.Structures;

// Expected values: the incidence angle on each facet follows from the roof geometry (a plane tilted by the roof slope
// α has the normal (±sin α, 0, cos α) across the bay), and the transmittance at that angle from Duffie & Beckman ch. 5
// (CoverOptics is checked against MODEL.md values in CoverOpticsTests).
public sealed class GlasshouseEnclosureTests
{
    // Single bay, ridge running north (axis azimuth 0), bay across x from 0 to 8 m, gutter 4 m, slope 30°.
    private readonly GlasshouseEnclosure single = Enclose(House());

    [Fact]
    public void Vertical_ray_meets_the_roof_at_the_roof_slope()
    {
        // Vertical ray on a plane tilted by α: incidence α (Duffie & Beckman ch. 1, angle of incidence on a tilted plane).
        double expected = Tau(Glass, 30) * 0.9;
        Assert.Equal(expected, single.SkyTransmittance(new Vector3(2, 10, 1), Vector3.UnitZ), 12);
        Assert.Equal(expected, single.SkyTransmittance(new Vector3(6.5, 3, 0.5), Vector3.UnitZ), 12);
    }

    [Fact]
    public void Ray_through_the_ridge_line_counts_one_crossing()
    {
        // Directly under the ridge (x = 4 m) a vertical ray meets both roof planes at one point: one crossing.
        Assert.Equal(Tau(Glass, 30) * 0.9, single.SkyTransmittance(new Vector3(4, 10, 1), Vector3.UnitZ), 12);
    }

    [Fact]
    public void Low_ray_leaves_through_the_side_wall()
    {
        // West, 5.71° up: from (4, 10, 1) it reaches x = 0 at z = 1.4 m, below the gutter: incidence on the wall
        // (normal −x) is acos(d·n).
        var d = new Vector3(-1, 0, 0.1).Normalized();
        double incidence = Math.Acos(-d.X) * 180 / Math.PI;
        Assert.Equal(Tau(Glass, incidence) * 0.9, single.SkyTransmittance(new Vector3(4, 10, 1), d), 12);
        GlasshouseEnclosure darkLeft = Enclose(House(left: Opaque));
        Assert.Equal(0, darkLeft.SkyTransmittance(new Vector3(4, 10, 1), d));
    }

    [Fact]
    public void Steep_ray_leaves_through_the_east_roof_plane()
    {
        // East, 45° up, from (4, 10, 1): at x = 8 it would be at z = 5 > gutter, so it leaves through the east roof
        // plane, normal (sin 30°, 0, cos 30°): cos θ = sin(45° + 30°), θ = 15°.
        Assert.Equal(Tau(Glass, 15) * 0.9, single.SkyTransmittance(new Vector3(4, 10, 1), Toward(90, 45)), 12);
    }

    [Fact]
    public void End_wall_and_gable()
    {
        // North, 10° up from (4, 19, 4.5): reaches y = 20 at z = 4.676 m, above the gutter and inside the gable triangle
        // (gable height at x = 4 is 6.31 m): incidence on the back end wall (normal +y) is 10°.
        Assert.Equal(Tau(Glass, 10) * 0.9, single.SkyTransmittance(new Vector3(4, 19, 4.5), Toward(0, 10)), 12);
        GlasshouseEnclosure darkBack = Enclose(House(back: Opaque));
        Assert.Equal(0, darkBack.SkyTransmittance(new Vector3(4, 19, 4.5), Toward(0, 10)));
        // North, 60° up from (3, 17, 4.5): meets the west roof plane (height 5.73 m at x = 3) at y = 17.7 m, before the end wall.
        Assert.True(darkBack.SkyTransmittance(new Vector3(3, 17, 4.5), Toward(0, 60)) > 0);
    }

    [Fact]
    public void Low_ray_across_two_bays_crosses_three_roof_planes()
    {
        // Two bays (x 0–8, 8–16), slope α = 30°, ray east at elevation e = 10° from (6, 10, 4.5):
        // leaves bay 0 by its east plane at x = 6.87 (cos θ = sin(α + e), θ = 50°), enters bay 1 by its west plane at
        // x = 10.13 (cos θ = sin(α − e), θ = 70°), leaves by its east plane at x = 13.0 (θ = 50°).
        GlasshouseEnclosure twoBays = Enclose(House(bays: 2));
        double expected = Tau(Glass, 50) * Tau(Glass, 70) * Tau(Glass, 50) * 0.9;
        Assert.Equal(expected, twoBays.SkyTransmittance(new Vector3(6, 10, 4.5), Toward(90, 10)), 12);
    }

    [Theory]
    // From a point on the internal gutter line of two bays (x = 8 m, z = 4 m), rays west:
    // at 10° (below the 30° slope) the ray runs into bay 0 and leaves by its west plane at x = 1.87 m,
    // cos θ = sin(30° + 10°), θ = 50°; at 50° it leaves at once over bay 0's east plane (normal (sin 30°, cos 30°) in
    // the bay section), cos θ = sin(50° − 30°), θ = 70°; the neighbouring bay's plane through the same line is not crossed.
    [InlineData(10.0, 50.0)]
    [InlineData(50.0, 70.0)]
    public void Ray_from_an_internal_gutter_line(double elevationDeg, double incidenceDeg)
    {
        GlasshouseEnclosure twoBays = Enclose(House(bays: 2));
        Assert.Equal(Tau(Glass, incidenceDeg) * 0.9, twoBays.SkyTransmittance(new Vector3(8, 10, 4), Toward(270, elevationDeg)), 12);
    }

    [Fact]
    public void Point_on_a_wall_counts_the_wall_only_when_looking_out()
    {
        // On the west wall (x = 0): west at 5.71° up crosses the wall at once (incidence acos(d·n));
        // east at 45° up crosses only the east roof plane (θ = 15°, as in Steep_ray_leaves_through_the_east_roof_plane).
        var onWall = new Vector3(0, 10, 1);
        var west = new Vector3(-1, 0, 0.1).Normalized();
        Assert.Equal(Tau(Glass, Math.Acos(-west.X) * 180 / Math.PI) * 0.9, single.SkyTransmittance(onWall, west), 12);
        Assert.Equal(Tau(Glass, 15) * 0.9, single.SkyTransmittance(onWall, Toward(90, 45)), 12);
    }

    [Fact]
    public void Directions_at_or_below_the_horizon_see_no_sky()
    {
        Assert.Equal(0, single.SkyTransmittance(new Vector3(4, 10, 1), Toward(90, 0)));
        Assert.Equal(0, single.SkyTransmittance(new Vector3(4, 10, 1), Toward(90, -20)));
        Assert.Equal(0, single.SkyTransmittance(new Vector3(4, 10, 1), Vector3.Zero));
    }

    [Fact]
    public void A_fully_opaque_envelope_has_no_gaps()
    {
        // A closed opaque shell admits no sky from any inside point (geometric necessity): checks that the facets
        // close the envelope, seams included.
        GlasshouseEnclosure dark = Enclose(House(bays: 3, azimuthDeg: 37, cornerX: 5, cornerY: -3, roof: Opaque, left: Opaque, right: Opaque, front: Opaque, back: Opaque));
        var random = new Random(20261202);
        Glasshouse g = dark.Glasshouse;
        for (int i = 0; i < 20000; i++)
        {
            // Include points exactly on seams: the ridges, gutter lines and walls.
            double u = random.Next(3) == 0 ? 0 : random.NextDouble() * g.Footprint.LengthM;
            double v = random.Next(4) == 0 ? random.Next(7) * 4.0 : random.NextDouble() * g.Footprint.WidthM;
            double z = random.NextDouble() * g.GutterHeightM;
            Vector3 p = g.Footprint.Corner + (u * g.Footprint.AxisDirection) + (v * g.Footprint.WidthDirection) + new Vector3(0, 0, z);
            Vector3 d = random.Next(5) == 0
                ? Toward(random.Next(8) * 45.0, random.Next(1, 10) * 10.0)
                : Toward(random.NextDouble() * 360, 0.01 + (random.NextDouble() * 89.99));
            Assert.Equal(0, dark.SkyTransmittance(p, d));
        }
    }

    [Fact]
    public void Outside_points_see_only_obstructions()
    {
        Obstruction shed = Box("shed", -10, 0, 0, 5, 5, 0, 3);
        GlasshouseEnclosure house = Enclose(House(), shed);
        Assert.False(house.Contains(new Vector3(-2, 2, 1)));
        Assert.Equal(1, house.SkyTransmittance(new Vector3(-2, 2, 1), Toward(90, 20)));
        Assert.Equal(0, house.SkyTransmittance(new Vector3(-2, 2, 1), Toward(270, 5)));
    }

    [Fact]
    public void Neighbouring_building_blocks_low_sun()
    {
        // A 10 m building 12 m east of the east wall (x 20–30): from (4, 10, 1) a ray east at 20° reaches x = 20 at
        // z = 6.8 m (blocked); at 45° it is at z = 17 m (clear).
        Obstruction building = Box("warehouse", 20, 0, 0, 20, 10, 0, 10);
        GlasshouseEnclosure house = Enclose(House(), building);
        Assert.Equal(0, house.SkyTransmittance(new Vector3(4, 10, 1), Toward(90, 20)));
        Assert.Equal(Tau(Glass, 15) * 0.9, house.SkyTransmittance(new Vector3(4, 10, 1), Toward(90, 45)), 12);
        // Passing beyond the building's north end (y = 20) at low elevation is clear.
        Assert.True(house.SkyTransmittance(new Vector3(4, 10, 1), Toward(20, 20)) > 0);
    }

    [Fact]
    public void Rotated_obstruction_blocks_by_its_own_footprint()
    {
        // A tank rotated 45°: footprint from (10, 0) along NE for 4 m and 2 m to its right (SE), 0–3 m high.
        Obstruction tank = Box("tank", 10, 0, 45, 4, 2, 0, 3);
        GlasshouseEnclosure house = Enclose(House(lengthM: 40, bays: 2), tank);
        // Centre of the tank: corner + 2·axis + 1·across.
        var axis = new Vector3(Math.Sqrt(0.5), Math.Sqrt(0.5), 0);
        var across = new Vector3(Math.Sqrt(0.5), -Math.Sqrt(0.5), 0);
        Vector3 centre = new Vector3(10, 0, 0) + (2 * axis) + (1 * across);
        Vector3 from = centre + new Vector3(0, 0, 6);
        Assert.True(house.IsBlocked(from, centre - new Vector3(0, 0, 1e-3) + new Vector3(0, 0, 0.5)));
        // Just outside the rotated footprint (1.05 m across from the long side) the vertical segment is clear.
        Vector3 beside = centre + (1.6 * across);
        Assert.False(house.IsBlocked(beside + new Vector3(0, 0, 6), beside + new Vector3(0, 0, 0.5)));
    }

    [Fact]
    public void IsBlocked_counts_opaque_facets_and_obstructions_only()
    {
        GlasshouseEnclosure darkLeft = Enclose(House(left: Opaque), Box("tank", 5, 5, 0, 1, 1, 0, 2));
        var lamp = new Vector3(2, 10, 3);
        Assert.True(darkLeft.IsBlocked(lamp, new Vector3(-3, 10, 1)));   // through the opaque west wall
        Assert.False(darkLeft.IsBlocked(lamp, new Vector3(10, 10, 1)));  // through the glazed east wall
        Assert.False(darkLeft.IsBlocked(lamp, new Vector3(6, 12, 1)));   // clear inside
        Assert.True(darkLeft.IsBlocked(new Vector3(5.5, 3, 1), new Vector3(5.5, 7, 1))); // through the tank
        Assert.False(darkLeft.IsBlocked(lamp, lamp));
        Assert.False(darkLeft.IsBlocked(new Vector3(0, 10, 1), new Vector3(3, 10, 1))); // starts on the wall
    }

    [Fact]
    public void Facets_cover_the_envelope_area()
    {
        // Surface areas from the geometry: roof planes 2·B·L·(b/2)/cos α; side walls 2·L·g; end walls 2·(W·g + B·(b/2)·rise).
        Glasshouse g = House(bays: 3, bayWidthM: 6.4, lengthM: 30, gutterM: 4.5, slopeDeg: 22);
        GlasshouseEnclosure house = Enclose(g);
        double rise = 3.2 * Math.Tan(22 * Math.PI / 180);
        double roof = 2 * 3 * 30 * 3.2 / Math.Cos(22 * Math.PI / 180);
        double walls = (2 * 30 * 4.5) + (2 * ((19.2 * 4.5) + (3 * 3.2 * rise)));
        double area = house.Facets.Sum(f => PolygonArea(f.Corners));
        Assert.Equal(roof + walls, area, 9);
        Assert.Equal(4 * 3 + 4, house.Facets.Length);
        Assert.Equal(roof, house.Facets.Where(f => f.Name.StartsWith("roof", StringComparison.Ordinal)).Sum(f => PolygonArea(f.Corners)), 9);
        Assert.All(house.Facets.Where(f => f.Name.StartsWith("roof", StringComparison.Ordinal)), f => Assert.Equal(Math.Cos(22 * Math.PI / 180), f.OutwardNormal.Z, 12));
    }

    [Fact]
    public void Flat_roof_has_no_gables()
    {
        GlasshouseEnclosure flat = Enclose(House(slopeDeg: 0));
        Assert.Equal(6, flat.Facets.Length);
        Assert.Equal(Tau(Glass, 0) * 0.9, flat.SkyTransmittance(new Vector3(4, 10, 1), Vector3.UnitZ), 12);
    }

    private static double PolygonArea(System.Collections.Immutable.ImmutableArray<Vector3> corners)
    {
        Vector3 sum = Vector3.Zero;
        for (int i = 1; i + 1 < corners.Length; i++)
        {
            sum += Vector3.Cross(corners[i] - corners[0], corners[i + 1] - corners[0]);
        }

        return sum.Length / 2;
    }
}
