using NodaTime;

namespace CanopyAdvisor.Server.Contracts;

/// <summary>A rotation task that did not fit on the crews.</summary>
/// <param name="TaskId">The task id.</param>
/// <param name="BenchId">The bench.</param>
/// <param name="LotId">The lot.</param>
/// <param name="Pots">Pots to turn.</param>
/// <param name="LabourHours">Labour, hours.</param>
/// <param name="WindowStart">Earliest time.</param>
/// <param name="WindowEnd">Latest time.</param>
/// <param name="Reason"><c>noWorkingTimeInWindow</c>, <c>longerThanWorkingTimeInWindow</c> or <c>crewsFullyBooked</c>.</param>
public sealed record UnscheduledTaskView(
    string TaskId,
    string BenchId,
    string LotId,
    int Pots,
    double LabourHours,
    OffsetDateTime WindowStart,
    OffsetDateTime WindowEnd,
    string Reason);
