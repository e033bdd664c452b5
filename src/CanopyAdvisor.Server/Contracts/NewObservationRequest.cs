namespace CanopyAdvisor.Server.Contracts;

/// <summary>An observation to record: the measured lean of sample plants on a bench (the rules of the observations CSV,
/// <c>LeanObservationReader</c>).</summary>
/// <param name="BenchId">The bench measured; it must carry a lot.</param>
/// <param name="At">When, ISO-8601 with an offset (<c>2026-11-30T10:00:00+01:00</c>); not before the lot was planted, not in the future.</param>
/// <param name="TiltDeg">Mean tilt from the vertical, 0 to 90°.</param>
/// <param name="AzimuthDeg">Compass bearing the tops point to, 0 to 360°.</param>
/// <param name="HeightMm">Mean height, mm (&gt; 0), or left out.</param>
/// <param name="Plants">How many plants the lean is the mean of (≥ 1; default 1).</param>
public sealed record NewObservationRequest(string BenchId, string At, double TiltDeg, double AzimuthDeg, double? HeightMm = null, int? Plants = null);
