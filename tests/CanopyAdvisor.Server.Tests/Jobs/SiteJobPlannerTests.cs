using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Files.Sites;
using CanopyAdvisor.Server.Forecasting;
using CanopyAdvisor.Server.Jobs;
using NodaTime;
using NodaTime.Text;

namespace CanopyAdvisor.Server.Tests.Jobs;

/// <summary>Job fire times in the site's zone on ordinary and daylight-saving days, computed by Quartz's own cron
/// rule. Transition dates: EU summer time starts and ends at 01:00 UTC on the last Sunday of March and of October
/// (Directive 2000/84/EC, art. 2–3): 2026-03-29 and 2026-10-25; US daylight time starts the second Sunday of March at
/// 02:00 local (Energy Policy Act of 2005, §110): 2026-03-08. Zone rules from the IANA tz database.</summary>
public sealed class SiteJobPlannerTests
{
    private static readonly OffsetDateTimePattern Local = OffsetDateTimePattern.GeneralIso;

    private static SiteJobPlan Daily(string zone, int hour, int minute) =>
        new(JobKinds.NightlyForecast, $"0 {minute} {hour} * * ?", TimeZoneInfo.FindSystemTimeZoneById(zone));

    [Theory]
    // An ordinary winter and summer night in Amsterdam: 02:00 local is 01:00 UTC (CET, +01) and 00:00 UTC (CEST, +02).
    [InlineData("Europe/Amsterdam", 2, 0, "2026-12-02T12:00:00Z", "2026-12-03T02:00:00+01")]
    [InlineData("Europe/Amsterdam", 2, 0, "2026-07-01T12:00:00Z", "2026-07-02T02:00:00+02")]
    // Spring forward (EU 2026-03-29: 02:00 CET becomes 03:00 CEST): 02:30 does not exist; it fires at the end of the
    // gap, 03:00 CEST (01:00 UTC), the first local time that exists after it.
    [InlineData("Europe/Amsterdam", 2, 30, "2026-03-28T12:00:00Z", "2026-03-29T03:00:00+02")]
    // The night after spring forward is ordinary again: 02:30 CEST.
    [InlineData("Europe/Amsterdam", 2, 30, "2026-03-29T12:00:00Z", "2026-03-30T02:30:00+02")]
    // Fall back (EU 2026-10-25: 03:00 CEST becomes 02:00 CET): 02:30 happens twice; Quartz fires at the first (CEST).
    [InlineData("Europe/Amsterdam", 2, 30, "2026-10-24T12:00:00Z", "2026-10-25T02:30:00+02")]
    // US spring forward (2026-03-08 in Chicago: 02:00 CST becomes 03:00 CDT): 02:30 fires at the end of the gap, 03:00 CDT.
    [InlineData("America/Chicago", 2, 30, "2026-03-07T18:00:00Z", "2026-03-08T03:00:00-05")]
    // US fall back (2026-11-01: 02:00 CDT becomes 01:00 CST): 02:30 happens once, in CST.
    [InlineData("America/Chicago", 2, 30, "2026-10-31T18:00:00Z", "2026-11-01T02:30:00-06")]
    public void A_daily_job_fires_at_the_documented_local_time(string zone, int hour, int minute, string after, string expected)
    {
        Instant next = SiteJobPlanner.NextFireAfter(Daily(zone, hour, minute), InstantPattern.ExtendedIso.Parse(after).Value)!.Value;
        DateTimeZone tz = DateTimeZoneProviders.Tzdb[zone];
        Assert.Equal(expected, Local.Format(next.InZone(tz).ToOffsetDateTime()));
    }

    [Fact]
    public void On_the_fall_back_day_02_30_fires_once_not_at_both_occurrences()
    {
        // 2026-10-25 in Amsterdam: 02:30 CEST is 00:30 UTC, 02:30 CET is 01:30 UTC (Directive 2000/84/EC dates).
        SiteJobPlan plan = Daily("Europe/Amsterdam", 2, 30);
        Instant first = SiteJobPlanner.NextFireAfter(plan, Instant.FromUtc(2026, 10, 24, 12, 0))!.Value;
        Instant second = SiteJobPlanner.NextFireAfter(plan, first)!.Value;
        Assert.Equal(Instant.FromUtc(2026, 10, 25, 0, 30), first);
        Assert.Equal(Instant.FromUtc(2026, 10, 26, 1, 30), second); // the next day, 02:30 CET; not 2026-10-25 01:30 UTC
    }

    [Fact]
    public void On_the_spring_forward_day_02_30_fires_exactly_once()
    {
        SiteJobPlan plan = Daily("Europe/Amsterdam", 2, 30);
        Instant from = Instant.FromUtc(2026, 3, 28, 12, 0);
        Instant to = Instant.FromUtc(2026, 3, 30, 12, 0);
        var fires = new List<Instant>();
        for (Instant? t = SiteJobPlanner.NextFireAfter(plan, from); t is Instant f && f <= to; t = SiteJobPlanner.NextFireAfter(plan, f))
        {
            fires.Add(f);
        }

        // 2026-03-29 03:00 CEST (01:00 UTC, the end of the gap) and 2026-03-30 02:30 CEST (00:30 UTC): one fire per local day.
        Assert.Equal([Instant.FromUtc(2026, 3, 29, 1, 0), Instant.FromUtc(2026, 3, 30, 0, 30)], fires);
    }

    [Fact]
    public void The_demo_glasshouse_gets_the_three_jobs_in_its_own_zone()
    {
        Site site = new SiteFileReader(ServerBeamFactory.Instance).Parse(DemoSites.ReadText(DemoSites.Names[0]), "demo", baseDirectory: null);
        IReadOnlyList<SiteJobPlan> plans = SiteJobPlanner.For(site);
        Assert.Equal([JobKinds.NightlyForecast, JobKinds.WeeklyOutlook, JobKinds.TaskList], plans.Select(p => p.Kind));
        Assert.All(plans, p => Assert.Equal(site.Zone.Id, p.Zone.Id));

        // The weekly outlook: Monday 06:00 local; from Wednesday 2026-12-02 the next is Monday 2026-12-07.
        Instant outlook = SiteJobPlanner.NextFireAfter(plans[1], Instant.FromUtc(2026, 12, 2, 12, 0))!.Value;
        LocalDateTime local = outlook.InZone(site.Zone).LocalDateTime;
        Assert.Equal(new LocalDateTime(2026, 12, 7, 6, 0), local);

        // The task list: at the earliest crew start on a working day.
        LocalTime start = site.Labour.Crews.Min(c => c.Start);
        Instant tasks = SiteJobPlanner.NextFireAfter(plans[2], Instant.FromUtc(2026, 12, 2, 12, 0))!.Value;
        Assert.Equal(start, tasks.InZone(site.Zone).TimeOfDay);
        Assert.Contains(tasks.InZone(site.Zone).DayOfWeek, site.Labour.Crews.SelectMany(c => c.WorkingDays));
    }

    [Fact]
    public void The_site_s_schedule_section_sets_the_nightly_and_outlook_times()
    {
        var json = System.Text.Json.Nodes.JsonNode.Parse(DemoSites.ReadText(DemoSites.Names[0]))!.AsObject();
        json["schedule"] = System.Text.Json.Nodes.JsonNode.Parse("""{"nightlyForecastAt": "03:15", "outlookDay": "fri", "outlookAt": "17:30"}""");
        Site site = new SiteFileReader(ServerBeamFactory.Instance).Parse(json.ToJsonString(), "demo", baseDirectory: null);
        IReadOnlyList<SiteJobPlan> plans = SiteJobPlanner.For(site);
        Assert.Equal("0 15 3 * * ?", plans[0].Cron);
        Assert.Equal("0 30 17 ? * FRI", plans[1].Cron);

        // From Wednesday 2026-12-02 12:00Z the next outlook is Friday 2026-12-04 17:30 local.
        Instant outlook = SiteJobPlanner.NextFireAfter(plans[1], Instant.FromUtc(2026, 12, 2, 12, 0))!.Value;
        Assert.Equal(new LocalDateTime(2026, 12, 4, 17, 30), outlook.InZone(site.Zone).LocalDateTime);
    }

    [Fact]
    public void The_last_fire_between_two_instants_is_the_latest_one_not_after_now()
    {
        SiteJobPlan plan = Daily("Europe/Amsterdam", 2, 0);
        // Down from 2026-12-01 12:00 UTC to 2026-12-04 00:30 UTC: the 02:00 CET fires of 2, 3 Dec were missed; the last is 3 Dec 01:00 UTC.
        Assert.Equal(Instant.FromUtc(2026, 12, 3, 1, 0), SiteJobPlanner.LastFireBetween(plan, Instant.FromUtc(2026, 12, 1, 12, 0), Instant.FromUtc(2026, 12, 4, 0, 30)));
        // Nothing falls between 01:00 and 02:00 UTC of the same day after the fire.
        Assert.Null(SiteJobPlanner.LastFireBetween(plan, Instant.FromUtc(2026, 12, 3, 1, 0), Instant.FromUtc(2026, 12, 3, 2, 0)));
    }
}
