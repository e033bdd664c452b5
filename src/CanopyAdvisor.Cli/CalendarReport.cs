using System.Globalization;
using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Sites;
using NodaTime;

namespace CanopyAdvisor.Cli;

/// <summary>The rotation calendar in <c>canopy plan</c>: each task on its crew and day, what did not fit and what would
/// fit it, and the labour per day and per ISO week. Times in the site's local time with offset; labour in hours.</summary>
internal sealed record CalendarReport(
    IReadOnlyList<CalendarTaskReport> Scheduled,
    IReadOnlyList<UnscheduledTaskReport> Unscheduled,
    IReadOnlyList<LabourDayReport> Days,
    IReadOnlyList<LabourWeekReport> Weeks,
    double TotalHours,
    double PeakDayHours)
{
    public static CalendarReport From(Site site, LabourSchedule schedule)
    {
        string Local(Instant t) => ForecastInputs.FormatLocal(t, site.Zone);
        string CrewName(string? id) => site.Labour.Crews.FirstOrDefault(c => c.Id == id)?.Name ?? id ?? "any crew";
        return new CalendarReport(
            [.. schedule.Scheduled.Select(s => new CalendarTaskReport(
                s.Task.Id, Iso(s.Date), Local(s.Start.ToInstant()), Local(s.End.ToInstant()), s.CrewId, CrewName(s.CrewId),
                s.Task.BenchId, s.Task.LotId, s.Task.Pots, Math.Round(s.Task.Angle.Degrees), Hours(s.Task.Labour),
                Local(s.Task.Earliest), Local(s.Task.Latest)))],
            [.. schedule.Unscheduled.Select(u => new UnscheduledTaskReport(
                u.Task.Id, u.Task.BenchId, u.Task.LotId, u.Task.Pots, Hours(u.Task.Labour), Local(u.Task.Earliest), Local(u.Task.Latest),
                ReasonName(u.Reason),
                [.. u.Options.Select(o => new ExtraLabourReport(Iso(o.Date), o.CrewId, CrewName(o.CrewId), Hours(o.Labour)))]))],
            [.. schedule.Days.Select(d => new LabourDayReport(Iso(d.Date), d.CrewId, CrewName(d.CrewId), Hours(d.Labour), Hours(d.Capacity), d.Tasks, d.ClockChange))],
            [.. schedule.Weeks.Select(w => new LabourWeekReport(
                string.Create(CultureInfo.InvariantCulture, $"{w.WeekYear}-W{w.Week:00}"), w.CrewId, CrewName(w.CrewId), Hours(w.Labour), Hours(w.Capacity), w.Tasks))],
            Hours(schedule.TotalLabour),
            Hours(schedule.PeakDailyLabour));
    }

    public static string ReasonName(UnscheduledReason reason) => reason switch
    {
        UnscheduledReason.NoWorkingTimeInWindow => "noWorkingTimeInWindow",
        UnscheduledReason.LongerThanWorkingTimeInWindow => "longerThanWorkingTimeInWindow",
        _ => "crewsFullyBooked",
    };

    private static double Hours(Duration d) => Math.Round(d.TotalHours, 2);

    private static string Iso(LocalDate date) => date.ToString("uuuu-MM-dd", CultureInfo.InvariantCulture);
}

/// <summary>One scheduled rotation task.</summary>
internal sealed record CalendarTaskReport(
    string TaskId, string Date, string Start, string End, string CrewId, string Crew, string BenchId, string LotId, int Pots,
    double AngleDeg, double LabourHours, string WindowStart, string WindowEnd);

/// <summary>A task that did not fit, why, and the extra labour that would fit it.</summary>
internal sealed record UnscheduledTaskReport(
    string TaskId, string BenchId, string LotId, int Pots, double LabourHours, string WindowStart, string WindowEnd, string Reason,
    IReadOnlyList<ExtraLabourReport> ExtraLabour);

/// <summary>Extra labour on one day (and crew) that would fit an unscheduled task.</summary>
internal sealed record ExtraLabourReport(string Date, string? CrewId, string Crew, double Hours);

/// <summary>A crew's rotation labour on one day against its capacity.</summary>
internal sealed record LabourDayReport(string Date, string CrewId, string Crew, double Hours, double CapacityHours, int Tasks, bool ClockChange);

/// <summary>A crew's rotation labour in one ISO week against its capacity.</summary>
internal sealed record LabourWeekReport(string Week, string CrewId, string Crew, double Hours, double CapacityHours, int Tasks);
