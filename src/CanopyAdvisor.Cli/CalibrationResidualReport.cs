namespace CanopyAdvisor.Cli;

/// <summary>One observation against the fitted model in <see cref="CalibrationReport"/>.</summary>
internal sealed record CalibrationResidualReport(
    string? Where,
    string BenchId,
    string At,
    double ObservedTiltDeg,
    double ObservedAzimuthDeg,
    double ModelledTiltDeg,
    double ModelledAzimuthDeg,
    double EastResidual,
    double NorthResidual,
    double MisfitDeg,
    double Plants,
    double? HeightMm);
