namespace CanopyAdvisor.Core.Plants.Growth;

/// <summary>What a lot's stem sees during one step of the elongation model.</summary>
/// <param name="AirTemperatureC">Air temperature during the step, °C (finite; skip steps whose temperature is missing).</param>
/// <param name="DifKelvin">The day's DIF, mean day minus mean night temperature, K.</param>
/// <param name="PhytochromeState">PSS in [0, 1]; from R:FR by <see cref="Growth.PhytochromeState.FromRedToFarRed"/>.</param>
/// <param name="RecentDliMolPerM2Day">The recent DLI at the lot, mol m⁻² d⁻¹ (e.g. the mean of the last 3 days, or the forecast day's).</param>
public sealed record ElongationConditions(double AirTemperatureC, double DifKelvin, double PhytochromeState, double RecentDliMolPerM2Day);
