namespace CanopyAdvisor.Server.Jobs;

/// <summary>One scheduled job of a site: its kind, its Quartz cron expression and the site's time zone the expression
/// is read in.</summary>
/// <param name="Kind">One of <see cref="JobKinds"/>.</param>
/// <param name="Cron">A Quartz cron expression (seconds minutes hours day-of-month month day-of-week), in local time.</param>
/// <param name="Zone">The site's time zone (from its IANA id), set on the trigger.</param>
internal sealed record SiteJobPlan(string Kind, string Cron, TimeZoneInfo Zone);
