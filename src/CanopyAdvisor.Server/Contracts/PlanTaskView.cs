using NodaTime;

namespace CanopyAdvisor.Server.Contracts;

/// <summary>A rotation task placed on a crew.</summary>
/// <param name="TaskId">The task id (a lot's n-th turn ever, <c>lot/r3</c>; stable while turns done are recorded).</param>
/// <param name="Uid">Its iCalendar UID (RFC 5545 §3.8.4.7), the same in every export.</param>
/// <param name="CrewId">The crew.</param>
/// <param name="Start">Start, local.</param>
/// <param name="End">End, local.</param>
/// <param name="BenchId">The bench.</param>
/// <param name="LotId">The lot.</param>
/// <param name="Pots">Pots to turn.</param>
/// <param name="AngleDeg">The turn, degrees clockwise seen from above.</param>
/// <param name="LabourHours">Labour, hours.</param>
/// <param name="WindowStart">Earliest time the turn keeps the plan.</param>
/// <param name="WindowEnd">Latest time the turn keeps the plan.</param>
public sealed record PlanTaskView(
    string TaskId,
    string Uid,
    string CrewId,
    OffsetDateTime Start,
    OffsetDateTime End,
    string BenchId,
    string LotId,
    int Pots,
    double AngleDeg,
    double LabourHours,
    OffsetDateTime WindowStart,
    OffsetDateTime WindowEnd);
