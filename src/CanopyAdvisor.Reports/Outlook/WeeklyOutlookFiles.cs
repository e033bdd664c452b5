using CanopyAdvisor.Core.Advice.Labour;

namespace CanopyAdvisor.Reports.Outlook;

/// <summary>A week's outlook and its files, as <see cref="WeeklyOutlook.Build"/> makes them.</summary>
/// <param name="Report">The outlook.</param>
/// <param name="Schedule">The rotation plan's turns scheduled on the site's crews.</param>
/// <param name="Page">The printable page (HTML).</param>
/// <param name="Csv">The benches as CSV.</param>
/// <param name="Snapshot">The gist (JSON) to compare next week's outlook with.</param>
/// <param name="Calendar">The scheduled turns as iCalendar (RFC 5545).</param>
public sealed record WeeklyOutlookFiles(OutlookReport Report, LabourSchedule Schedule, string Page, string Csv, string Snapshot, string Calendar);
