namespace CanopyAdvisor.Cli;

/// <summary>One bench in <c>canopy plan</c>: the verdict, the policy, the turns to the sale and the peak leans.</summary>
internal sealed record BenchPlanReport(
    string BenchId,
    string LotId,
    string Crop,
    int Pots,
    string SaleAt,
    string CheckedUntil,
    string Verdict,
    string Policy,
    double? AngleDeg,
    double? IntervalHours,
    int RotationsToSale,
    double LeanNowDeg,
    double PeakLeanWithPlanDeg,
    double PeakLeanWithoutPlanDeg,
    double? PeakLeanWhenLateDeg,
    double TargetLeanDeg,
    double LeanGradeLimitDeg,
    RotationTaskReport? FirstRotation,
    string? Remedy,
    IReadOnlyList<RotationCandidateReport> Candidates);
