using NodaTime;

namespace CanopyAdvisor.Core.Advice.Labour;

/// <summary>Extra labour on one day that would make room for a task that could not be placed.</summary>
/// <remarks>
/// An estimate: the person-time to add to a crew's day (overtime, or another person) so that its longest free stretch
/// within the task's window becomes long enough, assuming the day's other tasks keep their places. With
/// <see cref="CrewId"/> null no crew works that day: the figure is a whole extra shift for the task.
/// </remarks>
/// <param name="Date">The local date.</param>
/// <param name="CrewId">The crew whose day would be lengthened; null for an extra shift on a day nobody works.</param>
/// <param name="Labour">The extra person-time.</param>
public sealed record ExtraLabour(LocalDate Date, string? CrewId, Duration Labour);
