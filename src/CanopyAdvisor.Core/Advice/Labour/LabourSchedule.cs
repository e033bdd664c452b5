using System.Collections.Immutable;
using NodaTime;

namespace CanopyAdvisor.Core.Advice.Labour;

/// <summary>The labour-levelled rotation calendar: tasks placed, tasks that did not fit, and hours per day and per week.</summary>
/// <param name="Zone">The site's time zone, in which dates and working hours are local.</param>
/// <param name="Scheduled">Placed tasks, by start time, then crew order, then task id.</param>
/// <param name="Unscheduled">Tasks that could not be placed, in the order given.</param>
/// <param name="Days">
/// Per crew and working day from the first window's date to the last window's date (holidays and days off left out),
/// by date then crew order; zero-labour days included.
/// </param>
/// <param name="Weeks">Per crew and ISO week over the same span, by week then crew order.</param>
public sealed record LabourSchedule(
    DateTimeZone Zone,
    ImmutableArray<ScheduledTask> Scheduled,
    ImmutableArray<UnscheduledTask> Unscheduled,
    ImmutableArray<DailyLoad> Days,
    ImmutableArray<WeeklyLoad> Weeks)
{
    /// <summary>All crews' labour on a local date.</summary>
    public Duration LabourOn(LocalDate date) =>
        Days.Where(d => d.Date == date).Aggregate(Duration.Zero, (sum, d) => sum + d.Labour);

    /// <summary>The most labour on any one date, all crews together: the peak that levelling lowers.</summary>
    public Duration PeakDailyLabour =>
        Days.GroupBy(d => d.Date).Select(g => g.Aggregate(Duration.Zero, (sum, d) => sum + d.Labour)).DefaultIfEmpty(Duration.Zero).Max();

    /// <summary>All placed labour.</summary>
    public Duration TotalLabour => Scheduled.Aggregate(Duration.Zero, (sum, s) => sum + s.Task.Labour);
}
