namespace CanopyAdvisor.Core.Sites;

/// <summary>The layer of plants on a bench, as far as it shades light on its way to a stem.</summary>
/// <remarks>
/// Light reaching a stem at the sensing depth is attenuated along its path through the layer by Beer–Lambert,
/// exp(−G·LAD·path) with G = 0.5 (MODEL.md §3). A path leaves the layer through its top or through the bench's
/// edge, whichever comes first, so edge points see more low-angle light than middle points.
/// </remarks>
/// <param name="HeightM">Canopy height above the bench top, metres.</param>
/// <param name="SensingDepthM">Depth below the canopy top at which stems sense light, metres (≥ 0, ≤ HeightM).</param>
/// <param name="LeafAreaDensityM2PerM3">One-sided leaf area per canopy volume, m² m⁻³ (0 = no attenuation).</param>
public sealed record Canopy(double HeightM, double SensingDepthM, double LeafAreaDensityM2PerM3);
