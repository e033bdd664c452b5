using NodaTime;

namespace CanopyAdvisor.Core.Advice.Labour;

/// <summary>A rotation task placed in the calendar: which crew does it, on which local day, from when to when.</summary>
/// <param name="Task">The task.</param>
/// <param name="CrewId">The crew that does it.</param>
/// <param name="Start">When the crew starts it, in the site's time zone (local date, local time, offset and instant).</param>
/// <param name="End">When the crew finishes it, in the site's time zone.</param>
public sealed record ScheduledTask(RotationTask Task, string CrewId, ZonedDateTime Start, ZonedDateTime End)
{
    /// <summary>The local date of the crew's working day the task is on.</summary>
    public LocalDate Date => Start.Date;

    /// <summary>The clock time the crew spends on the task (labour divided among the crew's people, rounded up to a minute).</summary>
    public Duration CrewTime => End.ToInstant() - Start.ToInstant();
}
