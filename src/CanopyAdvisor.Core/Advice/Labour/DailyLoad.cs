using NodaTime;

namespace CanopyAdvisor.Core.Advice.Labour;

/// <summary>One crew's rotation labour on one working day, against what the crew can do that day.</summary>
/// <param name="Date">The local date.</param>
/// <param name="CrewId">The crew.</param>
/// <param name="Labour">Person-time of the tasks placed on that day.</param>
/// <param name="Capacity">People × the real length of the crew's working day (shorter or longer on a daylight-saving change).</param>
/// <param name="Tasks">Number of tasks placed on that day.</param>
/// <param name="ClockChange">
/// Whether a daylight-saving change touches the crew's hours that day: the day is shorter or longer than usual, or its
/// start or end fell in a gap (moved forward by the gap) or an overlap (the earlier instant taken), MODEL.md §0.
/// </param>
public sealed record DailyLoad(LocalDate Date, string CrewId, Duration Labour, Duration Capacity, int Tasks, bool ClockChange);
