namespace CanopyAdvisor.Core.Advice.SideLamps;

/// <summary>The light on one bench over the planning period, before or after the side lamps.</summary>
/// <param name="MeanPpfd">Mean horizontal PPFD over the bench's sample points and the period's usable time, µmol m⁻² s⁻¹.</param>
/// <param name="PeakPpfd">Highest horizontal PPFD at any sample point at any time step of the period, µmol m⁻² s⁻¹.</param>
/// <param name="Dli">Mean daily light integral of the bench over the period, mol m⁻² d⁻¹.</param>
/// <param name="Uniformity">Lowest over mean period DLI of the bench's points (min/avg), or null without light.</param>
/// <param name="LateralBlue">Mean over the bench's points of the length of the horizontal part of the period-mean blue
/// light vector, µmol m⁻² s⁻¹: the sideways blue light that drives the lean.</param>
public sealed record BenchLightFigures(double MeanPpfd, double PeakPpfd, double Dli, double? Uniformity, double LateralBlue);
