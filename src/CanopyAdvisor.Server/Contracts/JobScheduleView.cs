using NodaTime;

namespace CanopyAdvisor.Server.Contracts;

/// <summary>One scheduled job of a site.</summary>
/// <param name="Kind">The job.</param>
/// <param name="Cron">Its Quartz cron expression (seconds minutes hours day-of-month month day-of-week), local time.</param>
/// <param name="TimeZone">The IANA zone the expression is read in (the site's).</param>
/// <param name="NextRun">The next fire time after now, in the site's zone.</param>
public sealed record JobScheduleView(string Kind, string Cron, string TimeZone, OffsetDateTime? NextRun);
