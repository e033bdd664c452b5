using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using NodaTime;

namespace CanopyAdvisor.Core.Advice.Rotation;

/// <summary>The rotation advice for one bench's lot (<see cref="RotationPolicyPlanner"/>).</summary>
/// <param name="LotId">The lot.</param>
/// <param name="BenchId">Its bench.</param>
/// <param name="CropId">Its crop.</param>
/// <param name="Pots">Its pots (the labour of each turn).</param>
/// <param name="SaleAt">The start of the sale date in the site's zone.</param>
/// <param name="CheckedUntil">The lean was checked from now to here: the sale, or the forecast end if that is earlier.</param>
/// <param name="Verdict">What the search concluded.</param>
/// <param name="Policy">The chosen policy: none, the least labour that holds, or, when nothing holds, the one with the
/// lowest peak.</param>
/// <param name="GradeLimit">The crop's lean grade limit.</param>
/// <param name="TargetLean">The lean the plan must stay within: (1 − margin) × the grade limit.</param>
/// <param name="LeanNow">The bench lean now (no plan can lower the peak below it).</param>
/// <param name="PeakLeanWithoutPlan">The largest bench lean to <paramref name="CheckedUntil"/> if no more turns are made.</param>
/// <param name="PeakLeanWithPlan">The largest bench lean to <paramref name="CheckedUntil"/> with the chosen policy on time
/// (equal to <paramref name="PeakLeanWithoutPlan"/> for no rotation).</param>
/// <param name="PeakLeanWhenLate">The largest bench lean with the turns timed badly inside their windows (every turn at the
/// latest end, or alternately at the earliest and the latest end; see <see cref="RotationCandidate.LatePeakLean"/>);
/// null for no rotation.</param>
/// <param name="Rotations">The planned turns to the sale, in time order, each with its window.</param>
/// <param name="Candidates">The policies simulated, in the order tried (no rotation first).</param>
/// <param name="Remedy">What to do besides turning when rotation alone cannot hold the grade; null otherwise.</param>
public sealed record BenchRotationAdvice(
    string LotId,
    string BenchId,
    string CropId,
    int Pots,
    Instant SaleAt,
    Instant CheckedUntil,
    RotationVerdict Verdict,
    RotationPolicy Policy,
    Angle GradeLimit,
    Angle TargetLean,
    Angle LeanNow,
    Angle PeakLeanWithoutPlan,
    Angle PeakLeanWithPlan,
    Angle? PeakLeanWhenLate,
    ImmutableArray<PlannedRotation> Rotations,
    ImmutableArray<RotationCandidate> Candidates,
    string? Remedy)
{
    /// <summary>How many turns the plan takes to the sale.</summary>
    public int RotationsToSale => Rotations.Length;
}
