using System.Collections.Immutable;

namespace CanopyAdvisor.Core.Advice.Labour;

/// <summary>A rotation task that could not be placed, why, and the cheapest extra labour that would fit it.</summary>
/// <param name="Task">The task.</param>
/// <param name="Reason">Why it could not be placed.</param>
/// <param name="Options">
/// Up to <see cref="LabourScheduler.MaxExtraLabourOptions"/> days with the extra labour that would fit the task, least
/// extra first (then earliest date, then crew order).
/// </param>
public sealed record UnscheduledTask(RotationTask Task, UnscheduledReason Reason, ImmutableArray<ExtraLabour> Options);
