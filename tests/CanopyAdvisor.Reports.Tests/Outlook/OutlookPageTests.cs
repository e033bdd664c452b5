using System.Globalization;
using System.Text.RegularExpressions;
using System.Xml;
using System.Xml.Linq;
using CanopyAdvisor.Reports.Outlook;
using NodaTime;

namespace CanopyAdvisor.Reports.Tests.Outlook;

/// <summary>The outlook page: well-formed (XML 1.0, W3C, read by System.Xml as the reference parser, since the page is
/// written as polyglot HTML5/XHTML), self-contained, one arrow per bench, one row per bench in rank order, charts with
/// titles and descriptions, arrows pointing the right compass way.</summary>
public partial class OutlookPageTests
{
    private static readonly XNamespace Html = "http://www.w3.org/1999/xhtml";
    private static readonly XNamespace Svg = "http://www.w3.org/2000/svg";

    internal static XDocument Parse(string page)
    {
        // DTD processing is prohibited by default; HTML5's doctype carries no DTD, so it is skipped, not fetched.
        var settings = new XmlReaderSettings { DtdProcessing = DtdProcessing.Ignore, XmlResolver = null };
        using var reader = XmlReader.Create(new StringReader(page), settings);
        return XDocument.Load(reader);
    }

    private static OutlookReport Report(OutlookInput? input = null) =>
        OutlookReport.Build(input ?? OutlookFixture.Input(OutlookFixture.Eight()));

    [Fact]
    public void Page_is_well_formed_and_self_contained()
    {
        string page = OutlookPage.Render(Report());
        Assert.StartsWith("<!DOCTYPE html>", page, StringComparison.Ordinal);
        XDocument doc = Parse(page);
        Assert.Equal(Html + "html", doc.Root!.Name);
        Assert.Equal("en", (string?)doc.Root.Attribute("lang"));
        Assert.Contains("2026-W49", doc.Descendants(Html + "title").Single().Value, StringComparison.Ordinal);

        // Nothing to fetch or run: no scripts, no links, no external images or stylesheets.
        Assert.Empty(doc.Descendants(Html + "script"));
        Assert.Empty(doc.Descendants(Html + "link"));
        Assert.Empty(doc.Descendants(Html + "img"));
        Assert.DoesNotContain("http://", page.Replace("http://www.w3.org/", string.Empty, StringComparison.Ordinal), StringComparison.Ordinal);
        Assert.DoesNotContain("https://", page, StringComparison.Ordinal);
        Assert.DoesNotContain("@import", page, StringComparison.Ordinal);
    }

    [Fact]
    public void Sections_have_headings_and_print_breaks()
    {
        string page = OutlookPage.Render(Report());
        XDocument doc = Parse(page);
        string[] ids = [.. doc.Descendants(Html + "section").Select(s => (string)s.Attribute("id")!)];
        Assert.Equal(["glance", "map", "ranking", "lean-charts", "dli", "rotation", "change", "notes"], ids);
        Assert.All(doc.Descendants(Html + "section"), s => Assert.Equal(Html + "h2", s.Elements().First().Name));
        Assert.Single(doc.Descendants(Html + "h1"));
        Assert.Contains("@media print", page, StringComparison.Ordinal);
        Assert.Contains("break-before: page", page, StringComparison.Ordinal);
    }

    [Fact]
    public void Map_has_one_arrow_per_forecast_bench()
    {
        XDocument doc = Parse(OutlookPage.Render(Report()));
        XElement map = doc.Descendants(Html + "section").Single(s => (string?)s.Attribute("id") == "map").Descendants(Svg + "svg").Single();
        var arrows = map.Descendants(Svg + "g").Where(g => (string?)g.Attribute("class") == "arrow").ToList();
        Assert.Equal(OutlookFixture.EightRanked.Order(), arrows.Select(a => (string)a.Attribute("data-bench")!).Order());
        Assert.NotNull(map.Element(Svg + "title"));
        Assert.NotNull(map.Element(Svg + "desc"));
    }

    [Fact]
    public void Ranking_table_has_a_row_per_bench_in_rank_order_with_headers()
    {
        XDocument doc = Parse(OutlookPage.Render(Report()));
        XElement table = doc.Descendants(Html + "table").Single(t => (string?)t.Attribute("id") == "ranking-table");
        Assert.NotNull(table.Element(Html + "caption"));
        Assert.All(table.Element(Html + "thead")!.Descendants(Html + "th"), th => Assert.Equal("col", (string?)th.Attribute("scope")));
        var rows = table.Element(Html + "tbody")!.Elements(Html + "tr").ToList();
        Assert.Equal(OutlookFixture.EightRanked, rows.Select(r => (string)r.Attribute("data-bench")!));
        Assert.Equal(OutlookFixture.EightRanked, rows.Select(r => r.Elements(Html + "th").Single().Value));

        // Risk is in words and shape, not colour alone.
        Assert.Equal("■ leaves grade", rows[0].Elements(Html + "td").ElementAt(1).Value);
        Assert.Equal("◆ watch", rows[2].Elements(Html + "td").ElementAt(1).Value);
        Assert.Equal("○ low", rows[7].Elements(Html + "td").ElementAt(1).Value);
    }

    [Fact]
    public void Row_shows_bearing_and_compass_point_rate_and_stretch_numbers()
    {
        XDocument doc = Parse(OutlookPage.Render(Report()));
        XElement row = doc.Descendants(Html + "tr").Single(r => (string?)r.Attribute("data-bench") == "north-3");
        string[] cells = [.. row.Elements().Select(e => e.Value)];
        Assert.Contains("0° N", cells);            // azimuth 0 → N (16-point compass)
        Assert.Contains("+0.04", cells);           // (2.25 − 2) / 7 = 0.0357 °/day
        Assert.Contains("low DLI 8.1 under 10 mol m⁻² d⁻¹; high DIF 3.2 over 2 K", cells);
        XElement south4 = doc.Descendants(Html + "tr").Single(r => (string?)r.Attribute("data-bench") == "south-4");
        Assert.Contains("270° W", south4.Elements().Select(e => e.Value));
        Assert.Contains("75% of 12°", south4.Elements().Select(e => e.Value)); // 9 / 12
    }

    [Fact]
    public void Charts_are_present_with_titles_descriptions_grade_limit_and_band()
    {
        XDocument doc = Parse(OutlookPage.Render(Report()));
        var lean = doc.Descendants(Svg + "svg").Where(s => (string?)s.Attribute("class") == "lean-chart").ToList();
        Assert.Equal(OutlookFixture.EightRanked, lean.Select(s => (string)s.Attribute("data-bench")!));
        foreach (XElement chart in lean)
        {
            Assert.False(string.IsNullOrWhiteSpace(chart.Element(Svg + "title")?.Value));
            Assert.False(string.IsNullOrWhiteSpace(chart.Element(Svg + "desc")?.Value));
            Assert.Single(chart.Descendants(Svg + "line"), l => (string?)l.Attribute("class") == "grade-limit");
            Assert.Single(chart.Descendants(Svg + "polyline"), l => (string?)l.Attribute("class") == "lean-track");
        }

        // Benches with a band get the bar at the end; north-2 and north-3 were made without one.
        Assert.Equal(6, lean.Count(c => c.Descendants(Svg + "g").Any(g => (string?)g.Attribute("class") == "band")));
        XElement dli = doc.Descendants(Svg + "svg").Single(s => (string?)s.Attribute("class") == "dli-chart");
        Assert.NotNull(dli.Element(Svg + "title"));
        Assert.NotNull(dli.Element(Svg + "desc"));
        Assert.Contains(doc.Descendants(Html + "figcaption"), f => f.Value.Contains("DLI target", StringComparison.Ordinal));
    }

    [Fact]
    public void Lean_track_runs_from_now_to_the_week_end_and_grade_limit_sits_at_its_value()
    {
        XDocument doc = Parse(OutlookPage.Render(Report()));
        XElement chart = doc.Descendants(Svg + "svg").Single(s => (string?)s.Attribute("data-bench") == "south-1");
        var points = ((string)chart.Descendants(Svg + "polyline").Single().Attribute("points")!).Split(' ')
            .Select(p => p.Split(',').Select(v => double.Parse(v, CultureInfo.InvariantCulture)).ToArray()).ToList();
        Assert.Equal(24 * 7 + 1, points.Count); // hourly from now to now + 7 d inclusive; the spin-up day is left out
        Assert.True(points.Zip(points.Skip(1)).All(p => p.Second[0] > p.First[0]));

        // South-1 rises from 3° to 6° with a 15° limit: y grows downward, so the end is higher (smaller y) and both
        // lie below (larger y than) the limit line.
        double limitY = double.Parse((string)chart.Descendants(Svg + "line").Single(l => (string?)l.Attribute("class") == "grade-limit").Attribute("y1")!, CultureInfo.InvariantCulture);
        Assert.True(points[^1][1] < points[0][1]);
        Assert.True(points[0][1] > limitY && points[^1][1] > limitY);
    }

    [Fact]
    public void Leaves_grade_line_stands_at_its_time()
    {
        // south-3 leaves grade 3 days into the 7-day week; the plot spans x = 40 … 286 px (330 px wide, 40 px left and
        // 44 px right margins), so the line stands at 40 + 246 × 3/7 = 145.43 px.
        XDocument doc = Parse(OutlookPage.Render(Report()));
        XElement chart = doc.Descendants(Svg + "svg").Single(s => (string?)s.Attribute("data-bench") == "south-3");
        XElement line = chart.Descendants(Svg + "line").Single(l => (string?)l.Attribute("class") == "leaves-grade");
        Assert.Equal(145.4, double.Parse((string)line.Attribute("x1")!, CultureInfo.InvariantCulture), 6);
        Assert.Contains("crosses the limit Sat 5 Dec 08:00", chart.Element(Svg + "desc")!.Value, StringComparison.Ordinal);
    }

    [Fact]
    public void A_week_across_the_spring_clock_change_keeps_its_local_days()
    {
        // Europe/Amsterdam moves from +01:00 to +02:00 on Sunday 28 March 2027 (EU summer-time rule: last Sunday of
        // March). 168 h from Fri 26 Mar 08:00 +01:00 end on Fri 2 Apr 09:00 +02:00: eight local dates are touched.
        Instant now = Instant.FromUtc(2027, 3, 26, 7, 0);
        var forecast = new Core.Forecast.SiteForecast(now, now + Duration.FromDays(7), Duration.FromMinutes(12), [], 0, 0);
        OutlookReport report = OutlookReport.Build(new OutlookInput(OutlookFixture.Site, forecast, OutlookFixture.Crops, []));
        Assert.Equal(Enumerable.Range(0, 8).Select(d => new LocalDate(2027, 3, 26).PlusDays(d)), report.Days);
        Assert.Equal("2027-W12", report.WeekLabel); // ISO 8601: week 1 of 2027 starts Monday 4 January
        XDocument doc = Parse(OutlookPage.Render(report));
        Assert.Contains("to Fri 2 Apr 09:00", doc.Descendants(Html + "p").First().Value, StringComparison.Ordinal);
    }

    [GeneratedRegex(@"translate\((?<x>[-\d.]+) (?<y>[-\d.]+)\) rotate\((?<a>[-\d.]+)\)")]
    private static partial Regex ArrowTransform();

    [Theory]
    // bearing clockwise from north → where the arrow's tip lands on screen (SVG y grows downward, north up).
    // SVG 1.1 §7.4: rotate(a) is the matrix [cos a  −sin a; sin a  cos a] applied to (x, y); the arrow is drawn to
    // (0, −L). Hand-worked: 0° → (0, −L) up = north; 90° → (L, 0) right = east; 135° → (0.707 L, 0.707 L) right and
    // down = south-east; 180° → (0, L) down = south; 270° → (−L, 0) left = west.
    [InlineData(0, 0, -1)]
    [InlineData(90, 1, 0)]
    [InlineData(135, 0.7071, 0.7071)]
    [InlineData(180, 0, 1)]
    [InlineData(270, -1, 0)]
    public void Arrow_points_the_compass_way_with_north_up(double bearingDeg, double east, double down)
    {
        OutlookReport report = Report(OutlookFixture.Input(OutlookFixture.Forecast(OutlookFixture.Bench("south-1", 2, 5, bearingDeg))));
        XDocument doc = Parse(OutlookPage.Render(report));
        XElement arrow = doc.Descendants(Svg + "g").Single(g => (string?)g.Attribute("class") == "arrow");
        Match m = ArrowTransform().Match((string)arrow.Attribute("transform")!);
        Assert.True(m.Success);
        double a = double.Parse(m.Groups["a"].Value, CultureInfo.InvariantCulture) * Math.PI / 180;
        XElement shaft = arrow.Elements(Svg + "line").Last();
        double length = -double.Parse((string)shaft.Attribute("y2")!, CultureInfo.InvariantCulture);
        Assert.Equal(20, length, 6); // 4 px per degree × 5°
        (double x, double y) = (0, -length);
        double tipX = (x * Math.Cos(a)) - (y * Math.Sin(a)), tipY = (x * Math.Sin(a)) + (y * Math.Cos(a));
        Assert.Equal(east, tipX / length, 3);
        Assert.Equal(down, tipY / length, 3);
    }

    [Fact]
    public void Rotation_is_marked_not_planned_without_advice_and_shown_with_it()
    {
        string without = OutlookPage.Render(Report());
        Assert.Contains("Rotation work for the site this week: <strong>not planned</strong>", without, StringComparison.Ordinal);
        var input = OutlookFixture.Input(OutlookFixture.Eight()) with
        {
            Advice = [new BenchAdviceSummary("south-3", "turn 180° every 2 days", 3, 1.25)],
            RotationHoursThisWeek = 4.5,
        };
        XDocument doc = Parse(OutlookPage.Render(Report(input)));
        Assert.Contains("4.5 h planned", doc.Descendants(Html + "strong").Select(s => s.Value));
        XElement row = doc.Descendants(Html + "table").Single(t => (string?)t.Attribute("id") == "rotation-table")
            .Descendants(Html + "tr").Single(r => r.Element(Html + "th")?.Value == "south-3");
        Assert.Equal(["south-3", "turn 180° every 2 days", "3", "1.3 h"], row.Elements().Select(e => e.Value));
    }

    [Fact]
    public void Text_from_the_site_is_escaped()
    {
        var input = OutlookFixture.Input(OutlookFixture.Eight()) with
        {
            Site = OutlookFixture.Site with { Name = "Range <A> & \"B\"" },
            Advice = [new BenchAdviceSummary("south-1", "<script>alert(1)</script>", 1, 0.2)],
        };
        string page = OutlookPage.Render(Report(input));
        XDocument doc = Parse(page);
        Assert.Empty(doc.Descendants(Html + "script"));
        Assert.Contains("Range <A> & \"B\"", doc.Descendants(Html + "h1").Single().Value, StringComparison.Ordinal);
    }

    [Fact]
    public void Page_of_a_real_forecast_parses_and_names_every_bench()
    {
        // A short real run (1 day, no band) on the demo glasshouse, with the day's light from the compiled field.
        var (site, forecast, light) = RealRun.Glasshouse();
        var report = OutlookReport.Build(new OutlookInput(site, forecast, OutlookFixture.Crops, BenchDayDli.From(light)));
        XDocument doc = Parse(OutlookPage.Render(report));
        Assert.Equal(forecast.Benches.Length, doc.Descendants(Svg + "g").Count(g => (string?)g.Attribute("class") == "arrow"));
        Assert.Equal(forecast.Benches.Length, doc.Descendants(Svg + "svg").Count(s => (string?)s.Attribute("class") == "lean-chart"));
        Assert.All(report.Benches, b => Assert.All(b.DailyDli, v => Assert.True(double.IsFinite(v) && v > 0)));
        Assert.Equal(report.Days.Length, doc.Descendants(Svg + "g").Count(g => (string?)g.Attribute("class") == "dli-day"));
    }
}
