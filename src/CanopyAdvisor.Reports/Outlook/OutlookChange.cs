using System.Collections.Immutable;
using NodaTime;

namespace CanopyAdvisor.Reports.Outlook;

/// <summary>The change of an outlook against an earlier one of the same site.</summary>
/// <param name="PreviousNow">The start of the earlier outlook's week.</param>
/// <param name="PreviousWeekLabel">The earlier outlook's week, e.g. <c>2026-W48</c>.</param>
/// <param name="Benches">One change per bench of this outlook, in this outlook's rank order.</param>
/// <param name="Gone">Benches of the earlier outlook with no forecast now (lot sold or moved), in their old rank order.</param>
public sealed record OutlookChange(
    Instant PreviousNow,
    string PreviousWeekLabel,
    ImmutableArray<BenchChange> Benches,
    ImmutableArray<SnapshotBench> Gone);
