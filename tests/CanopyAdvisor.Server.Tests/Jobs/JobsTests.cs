using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using CanopyAdvisor.Server.Jobs;
using CanopyAdvisor.Server.Tests.Support;
using Microsoft.Extensions.DependencyInjection;
using NodaTime;
using Quartz;

namespace CanopyAdvisor.Server.Tests.Jobs;

/// <summary>Scheduled jobs in the service: triggers from the stored sites, the catch-up of a missed fire time (once),
/// the job history through the API. The clock is the test clock (no waiting on real time). Local times from the IANA
/// tz database: Chicago is UTC−6 in December (CST).</summary>
public sealed class JobsTests : IDisposable
{
    private readonly CanopyFactory _factory = new();

    public void Dispose() => _factory.Dispose();

    private SiteJobScheduler Scheduler => _factory.Services.GetRequiredService<SiteJobScheduler>();

    /// <summary>Only the indoor demo room is kept (no sky: its forecasts are quick).</summary>
    private async Task<(HttpClient Admin, string SiteId)> IndoorOnlyAsync()
    {
        HttpClient admin = await _factory.SignedInAsync(Demo.Admin);
        await Scheduler.CatchUp;
        string glasshouse = await SiteEditing.SiteIdAsync(admin, "demo-glasshouse");
        Assert.Equal(HttpStatusCode.NoContent, (await admin.DeleteAsync($"/api/sites/{glasshouse}")).StatusCode);
        return (admin, await SiteEditing.SiteIdAsync(admin, "demo-indoor-farm"));
    }

    private static async Task<List<JsonElement>> RunsAsync(HttpClient client, string siteId, string kind) =>
        (await client.GetFromJsonAsync<JsonElement>($"/api/sites/{siteId}/jobs")).GetProperty("runs").EnumerateArray()
            .Where(r => r.GetProperty("kind").GetString() == kind).ToList();

    [Fact]
    public async Task A_nightly_forecast_missed_while_down_runs_once_on_start_then_only_the_latest_missed_one()
    {
        (HttpClient admin, string siteId) = await IndoorOnlyAsync();
        Assert.Empty(await RunsAsync(admin, siteId, JobKinds.NightlyForecast)); // seeded at 2026-12-02 08:00Z: nothing missed yet

        // Down until 2026-12-03 12:00Z: the 02:00 CST fire of 3 Dec (08:00Z) was missed.
        _factory.Clock.Advance(Duration.FromHours(28));
        Assert.True(await Scheduler.CatchUpNowAsync(CancellationToken.None) >= 1);
        JsonElement run = Assert.Single(await RunsAsync(admin, siteId, JobKinds.NightlyForecast));
        Assert.Equal("2026-12-03T02:00:00-06:00", run.GetProperty("scheduledFor").GetString());
        Assert.True(run.GetProperty("caughtUp").GetBoolean());
        Assert.Equal(JobKinds.Succeeded, run.GetProperty("outcome").GetString());

        // The forecast is stored, under the job's name, starting at the fire time.
        List<JsonElement> forecasts = (await admin.GetFromJsonAsync<List<JsonElement>>($"/api/sites/{siteId}/forecasts"))!;
        JsonElement stored = Assert.Single(forecasts, f => f.GetProperty("createdBy").GetString() == NightlyForecastWork.JobUserId);
        JsonElement forecast = await admin.GetFromJsonAsync<JsonElement>($"/api/sites/{siteId}/forecasts/{stored.GetProperty("id").GetString()}");
        Assert.Equal("2026-12-03T02:00:00-06:00", forecast.GetProperty("now").GetString());

        // Once: starting again at the same time runs nothing more.
        Assert.Equal(0, await Scheduler.CatchUpNowAsync(CancellationToken.None));
        Assert.Single(await RunsAsync(admin, siteId, JobKinds.NightlyForecast));

        // Down three more days (to 2026-12-06 12:00Z): 4, 5 and 6 Dec were missed; only the latest (6 Dec) runs.
        _factory.Clock.Advance(Duration.FromDays(3));
        await Scheduler.CatchUpNowAsync(CancellationToken.None);
        List<JsonElement> runs = await RunsAsync(admin, siteId, JobKinds.NightlyForecast);
        Assert.Equal(["2026-12-06T02:00:00-06:00", "2026-12-03T02:00:00-06:00"], runs.Select(r => r.GetProperty("scheduledFor").GetString()));
    }

    [Fact]
    public async Task The_day_s_task_list_is_stored_and_readable()
    {
        (HttpClient admin, string siteId) = await IndoorOnlyAsync();
        Assert.Equal(HttpStatusCode.NotFound, (await admin.GetAsync($"/api/sites/{siteId}/jobs/task-list/latest")).StatusCode);

        // Seeded at 2026-12-02 08:00Z (02:00 CST); the earliest crew start is 06:00 local (the indoor demo's day shift), so
        // at Thursday 2026-12-03 18:00Z (12:00 CST) Thursday's 06:00 CST start was missed and runs once.
        _factory.Clock.Advance(Duration.FromHours(34));
        await Scheduler.CatchUpNowAsync(CancellationToken.None);
        JsonElement run = Assert.Single(await RunsAsync(admin, siteId, JobKinds.TaskList));
        Assert.Equal(JobKinds.Succeeded, run.GetProperty("outcome").GetString());
        Assert.Equal("2026-12-03T06:00:00-06:00", run.GetProperty("scheduledFor").GetString());

        JsonElement list = await admin.GetFromJsonAsync<JsonElement>($"/api/sites/{siteId}/jobs/task-list/latest");
        Assert.Equal("2026-12-03", list.GetProperty("date").GetString());
        Assert.Equal("America/Chicago", list.GetProperty("timeZone").GetString());
        Assert.All(list.GetProperty("tasks").EnumerateArray(), t => Assert.StartsWith("2026-12-03T", t.GetProperty("start").GetString(), StringComparison.Ordinal));
    }

    [Fact]
    public async Task The_weekly_outlook_is_stored_on_monday_and_the_next_one_compares_with_it()
    {
        (HttpClient admin, string siteId) = await IndoorOnlyAsync();
        Assert.Equal(HttpStatusCode.NotFound, (await admin.GetAsync($"/api/sites/{siteId}/jobs/weekly-outlook/latest")).StatusCode);

        // The demo lots are sold by 2026-12-06; keep them growing to 2027-01-29 so both outlooks have lots to show.
        (System.Text.Json.Nodes.JsonObject site, int version) = await SiteEditing.ReadAsync(admin, siteId);
        foreach (System.Text.Json.Nodes.JsonNode? lot in site["lots"]!.AsArray())
        {
            lot!["saleOn"] = "2027-01-29";
        }

        Assert.Equal(HttpStatusCode.OK, (await SiteEditing.ReplaceAsync(admin, siteId, site, version)).StatusCode);

        // To Monday 2026-12-07 13:00Z (07:00 CST): Monday's 06:00 CST outlook was missed and runs once.
        _factory.Clock.Advance(Duration.FromDays(5) + Duration.FromHours(5));
        await Scheduler.CatchUpNowAsync(CancellationToken.None);
        JsonElement first = Assert.Single(await RunsAsync(admin, siteId, JobKinds.WeeklyOutlook));
        Assert.Equal("2026-12-07T06:00:00-06:00", first.GetProperty("scheduledFor").GetString());
        Assert.True(first.GetProperty("outcome").GetString() == JobKinds.Succeeded, first.GetProperty("message").GetString());
        Assert.DoesNotContain("compared", first.GetProperty("message").GetString(), StringComparison.Ordinal);

        HttpResponseMessage page = await admin.GetAsync($"/api/sites/{siteId}/jobs/weekly-outlook/latest");
        Assert.Equal(HttpStatusCode.OK, page.StatusCode);
        Assert.Equal("text/html", page.Content.Headers.ContentType?.MediaType);
        Assert.Contains("Demo indoor farm room", await page.Content.ReadAsStringAsync(), StringComparison.Ordinal);
        HttpResponseMessage csv = await admin.GetAsync($"/api/sites/{siteId}/jobs/weekly-outlook/latest.csv");
        Assert.Equal("text/csv", csv.Content.Headers.ContentType?.MediaType);
        // One line per bench with a lot after the header: the indoor demo has 12 (3 racks × 4 tiers, Files/Sites/DemoSites.cs).
        Assert.Equal(13, (await csv.Content.ReadAsStringAsync()).Split('\n', StringSplitOptions.RemoveEmptyEntries).Length);

        // A week on: the next outlook compares with the stored one.
        _factory.Clock.Advance(Duration.FromDays(7));
        await Scheduler.CatchUpNowAsync(CancellationToken.None);
        List<JsonElement> runs = await RunsAsync(admin, siteId, JobKinds.WeeklyOutlook);
        Assert.Equal(2, runs.Count);
        Assert.Equal("2026-12-14T06:00:00-06:00", runs[0].GetProperty("scheduledFor").GetString());
        Assert.Contains("compared with the previous one", runs[0].GetProperty("message").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task Every_role_reads_the_schedule_in_the_site_s_zone_and_other_organisations_get_404()
    {
        string other = await _factory.AddOtherOrganisationAsync();
        HttpClient grower = await _factory.SignedInAsync(Demo.Grower);
        string siteId = await SiteEditing.SiteIdAsync(grower, "demo-indoor-farm");
        JsonElement jobs = await grower.GetFromJsonAsync<JsonElement>($"/api/sites/{siteId}/jobs");
        JsonElement nightly = jobs.GetProperty("schedule").EnumerateArray().Single(s => s.GetProperty("kind").GetString() == JobKinds.NightlyForecast);
        Assert.Equal("America/Chicago", nightly.GetProperty("timeZone").GetString());
        // Clock 2026-12-02 08:00Z = 02:00 CST exactly: the next 02:00 CST is the next day's.
        Assert.Equal("2026-12-03T02:00:00-06:00", nightly.GetProperty("nextRun").GetString());

        Assert.Equal(HttpStatusCode.NotFound, (await grower.GetAsync($"/api/sites/{other}/jobs")).StatusCode);
        Assert.Equal(HttpStatusCode.NotFound, (await grower.GetAsync($"/api/sites/{other}/jobs/task-list/latest")).StatusCode);
        Assert.Equal(HttpStatusCode.Unauthorized, (await _factory.CreateClient().GetAsync($"/api/sites/{siteId}/jobs")).StatusCode);
    }

    [Fact]
    public async Task Triggers_follow_site_creates_and_deletes()
    {
        HttpClient admin = await _factory.SignedInAsync(Demo.Admin);
        await Scheduler.CatchUp;
        string glasshouse = await SiteEditing.SiteIdAsync(admin, "demo-glasshouse");
        string indoor = await SiteEditing.SiteIdAsync(admin, "demo-indoor-farm");
        string organisation = (await _factory.Store.Sites.GetAsync((await _factory.Store.Users.FindByEmailAsync(Demo.Admin))!.OrganisationId, indoor))!.OrganisationId;
        IScheduler quartz = await _factory.Services.GetRequiredService<ISchedulerFactory>().GetScheduler();

        async Task<string[]> JobsAsync() =>
            (await quartz.GetJobKeys(GroupMatcher<JobKey>.GroupEquals(organisation))).Select(k => k.Name).Order(StringComparer.Ordinal).ToArray();

        Assert.Contains($"{glasshouse}/{JobKinds.NightlyForecast}", await JobsAsync());
        Assert.Equal(HttpStatusCode.NoContent, (await admin.DeleteAsync($"/api/sites/{glasshouse}")).StatusCode);
        Assert.All(await JobsAsync(), name => Assert.StartsWith(indoor + "/", name, StringComparison.Ordinal));

        string json = CanopyAdvisor.Files.Sites.DemoSites.ReadText("glasshouse");
        HttpResponseMessage created = await admin.PostAsync("/api/sites", SiteEditing.Json(json));
        Assert.Equal(HttpStatusCode.Created, created.StatusCode);
        string again = (await created.Content.ReadFromJsonAsync<JsonElement>()).GetProperty("id").GetString()!;
        Assert.Contains($"{again}/{JobKinds.NightlyForecast}", await JobsAsync());

        // The trigger is the site's cron in the site's zone (Amsterdam).
        var trigger = (ICronTrigger)(await quartz.GetTrigger(new TriggerKey($"{again}/{JobKinds.NightlyForecast}", organisation)))!;
        Assert.Equal("Europe/Amsterdam", trigger.TimeZone.Id);
        Assert.Equal(CronTriggerMisfireInstruction.FireAndProceed, (CronTriggerMisfireInstruction)trigger.MisfireInstruction);
        Assert.Equal("0 0 2 * * ?", trigger.CronExpressionString);

        // A changed schedule section changes the trigger.
        (System.Text.Json.Nodes.JsonObject site, int version) = await SiteEditing.ReadAsync(admin, indoor);
        site["schedule"] = System.Text.Json.Nodes.JsonNode.Parse("""{"nightlyForecastAt": "03:15"}""");
        Assert.Equal(HttpStatusCode.OK, (await SiteEditing.ReplaceAsync(admin, indoor, site, version)).StatusCode);
        var changed = (ICronTrigger)(await quartz.GetTrigger(new TriggerKey($"{indoor}/{JobKinds.NightlyForecast}", organisation)))!;
        Assert.Equal("0 15 3 * * ?", changed.CronExpressionString);
        Assert.Equal("America/Chicago", changed.TimeZone.Id);
    }

    [Fact]
    public async Task A_fired_trigger_runs_the_job_through_quartz_and_records_it()
    {
        (HttpClient admin, string siteId) = await IndoorOnlyAsync();
        string organisation = (await _factory.Store.Users.FindByEmailAsync(Demo.Admin))!.OrganisationId;
        IScheduler quartz = await _factory.Services.GetRequiredService<ISchedulerFactory>().GetScheduler();
        await quartz.TriggerJob(new JobKey($"{siteId}/{JobKinds.NightlyForecast}", organisation));

        // Wait for the run to be recorded (a guard against a hang, not a speed check).
        using var guard = new CancellationTokenSource(TimeSpan.FromMinutes(2));
        List<JsonElement> runs;
        while ((runs = await RunsAsync(admin, siteId, JobKinds.NightlyForecast)).Count == 0)
        {
            await Task.Delay(50, guard.Token);
        }

        JsonElement run = Assert.Single(runs);
        Assert.False(run.GetProperty("caughtUp").GetBoolean());
        // Fired now on the real clock: succeeded while the demo lots grow (to 2026-12-06), afterwards refused as sold.
        Assert.True(
            run.GetProperty("outcome").GetString() == JobKinds.Succeeded
            || run.GetProperty("message").GetString()!.Contains("the lot is sold", StringComparison.Ordinal),
            run.GetRawText());
    }
}
