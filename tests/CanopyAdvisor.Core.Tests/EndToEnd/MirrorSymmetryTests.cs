using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Structures;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.EndToEnd;

// Mirror symmetry of the whole light chain (site records → EnclosureBuilder → LightFieldCompiler → Step / LightSimulation).
// Source: the governing equations are invariant under the reflection x → −x (MODEL.md §3): the lamp law E = Φ·I/d²
// depends only on distance and the angles in the lamp's own frame, Fresnel transmittance (Duffie & Beckman ch. 5) only on
// the incidence angle, Beer–Lambert only on the path length, the sky view integrals only on which directions are open;
// none of them prefers a handedness. So a site mirrored east–west under a mirrored sun must give mirrored vectors
// (x → −x, y and z equal) and equal scalars (horizontal PPFD, R:FR) point for point. The outside light must be fixed
// values with a mirrored sun: a real sun (ClearSkyOutsideLight) is not mirror-symmetric, its path runs east to west.
public sealed class MirrorSymmetryTests
{
    private const double Relative = 1e-9;

    private static readonly Lazy<(Site Site, CompiledLightField Field)> Original = new(() => CompileSite(MirrorScene.Build()));
    private static readonly Lazy<(Site Site, CompiledLightField Field)> Mirrored = new(() => CompileSite(SiteMirror.Site(MirrorScene.Build())));

    private static (Site, CompiledLightField) CompileSite(Site site)
    {
        IEnclosure enclosure = EnclosureBuilder.Build(site);
        return (site, LightFieldCompiler.Compile(site, enclosure));
    }

    private static readonly Instant When = Instant.FromUtc(2026, 6, 21, 10, 0);

    private static OutsideLight Sky(double azimuthDeg, double zenithDeg, double dni, double dhi)
    {
        Vector3 sun = Direction.FromAzimuthZenith(Angle.FromDegrees(azimuthDeg), Angle.FromDegrees(zenithDeg));
        double ghi = dhi + (sun.Z > 0 ? dni * sun.Z : 0);
        return new OutsideLight(When, sun, dni, dhi, ghi);
    }

    // Invented sun positions and outside PAR (µmol m⁻² s⁻¹) with local times that switch lamp groups on and off:
    // toplights 04:00–22:00 but off above 600 outside, side lamps 06:00–20:00, the night lamp 20:00–02:00.
    public static TheoryData<string, double, double, double, double, int, int> Cases => new()
    {
        { "morning sun in the east, toplights and side lamps on", 95, 70, 900, 150, 8, 30 },
        { "high noon sun, toplights off above 600 outside", 170, 35, 1500, 250, 12, 30 },
        { "noon under thin cloud, toplights on", 185, 38, 300, 200, 12, 0 },
        { "low winter sun in the south-south-west", 200, 80, 400, 60, 13, 0 },
        { "low western sun", 255, 75, 700, 120, 17, 0 },
        { "dusk, toplights and night lamp on", 300, 95, 0, 5, 21, 0 },
        { "past midnight, night lamp only", 0, 120, 0, 0, 1, 0 },
    };

    [Fact]
    public void Both_sites_are_valid()
    {
        Assert.Empty(SiteValidator.Validate(Original.Value.Site));
        Assert.Empty(SiteValidator.Validate(Mirrored.Value.Site));
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void Mirrored_site_under_a_mirrored_sun_gives_mirrored_light(
        string label, double azimuthDeg, double zenithDeg, double dni, double dhi, int hour, int minute)
    {
        OutsideLight outside = Sky(azimuthDeg, zenithDeg, dni, dhi);
        OutsideLight mirroredOutside = SiteMirror.Outside(outside);
        Assert.Equal(0, AngleDifferenceDeg(360 - azimuthDeg, Direction.Azimuth(mirroredOutside.SunDirection).Degrees), 9);

        var time = new LocalTime(hour, minute);
        PointLight[] a = StepAll(Original.Value.Field, outside, time);
        PointLight[] b = StepAll(Mirrored.Value.Field, mirroredOutside, time);

        double largestX = 0;
        foreach ((int p, int q) in MatchedPoints(Original.Value.Field, Mirrored.Value.Field))
        {
            string where = $"{label}: point {p} ({Original.Value.Field.Points[p].Position})";
            AssertMirrored(a[p], b[q], where);
            largestX = Math.Max(largestX, Math.Abs(a[p].LightVector.X));
        }

        // Not vacuous: the light has a sizeable east–west part somewhere, and PPFD varies over the site.
        Assert.True(largestX > 1, $"{label}: largest |light vector x| is only {largestX}");
        Assert.True(a.Max(l => l.HorizontalPpfd) > 1.2 * a.Min(l => l.HorizontalPpfd), $"{label}: PPFD is uniform, the scene tests little");
    }

    // The day summaries (DLI, mean vectors and their compass azimuths, R:FR) mirror too: azimuth a → 360° − a.
    [Fact]
    public void Mirrored_day_summaries_mirror()
    {
        var date = new LocalDate(2026, 6, 21);
        LightPeriodSummary a = LightSimulation.Run(Original.Value.Field, SyntheticSunPath.Original, date, date);
        LightPeriodSummary b = LightSimulation.Run(Mirrored.Value.Field, SyntheticSunPath.Mirrored, date, date);
        Assert.Equal(a.Days.Length, b.Days.Length);
        for (int i = 0; i < a.Days.Length; i++)
        {
            BenchDayLight x = a.Days[i], y = b.Days[i];
            Assert.Equal(x.BenchId, y.BenchId);
            Close(x.Dli, y.Dli, x.BenchId + " DLI");
            Close(x.MeanHorizontalPpfd, y.MeanHorizontalPpfd, x.BenchId + " mean PPFD");
            Close(x.DliUniformity!.Value, y.DliUniformity!.Value, x.BenchId + " uniformity");
            Close(x.RedToFarRed!.Value, y.RedToFarRed!.Value, x.BenchId + " R:FR");
            CloseVector(SiteMirror.Point(x.MeanLightVector), y.MeanLightVector, x.BenchId + " mean light vector");
            CloseVector(SiteMirror.Point(x.MeanBlueVector), y.MeanBlueVector, x.BenchId + " mean blue vector");
            Close(x.LightVectorTilt.Degrees, y.LightVectorTilt.Degrees, x.BenchId + " tilt");
            double mirroredAzimuth = (360 - x.LightVectorAzimuth.Degrees) % 360;
            Assert.True(Math.Abs(AngleDifferenceDeg(mirroredAzimuth, y.LightVectorAzimuth.Degrees)) < 1e-6,
                $"{x.BenchId}: azimuth {x.LightVectorAzimuth.Degrees} should mirror to {mirroredAzimuth}, got {y.LightVectorAzimuth.Degrees}");
            Assert.True(x.Dli > 1, $"{x.BenchId}: DLI {x.Dli} is too small to test anything");
        }
    }

    public static TheoryData<string> WrongMirrors => new()
    {
        "sun not mirrored",
        "lamp spin kept",
        "lamp yaw kept",
        "side walls not swapped",
        "footprints start at the image of their own corner",
    };

    // The comparison has teeth: each way of getting the mirror wrong breaks it at some point of some step.
    [Theory]
    [MemberData(nameof(WrongMirrors))]
    public void A_wrong_mirror_is_detected(string mistake)
    {
        Site site = MirrorScene.Build();
        Site wrong = SiteMirror.Site(site);
        wrong = mistake switch
        {
            "lamp spin kept" => wrong with { Lamps = [.. site.Lamps.Select(l => SiteMirror.Lamp(l) with { Aim = l.Aim with { Yaw = -l.Aim.Yaw } })] },
            "lamp yaw kept" => wrong with { Lamps = [.. site.Lamps.Select(l => SiteMirror.Lamp(l) with { Aim = l.Aim with { Spin = -l.Aim.Spin } })] },
            "side walls not swapped" => wrong with { Structure = ((Glasshouse)wrong.Structure) with { LeftWall = MirrorScene.TwinWall, RightWall = MirrorScene.Glass } },
            "footprints start at the image of their own corner" => wrong with
            {
                Structure = ((Glasshouse)wrong.Structure) with { Footprint = NaiveMirror(((Glasshouse)site.Structure).Footprint) },
                Benches = [.. site.Benches.Select(b => b with { Footprint = NaiveMirror(b.Footprint) })],
                Obstructions = [.. site.Obstructions.Select(o => o with { Footprint = NaiveMirror(o.Footprint) })],
            },
            _ => wrong,
        };
        CompiledLightField a = Original.Value.Field;
        CompiledLightField b = LightFieldCompiler.Compile(wrong, EnclosureBuilder.Build(wrong));

        double worst = 0;
        foreach ((string _, double az, double zen, double dni, double dhi, int hour, int minute) in Cases.Select(Unpack))
        {
            OutsideLight outside = Sky(az, zen, dni, dhi);
            OutsideLight other = mistake == "sun not mirrored" ? outside : SiteMirror.Outside(outside);
            var time = new LocalTime(hour, minute);
            PointLight[] x = StepAll(a, outside, time);
            PointLight[] y = StepAll(b, other, time);
            foreach ((int p, int q) in NearestPoints(a, b))
            {
                worst = Math.Max(worst, Math.Abs(x[p].HorizontalPpfd - y[q].HorizontalPpfd) / (1 + x[p].HorizontalPpfd));
                worst = Math.Max(worst, (SiteMirror.Point(x[p].LightVector) - y[q].LightVector).Length / (1 + x[p].LightVector.Length));
            }
        }

        Assert.True(worst > 1e-3, $"{mistake}: largest relative difference only {worst}");
    }

    private static (string, double, double, double, double, int, int) Unpack(object[] row) =>
        ((string)row[0], (double)row[1], (double)row[2], (double)row[3], (double)row[4], (int)row[5], (int)row[6]);

    // The mistake: mirror the reference corner itself and negate the azimuth; the width then runs the wrong way.
    private static Footprint NaiveMirror(Footprint f)
    {
        Vector3 c = SiteMirror.Point(f.Corner);
        return new Footprint(c.X, c.Y, -f.AxisAzimuth, f.LengthM, f.WidthM);
    }

    private static PointLight[] StepAll(CompiledLightField field, OutsideLight outside, LocalTime time)
    {
        var into = new PointLight[field.Points.Length];
        field.Step(outside, time, into);
        return into;
    }

    /// <summary>Pairs each point of <paramref name="a"/> with the point of the same bench in <paramref name="b"/> at its mirrored position.</summary>
    private static IEnumerable<(int A, int B)> MatchedPoints(CompiledLightField a, CompiledLightField b)
    {
        Assert.Equal(a.Points.Length, b.Points.Length);
        var used = new HashSet<int>();
        for (int bench = 0; bench < a.Benches.Length; bench++)
        {
            (int startA, int count) = a.PointsOfBench(bench);
            (int startB, int countB) = b.PointsOfBench(bench);
            Assert.Equal(count, countB);
            for (int p = startA; p < startA + count; p++)
            {
                Vector3 image = SiteMirror.Point(a.Points[p].Position);
                int q = Enumerable.Range(startB, count).Single(i => (b.Points[i].Position - image).Length < 1e-9);
                Assert.True(used.Add(q));
                yield return (p, q);
            }
        }
    }

    /// <summary>For a wrongly mirrored site: pairs points of the same bench by nearest mirrored position.</summary>
    private static IEnumerable<(int A, int B)> NearestPoints(CompiledLightField a, CompiledLightField b)
    {
        for (int bench = 0; bench < a.Benches.Length; bench++)
        {
            (int startA, int count) = a.PointsOfBench(bench);
            (int startB, int countB) = b.PointsOfBench(bench);
            for (int p = startA; p < startA + count; p++)
            {
                Vector3 image = SiteMirror.Point(a.Points[p].Position);
                yield return (p, Enumerable.Range(startB, countB).MinBy(i => (b.Points[i].Position - image).Length));
            }
        }
    }

    private static void AssertMirrored(PointLight a, PointLight b, string where)
    {
        Close(a.HorizontalPpfd, b.HorizontalPpfd, where + " horizontal PPFD");
        CloseVector(SiteMirror.Point(a.LightVector), b.LightVector, where + " light vector");
        CloseVector(SiteMirror.Point(a.BlueVector), b.BlueVector, where + " blue vector");
        Close(a.Red660, b.Red660, where + " 660 nm");
        Close(a.FarRed730, b.FarRed730, where + " 730 nm");
        if (a.FarRed730 > 0)
        {
            Close(a.RedToFarRed, b.RedToFarRed, where + " R:FR");
        }
    }

    private static void CloseVector(Vector3 expected, Vector3 actual, string what)
    {
        double scale = 1 + expected.Length;
        Assert.True((expected - actual).Length <= Relative * scale, $"{what}: expected {expected}, got {actual}");
    }

    private static void Close(double expected, double actual, string what) =>
        Assert.True(Math.Abs(expected - actual) <= Relative * (1 + Math.Abs(expected)), $"{what}: expected {expected}, got {actual}");

    private static double AngleDifferenceDeg(double a, double b)
    {
        double d = (a - b) % 360;
        return d > 180 ? d - 360 : d < -180 ? d + 360 : d;
    }
}
