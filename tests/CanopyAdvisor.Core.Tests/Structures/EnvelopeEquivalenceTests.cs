using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Structures;
using static CanopyAdvisor.Core.Tests.Structures.GlasshouseFixtures;

namespace CanopyAdvisor.Core.Tests.Structures;

// The fast saw-tooth traversal must agree with the plain every-facet ray test (two independent implementations of the
// same geometry), including rays through ridges, gutters, eaves and corners. Origins are strictly inside: which facet
// a ray from a point exactly on an edge "crosses" is a convention each implementation may settle differently (the
// physical cases are checked in GlasshouseEnclosureTests and by the no-gaps test).
public sealed class EnvelopeEquivalenceTests
{
    public static TheoryData<int, double, double, bool> Houses => new()
    {
        { 1, 30, 0, false },
        { 3, 22, 37, false },
        { 6, 26, 200, true },
        { 2, 0, 90, false },
        { 10, 45, 311, true },
    };

    [Theory]
    [MemberData(nameof(Houses))]
    public void Saw_tooth_traversal_matches_facet_by_facet_ray_test(int bays, double slopeDeg, double azimuthDeg, bool mixedCovers)
    {
        Glasshouse house = House(bays: bays, bayWidthM: 6.4, lengthM: 31, gutterM: 4.2, slopeDeg: slopeDeg, azimuthDeg: azimuthDeg,
            cornerX: -4, cornerY: 9, roof: Glass,
            left: mixedCovers ? Opaque : TwinWall, right: Glass, front: TwinWall, back: mixedCovers ? Opaque : Glass);
        GlasshouseEnclosure enclosure = Enclose(house);
        Footprint f = house.Footprint;
        var random = new Random(bays * 1000 + (int)slopeDeg);
        double ridgeRise = house.RidgeHeightM - house.GutterHeightM;
        for (int i = 0; i < 20000; i++)
        {
            double u = random.Next(6) == 0 ? 0.001 + (random.Next(31) * 0.999) : 0.001 + (random.NextDouble() * (f.LengthM - 0.002));
            // Every fourth point lies under a ridge or an internal gutter line, so rays pass through edges.
            double v = random.Next(4) == 0 ? 3.2 + (random.Next(2 * bays - 1) * 3.2) : 0.001 + (random.NextDouble() * (f.WidthM - 0.002));
            double withinBay = v - (Math.Min(Math.Floor(v / 6.4), bays - 1) * 6.4);
            double roof = house.GutterHeightM + (Math.Min(withinBay, 6.4 - withinBay) * Math.Tan(slopeDeg * Math.PI / 180));
            double z = random.Next(8) == 0 ? house.GutterHeightM - 0.001 : 0.001 + (random.NextDouble() * (roof - 0.002));
            Vector3 p = f.Corner + (u * f.AxisDirection) + (v * f.WidthDirection) + new Vector3(0, 0, z);
            Vector3 d = random.Next(6) == 0
                ? Toward(azimuthDeg + (random.Next(8) * 45.0), random.Next(1, 10) * 10.0)
                : Toward(random.NextDouble() * 360, 0.05 + (random.NextDouble() * 89.9));
            Assert.True(enclosure.Contains(p));
            double fast = enclosure.SkyTransmittance(p, d);
            double reference = (1 - house.StructuralShading) * enclosure.EnvelopeTransmittanceByFacets(p, d);
            Assert.True(Math.Abs(fast - reference) < 1e-12, $"p = {p}, d = {d}: fast {fast}, facets {reference} (rise {ridgeRise})");

            // A direction prepared once for many points gives the same number, bit for bit.
            Assert.Equal(fast, enclosure.SkyTransmittance(p, enclosure.Prepare(d)));
        }
    }
}
