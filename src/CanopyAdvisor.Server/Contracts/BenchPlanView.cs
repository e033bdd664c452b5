using NodaTime;

namespace CanopyAdvisor.Server.Contracts;

/// <summary>One bench's rotation advice.</summary>
/// <param name="BenchId">The bench.</param>
/// <param name="LotId">Its lot.</param>
/// <param name="CropId">The lot's crop.</param>
/// <param name="Pots">Pots on the bench.</param>
/// <param name="SaleAt">When the lot is sold.</param>
/// <param name="CheckedUntil">How far it was checked.</param>
/// <param name="Verdict"><c>noRotationNeeded</c>, <c>rotate</c> or <c>rotationCannotHold</c>.</param>
/// <param name="Policy">The policy in words.</param>
/// <param name="AngleDeg">The turn, degrees, or null for no rotation.</param>
/// <param name="IntervalHours">Hours between turns, or null for no rotation.</param>
/// <param name="RotationsToSale">Turns to the sale.</param>
/// <param name="LeanNowDeg">Bench-mean lean now, degrees.</param>
/// <param name="PeakLeanWithPlanDeg">Largest lean to the sale with the plan, degrees.</param>
/// <param name="PeakLeanWithoutPlanDeg">Largest lean to the sale without turning, degrees.</param>
/// <param name="TargetLeanDeg">The grade limit less the margin, degrees.</param>
/// <param name="LeanGradeLimitDeg">The crop's lean grade limit, degrees.</param>
/// <param name="Remedy">What to do when rotation cannot hold, or null.</param>
public sealed record BenchPlanView(
    string BenchId,
    string LotId,
    string CropId,
    int Pots,
    OffsetDateTime SaleAt,
    OffsetDateTime CheckedUntil,
    string Verdict,
    string Policy,
    double? AngleDeg,
    double? IntervalHours,
    int RotationsToSale,
    double LeanNowDeg,
    double PeakLeanWithPlanDeg,
    double PeakLeanWithoutPlanDeg,
    double TargetLeanDeg,
    double LeanGradeLimitDeg,
    string? Remedy);
