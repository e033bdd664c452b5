namespace CanopyAdvisor.Cli;

/// <summary>A bench's lean forecast and light, before or after, in <see cref="LampsBenchReport"/>.</summary>
internal sealed record LampsBenchStateReport(
    double LeanNowDeg,
    double LeanAtHorizonDeg,
    double LeanAtHorizonAzimuthDeg,
    string LeanDirection,
    double LeanRateDegPerDay,
    string? LeavesGradeAt,
    double PpfdMean,
    double PpfdPeak,
    double Dli,
    double? Uniformity,
    double LateralBlue);
