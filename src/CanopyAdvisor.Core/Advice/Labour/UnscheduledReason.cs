namespace CanopyAdvisor.Core.Advice.Labour;

/// <summary>Why a rotation task could not be placed in the calendar.</summary>
public enum UnscheduledReason
{
    /// <summary>No crew works at any time within the task's window (weekends, holidays, outside working hours).</summary>
    NoWorkingTimeInWindow,

    /// <summary>
    /// Crews work within the window, but no stretch of one crew's working day inside the window is as long as the task
    /// takes that crew; tasks are not split, so the task needs longer working hours (or more people) on some day.
    /// </summary>
    LongerThanWorkingTimeInWindow,

    /// <summary>The task would fit a crew's working day in its window, but the other tasks leave no free stretch long enough.</summary>
    CrewsFullyBooked,
}
