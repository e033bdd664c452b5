namespace CanopyAdvisor.Server.Contracts;

/// <summary>A bench's lean and light over the period, with or without the lamps.</summary>
/// <param name="LeanNowDeg">Bench-mean lean now, degrees.</param>
/// <param name="LeanAtHorizonDeg">Lean at the horizon, degrees.</param>
/// <param name="LeanAtHorizonAzimuthDeg">Its compass direction, degrees.</param>
/// <param name="LeanRateDegPerDay">Lean rate, degrees per day.</param>
/// <param name="PpfdMean">Mean horizontal PPFD, µmol m⁻² s⁻¹.</param>
/// <param name="PpfdPeak">Highest PPFD at any point and step, µmol m⁻² s⁻¹.</param>
/// <param name="Dli">Daily light integral, mol m⁻² d⁻¹.</param>
/// <param name="Uniformity">Min/mean point DLI, or null.</param>
/// <param name="LateralBlue">Horizontal blue light vector, µmol m⁻² s⁻¹.</param>
public sealed record LampsBenchStateView(
    double LeanNowDeg, double LeanAtHorizonDeg, double LeanAtHorizonAzimuthDeg, double LeanRateDegPerDay, double PpfdMean, double PpfdPeak, double Dli, double? Uniformity, double LateralBlue);
