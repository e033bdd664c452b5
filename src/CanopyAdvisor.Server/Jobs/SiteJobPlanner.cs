using System.Globalization;
using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Sites;
using NodaTime;
using Quartz;

namespace CanopyAdvisor.Server.Jobs;

/// <summary>A site's scheduled jobs and their fire times, in the site's own time zone.</summary>
/// <remarks>
/// <para>Every job is a Quartz cron expression read in the site's IANA zone (the trigger's time zone), so "02:00" is
/// 02:00 on the site's clock in winter and summer alike. The fire times are Quartz's own
/// (the cron trigger's own <c>GetFireTimeAfter</c>, on the trigger <see cref="Trigger"/> builds), so what the schedule shows, what
/// the catch-up on start checks and what Quartz fires are one rule.</para>
/// <para>Daylight-saving days (what Quartz does, checked in the tests): a local time that does not exist on a
/// spring-forward day (02:30 when the clocks go from 02:00 to 03:00) fires once, at the end of the gap (03:00 local,
/// the first local time that exists after it), so the night's job is not skipped; a local time that happens twice on a fall-back day (02:30 when the clocks go from 03:00 back
/// to 02:00) fires once, at its first occurrence (still summer time).</para>
/// <para>Jobs and times: the nightly forecast every day and the weekly outlook on its day, at the site's
/// <see cref="Site.Schedule"/> times (default 02:00, and Monday 06:00), and the rotation task list at the earliest crew
/// start on the days any crew works.</para>
/// </remarks>
internal static class SiteJobPlanner
{
    private static readonly Duration LookBack = Duration.FromDays(400);

    /// <summary>The site's jobs.</summary>
    public static IReadOnlyList<SiteJobPlan> For(Site site)
    {
        ArgumentNullException.ThrowIfNull(site);
        TimeZoneInfo zone = ZoneOf(site.Zone);
        var plans = new List<SiteJobPlan>
        {
            new(JobKinds.NightlyForecast, Daily(site.Schedule.NightlyForecastAt), zone),
            new(JobKinds.WeeklyOutlook, Weekly(site.Schedule.OutlookAt, [site.Schedule.OutlookDay]), zone),
        };
        if (!site.Labour.Crews.IsDefaultOrEmpty)
        {
            LocalTime start = site.Labour.Crews.Min(c => c.Start);
            IsoDayOfWeek[] days = site.Labour.Crews.SelectMany(c => c.WorkingDays.IsDefault ? [] : c.WorkingDays.AsEnumerable()).Distinct().Order().ToArray();
            if (days.Length > 0)
            {
                plans.Add(new SiteJobPlan(JobKinds.TaskList, Weekly(start, days), zone));
            }
        }

        return plans;
    }

    /// <summary>The system time zone with this IANA id (Linux and .NET on ICU read IANA ids directly).</summary>
    public static TimeZoneInfo ZoneOf(DateTimeZone zone)
    {
        ArgumentNullException.ThrowIfNull(zone);
        return zone.Id == "UTC" ? TimeZoneInfo.Utc : TimeZoneInfo.FindSystemTimeZoneById(zone.Id);
    }

    /// <summary>The Quartz cron trigger of a plan: the cron expression in the site's zone, starting at
    /// <paramref name="startAt"/>. Misfires (a fire Quartz could not start on time, e.g. all its threads were busy) fire
    /// once as soon as possible and then keep to the schedule: the same "once" rule as the catch-up on start.</summary>
    public static ITrigger Trigger(SiteJobPlan plan, TriggerKey key, DateTimeOffset startAt)
    {
        ArgumentNullException.ThrowIfNull(plan);
        return TriggerBuilder.Create()
            .WithIdentity(key)
            .StartAt(startAt)
            .WithCronSchedule(plan.Cron, cron => cron.InTimeZone(plan.Zone).WithMisfireInstruction(CronTriggerMisfireInstruction.FireAndProceed))
            .Build();
    }

    /// <summary>The first fire time strictly after <paramref name="after"/>, or null when there is none.</summary>
    public static Instant? NextFireAfter(SiteJobPlan plan, Instant after)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ITrigger trigger = Trigger(plan, new TriggerKey("fire-times"), DateTimeOffset.UnixEpoch);
        return trigger.GetFireTimeAfter(after.ToDateTimeOffset()) is DateTimeOffset next ? Instant.FromDateTimeOffset(next) : null;
    }

    /// <summary>The last fire time in (<paramref name="after"/>, <paramref name="now"/>], or null when none falls there.</summary>
    public static Instant? LastFireBetween(SiteJobPlan plan, Instant after, Instant now)
    {
        // A store that has not run for more than a year catches up on the last fire time only; no need to walk further.
        Instant? last = null;
        Instant from = after < now - LookBack ? now - LookBack : after;
        while (NextFireAfter(plan, from) is Instant next && next <= now)
        {
            last = next;
            from = next;
        }

        return last;
    }

    private static string Daily(LocalTime at) =>
        string.Create(CultureInfo.InvariantCulture, $"0 {at.Minute} {at.Hour} * * ?");

    private static string Weekly(LocalTime at, IReadOnlyList<IsoDayOfWeek> days) =>
        string.Create(CultureInfo.InvariantCulture, $"0 {at.Minute} {at.Hour} ? * {string.Join(',', days.Select(DayName))}");

    private static string DayName(IsoDayOfWeek day) => day switch
    {
        IsoDayOfWeek.Monday => "MON",
        IsoDayOfWeek.Tuesday => "TUE",
        IsoDayOfWeek.Wednesday => "WED",
        IsoDayOfWeek.Thursday => "THU",
        IsoDayOfWeek.Friday => "FRI",
        IsoDayOfWeek.Saturday => "SAT",
        IsoDayOfWeek.Sunday => "SUN",
        _ => throw new ArgumentOutOfRangeException(nameof(day), day, "not a day of the week"),
    };
}
