using System.Globalization;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Structures;
using CanopyAdvisor.Files.Photometry;
using CanopyAdvisor.Files.Sites;
using NodaTime;

namespace CanopyAdvisor.Files.Tests.EndToEnd;

// Orientation of an IES lamp from the site file through to the light at the benches. The file is type C with full 0–360°
// horizontal angles and an invented pattern that differs in all four directions, I(γ, C) = 100 cos γ (1 + sin γ (0.5 cos C
// + 0.3 sin C)) µmol s⁻¹ sr⁻¹ (single-valued at γ = 0). Conventions checked: the site file reference (src/CanopyAdvisor.Files/
// Sites/README.md): "the IES C = 0° direction of an unspun lamp points to yawDeg", spin turns the pattern about the axis;
// and the reading of LM-63 type C horizontal angles as counter-clockwise seen from above a downward lamp (from memory, as
// the code's own documentation says). Four one-point benches sit 1 m east, north, west and south of the lamp and 1 m
// below it, so γ = 45° (a grid node) and C is a node too: the horizontal PPFD is I(45°, C) cos 45°/(2 m²) exactly
// (inverse-square law, MODEL.md §3) because the file's own flux normalises the pattern.
public sealed class IesAimSiteFileTests : IDisposable
{
    private readonly string folder = Path.Combine(Path.GetTempPath(), "canopy-e2e-aim-" + Guid.NewGuid().ToString("N"));

    public IesAimSiteFileTests() => Directory.CreateDirectory(folder);

    public void Dispose() => Directory.Delete(folder, recursive: true);

    private static double Pattern(double gammaDeg, double cDeg)
    {
        double g = gammaDeg * Math.PI / 180, c = cDeg * Math.PI / 180;
        return gammaDeg > 90 ? 0 : 100 * Math.Max(0, Math.Cos(g)) * (1 + (Math.Sin(g) * ((0.5 * Math.Cos(c)) + (0.3 * Math.Sin(c)))));
    }

    private static string AsymmetricIes()
    {
        IReadOnlyList<double> vertical = IesWriter.Range(0, 90, 5);
        IReadOnlyList<double> horizontal = IesWriter.Range(0, 360, 15);
        var values = horizontal.Select(c => (IReadOnlyList<double>)[.. vertical.Select(v => Pattern(v, c))]).ToList();
        return IesWriter.WriteTypeC(new IesGrid(vertical, horizontal, values), new IesWriteSettings());
    }

    private static string Bench(string id, double x, double y) => string.Create(CultureInfo.InvariantCulture, $$"""
        { "id": "{{id}}", "footprint": { "cornerXM": {{x - 0.5}}, "cornerYM": {{y - 0.5}}, "axisAzimuthDeg": 0, "lengthM": 1, "widthM": 1 },
          "surfaceHeightM": 0.8, "canopy": { "heightM": 0.2, "sensingDepthM": 0, "leafAreaDensityM2PerM3": 0 },
          "samplesAlongLength": 1, "samplesAcrossWidth": 1 }
        """);

    // yaw, spin → the C angle seen from the east, north, west and south benches (C counter-clockwise from above, C = 0 at
    // yaw + spin for a downward lamp).
    [Theory]
    [InlineData(90, 0, 0, 90, 180, 270)]   // C = 0 east
    [InlineData(0, 0, 270, 0, 90, 180)]    // C = 0 north
    [InlineData(180, 0, 90, 180, 270, 0)]  // C = 0 south
    [InlineData(90, 90, 270, 0, 90, 180)]  // spin +90° moves the pattern by +90°: C = 0 north
    [InlineData(0, -90, 0, 90, 180, 270)]  // spin −90° from north: C = 0 east
    public void Ies_pattern_points_where_the_aim_says(double yawDeg, double spinDeg, double cEast, double cNorth, double cWest, double cSouth)
    {
        File.WriteAllText(Path.Combine(folder, "aim.ies"), AsymmetricIes());
        string yaw = yawDeg.ToString(CultureInfo.InvariantCulture), spin = spinDeg.ToString(CultureInfo.InvariantCulture);
        string json = $$"""
        {
          "formatVersion": 1, "id": "e2e-aim", "name": "IES aim test room (invented test data)",
          "location": { "latitudeDeg": 52.0, "longitudeDeg": 4.4, "elevationM": 0 },
          "timeZone": "Europe/Amsterdam",
          "structure": { "kind": "indoorRoom",
            "footprint": { "cornerXM": 0, "cornerYM": 0, "axisAzimuthDeg": 0, "lengthM": 10, "widthM": 10 }, "heightM": 3 },
          "benches": [ {{Bench("east", 6, 5)}}, {{Bench("north", 5, 6)}}, {{Bench("west", 4, 5)}}, {{Bench("south", 5, 4)}} ],
          "lampTypes": { "spot": { "beam": { "kind": "ies", "file": "aim.ies", "values": "photon" }, "watts": 100,
                                   "bands": { "blue": 0.2, "green": 0.4, "red": 0.4, "farRed": 0.05 } } },
          "lamps": [ { "id": "l1", "type": "spot", "xM": 5, "yM": 5, "zM": 2.0, "aim": { "yawDeg": {{yaw}}, "tiltDeg": 0, "spinDeg": {{spin}} },
                       "schedule": { "on": "00:00", "off": "00:00" } } ]
        }
        """;
        string path = Path.Combine(folder, "site.json");
        File.WriteAllText(path, json);

        Site site = new SiteFileReader(StandardBeamFactory.Instance).Read(path);
        Assert.Empty(SiteValidator.Validate(site));
        CompiledLightField field = LightFieldCompiler.Compile(site, EnclosureBuilder.Build(site));
        var light = new PointLight[field.Points.Length];
        field.Step(OutsideLight.Dark(Instant.FromUtc(2026, 6, 15, 10, 0), -Vector3.UnitZ), new LocalTime(12, 0), light);

        double[] c = [cEast, cNorth, cWest, cSouth];
        for (int b = 0; b < 4; b++)
        {
            double expected = Pattern(45, c[b]) * Math.Cos(Math.PI / 4) / 2;
            Assert.Equal(expected, light[field.PointsOfBench(b).Start].HorizontalPpfd, 9);
        }
    }
}
