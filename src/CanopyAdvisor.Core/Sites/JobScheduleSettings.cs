using NodaTime;

namespace CanopyAdvisor.Core.Sites;

/// <summary>When the service runs a site's scheduled work, in the site's local time: the nightly forecast and the weekly
/// outlook. (The day's rotation task list runs at the earliest crew start; see the site's labour settings.)</summary>
/// <remarks>Local times repeat every day, so one that falls in a daylight-saving gap or overlap on some day is allowed;
/// the service documents what it does then (at the end of a gap; at the first of two occurrences). Immutable.</remarks>
/// <param name="NightlyForecastAt">Local time of the nightly forecast.</param>
/// <param name="OutlookDay">Day of the week of the outlook.</param>
/// <param name="OutlookAt">Local time of the outlook.</param>
public sealed record JobScheduleSettings(LocalTime NightlyForecastAt, IsoDayOfWeek OutlookDay, LocalTime OutlookAt)
{
    /// <summary>The nightly forecast at 02:00 (after midnight, before a crew starts; common practice for nightly batch
    /// work) and the outlook on Monday (the first day of the ISO 8601 week) at 06:00.</summary>
    public static JobScheduleSettings Default { get; } = new(new LocalTime(2, 0), IsoDayOfWeek.Monday, new LocalTime(6, 0));
}
