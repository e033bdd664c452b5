using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Structures;
using static CanopyAdvisor.Core.Tests.Structures.GlasshouseFixtures;

namespace CanopyAdvisor.Core.Tests.Structures;

// Reflection symmetry: the physics (Fresnel transmittance depends only on the incidence angle, Duffie & Beckman ch. 5;
// ray geometry is mirror invariant) must give equal results for a house mirrored east–west, at mirrored points and
// for mirrored directions. Rotating the whole scene about the vertical must not change anything either.
public sealed class EnclosureSymmetryTests
{
    private static Vector3 MirrorEastWest(Vector3 p) => new(-p.X, p.Y, p.Z);

    // Mirroring x → −x turns a footprint's axis azimuth a into −a, and its width direction (right of the axis) into
    // the left: the mirrored footprint starts at the mirror of the far-side corner, and left/right walls swap.
    private static Footprint MirrorFootprint(Footprint f)
    {
        Vector3 farCorner = MirrorEastWest(f.Corner + (f.WidthM * f.WidthDirection));
        return new Footprint(farCorner.X, farCorner.Y, -f.AxisAzimuth, f.LengthM, f.WidthM);
    }

    private static Obstruction MirrorObstruction(Obstruction o) => o with { Footprint = MirrorFootprint(o.Footprint) };

    [Theory]
    [InlineData(0.0)]
    [InlineData(23.0)]
    [InlineData(90.0)]
    [InlineData(131.0)]
    public void Mirrored_house_gives_the_same_sky_transmittance(double azimuthDeg)
    {
        Glasshouse original = House(bays: 3, bayWidthM: 6.4, lengthM: 25, gutterM: 4.2, slopeDeg: 25, azimuthDeg: azimuthDeg,
            cornerX: 3, cornerY: -7, roof: Glass, left: Opaque, right: TwinWall, front: Glass, back: Opaque, shading: 0.15);
        Obstruction[] obstructions =
        [
            Box("silo", 25, 10, 10, 6, 6, 0, 12),
            Box("duct", 6, -2, azimuthDeg, 8, 0.6, 3.2, 3.8),
        ];
        Glasshouse mirrored = original with
        {
            Footprint = MirrorFootprint(original.Footprint),
            LeftWall = original.RightWall,
            RightWall = original.LeftWall,
        };
        GlasshouseEnclosure a = Enclose(original, obstructions);
        GlasshouseEnclosure b = Enclose(mirrored, [.. obstructions.Select(MirrorObstruction)]);

        var random = new Random(7);
        Footprint f = original.Footprint;
        int nonZero = 0;
        for (int i = 0; i < 4000; i++)
        {
            Vector3 p = f.Corner + (random.NextDouble() * f.LengthM * f.AxisDirection) + (random.NextDouble() * f.WidthM * f.WidthDirection)
                + new Vector3(0, 0, random.NextDouble() * original.GutterHeightM);
            Vector3 d = Toward(random.NextDouble() * 360, 0.5 + (random.NextDouble() * 89));
            double expected = a.SkyTransmittance(p, d);
            Assert.Equal(expected, b.SkyTransmittance(MirrorEastWest(p), MirrorEastWest(d)), 12);
            Vector3 q = p + (d * 3);
            Assert.Equal(a.IsBlocked(p, q), b.IsBlocked(MirrorEastWest(p), MirrorEastWest(q)));
            nonZero += expected > 0 ? 1 : 0;
        }

        // The comparison is only meaningful if both lit and dark cases occur.
        Assert.InRange(nonZero, 400, 3600);
    }

    [Fact]
    public void Rotating_the_scene_changes_nothing()
    {
        const double turnDeg = 57;
        double c = Math.Cos(turnDeg * Math.PI / 180);
        double s = Math.Sin(turnDeg * Math.PI / 180);

        // Clockwise rotation seen from above (azimuths grow by turnDeg).
        Vector3 Turn(Vector3 p) => new((p.X * c) + (p.Y * s), (-p.X * s) + (p.Y * c), p.Z);

        Glasshouse original = House(bays: 2, azimuthDeg: 10, left: Opaque, right: TwinWall);
        Vector3 turnedCorner = Turn(original.Footprint.Corner);
        Glasshouse turned = original with
        {
            Footprint = original.Footprint with
            {
                CornerXM = turnedCorner.X,
                CornerYM = turnedCorner.Y,
                AxisAzimuth = original.Footprint.AxisAzimuth + Angle.FromDegrees(turnDeg),
            },
        };
        GlasshouseEnclosure a = Enclose(original);
        GlasshouseEnclosure b = Enclose(turned);
        var random = new Random(11);
        for (int i = 0; i < 2000; i++)
        {
            Footprint f = original.Footprint;
            Vector3 p = f.Corner + (random.NextDouble() * f.LengthM * f.AxisDirection) + (random.NextDouble() * f.WidthM * f.WidthDirection)
                + new Vector3(0, 0, random.NextDouble() * 4);
            Vector3 d = Toward(random.NextDouble() * 360, 1 + (random.NextDouble() * 88));
            Assert.Equal(a.SkyTransmittance(p, d), b.SkyTransmittance(Turn(p), Turn(d)), 12);
        }
    }
}
