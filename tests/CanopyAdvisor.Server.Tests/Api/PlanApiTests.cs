using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using CanopyAdvisor.Server.Tests.Support;
using Ical.Net;
using Ical.Net.CalendarComponents;

namespace CanopyAdvisor.Server.Tests.Api;

/// <summary>The rotation plan and its calendar exports through the API: every role may run them, other organisations'
/// sites answer 404, bad options are one ProblemDetails, the iCalendar parses (Ical.Net, an outside RFC 5545 reader) and
/// keeps its UIDs across exports, the CSV follows RFC 4180.</summary>
/// <remarks>The demo indoor farm (no sky), planned from 2026-12-02T02:00−06:00 to its last sale (2026-12-18, demo data).</remarks>
public sealed class PlanApiTests(CanopyFactory factory) : IClassFixture<CanopyFactory>
{
    private const string Now = "2026-12-02T02:00:00-06:00";

    // The start of the day shift (demo labour settings) with a 50 % margin: the demo room then needs turns on some benches,
    // every one placed on a crew (6 tasks with this build's crop values).
    private const string CalendarQuery = "now=2026-12-02T06%3A00%3A00-06%3A00&marginPercent=50";

    private const string CalendarBody = """{"now": "2026-12-02T06:00:00-06:00", "marginPercent": 50}""";

    private async Task<(HttpClient Client, string SiteId)> AsAsync(string email)
    {
        HttpClient client = await factory.SignedInAsync(email);
        return (client, await SiteEditing.SiteIdAsync(client, "demo-indoor-farm"));
    }

    [Fact]
    public async Task The_plan_covers_every_bench_and_its_tasks_fit_their_windows()
    {
        (HttpClient manager, string siteId) = await AsAsync(Demo.Manager);
        HttpResponseMessage response = await manager.PostAsync($"/api/sites/{siteId}/plan", SiteEditing.Json($$"""{"now": "{{Now}}"}"""));
        JsonElement plan = await response.Content.ReadFromJsonAsync<JsonElement>();
        Assert.True(response.StatusCode == HttpStatusCode.OK, plan.GetRawText());
        // 3 racks × 4 tiers, one lot each (Files/Sites/DemoSites.cs).
        Assert.Equal(12, plan.GetProperty("benches").GetArrayLength());
        Assert.Equal("America/Chicago", plan.GetProperty("timeZone").GetString());
        Assert.Equal(Now, plan.GetProperty("now").GetString());
        // The default margin, ModelConstants.RotationGradeMargin (20 %, an estimate).
        Assert.Equal(20, plan.GetProperty("marginPercent").GetDouble());
        foreach (JsonElement bench in plan.GetProperty("benches").EnumerateArray())
        {
            string verdict = bench.GetProperty("verdict").GetString()!;
            Assert.Contains(verdict, new[] { "noRotationNeeded", "rotate", "rotationCannotHold" });
            // A plan that holds keeps the peak at or under the target (grade limit less the margin).
            if (verdict != "rotationCannotHold")
            {
                Assert.True(bench.GetProperty("peakLeanWithPlanDeg").GetDouble() <= bench.GetProperty("targetLeanDeg").GetDouble() + 0.01, bench.GetRawText());
            }
        }

        foreach (JsonElement task in plan.GetProperty("scheduled").EnumerateArray())
        {
            DateTimeOffset start = task.GetProperty("start").GetDateTimeOffset();
            DateTimeOffset end = task.GetProperty("end").GetDateTimeOffset();
            Assert.True(start < end);
            Assert.True(task.GetProperty("windowStart").GetDateTimeOffset() <= start && end <= task.GetProperty("windowEnd").GetDateTimeOffset(), task.GetRawText());
        }
    }

    [Theory]
    // Every role reads advice (the server README's matrix).
    [InlineData(Demo.Grower)]
    [InlineData(Demo.Designer)]
    [InlineData(Demo.Manager)]
    [InlineData(Demo.Admin)]
    public async Task Every_role_may_export_the_calendar_and_the_ics_keeps_its_uids(string email)
    {
        (HttpClient client, string siteId) = await AsAsync(email);
        HttpResponseMessage first = await client.GetAsync($"/api/sites/{siteId}/plan/calendar.ics?{CalendarQuery}");
        Assert.Equal(HttpStatusCode.OK, first.StatusCode);
        // RFC 5545 §8.1: text/calendar.
        Assert.Equal("text/calendar", first.Content.Headers.ContentType?.MediaType);
        string text = await first.Content.ReadAsStringAsync();
        // RFC 5545 §3.1: lines end in CRLF.
        Assert.DoesNotContain("\n", text.Replace("\r\n", "", StringComparison.Ordinal), StringComparison.Ordinal);
        Calendar calendar = Calendar.Load(text)!;
        List<CalendarEvent> events = [.. calendar.Events];
        Assert.NotEmpty(events);

        factory.Clock.Advance(NodaTime.Duration.FromMinutes(5));
        string again = await client.GetStringAsync($"/api/sites/{siteId}/plan/calendar.ics?{CalendarQuery}");
        List<CalendarEvent> eventsAgain = [.. Calendar.Load(again)!.Events];
        Assert.Equal(events.Select(e => e.Uid).Order(), eventsAgain.Select(e => e.Uid).Order());
        Assert.Equal(events.Count, events.Select(e => e.Uid).Distinct().Count());

        JsonElement plan = await (await client.PostAsync($"/api/sites/{siteId}/plan", SiteEditing.Json(CalendarBody))).Content.ReadFromJsonAsync<JsonElement>();
        List<JsonElement> tasks = [.. plan.GetProperty("scheduled").EnumerateArray()];
        Assert.Equal(tasks.Count, events.Count);
        foreach (JsonElement task in tasks)
        {
            CalendarEvent e = events.Single(x => x.Uid == task.GetProperty("uid").GetString());
            Assert.Equal(task.GetProperty("start").GetDateTimeOffset().UtcDateTime, e.DtStart!.AsUtc);
            Assert.Equal(task.GetProperty("end").GetDateTimeOffset().UtcDateTime, e.DtEnd!.AsUtc);
        }
    }

    [Fact]
    public async Task The_csv_has_one_row_per_scheduled_task()
    {
        (HttpClient grower, string siteId) = await AsAsync(Demo.Grower);
        HttpResponseMessage response = await grower.GetAsync($"/api/sites/{siteId}/plan/calendar.csv?{CalendarQuery}");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        // RFC 4180 §3: text/csv, with the header parameter.
        Assert.Equal("text/csv", response.Content.Headers.ContentType?.MediaType);
        Assert.Contains(response.Content.Headers.ContentType!.Parameters, p => p.Name == "header" && p.Value == "present");
        string text = await response.Content.ReadAsStringAsync();
        // RFC 4180 §2: CRLF after every record, a header first.
        string[] rows = text.Split("\r\n");
        Assert.True(rows.Length > 2, text);
        Assert.Equal("", rows[^1]);
        Assert.StartsWith("date,start,end,", rows[0], StringComparison.Ordinal);
        JsonElement plan = await (await grower.PostAsync($"/api/sites/{siteId}/plan", SiteEditing.Json(CalendarBody))).Content.ReadFromJsonAsync<JsonElement>();
        Assert.Equal(plan.GetProperty("scheduled").GetArrayLength(), rows.Length - 2);
    }

    [Fact]
    public async Task Another_organisations_site_is_404()
    {
        await factory.AddOtherOrganisationAsync();
        (_, string siteId) = await AsAsync(Demo.Grower);
        HttpClient other = await factory.SignedInAsync(CanopyFactory.OtherAdminEmail);
        await ProblemAssert.IsProblem(await other.PostAsync($"/api/sites/{siteId}/plan", SiteEditing.Json("{}")), HttpStatusCode.NotFound);
        await ProblemAssert.IsProblem(await other.GetAsync($"/api/sites/{siteId}/plan/calendar.ics"), HttpStatusCode.NotFound);
        await ProblemAssert.IsProblem(await other.GetAsync($"/api/sites/{siteId}/plan/calendar.csv"), HttpStatusCode.NotFound);
    }

    [Theory]
    [InlineData("""{"now": "2026-12-02T02:00:00", "marginPercent": 100}""", new[] { "now", "marginPercent" })] // ISO 8601 offset required; margin in [0, 100)
    [InlineData("""{"marginPercent": -1}""", new[] { "marginPercent" })]
    [InlineData("""{"now": "2027-02-01T00:00:00-06:00"}""", new[] { "now" })] // after every demo lot's sale (last 2026-12-18)
    [InlineData("""{"margin": 20}""", new[] { "margin" })] // unknown field
    [InlineData("""{"marginPercent": NaN}""", new[] { "marginPercent" })] // not JSON (RFC 8259 §6)
    public async Task Bad_options_are_400_with_every_problem(string body, string[] paths)
    {
        (HttpClient grower, string siteId) = await AsAsync(Demo.Grower);
        await ProblemAssert.IsInvalid(await grower.PostAsync($"/api/sites/{siteId}/plan", SiteEditing.Json(body)), paths);
    }
}
