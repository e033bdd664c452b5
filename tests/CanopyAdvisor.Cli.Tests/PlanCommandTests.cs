using System.Text.Json;

namespace CanopyAdvisor.Cli.Tests;

/// <summary><c>canopy plan</c>: the rotation policy per bench and the rotation tasks, from a site file to JSON and text.</summary>
public sealed class PlanCommandTests : IDisposable
{
    // The demo lots are dated for early December 2026 (src/CanopyAdvisor.Files/Sites/README.md, "Demo sites").
    private const string IndoorNow = "2026-12-02T08:00:00-06:00";

    private readonly string _directory = Directory.CreateTempSubdirectory("canopy-plan-").FullName;

    public void Dispose() => Directory.Delete(_directory, recursive: true);

    [Fact]
    public void Json_gives_every_lot_a_verdict_a_policy_and_its_peaks_and_lists_the_tasks()
    {
        // A 60 % margin leaves some indoor benches over their target without turning (demo data), so turns are planned.
        string ics = Path.Combine(_directory, "rotations.ics"), csv = Path.Combine(_directory, "rotations.csv");
        var (code, output, error) = CliRunner.Run("plan", "demo:indoor-farm", "--now", IndoorNow, "--margin", "60", "--json", "--ics", ics, "--csv", csv);
        Assert.True(code == 0, error);
        using JsonDocument doc = JsonDocument.Parse(output);
        JsonElement root = doc.RootElement;
        Assert.Equal(60, root.GetProperty("marginPercent").GetDouble());
        JsonElement benches = root.GetProperty("benches");
        Assert.Equal(12, benches.GetArrayLength());
        int turns = 0;
        var sales = new Dictionary<string, DateTimeOffset>();
        foreach (JsonElement b in benches.EnumerateArray())
        {
            string verdict = b.GetProperty("verdict").GetString()!;
            Assert.Contains(verdict, new[] { "noRotationNeeded", "rotate", "rotationCannotHold" });
            double withPlan = b.GetProperty("peakLeanWithPlanDeg").GetDouble();
            double without = b.GetProperty("peakLeanWithoutPlanDeg").GetDouble();
            double target = b.GetProperty("targetLeanDeg").GetDouble();
            Assert.Equal(0.4 * b.GetProperty("leanGradeLimitDeg").GetDouble(), target, 2);
            int n = b.GetProperty("rotationsToSale").GetInt32();
            turns += n;
            sales[b.GetProperty("lotId").GetString()!] = DateTimeOffset.Parse(b.GetProperty("saleAt").GetString()!, System.Globalization.CultureInfo.InvariantCulture);
            foreach (JsonElement candidate in b.GetProperty("candidates").EnumerateArray())
            {
                foreach (string field in new[] { "policy", "angleDeg", "intervalHours", "rotations", "peakLeanDeg", "latePeakLeanDeg", "windowFraction", "holds" })
                {
                    Assert.True(candidate.TryGetProperty(field, out _), $"candidates: {field} missing");
                }
            }

            Assert.Equal("none", b.GetProperty("candidates")[0].GetProperty("policy").GetString());
            switch (verdict)
            {
                case "noRotationNeeded":
                    Assert.Equal("none", b.GetProperty("policy").GetString());
                    Assert.Equal(0, n);
                    Assert.Equal(JsonValueKind.Null, b.GetProperty("firstRotation").ValueKind);
                    Assert.True(without <= target + 0.01);
                    break;
                case "rotate":
                    Assert.True(n > 0);
                    Assert.True(withPlan <= target + 0.01, $"{withPlan} vs {target}");
                    Assert.Contains(b.GetProperty("angleDeg").GetDouble(), new[] { 90.0, 180.0 });
                    Assert.True(b.GetProperty("intervalHours").GetDouble() >= 12);
                    Assert.Equal(JsonValueKind.Object, b.GetProperty("firstRotation").ValueKind);
                    break;
                default:
                    Assert.False(string.IsNullOrEmpty(b.GetProperty("remedy").GetString()));
                    break;
            }
        }

        JsonElement tasks = root.GetProperty("tasks");
        Assert.True(turns > 0, "the 60 % margin should call for some turns on the indoor demo");
        Assert.Equal(turns, tasks.GetArrayLength());
        DateTimeOffset previous = DateTimeOffset.MinValue;
        foreach (JsonElement t in tasks.EnumerateArray())
        {
            foreach (string field in new[] { "lotId", "benchId", "pots", "angleDeg", "at", "earliest", "latest" })
            {
                Assert.True(t.TryGetProperty(field, out _), $"{field} missing");
            }

            DateTimeOffset at = Parse(t, "at");
            Assert.EndsWith("-06:00", t.GetProperty("at").GetString(), StringComparison.Ordinal); // America/Chicago in December
            Assert.True(Parse(t, "earliest") <= at && at <= Parse(t, "latest"));
            Assert.True(at < sales[t.GetProperty("lotId").GetString()!], "a turn after the sale");
            Assert.True(at >= previous, "tasks in time order");
            previous = at;
        }

        // The calendar: every task placed on a crew inside its window (MODEL.md §6), or reported as not fitting.
        JsonElement calendar = root.GetProperty("calendar");
        JsonElement scheduled = calendar.GetProperty("scheduled");
        Assert.Equal(turns, scheduled.GetArrayLength() + calendar.GetProperty("unscheduled").GetArrayLength());
        double hours = 0;
        foreach (JsonElement t in scheduled.EnumerateArray())
        {
            Assert.True(Parse(t, "windowStart") <= Parse(t, "start") && Parse(t, "end") <= Parse(t, "windowEnd"), t.GetProperty("taskId").GetString());
            Assert.Matches("^lot-.+/r[0-9]+$", t.GetProperty("taskId").GetString()!);
            hours += t.GetProperty("labourHours").GetDouble();
        }

        Assert.Equal(hours, calendar.GetProperty("totalHours").GetDouble(), 1);

        // RFC 5545 §3.6.1: one VEVENT per scheduled task; RFC 4180: a header row and one row per scheduled task.
        string icsText = File.ReadAllText(ics);
        Assert.StartsWith("BEGIN:VCALENDAR\r\n", icsText, StringComparison.Ordinal);
        Assert.Equal(scheduled.GetArrayLength(), icsText.Split("BEGIN:VEVENT\r\n").Length - 1);
        Assert.Equal(scheduled.GetArrayLength() + 1, File.ReadAllText(csv).Split("\r\n", StringSplitOptions.RemoveEmptyEntries).Length);
    }

    [Fact]
    public void Text_names_benches_and_verdicts_and_progress_goes_to_the_error_stream()
    {
        var (code, output, error) = CliRunner.Run("plan", "demo:indoor-farm", "--now", IndoorNow);
        Assert.True(code == 0, error);
        Assert.Contains("rack-a-tier-1", output, StringComparison.Ordinal);
        Assert.Contains("no rotation", output, StringComparison.Ordinal);
        Assert.Contains("rotation tasks", output, StringComparison.Ordinal);
        Assert.Contains("planning", error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("--margin", "100", "--margin: must be at least 0 and below 100")]
    [InlineData("--margin", "-5", "--margin: must be at least 0 and below 100")]
    [InlineData("--now", "2026-12-02", "--now: '2026-12-02' is not an ISO-8601 date and time with an offset")]
    [InlineData("--now", "2027-06-01T08:00:00-05:00", "lots: every lot is sold by")]
    public void Bad_options_are_named(string option, string value, string expected)
    {
        var (code, _, error) = CliRunner.Run("plan", "demo:indoor-farm", option, value);
        Assert.Equal(CanopyCommandLine.InvalidInputExitCode, code);
        Assert.Contains(expected, error, StringComparison.Ordinal);
    }

    [Fact]
    public void A_missing_site_file_is_refused()
    {
        var (code, _, error) = CliRunner.Run("plan", Path.Combine(_directory, "missing.json"));
        Assert.Equal(CanopyCommandLine.InvalidInputExitCode, code);
        Assert.Contains("file not found", error, StringComparison.Ordinal);
    }

    [Fact]
    public void An_unknown_crop_is_reported_at_its_lot()
    {
        string json = CliRunner.Run("demo", "show", "indoor-farm").Output.Replace("\"crop\": \"basil\"", "\"crop\": \"basill\"", StringComparison.Ordinal);
        string site = Path.Combine(_directory, "site.json");
        File.WriteAllText(site, json);
        var (code, _, error) = CliRunner.Run("plan", site, "--now", IndoorNow);
        Assert.Equal(CanopyCommandLine.InvalidInputExitCode, code);
        Assert.Contains("basill", error, StringComparison.Ordinal);
    }

    private static DateTimeOffset Parse(JsonElement e, string name) =>
        DateTimeOffset.Parse(e.GetProperty(name).GetString()!, System.Globalization.CultureInfo.InvariantCulture);
}
