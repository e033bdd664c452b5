namespace CanopyAdvisor.Cli;

/// <summary>One bench in <see cref="ForecastReport"/>.</summary>
internal sealed record BenchForecastReport(
    string BenchId,
    string LotId,
    string Crop,
    double LeanDeg,
    double LeanAzimuthDeg,
    string LeanDirection,
    double WorstLeanDeg,
    double LeanRateDegPerDay,
    double LeanAtHorizonDeg,
    double LeanAtHorizonAzimuthDeg,
    double LeanGradeLimitDeg,
    string? LeavesGradeAt,
    double HeightMm,
    double HeightAtHorizonMm,
    double HeightAtSaleMm,
    double HeightGradeLimitMm,
    double DliMolPerM2Day,
    double PhytochromeState,
    double DifK,
    LeanBandReport? LeanAtHorizonBand,
    IReadOnlyList<FlagReport> Flags);
