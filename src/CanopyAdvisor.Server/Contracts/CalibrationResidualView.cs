using NodaTime;

namespace CanopyAdvisor.Server.Contracts;

/// <summary>One observation against the calibrated model.</summary>
/// <param name="ObservationId">The stored observation.</param>
/// <param name="BenchId">Its bench.</param>
/// <param name="At">When.</param>
/// <param name="ObservedTiltDeg">Observed tilt, degrees.</param>
/// <param name="ObservedAzimuthDeg">Observed azimuth, degrees.</param>
/// <param name="ModelledTiltDeg">Modelled tilt, degrees.</param>
/// <param name="ModelledAzimuthDeg">Modelled azimuth, degrees.</param>
/// <param name="MisfitDeg">Length of the lean-vector difference as an angle, degrees.</param>
/// <param name="Plants">Plants measured (the weight).</param>
/// <param name="HeightMm">Height measured, or null.</param>
public sealed record CalibrationResidualView(
    string? ObservationId, string BenchId, OffsetDateTime At, double ObservedTiltDeg, double ObservedAzimuthDeg, double ModelledTiltDeg,
    double ModelledAzimuthDeg, double MisfitDeg, double Plants, double? HeightMm);
