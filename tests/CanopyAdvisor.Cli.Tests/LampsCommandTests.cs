using System.Text.Json;
using System.Text.Json.Nodes;
using CanopyAdvisor.Core.Advice.SideLamps;

namespace CanopyAdvisor.Cli.Tests;

/// <summary><c>canopy lamps</c>: side lamps from a site and a brief, to text and JSON.</summary>
public sealed class LampsCommandTests : IDisposable
{
    // The demo lots are dated for early December 2026 (src/CanopyAdvisor.Files/Sites/README.md, "Demo sites").
    private const string DemoNow = "2026-12-02T08:00:00+01:00";

    private readonly string _directory = Directory.CreateTempSubdirectory("canopy-lamps-").FullName;

    public void Dispose() => Directory.Delete(_directory, recursive: true);

    /// <summary>The demo glasshouse cut down to one bench (north-4, tagetes) and one row of toplights, to keep the
    /// test small; a brief with the east-wall rail, one lamp and one random start.</summary>
    private (string Site, string Brief) SmallFiles(double? price = 0.21)
    {
        JsonObject site = JsonNode.Parse(CliRunner.Run("demo", "show", "glasshouse").Output)!.AsObject();
        site["benches"] = new JsonArray(site["benches"]!.AsArray().Where(b => (string?)b!["id"] == "north-4").Select(b => b!.DeepClone()).ToArray());
        site["lots"] = new JsonArray(site["lots"]!.AsArray().Where(l => (string?)l!["benchId"] == "north-4").Select(l => l!.DeepClone()).ToArray());
        site["lampRows"] = new JsonArray(site["lampRows"]!.AsArray()[^1]!.DeepClone());
        if (price is double p)
        {
            site["tariff"] = new JsonObject { ["pricePerKWh"] = p, ["currency"] = "EUR" };
        }
        else
        {
            site.Remove("tariff");
        }

        string sitePath = Path.Combine(_directory, "site.json");
        File.WriteAllText(sitePath, site.ToJsonString());
        const string brief = """
            { "formatVersion": 1, "demoData": true,
              "rails": [ { "id": "east", "start": { "xM": 47.7, "yM": 40, "zM": 2.5 }, "end": { "xM": 47.7, "yM": 54, "zM": 2.5 }, "facingDeg": 270 } ],
              "lampTypes": ["side-600"], "maxLamps": 1, "benches": ["north-4"], "energyWeightPerKW": 0.05,
              "schedule": { "on": "04:00", "off": "22:00" }, "seed": 3, "starts": 1 }
            """;
        string briefPath = Path.Combine(_directory, "brief.json");
        File.WriteAllText(briefPath, brief);
        return (sitePath, briefPath);
    }

    [Fact]
    public void Json_reports_lamps_benches_energy_cost_and_cautions()
    {
        (string site, string brief) = SmallFiles();
        var (code, output, error) = CliRunner.Run("lamps", site, "--brief", brief, "--now", DemoNow, "--days", "1", "--json");
        Assert.True(code == 0, error);
        using JsonDocument doc = JsonDocument.Parse(output);
        JsonElement root = doc.RootElement;

        JsonElement lamp = Assert.Single(root.GetProperty("lamps").EnumerateArray());
        Assert.Equal("east", lamp.GetProperty("rail").GetString());
        Assert.Equal(47.7, lamp.GetProperty("xM").GetDouble(), 6);
        Assert.InRange(lamp.GetProperty("yM").GetDouble(), 40, 54);
        Assert.InRange(lamp.GetProperty("dimming").GetDouble(), 0, 1);

        JsonElement bench = Assert.Single(root.GetProperty("benches").EnumerateArray());
        Assert.Equal("north-4", bench.GetProperty("benchId").GetString());
        foreach (string side in new[] { "before", "after" })
        {
            JsonElement s = bench.GetProperty(side);
            foreach (string field in new[] { "leanNowDeg", "leanAtHorizonDeg", "leanRateDegPerDay", "ppfdMean", "ppfdPeak", "dli", "uniformity", "lateralBlue" })
            {
                Assert.True(s.TryGetProperty(field, out _), $"{side}.{field} missing");
            }
        }

        // Energy: kWh = W × h / 1000 (SI), 04:00–22:00 = 18 h a day, 126 h a week; cost = kWh × 0.21 EUR (the test tariff).
        JsonElement energy = root.GetProperty("energy");
        double watts = energy.GetProperty("addedWatts").GetDouble();
        Assert.Equal(126, energy.GetProperty("onHoursPerWeek").GetDouble(), 6);
        Assert.Equal(watts * 126 / 1000, energy.GetProperty("kWhPerWeek").GetDouble(), 1);
        Assert.Equal(energy.GetProperty("kWhPerWeek").GetDouble() * 0.21, energy.GetProperty("costPerWeek").GetDouble(), 1);
        Assert.Equal("EUR", energy.GetProperty("currency").GetString());

        string[] cautions = [.. root.GetProperty("cautions").EnumerateArray().Select(c => c.GetString()!)];
        Assert.Equal(SideLampCautions.All, cautions);
    }

    [Fact]
    public void Text_prints_the_cautions_the_lamps_and_an_unknown_cost()
    {
        (string site, string brief) = SmallFiles(price: null);
        string map = Path.Combine(_directory, "light.svg");
        var (code, output, error) = CliRunner.Run("lamps", site, "--brief", brief, "--now", DemoNow, "--days", "1", "--map", map);
        Assert.True(code == 0, error);

        // The usual cautions (COMMON.md: electrical work, wet locations, work at height, eye safety, heat).
        Assert.Contains("cautions:", output, StringComparison.Ordinal);
        Assert.Contains("licensed electrician", output, StringComparison.Ordinal);
        Assert.Contains("wet locations", output, StringComparison.Ordinal);
        Assert.Contains("Work at height", output, StringComparison.Ordinal);
        Assert.Contains("intense blue", output, StringComparison.Ordinal);
        Assert.Contains("Heat", output, StringComparison.Ordinal);
        Assert.Contains("side-plan-1", output, StringComparison.Ordinal);
        Assert.Contains("cost unknown", output, StringComparison.Ordinal);
        Assert.Contains("planning side lamps", error, StringComparison.Ordinal);
        Assert.StartsWith("<svg", File.ReadAllText(map).TrimStart(), StringComparison.Ordinal);
        Assert.True(File.Exists(Path.Combine(_directory, "light-before.svg")));
    }

    [Fact]
    public void The_same_seed_prints_the_same_plan()
    {
        (string site, string brief) = SmallFiles();
        string[] args = ["lamps", site, "--brief", brief, "--now", DemoNow, "--days", "1", "--json", "--seed", "11"];
        Assert.Equal(CliRunner.Run(args).Output, CliRunner.Run(args).Output);
    }

    [Fact]
    public void A_bad_brief_is_reported_by_path_and_nothing_is_computed()
    {
        (string site, string brief) = SmallFiles();
        File.WriteAllText(brief, File.ReadAllText(brief).Replace("\"side-600\"", "\"side-900\"", StringComparison.Ordinal).Replace("\"maxLamps\": 1", "\"maxLamps\": 1, \"colour\": 2", StringComparison.Ordinal));
        var (code, output, error) = CliRunner.Run("lamps", site, "--brief", brief, "--now", DemoNow);
        Assert.Equal(CanopyCommandLine.InvalidInputExitCode, code);
        Assert.Equal(string.Empty, output);
        Assert.Contains("lampTypes[0]: unknown lamp type 'side-900'", error, StringComparison.Ordinal);
        Assert.Contains("colour: unknown property", error, StringComparison.Ordinal);
        Assert.DoesNotContain("planning side lamps", error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("--brief", "demo:nowhere", "--brief: unknown demo brief 'nowhere'")]
    [InlineData("--days", "0", "--days: must be at least 1")]
    public void Bad_options_are_named(string option, string value, string expected)
    {
        string[] args = option == "--brief"
            ? ["lamps", "demo:glasshouse", option, value, "--now", DemoNow]
            : ["lamps", "demo:glasshouse", "--brief", "demo:glasshouse", option, value];
        var (code, _, error) = CliRunner.Run(args);
        Assert.Equal(CanopyCommandLine.InvalidInputExitCode, code);
        Assert.Contains(expected, error, StringComparison.Ordinal);
    }

    [Fact]
    public void The_demo_brief_runs_on_the_demo_glasshouse()
    {
        // The shipped demo pair (invented demo data) must work together end to end.
        var (code, output, error) = CliRunner.Run("lamps", "demo:glasshouse", "--brief", "demo:glasshouse", "--now", DemoNow, "--days", "1");
        Assert.True(code == 0, error);
        Assert.Contains("benches at risk: north-4", output, StringComparison.Ordinal);
        Assert.Contains("EUR per week", output, StringComparison.Ordinal);
        Assert.Contains("cautions:", output, StringComparison.Ordinal);
    }
}
