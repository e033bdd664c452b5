using System.Text.Json;
using System.Xml;
using System.Xml.Linq;

namespace CanopyAdvisor.Cli.Tests;

/// <summary><c>canopy outlook</c>: writes the page, the CSV and outlook.json into a folder, each file whole; compares
/// with the folder's earlier outlook; refuses bad input with exit code 2.</summary>
public sealed class OutlookCommandTests : IDisposable
{
    // The demo lots are dated for early December 2026 (src/CanopyAdvisor.Files/Sites/README.md, "Demo sites").
    private const string DemoNow = "2026-12-02T08:00:00+01:00";
    private const string WeekAfter = "2026-12-09T08:00:00+01:00";

    private readonly string _directory = Directory.CreateTempSubdirectory("canopy-outlook-").FullName;

    public void Dispose() => Directory.Delete(_directory, recursive: true);

    private static XDocument ParseXml(string path)
    {
        var settings = new XmlReaderSettings { DtdProcessing = DtdProcessing.Ignore, XmlResolver = null };
        using var reader = XmlReader.Create(path, settings);
        return XDocument.Load(reader);
    }

    [Fact]
    public void Writes_four_files_and_nothing_else_then_compares_with_them_a_week_later()
    {
        string folder = Path.Combine(_directory, "out", "week");
        var (code, output, error) = CliRunner.Run("outlook", "demo:glasshouse", "--out", folder, "--now", DemoNow);
        Assert.True(code == 0, error);
        Assert.Equal(["outlook.csv", "outlook.html", "outlook.json", "rotations.ics"], Directory.GetFiles(folder).Select(Path.GetFileName).Order());
        Assert.Contains("forecasting", error, StringComparison.Ordinal);
        Assert.Contains(Path.Combine(folder, "outlook.html"), output, StringComparison.Ordinal);

        // The page parses; 8 benches, each with an arrow and a row; no comparison the first time.
        XDocument page = ParseXml(Path.Combine(folder, "outlook.html"));
        XNamespace html = "http://www.w3.org/1999/xhtml", svg = "http://www.w3.org/2000/svg";
        Assert.Equal(8, page.Descendants(svg + "g").Count(g => (string?)g.Attribute("class") == "arrow"));
        Assert.Equal(8, page.Descendants(html + "table").Single(t => (string?)t.Attribute("id") == "ranking-table").Element(html + "tbody")!.Elements().Count());
        Assert.DoesNotContain(page.Descendants(html + "table"), t => (string?)t.Attribute("id") == "change-table");
        Assert.Equal(9, File.ReadAllText(Path.Combine(folder, "outlook.csv")).Split("\r\n", StringSplitOptions.RemoveEmptyEntries).Length);

        // Every bench carries a rotation recommendation (MODEL.md §6), and the calendar is an RFC 5545 calendar.
        Assert.All(page.Descendants(html + "table").Single(t => (string?)t.Attribute("id") == "ranking-table").Element(html + "tbody")!.Elements(),
            row => Assert.DoesNotContain("not planned", row.Value, StringComparison.Ordinal));
        string ics = File.ReadAllText(Path.Combine(folder, "rotations.ics"));
        Assert.StartsWith("BEGIN:VCALENDAR\r\nVERSION:2.0\r\n", ics, StringComparison.Ordinal);
        Assert.EndsWith("END:VCALENDAR\r\n", ics, StringComparison.Ordinal);

        // A week later into the same folder: the earlier outlook.json is read before it is replaced.
        (code, _, error) = CliRunner.Run("outlook", "demo:glasshouse", "--out", folder, "--now", WeekAfter);
        Assert.True(code == 0, error);
        page = ParseXml(Path.Combine(folder, "outlook.html"));
        XElement change = page.Descendants(html + "table").Single(t => (string?)t.Attribute("id") == "change-table");
        Assert.Equal(8, change.Element(html + "tbody")!.Elements().Count());
        using JsonDocument json = JsonDocument.Parse(File.ReadAllText(Path.Combine(folder, "outlook.json")));
        Assert.Equal("2026-W50", json.RootElement.GetProperty("week").GetString());
        Assert.Equal(["outlook.csv", "outlook.html", "outlook.json", "rotations.ics"], Directory.GetFiles(folder).Select(Path.GetFileName).Order());
    }

    [Fact]
    public void A_corrupt_earlier_file_warns_and_is_replaced()
    {
        string folder = Path.Combine(_directory, "corrupt");
        Directory.CreateDirectory(folder);
        File.WriteAllText(Path.Combine(folder, "outlook.json"), "{ not json");
        var (code, _, error) = CliRunner.Run("outlook", "demo:glasshouse", "--out", folder, "--now", DemoNow);
        Assert.True(code == 0, error);
        Assert.Contains("warning: ", error, StringComparison.Ordinal);
        Assert.Contains("could not be read as an outlook", error, StringComparison.Ordinal);
        using JsonDocument json = JsonDocument.Parse(File.ReadAllText(Path.Combine(folder, "outlook.json")));
        Assert.Equal("canopy-outlook", json.RootElement.GetProperty("format").GetString());
    }

    [Fact]
    public void Previous_of_another_site_is_ignored_with_a_note()
    {
        // A hand-made earlier outlook of the indoor demo farm.
        string other = Path.Combine(_directory, "other.json");
        File.WriteAllText(other, """
            {"format": "canopy-outlook", "version": 1, "siteId": "demo-indoor-farm", "siteName": "farm",
             "now": "2026-11-25T14:00:00Z", "weekEnd": "2026-12-02T14:00:00Z", "week": "2026-W48", "benches": []}
            """);
        string folder = Path.Combine(_directory, "mine");
        var (code, _, error) = CliRunner.Run("outlook", "demo:glasshouse", "--out", folder, "--now", DemoNow, "--previous", other);
        Assert.True(code == 0, error);
        Assert.Contains("is the outlook of another site", error, StringComparison.Ordinal);
        Assert.Contains("is the outlook of another site", File.ReadAllText(Path.Combine(folder, "outlook.html")), StringComparison.Ordinal);
    }

    [Fact]
    public void A_failed_write_leaves_no_temporary_files_and_exits_2()
    {
        string folder = Path.Combine(_directory, "blocked");
        Directory.CreateDirectory(Path.Combine(folder, "outlook.csv")); // a folder where the CSV must go: the move fails
        var (code, _, error) = CliRunner.Run("outlook", "demo:glasshouse", "--out", folder, "--now", DemoNow);
        Assert.Equal(CanopyCommandLine.InvalidInputExitCode, code);
        Assert.Contains("error:", error, StringComparison.Ordinal);
        Assert.Empty(Directory.GetFiles(folder, "*.tmp"));
        Assert.False(File.Exists(Path.Combine(folder, "outlook.json")));
    }

    [Theory]
    [InlineData("--out: is required")]
    public void Missing_out_folder_is_refused(string expected)
    {
        var (code, _, error) = CliRunner.Run("outlook", "demo:glasshouse", "--now", DemoNow);
        Assert.Equal(CanopyCommandLine.InvalidInputExitCode, code);
        Assert.Contains(expected, error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("demo:glasshouse", "--now", "2026-12-02", "--now: '2026-12-02' is not an ISO-8601 date and time with an offset")]
    [InlineData("demo:nowhere", "--now", DemoNow, "unknown demo site 'nowhere'")]
    [InlineData("demo:glasshouse", "--previous", "no-such-outlook.json", "--previous: file not found")]
    public void Bad_input_exits_2_and_writes_nothing(string site, string option, string value, string expected)
    {
        string folder = Path.Combine(_directory, "bad");
        var (code, _, error) = CliRunner.Run("outlook", site, "--out", folder, option, value);
        Assert.Equal(CanopyCommandLine.InvalidInputExitCode, code);
        Assert.Contains(expected, error, StringComparison.Ordinal);
        Assert.False(Directory.Exists(folder));
    }

    [Fact]
    public void Out_that_is_a_file_is_refused()
    {
        string file = Path.Combine(_directory, "a-file");
        File.WriteAllText(file, "x");
        var (code, _, error) = CliRunner.Run("outlook", "demo:glasshouse", "--out", file, "--now", DemoNow);
        Assert.Equal(CanopyCommandLine.InvalidInputExitCode, code);
        Assert.Contains("is a file, not a folder", error, StringComparison.Ordinal);
    }
}
