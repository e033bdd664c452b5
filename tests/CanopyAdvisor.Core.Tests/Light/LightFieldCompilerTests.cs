using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Structures;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Light;

public class LightFieldCompilerTests
{
    private static readonly OutsideLight Night = OutsideLight.Dark(Instant.FromUtc(2026, 1, 1, 0, 0), new Vector3(0, 0, -1));

    private static PointLight[] Evaluate(CompiledLightField field, OutsideLight outside, LocalTime localTime)
    {
        var into = new PointLight[field.Points.Length];
        field.Step(outside, localTime, into);
        return into;
    }

    // MODEL.md §3 check values: a downward Lambertian lamp of Φ = 1000 µmol s⁻¹ 1 m above the point gives
    // E = (Φ/π) h²/(h²+r²)² = 318.31 on axis and 79.58 at 1 m horizontal offset; an isotropic lamp Φ/(4πh²) = 79.58.
    [Theory]
    [InlineData("Lambertian, on axis (MODEL.md §3)", true, 0, 318.31)]
    [InlineData("Lambertian, 1 m offset (MODEL.md §3)", true, 1, 79.58)]
    [InlineData("isotropic, on axis (MODEL.md §3)", false, 0, 79.58)]
    public void Downward_lamp_over_open_point_matches_the_point_source_formula(string label, bool lambertian, int pointIndex, double expected)
    {
        _ = label;
        BeamDistribution distribution = lambertian ? LambertianTestDistribution.Instance : IsotropicTestDistribution.Instance;

        // Two points at 0.5 and 1.5 m along the bench, sensing height 0.8 + 0.2 = 1.0 m; lamp 1 m above the first.
        Bench bench = TestSites.Bench("b", 0, 0, 2, 1, 2, 1);
        Lamp lamp = TestSites.Lamp("l", new Vector3(0.5, 0.5, 2.0), distribution, 1000);
        CompiledLightField field = LightFieldCompiler.Compile(TestSites.Make(TestSites.Room, [bench], [lamp]), IndoorTestEnclosure.Instance);

        PointLight light = Evaluate(field, Night, new LocalTime(12, 0))[pointIndex];
        Assert.Equal(expected, light.HorizontalPpfd, 2);
    }

    // The light vector of one lamp is E·û toward the lamp (MODEL.md §3); at 1 m offset under a 1 m high lamp,
    // û = (−1, 0, 1)/√2 and E = (Φ/π)·cos θ / d² = 1000/π · (1/√2) / 2 = 112.54 µmol m⁻² s⁻¹ (hand-computed).
    [Fact]
    public void Lamp_light_vector_points_at_the_lamp_with_normal_irradiance()
    {
        Bench bench = TestSites.Bench("b", 0, 0, 1, 2, 1, 2);          // points at x = 0.5 and 1.5, y = 0.5
        Lamp lamp = TestSites.Lamp("l", new Vector3(0.5, 0.5, 2.0), LambertianTestDistribution.Instance, 1000);
        CompiledLightField field = LightFieldCompiler.Compile(TestSites.Make(TestSites.Room, [bench], [lamp]), IndoorTestEnclosure.Instance);

        PointLight offset = Evaluate(field, Night, new LocalTime(12, 0))[1];
        double e = 1000 / Math.PI * (1 / Math.Sqrt(2)) / 2;
        Assert.Equal(-e / Math.Sqrt(2), offset.LightVector.X, 9);
        Assert.Equal(0, offset.LightVector.Y, 9);
        Assert.Equal(e / Math.Sqrt(2), offset.LightVector.Z, 9);
        Assert.Equal(0.2 * offset.LightVector.X, offset.BlueVector.X, 9);   // TestSites.WhiteBands: blue 0.2
        // Flat in-band spectrum (CompiledLightField doc): R:FR = red/10 ÷ (farRed/5) = 0.4 / (2 · 0.05) = 4.
        Assert.Equal(4.0, offset.RedToFarRed, 9);
    }

    // Edge effect (MODEL.md §3; Monsi & Saeki 1953 with G = 0.5): a side lamp at sensing height shines horizontally
    // into a 2 m wide bench. The ratio of light with LAD 4 to light with LAD 0 at each point is exp(−0.5·4·path) with
    // path the horizontal distance from the lamp-side edge: 0.2 m at the edge point, 1.0 m at the middle point.
    [Fact]
    public void Side_lamp_reaches_the_edge_point_more_than_the_middle_point()
    {
        Bench Make(double lad) => TestSites.Bench("b", 0, 0, 1, 2, 1, 5, surfaceM: 0.8, canopyM: 0.3, depthM: 0.1, lad: lad);
        Lamp side = TestSites.Lamp(
            "side", new Vector3(-0.5, 0.5, 1.0), LambertianTestDistribution.Instance, 1000,
            aim: new LampAim(Angle.FromDegrees(90), Angle.FromDegrees(90), Angle.Zero));
        PointLight[] leafy = Evaluate(LightFieldCompiler.Compile(TestSites.Make(TestSites.Room, [Make(4)], [side]), IndoorTestEnclosure.Instance), Night, LocalTime.Noon);
        PointLight[] bare = Evaluate(LightFieldCompiler.Compile(TestSites.Make(TestSites.Room, [Make(0)], [side]), IndoorTestEnclosure.Instance), Night, LocalTime.Noon);

        // Points across the width: x = 0.2 (edge, facing the lamp), 0.6, 1.0 (middle), 1.4, 1.8.
        double edgeRatio = leafy[0].LightVector.Length / bare[0].LightVector.Length;
        double middleRatio = leafy[2].LightVector.Length / bare[2].LightVector.Length;
        Assert.Equal(Math.Exp(-0.5 * 4 * 0.2), edgeRatio, 9);
        Assert.Equal(Math.Exp(-0.5 * 4 * 1.0), middleRatio, 9);
        Assert.True(leafy[0].LightVector.Length > leafy[2].LightVector.Length * 5);

        // With no leaves the canopy passes everything: both points see their unattenuated inverse-square light,
        // E = Φ/π / d² on the lamp's axis (d = 0.7 m and 1.5 m).
        Assert.Equal(1000 / Math.PI / (0.7 * 0.7), bare[0].LightVector.Length, 9);
        Assert.Equal(1000 / Math.PI / (1.5 * 1.5), bare[2].LightVector.Length, 9);
    }

    // A lamp inside the canopy layer (5 cm over the sensing point, under a 10 cm sensing depth): the light's path
    // through the leaves ends at the lamp, 0.05 m, not at the canopy top: exp(−0.5·4·0.05) (Beer–Lambert, G = 0.5).
    [Fact]
    public void Lamp_inside_the_canopy_is_attenuated_only_up_to_the_lamp()
    {
        Bench Make(double lad) => TestSites.Bench("b", 0, 0, 1, 1, 1, 1, canopyM: 0.3, depthM: 0.1, lad: lad);
        Lamp lamp = TestSites.Lamp("in", new Vector3(0.5, 0.5, 1.05), IsotropicTestDistribution.Instance, 100);
        double leafy = Evaluate(LightFieldCompiler.Compile(TestSites.Make(TestSites.Room, [Make(4)], [lamp]), IndoorTestEnclosure.Instance), Night, LocalTime.Noon)[0].HorizontalPpfd;
        double bare = Evaluate(LightFieldCompiler.Compile(TestSites.Make(TestSites.Room, [Make(0)], [lamp]), IndoorTestEnclosure.Instance), Night, LocalTime.Noon)[0].HorizontalPpfd;
        Assert.Equal(Math.Exp(-0.5 * 4 * 0.05), leafy / bare, 9);
    }

    // Edge effect on the sky (MODEL.md §3): with leaves, low sky reaches the edge point through the short side path
    // but the middle point only through the top, so the edge point sees more sky; without leaves both see all of it
    // (f = 1 under an open sky, the definition of the view factor).
    [Fact]
    public void Edge_point_sees_more_sky_than_the_middle_point_only_with_leaves()
    {
        Bench Make(double lad) => TestSites.Bench("b", 0, 0, 1, 2, 1, 5, canopyM: 0.3, depthM: 0.1, lad: lad);
        CompiledLightField leafy = LightFieldCompiler.Compile(TestSites.Make(TestSites.Glasshouse, [Make(4)], []), OpenSkyTestEnclosure.Instance);
        CompiledLightField bare = LightFieldCompiler.Compile(TestSites.Make(TestSites.Glasshouse, [Make(0)], []), OpenSkyTestEnclosure.Instance);
        Assert.True(leafy.SkyViewAt(0).ViewFactor > leafy.SkyViewAt(2).ViewFactor + 0.005); // 0.7143 vs 0.7059 on the default grid
        Assert.True(leafy.SkyViewAt(2).ViewFactor < 1);
        Assert.Equal(1, bare.SkyViewAt(0).ViewFactor, 12);
        Assert.Equal(1, bare.SkyViewAt(2).ViewFactor, 12);

        // The edge point's extra light comes from its side (west, the near edge): its sky vector leans west.
        Assert.True(leafy.SkyViewAt(0).SkyVector.X < 0);
        Assert.Equal(0, leafy.SkyViewAt(2).SkyVector.X, 9);
    }

    // Grouping is bookkeeping only: lamps that switch together sum the same light whether stored per group or per
    // lamp. Schedules with On = Off are "always on" (LampSchedule doc) but are different records, so each of these
    // lamps gets its own group; the result must equal the grouped one (to rounding).
    [Fact]
    public void Grouping_lamps_gives_the_same_light_as_not_grouping()
    {
        Bench bench = TestSites.Bench("b", 0, 0, 3, 2, 6, 4, canopyM: 0.3, depthM: 0.1, lad: 3);
        var positions = new[] { new Vector3(0.5, 0.5, 2.2), new Vector3(1.5, 1.5, 2.2), new Vector3(1.0, 2.5, 2.4), new Vector3(-0.4, 1.0, 1.0), new Vector3(2.5, 2.0, 1.1) };
        Lamp[] grouped = [.. positions.Select((p, i) => TestSites.Lamp($"l{i}", p, LambertianTestDistribution.Instance, 500 + (100 * i),
            aim: p.Z < 1.5 ? new LampAim(Angle.FromDegrees(p.X < 0 ? 90 : 270), Angle.FromDegrees(70), Angle.Zero) : null))];
        Lamp[] separate = [.. grouped.Select((l, i) => l with { Schedule = new LampSchedule(new LocalTime(i + 1, 0), new LocalTime(i + 1, 0), null) })];

        CompiledLightField one = LightFieldCompiler.Compile(TestSites.Make(TestSites.Room, [bench], grouped), IndoorTestEnclosure.Instance);
        CompiledLightField many = LightFieldCompiler.Compile(TestSites.Make(TestSites.Room, [bench], separate), IndoorTestEnclosure.Instance);
        Assert.Single(one.Groups);
        Assert.Equal(5, many.Groups.Length);

        PointLight[] a = Evaluate(one, Night, LocalTime.Noon);
        PointLight[] b = Evaluate(many, Night, LocalTime.Noon);
        for (int p = 0; p < a.Length; p++)
        {
            Assert.Equal(a[p].HorizontalPpfd, b[p].HorizontalPpfd, 9);
            Assert.Equal(a[p].LightVector.X, b[p].LightVector.X, 9);
            Assert.Equal(a[p].LightVector.Y, b[p].LightVector.Y, 9);
            Assert.Equal(a[p].LightVector.Z, b[p].LightVector.Z, 9);
            Assert.Equal(a[p].Red660, b[p].Red660, 9);
            Assert.Equal(a[p].FarRed730, b[p].FarRed730, 9);
        }
    }

    // Schedules: a lamp outside its photoperiod, or above its outside-light threshold, adds nothing (LampSchedule doc).
    [Fact]
    public void Groups_that_are_off_add_nothing()
    {
        Bench bench = TestSites.Bench("b", 0, 0, 1, 1, 1, 1);
        var schedule = new LampSchedule(new LocalTime(6, 0), new LocalTime(22, 0), 300);
        Lamp lamp = TestSites.Lamp("l", new Vector3(0.5, 0.5, 2.0), LambertianTestDistribution.Instance, 1000, schedule: schedule);
        CompiledLightField field = LightFieldCompiler.Compile(TestSites.Make(TestSites.Room, [bench], [lamp]), IndoorTestEnclosure.Instance);

        Assert.Equal(318.31, Evaluate(field, Night, new LocalTime(6, 0))[0].HorizontalPpfd, 2);
        Assert.Equal(0, Evaluate(field, Night, new LocalTime(22, 0))[0].HorizontalPpfd);
        var bright = new OutsideLight(Night.Time, new Vector3(0, 0, 1), 0, 0, 400);
        Assert.Equal(0, Evaluate(field, bright, new LocalTime(12, 0))[0].HorizontalPpfd);
    }

    // An opaque surface between the point and the lamp blocks it (IEnclosure.IsBlocked contract).
    [Fact]
    public void Blocked_lamp_adds_nothing()
    {
        Bench bench = TestSites.Bench("b", 0, 0, 1, 1, 1, 1);
        Lamp lamp = TestSites.Lamp("l", new Vector3(0.5, 0.5, 2.0), LambertianTestDistribution.Instance, 1000);
        CompiledLightField field = LightFieldCompiler.Compile(TestSites.Make(TestSites.Room, [bench], [lamp]), new EverythingBlocked());
        Assert.Equal(0, Evaluate(field, Night, LocalTime.Noon)[0].LightVector.Length);
    }

    // Howell's catalogue B-3 (MODEL.md §3): view factor from a point to a parallel rectangle 1 × 1 at height 1 with a
    // corner over the point, 0.138531606. An opaque square over the point's corner hides that share of the sky, so the
    // sky view factor is 1 − 0.138532. Tolerance 5e-4: the quadrature cells cut by the square's edges (measured error
    // 1.6e-4 with HemisphereQuadrature at 180 bands; about 0.008 at 10° cells).
    [Fact]
    public void Sky_view_factor_misses_an_opaque_square_as_in_howell_b3()
    {
        Bench bench = TestSites.Bench("b", 0, 0, 1, 1, 1, 1, surfaceM: 0, canopyM: 0);
        Site site = TestSites.Make(TestSites.Glasshouse, [bench], []);
        var roof = new SquareShadeEnclosure(new Vector3(0.5, 0.5, 0), 1, 1, 1);
        CompiledLightField field = LightFieldCompiler.Compile(site, roof, new LightFieldOptions(SkyZenithBands: 180));

        (double f, _, double s) = field.SkyViewAt(0);
        Assert.Equal(1 - 0.138531606, f, 5e-4);
        Assert.True(s < 2 && s > 1.5);
    }

    // Open hemisphere: f = 1, v = ẑ, s = 2 (MODEL.md §3: "an open hemisphere gives f = 1, v = ẑ"; s = 2 from
    // (1/π)∫dω = 2π/π). Exact because the grid integrates each kernel exactly over its cells.
    [Theory]
    [InlineData(1)]
    [InlineData(9)]
    [InlineData(30)]
    public void Open_sky_view_is_exact(int rings)
    {
        Bench bench = TestSites.Bench("b", 0, 0, 1, 1, 1, 1);
        CompiledLightField field = LightFieldCompiler.Compile(TestSites.Make(TestSites.Glasshouse, [bench], []), OpenSkyTestEnclosure.Instance, new LightFieldOptions(rings));
        (double f, Vector3 v, double s) = field.SkyViewAt(0);
        Assert.Equal(1, f, 12);
        Assert.Equal(0, v.X, 12);
        Assert.Equal(0, v.Y, 12);
        Assert.Equal(1, v.Z, 12);
        Assert.Equal(2, s, 12);
    }

    // COMMON.md: bad input is reported as every problem with its path, never a crash or a half-result.
    [Fact]
    public void Bad_benches_and_lamps_are_all_reported()
    {
        Bench bad = TestSites.Bench("b", 0, 0, 1, -1, 0, 1, canopyM: 0.2, depthM: 0.3, lad: -1);
        Lamp lamp = TestSites.Lamp("l", new Vector3(0, 0, 2), LambertianTestDistribution.Instance, -5, dimming: 1.5);
        var error = Assert.Throws<InvalidInputException>(() =>
            LightFieldCompiler.Compile(TestSites.Make(TestSites.Room, [bad], [lamp]), IndoorTestEnclosure.Instance));
        string[] paths = [.. error.Errors.Select(e => e.Path)];
        Assert.Contains("benches[0].samplesAlongLength", paths);
        Assert.Contains("benches[0].footprint.widthM", paths);
        Assert.Contains("benches[0].canopy.sensingDepthM", paths);
        Assert.Contains("benches[0].canopy.leafAreaDensityM2PerM3", paths);
        Assert.Contains("lamps[0].ppfMicromolesPerSecond", paths);
        Assert.Contains("lamps[0].dimming", paths);
    }

    private sealed class EverythingBlocked : IEnclosure
    {
        public double SkyTransmittance(Vector3 origin, Vector3 towardSky) => 0;

        public bool IsBlocked(Vector3 from, Vector3 to) => true;
    }

    /// <summary>An opaque horizontal a × b rectangle at height c whose corner is straight over <c>corner</c>.</summary>
    private sealed class SquareShadeEnclosure(Vector3 corner, double a, double b, double c) : IEnclosure
    {
        public double SkyTransmittance(Vector3 origin, Vector3 towardSky)
        {
            if (towardSky.Z <= 0)
            {
                return 0;
            }

            double t = (corner.Z + c - origin.Z) / towardSky.Z;
            double x = origin.X + (t * towardSky.X) - corner.X;
            double y = origin.Y + (t * towardSky.Y) - corner.Y;
            return x >= 0 && x <= a && y >= 0 && y <= b ? 0 : 1;
        }

        public bool IsBlocked(Vector3 from, Vector3 to) => false;
    }
}
