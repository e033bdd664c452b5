using System.Collections.Immutable;
using NodaTime;

namespace CanopyAdvisor.Reports.Outlook;

/// <summary>The key numbers of one ranked bench kept in <c>outlook.json</c> for next week's comparison.</summary>
/// <param name="Rank">Rank, 1 = most at risk.</param>
/// <param name="BenchId">The bench.</param>
/// <param name="LotId">The lot on it (a different lot next week counts as new).</param>
/// <param name="CropId">The lot's crop.</param>
/// <param name="Risk">The risk class.</param>
/// <param name="LeanNowDeg">Bench lean now, degrees.</param>
/// <param name="LeanAtWeekEndDeg">Bench lean at the week end, degrees.</param>
/// <param name="LeanAzimuthDeg">Compass bearing of the lean at the week end, degrees clockwise from north.</param>
/// <param name="GradeLimitDeg">The crop's lean grade limit, degrees.</param>
/// <param name="LeanRateDegPerDay">Lean rate, degrees per day.</param>
/// <param name="LeavesGradeAt">When the bench leaves grade within that week, or null.</param>
/// <param name="Flags">The causes of its flags (e.g. <c>lowDli</c>, <c>heightOverGrade</c>, <c>leanOverGrade</c>).</param>
public sealed record SnapshotBench(
    int Rank,
    string BenchId,
    string LotId,
    string CropId,
    OutlookRisk Risk,
    double LeanNowDeg,
    double LeanAtWeekEndDeg,
    double LeanAzimuthDeg,
    double GradeLimitDeg,
    double LeanRateDegPerDay,
    Instant? LeavesGradeAt,
    ImmutableArray<string> Flags);
