using System.Text.Json.Nodes;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Structures;
using CanopyAdvisor.Files.Sites;
using NodaTime;

namespace CanopyAdvisor.Files.Tests.EndToEnd;

// The demo glasshouse file (invented demo data) and its east–west mirror image written as a site file, both read by the
// real SiteFileReader and StandardBeamFactory and run through the real enclosure and compiler. Source: the governing
// equations are mirror-invariant (MODEL.md §3; see Core.Tests/EndToEnd/MirrorSymmetryTests), so a file mirrored by the
// conventions of the site file reference (footprint width to the right of the axis, left/right walls, yaw) must read back
// into a site whose light mirrors point for point. A reader that laid the width out to the left, or turned yaw the other
// way, would fail. The west wall is made opaque first so that swapping the side walls matters.
public sealed class DemoSiteMirrorTests
{
    [Fact]
    public void Mirrored_demo_glasshouse_file_gives_mirrored_light()
    {
        JsonNode demo = JsonNode.Parse(DemoSites.ReadText("glasshouse"))!;
        demo["structure"]!["covers"]!["leftWall"] = "insulated-panel";
        string original = demo.ToJsonString();
        string mirrored = JsonSiteMirror.Mirror(original);

        var reader = new SiteFileReader(StandardBeamFactory.Instance);
        Site a = reader.Parse(original, "demo.json", null);
        Site b = reader.Parse(mirrored, "demo-mirrored.json", null);
        CompiledLightField fa = LightFieldCompiler.Compile(a, EnclosureBuilder.Build(a));
        CompiledLightField fb = LightFieldCompiler.Compile(b, EnclosureBuilder.Build(b));
        Assert.Equal(fa.Points.Length, fb.Points.Length);

        // Invented outside light: morning sun in the east with toplights on (outside below their 500 threshold), a low
        // western sun, and night with the lamps alone.
        (double Az, double Zen, double Dni, double Dhi, LocalTime Time)[] cases =
        [
            (100, 75, 600, 100, new LocalTime(7, 0)),
            (250, 72, 900, 150, new LocalTime(17, 30)),
            (0, 120, 0, 0, new LocalTime(5, 0)),
        ];
        foreach ((double az, double zen, double dni, double dhi, LocalTime time) in cases)
        {
            Vector3 sun = Direction.FromAzimuthZenith(Angle.FromDegrees(az), Angle.FromDegrees(zen));
            var outside = new OutsideLight(Instant.FromUtc(2026, 3, 20, 6, 0), sun, dni, dhi, dhi + Math.Max(0, dni * sun.Z));
            var x = new PointLight[fa.Points.Length];
            var y = new PointLight[fb.Points.Length];
            fa.Step(outside, time, x);
            fb.Step(outside with { SunDirection = new Vector3(-sun.X, sun.Y, sun.Z) }, time, y);

            double largestX = 0;
            for (int bench = 0; bench < fa.Benches.Length; bench++)
            {
                (int start, int count) = fa.PointsOfBench(bench);
                (int startB, _) = fb.PointsOfBench(bench);
                for (int p = start; p < start + count; p++)
                {
                    Vector3 image = new(-fa.Points[p].Position.X, fa.Points[p].Position.Y, fa.Points[p].Position.Z);
                    int q = Enumerable.Range(startB, count).Single(i => (fb.Points[i].Position - image).Length < 1e-9);
                    string where = $"sun {az}°/{zen}°, bench {fa.Benches[bench].Id}, point {p}";
                    Assert.True(Math.Abs(x[p].HorizontalPpfd - y[q].HorizontalPpfd) <= 1e-9 * (1 + x[p].HorizontalPpfd),
                        $"{where}: PPFD {x[p].HorizontalPpfd} vs {y[q].HorizontalPpfd}");
                    Vector3 expected = new(-x[p].LightVector.X, x[p].LightVector.Y, x[p].LightVector.Z);
                    Assert.True((expected - y[q].LightVector).Length <= 1e-9 * (1 + expected.Length), $"{where}: light vector {expected} vs {y[q].LightVector}");
                    Vector3 blue = new(-x[p].BlueVector.X, x[p].BlueVector.Y, x[p].BlueVector.Z);
                    Assert.True((blue - y[q].BlueVector).Length <= 1e-9 * (1 + blue.Length), $"{where}: blue vector");
                    Assert.True(Math.Abs(x[p].RedToFarRed - y[q].RedToFarRed) <= 1e-9 * (1 + x[p].RedToFarRed), $"{where}: R:FR");
                    largestX = Math.Max(largestX, Math.Abs(x[p].LightVector.X));
                }
            }

            Assert.True(largestX > 1, $"sun {az}°: the light has no east–west part to mirror ({largestX})");
        }
    }
}
