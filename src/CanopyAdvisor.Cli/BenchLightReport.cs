namespace CanopyAdvisor.Cli;

/// <summary>One bench in <see cref="LightReport"/>; the top-level values are means over the period.</summary>
internal sealed record BenchLightReport(
    string BenchId,
    double Ppfd,
    double Dli,
    double? Uniformity,
    double LightTiltDeg,
    double LightAzimuthDeg,
    double BlueTiltDeg,
    double BlueAzimuthDeg,
    double? Rfr,
    IReadOnlyList<BenchDayReport> Days);
