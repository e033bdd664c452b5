using System.Globalization;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Structures;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Photometry;
using CanopyAdvisor.Files.Sites;
using NodaTime;

namespace CanopyAdvisor.Files.Tests.EndToEnd;

// A site file with an IES LM-63 lamp read by the real factory (SiteFileReader + StandardBeamFactory + IesReader), then
// the real EnclosureBuilder, LightFieldCompiler and a time step. The IES file is a downward Lambertian lamp of
// 1000 µmol s⁻¹ sampled on a 5° type C grid (I = (Φ/π) cos γ, axially symmetric), hung 1 m above the sample point of a
// one-point bench: MODEL.md §3 gives E = Φ/(π h²) = 318.31 µmol m⁻² s⁻¹ on axis and (Φ/π) h²/(h² + r²)² = 79.58 at r = 1 m.
public sealed class IesSiteFileTests : IDisposable
{
    private const double StepDeg = 5;

    private readonly string folder = Path.Combine(Path.GetTempPath(), "canopy-e2e-" + Guid.NewGuid().ToString("N"));

    public IesSiteFileTests() => Directory.CreateDirectory(folder);

    public void Dispose() => Directory.Delete(folder, recursive: true);

    private static string LambertianIes() =>
        IesWriter.WriteTypeC(
            IesWriter.SampleTypeC(LambertianDistribution.Instance, 1000, IesWriter.Range(0, 90, StepDeg), [0]),
            new IesWriteSettings { Keywords = [new IesKeyword("TEST", "invented test data", 0)] });

    // An indoor room 10 m × 8 m × 3 m; bench "axis" has its one sample point at (2.5, 2.5, 1.0) right under the lamp at
    // (2.5, 2.5, 2.0); bench "offset" at (3.5, 2.5, 1.0), 1 m to the side.
    private string WriteSite(string beamJson, string? ppf)
    {
        string ppfProperty = ppf is null ? string.Empty : $"\"ppfUmolPerS\": {ppf}, ";
        string json = $$"""
        {
          "formatVersion": 1,
          "id": "e2e-ies",
          "name": "End-to-end IES test room (invented test data)",
          "location": { "latitudeDeg": 52.0, "longitudeDeg": 4.4, "elevationM": 0 },
          "timeZone": "Europe/Amsterdam",
          "structure": {
            "kind": "indoorRoom",
            "footprint": { "cornerXM": 0, "cornerYM": 0, "axisAzimuthDeg": 0, "lengthM": 10, "widthM": 8 },
            "heightM": 3
          },
          "benches": [
            { "id": "axis", "footprint": { "cornerXM": 2, "cornerYM": 2, "axisAzimuthDeg": 0, "lengthM": 1, "widthM": 1 },
              "surfaceHeightM": 0.8, "canopy": { "heightM": 0.2, "sensingDepthM": 0, "leafAreaDensityM2PerM3": 0 },
              "samplesAlongLength": 1, "samplesAcrossWidth": 1 },
            { "id": "offset", "footprint": { "cornerXM": 3, "cornerYM": 2, "axisAzimuthDeg": 0, "lengthM": 1, "widthM": 1 },
              "surfaceHeightM": 0.8, "canopy": { "heightM": 0.2, "sensingDepthM": 0, "leafAreaDensityM2PerM3": 0 },
              "samplesAlongLength": 1, "samplesAcrossWidth": 1 }
          ],
          "lampTypes": {
            "top": { "beam": {{beamJson}}, {{ppfProperty}}"watts": 300,
                     "bands": { "blue": 0.2, "green": 0.4, "red": 0.4, "farRed": 0.05 } }
          },
          "lamps": [
            { "id": "l1", "type": "top", "xM": 2.5, "yM": 2.5, "zM": 2.0, "schedule": { "on": "00:00", "off": "00:00" } }
          ]
        }
        """;
        string path = Path.Combine(folder, "site.json");
        File.WriteAllText(path, json);
        return path;
    }

    private static (Site Site, double Axis, double Offset) ReadAndStep(string path)
    {
        Site site = new SiteFileReader(StandardBeamFactory.Instance).Read(path);
        CompiledLightField field = LightFieldCompiler.Compile(site, EnclosureBuilder.Build(site));
        var light = new PointLight[field.Points.Length];
        Instant noon = Instant.FromUtc(2026, 6, 15, 10, 0);
        field.Step(OutsideLight.Dark(noon, -Vector3.UnitZ), new LocalTime(12, 0), light);
        return (site, light[field.PointsOfBench(0).Start].HorizontalPpfd, light[field.PointsOfBench(1).Start].HorizontalPpfd);
    }

    // Bound on the grid's effect on the lamp's flux. The reader interpolates linearly between the 5° nodes and integrates
    // the interpolant exactly. For f = (Φ/π) cos γ, linear interpolation errs by at most h²/8 · max|f''| = h²/8 · Φ/π
    // (the standard bound for linear interpolation), so over the hemisphere (∫ 2π sin γ dγ = 2π) the flux errs by at most
    // Φ h²/4: 0.19 % for h = 5° (the chord lies under the concave cosine, so the file's flux is a little under 1000).
    private static readonly double FluxBound = Math.Pow(StepDeg * Math.PI / 180, 2) / 4;

    // Photon values, PPF taken from the file: E = Φ_file · I(γ)/Φ_file / d², so the nodes come back exactly:
    // 318.31 on axis and 79.58 at 45° (a node) to rounding; only the flux itself carries the grid error.
    [Fact]
    public void Photon_ies_lamp_with_the_files_flux_gives_the_textbook_ppfd()
    {
        File.WriteAllText(Path.Combine(folder, "lamp.ies"), LambertianIes());
        (Site site, double axis, double offset) = ReadAndStep(WriteSite("""{ "kind": "ies", "file": "lamp.ies", "values": "photon" }""", null));

        Assert.Empty(SiteValidator.Validate(site));
        Assert.Equal(1000 / Math.PI, axis, 9);
        Assert.Equal(318.31, axis, 2);
        Assert.Equal(1000 / Math.PI / 4, offset, 9);
        Assert.Equal(79.58, offset, 2);

        double ppf = site.Lamps.Single().PpfMicromolesPerSecond;
        Assert.InRange(ppf, 1000 * (1 - FluxBound), 1000);
    }

    // Photon values with the site's own PPF of 1000: E = 1000 · I(0)/Φ_file, so on axis 318.31 × 1000/Φ_file, within the
    // flux bound above (0.19 %) and not below 318.31.
    [Fact]
    public void Photon_ies_lamp_with_the_sites_ppf_is_within_the_grid_error()
    {
        File.WriteAllText(Path.Combine(folder, "lamp.ies"), LambertianIes());
        (Site site, double axis, _) = ReadAndStep(WriteSite("""{ "kind": "ies", "file": "lamp.ies", "values": "photon" }""", "1000"));

        Assert.Equal(1000, site.Lamps.Single().PpfMicromolesPerSecond);
        Assert.InRange(axis, 1000 / Math.PI, 1000 / Math.PI / (1 - FluxBound));
    }

    // Lumen values: the same numbers read as candela are multiplied by micromolesPerLumen (µmol s⁻¹ lm⁻¹), so the file's
    // flux and every irradiance scale by that factor: 0.015 × 318.31 = 4.775 on axis.
    [Theory]
    [InlineData(0.015)]
    [InlineData(0.0185)]
    public void Lumen_ies_lamp_scales_by_micromoles_per_lumen(double micromolesPerLumen)
    {
        File.WriteAllText(Path.Combine(folder, "lamp.ies"), LambertianIes());
        (Site photonSite, double photonAxis, _) = ReadAndStep(WriteSite("""{ "kind": "ies", "file": "lamp.ies", "values": "photon" }""", null));
        string factor = micromolesPerLumen.ToString(CultureInfo.InvariantCulture);
        (Site lumenSite, double lumenAxis, double lumenOffset) = ReadAndStep(
            WriteSite($$"""{ "kind": "ies", "file": "lamp.ies", "values": "lumen", "micromolesPerLumen": {{factor}} }""", null));

        double photonPpf = photonSite.Lamps.Single().PpfMicromolesPerSecond;
        Assert.Equal(micromolesPerLumen * photonPpf, lumenSite.Lamps.Single().PpfMicromolesPerSecond, 9);
        Assert.Equal(micromolesPerLumen * photonAxis, lumenAxis, 9);
        Assert.Equal(micromolesPerLumen * 1000 / Math.PI, lumenAxis, 9);
        Assert.Equal(micromolesPerLumen * 1000 / Math.PI / 4, lumenOffset, 9);
    }

    // A broken IES file (ANSI/IES LM-63-2002 layout: one block of 5 values declared, "7O" is not a number, line 9) referenced
    // from a site file: InvalidInputException at the lamp type's beam file, naming the IES file and line.
    [Fact]
    public void A_broken_ies_file_is_reported_at_the_site_field_with_the_ies_line()
    {
        const string Broken =
            "IESNA:LM-63-2002\n[TEST] invented test data\n[MANUFAC] none\nTILT=NONE\n" +
            "1 -1 1 5 1 1 2 0 0 0\n" + //  5
            "1 1 100\n" + //                6
            "0 22.5 45 67.5 90\n" + //      7
            "0\n" + //                      8
            "100 90 7O 40 0\n"; //          9
        File.WriteAllText(Path.Combine(folder, "broken.ies"), Broken);
        string path = WriteSite("""{ "kind": "ies", "file": "broken.ies", "values": "photon" }""", null);

        var e = Assert.Throws<InvalidInputException>(() => new SiteFileReader(StandardBeamFactory.Instance).Read(path));
        ValidationError error = Assert.Single(e.Errors);
        Assert.Equal("lampTypes.top.beam.file", error.Path);
        Assert.StartsWith("broken.ies:9:", error.Message, StringComparison.Ordinal);
        Assert.Contains("'7O' is not a finite number", error.Message, StringComparison.Ordinal);
    }
}
