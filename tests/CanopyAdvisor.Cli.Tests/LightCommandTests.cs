using System.Globalization;
using System.Text.Json;

namespace CanopyAdvisor.Cli.Tests;

/// <summary><c>canopy light</c>: the whole path from a site file to the printed per-bench light.</summary>
public sealed class LightCommandTests : IDisposable
{
    private readonly string _directory = Directory.CreateTempSubdirectory("canopy-cli-").FullName;

    public void Dispose() => Directory.Delete(_directory, recursive: true);

    // One downward Lambertian lamp of Φ = 1000 µmol s⁻¹, always on, 1 m above the single sample point of a bench with
    // no leaves, in an indoor room: PPFD = Φ/(π h²) = 318.31 µmol m⁻² s⁻¹ (MODEL.md §3) and
    // DLI = 318.31 × 24 h × 3600 / 10⁶ = 27.50 mol m⁻² d⁻¹ (MODEL.md §0). The light comes straight down: tilt 0.
    private const string OneLampRoom = """
        {
          "formatVersion": 1, "id": "one-lamp", "name": "One lamp (test data)",
          "location": { "latitudeDeg": 52.0, "longitudeDeg": 4.4, "elevationM": 0 },
          "timeZone": "Europe/Amsterdam",
          "structure": { "kind": "indoorRoom", "heightM": 3,
            "footprint": { "cornerXM": 0, "cornerYM": 0, "axisAzimuthDeg": 0, "lengthM": 4, "widthM": 4 } },
          "benches": [ { "id": "b1", "footprint": { "cornerXM": 1, "cornerYM": 1, "axisAzimuthDeg": 0, "lengthM": 1, "widthM": 1 },
            "surfaceHeightM": 0.8, "canopy": { "heightM": 0.2, "sensingDepthM": 0, "leafAreaDensityM2PerM3": 0 },
            "samplesAlongLength": 1, "samplesAcrossWidth": 1 } ],
          "lampTypes": { "flat": { "beam": { "kind": "lambertian" }, "ppfUmolPerS": 1000, "watts": 400,
            "bands": { "blue": 0.2, "green": 0.3, "red": 0.5, "farRed": 0.05 } } },
          "lamps": [ { "id": "l1", "type": "flat", "xM": 1.5, "yM": 1.5, "zM": 2.0,
            "schedule": { "on": "00:00", "off": "00:00" } } ]
        }
        """;

    [Fact]
    public void One_lamp_gives_the_point_source_ppfd_and_its_daily_integral()
    {
        string site = Write("one-lamp.json", OneLampRoom);
        var (code, output, error) = CliRunner.Run("light", site, "--from", "2027-03-15", "--days", "2", "--json");
        Assert.True(code == 0, error);
        using JsonDocument doc = JsonDocument.Parse(output);
        JsonElement bench = doc.RootElement.GetProperty("benches")[0];
        Assert.Equal("b1", bench.GetProperty("benchId").GetString());
        Assert.Equal(318.31, bench.GetProperty("ppfd").GetDouble(), 0.05);
        Assert.Equal(27.50, bench.GetProperty("dli").GetDouble(), 0.005);
        Assert.Equal(0, bench.GetProperty("lightTiltDeg").GetDouble(), 6);
        Assert.Equal(1, bench.GetProperty("uniformity").GetDouble(), 6);
        // R:FR from band fractions with a flat spectrum inside each band: red/10 ÷ farRed/5 = 0.05 ÷ 0.01 = 5.
        Assert.Equal(5, bench.GetProperty("rfr").GetDouble(), 3);
        Assert.Equal(2, bench.GetProperty("days").GetArrayLength());
    }

    [Fact]
    public void Daylight_saving_day_has_23_hours_in_the_site_zone()
    {
        // Europe/Amsterdam moves to summer time on the last Sunday of March: 2027-03-28 has 23 hours (IANA tz database).
        string site = Write("one-lamp.json", OneLampRoom);
        var (code, output, error) = CliRunner.Run("light", site, "--from", "2027-03-28", "--days", "1", "--json");
        Assert.True(code == 0, error);
        using JsonDocument doc = JsonDocument.Parse(output);
        JsonElement day = doc.RootElement.GetProperty("benches")[0].GetProperty("days")[0];
        Assert.Equal(23, day.GetProperty("hoursInDay").GetDouble());
        Assert.Equal(318.31 * 23 * 3600 / 1e6, day.GetProperty("dli").GetDouble(), 0.005);
    }

    [Fact]
    public void Demo_glasshouse_prints_a_table_for_every_bench()
    {
        var (code, output, error) = CliRunner.Run("light", "demo:glasshouse", "--from", "2026-12-14", "--days", "1");
        Assert.True(code == 0, error);
        Assert.Contains("Europe/Amsterdam", output, StringComparison.Ordinal);
        foreach (string bench in new[] { "south-1", "south-4", "north-1", "north-4" })
        {
            Assert.Contains(bench, output, StringComparison.Ordinal);
        }

        Assert.Contains("computing light", error, StringComparison.Ordinal);   // progress goes to the error stream
    }

    [Fact]
    public void Map_option_writes_an_svg_file()
    {
        string map = Path.Combine(_directory, "light.svg");
        var (code, _, error) = CliRunner.Run("light", "demo:indoor-farm", "--from", "2026-12-14", "--days", "1", "--map", map);
        Assert.True(code == 0, error);
        Assert.StartsWith("<svg", File.ReadAllText(map), StringComparison.Ordinal);
    }

    [Fact]
    public void Bad_site_file_is_rejected_with_every_path_and_nothing_printed()
    {
        string broken = OneLampRoom
            .Replace("\"lengthM\": 1, \"widthM\": 1", "\"lengthM\": 1, \"widthM\": -1", StringComparison.Ordinal)
            .Replace("Europe/Amsterdam", "Europe/Atlantis", StringComparison.Ordinal);
        string site = Write("broken.json", broken);
        var (code, output, error) = CliRunner.Run("light", site, "--from", "2027-03-15", "--json");
        Assert.Equal(CanopyCommandLine.InvalidInputExitCode, code);
        Assert.Equal(string.Empty, output);
        Assert.Contains("benches[0].footprint.widthM", error, StringComparison.Ordinal);
        Assert.Contains("timeZone", error, StringComparison.Ordinal);
        Assert.Contains("nothing was computed", error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("--days", "0", "--days: must be within [1, 366]")]
    [InlineData("--step-minutes", "7", "--step-minutes: must be a whole divisor of a day")]
    [InlineData("--from", "15/03/2027", "--from: '15/03/2027' is not an ISO-8601 date")]
    public void Bad_options_are_named(string option, string value, string expected)
    {
        var (code, _, error) = CliRunner.Run("light", "demo:glasshouse", option, value);
        Assert.Equal(CanopyCommandLine.InvalidInputExitCode, code);
        Assert.Contains(expected, error, StringComparison.Ordinal);
    }

    [Fact]
    public void Unknown_demo_and_missing_file_are_reported()
    {
        Assert.Contains("unknown demo site 'nowhere'", CliRunner.Run("light", "demo:nowhere").Error, StringComparison.Ordinal);
        Assert.Contains("file not found", CliRunner.Run("light", Path.Combine(_directory, "none.json")).Error, StringComparison.Ordinal);
    }

    [Fact]
    public void Gaps_in_a_weather_log_are_counted_not_filled()
    {
        // A log of half-hourly readings with a 4-hour hole at midday: the hole exceeds the 2-hour interpolation limit,
        // so those steps are reported missing instead of being invented.
        var lines = new List<string> { "timestamp,ghiWm2" };
        for (int minutes = 0; minutes < 24 * 60; minutes += 30)
        {
            if (minutes is >= 10 * 60 and < 14 * 60)
            {
                continue;
            }

            lines.Add(string.Create(CultureInfo.InvariantCulture, $"2026-06-01T{minutes / 60:00}:{minutes % 60:00}:00+02:00,{(minutes is > 6 * 60 and < 20 * 60 ? 300 : 0)}"));
        }

        string log = Write("weather.csv", string.Join('\n', lines));
        var (code, output, error) = CliRunner.Run("light", "demo:glasshouse", "--from", "2026-06-01", "--days", "1", "--weather", log, "--json");
        Assert.True(code == 0, error);
        using JsonDocument doc = JsonDocument.Parse(output);
        Assert.True(doc.RootElement.GetProperty("missingSteps").GetInt32() > 0);
    }

    private string Write(string name, string text)
    {
        string path = Path.Combine(_directory, name);
        File.WriteAllText(path, text);
        return path;
    }
}
