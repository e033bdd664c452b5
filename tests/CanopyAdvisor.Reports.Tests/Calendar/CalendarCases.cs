using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Files.Sites;
using NodaTime;

namespace CanopyAdvisor.Reports.Tests.Calendar;

/// <summary>The demo glasshouse (invented demo data) with one 180° rotation per lot, scheduled with its own crews.</summary>
internal static class CalendarCases
{
    public static Site Glasshouse() => DemoSites.Load("glasshouse", StandardBeamFactory.Instance);

    /// <summary>One task per lot, all in the window Monday 2026-12-07 00:00 to Wednesday 2026-12-09 23:59 local time.</summary>
    public static RotationTask[] Tasks(Site site, LocalDateTime from, LocalDateTime to) =>
    [
        .. site.Lots.Select(l => RotationTask.Create(
            RotationTask.IdFor(l.Id, 1), site.Id, l.BenchId, l.Id, Angle.FromDegrees(180),
            site.Zone.AtLeniently(from).ToInstant(), site.Zone.AtLeniently(to).ToInstant(), l.Pots, site.Labour)),
    ];

    public static RotationTask[] DecemberTasks(Site site) => Tasks(site, new LocalDateTime(2026, 12, 7, 0, 0), new LocalDateTime(2026, 12, 9, 23, 59));

    public static LabourSchedule December(Site site) => LabourScheduler.Schedule(site, DecemberTasks(site));

    /// <summary>Undoes RFC 5545 §3.1 folding: a CRLF followed by one space or tab is removed.</summary>
    public static string Unfold(string text) => text.Replace("\r\n ", string.Empty, StringComparison.Ordinal).Replace("\r\n\t", string.Empty, StringComparison.Ordinal);
}
