using System.Text.Json;

namespace CanopyAdvisor.Cli.Tests;

/// <summary><c>canopy forecast</c>: the per-bench lean and stretch forecast, from a site file to JSON and text.</summary>
public sealed class ForecastCommandTests : IDisposable
{
    // The demo lots are dated for early December 2026 (src/CanopyAdvisor.Files/Sites/README.md, "Demo sites").
    private const string DemoNow = "2026-12-02T08:00:00+01:00";

    private readonly string _directory = Directory.CreateTempSubdirectory("canopy-forecast-").FullName;

    public void Dispose() => Directory.Delete(_directory, recursive: true);

    [Fact]
    public void Json_has_the_fields_of_the_issue_for_every_lot()
    {
        var (code, output, error) = CliRunner.Run("forecast", "demo:glasshouse", "--now", DemoNow, "--days", "2", "--json");
        Assert.True(code == 0, error);
        using JsonDocument doc = JsonDocument.Parse(output);
        JsonElement benches = doc.RootElement.GetProperty("benches");
        Assert.Equal(8, benches.GetArrayLength());
        foreach (JsonElement b in benches.EnumerateArray())
        {
            foreach (string field in new[] { "benchId", "crop", "leanDeg", "leanAzimuthDeg", "leanRateDegPerDay", "leanAtHorizonDeg", "leavesGradeAt", "heightMm", "flags" })
            {
                Assert.True(b.TryGetProperty(field, out _), $"{field} missing");
            }

            double lean = b.GetProperty("leanDeg").GetDouble();
            Assert.InRange(lean, 0, 90);
            Assert.InRange(b.GetProperty("leanAzimuthDeg").GetDouble(), 0, 360);
            JsonElement band = b.GetProperty("leanAtHorizonBand");
            Assert.True(band.GetProperty("lowDeg").GetDouble() <= band.GetProperty("highDeg").GetDouble());
            foreach (JsonElement flag in b.GetProperty("flags").EnumerateArray())
            {
                Assert.Contains(flag.GetProperty("kind").GetString(), new[] { "leggy", "leaning" });
                Assert.False(string.IsNullOrEmpty(flag.GetProperty("cause").GetString()));
                Assert.True(flag.TryGetProperty("value", out _) && flag.TryGetProperty("limit", out _));
            }
        }
    }

    [Fact]
    public void Text_table_names_benches_and_progress_goes_to_the_error_stream()
    {
        var (code, output, error) = CliRunner.Run("forecast", "demo:indoor-farm", "--now", "2026-12-02T08:00:00-06:00", "--days", "1", "--no-band");
        Assert.True(code == 0, error);
        Assert.Contains("rack-a-tier-1", output, StringComparison.Ordinal);
        Assert.Contains("forecasting", error, StringComparison.Ordinal);
    }

    [Fact]
    public void Unknown_crop_is_reported_at_its_lot()
    {
        string json = CliRunner.Run("demo", "show", "glasshouse").Output.Replace("\"crop\": \"petunia\"", "\"crop\": \"petuna\"", StringComparison.Ordinal);
        string site = Path.Combine(_directory, "site.json");
        File.WriteAllText(site, json);
        var (code, _, error) = CliRunner.Run("forecast", site, "--now", DemoNow, "--no-band");
        Assert.Equal(CanopyCommandLine.InvalidInputExitCode, code);
        Assert.Contains("lots[0].crop", error, StringComparison.Ordinal);
        Assert.Contains("petuna", error, StringComparison.Ordinal);
    }

    [Fact]
    public void A_site_without_lots_is_refused()
    {
        var (code, _, error) = CliRunner.Run("forecast", Path.Combine(_directory, "missing.json"));
        Assert.Equal(CanopyCommandLine.InvalidInputExitCode, code);
        Assert.Contains("file not found", error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("--days", "0", "--days: must be more than 0")]
    [InlineData("--now", "2026-12-02", "--now: '2026-12-02' is not an ISO-8601 date and time with an offset")]
    public void Bad_options_are_named(string option, string value, string expected)
    {
        var (code, _, error) = CliRunner.Run("forecast", "demo:glasshouse", option, value);
        Assert.Equal(CanopyCommandLine.InvalidInputExitCode, code);
        Assert.Contains(expected, error, StringComparison.Ordinal);
    }
}
