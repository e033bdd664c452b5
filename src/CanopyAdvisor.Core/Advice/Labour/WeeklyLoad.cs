using NodaTime;

namespace CanopyAdvisor.Core.Advice.Labour;

/// <summary>One crew's rotation labour in one ISO 8601 week (Monday to Sunday), against its capacity that week.</summary>
/// <param name="WeekYear">The ISO week-numbering year (may differ from the calendar year around New Year).</param>
/// <param name="Week">The ISO week number, 1–53.</param>
/// <param name="CrewId">The crew.</param>
/// <param name="Labour">Person-time of the tasks placed in that week.</param>
/// <param name="Capacity">Sum of the crew's daily capacities in that week, within the calendar's span.</param>
/// <param name="Tasks">Number of tasks placed in that week.</param>
public sealed record WeeklyLoad(int WeekYear, int Week, string CrewId, Duration Labour, Duration Capacity, int Tasks);
