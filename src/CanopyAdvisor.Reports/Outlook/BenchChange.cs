using System.Collections.Immutable;

namespace CanopyAdvisor.Reports.Outlook;

/// <summary>How one bench moved against the previous outlook.</summary>
/// <param name="BenchId">The bench.</param>
/// <param name="IsNew">True when the previous outlook had no forecast for this bench's lot (a new lot or a new bench);
/// the other fields are then null or empty.</param>
/// <param name="PreviousRank">The bench's rank in the previous outlook, or null when new.</param>
/// <param name="RankChange">Previous rank minus this rank: positive when the bench moved up toward the top (more risk),
/// or null when new.</param>
/// <param name="LeanAtWeekEndChangeDeg">This outlook's lean at week end minus the previous outlook's, degrees, or null when new.</param>
/// <param name="NewFlags">Flag causes raised now that the previous outlook did not have (e.g. <c>lowDli</c>).</param>
/// <param name="ClearedFlags">Flag causes of the previous outlook that are gone now.</param>
public sealed record BenchChange(
    string BenchId,
    bool IsNew,
    int? PreviousRank,
    int? RankChange,
    double? LeanAtWeekEndChangeDeg,
    ImmutableArray<string> NewFlags,
    ImmutableArray<string> ClearedFlags);
