using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Light;

/// <summary>One sample point's light over one local day.</summary>
/// <param name="Dli">Daily light integral on the horizontal, mol m⁻² d⁻¹ (Σ PPFD·Δt / 10⁶ over the usable steps).</param>
/// <param name="MeanLightVector">Time-averaged light vector over the usable steps, µmol m⁻² s⁻¹.</param>
/// <param name="MeanBlueVector">Time-averaged blue light vector over the usable steps, µmol m⁻² s⁻¹.</param>
/// <param name="RedToFarRed">Photon-weighted R:FR (Σ 660 nm / Σ 730 nm window flux), or null without far-red light.</param>
public readonly record struct PointDayLight(double Dli, Vector3 MeanLightVector, Vector3 MeanBlueVector, double? RedToFarRed);
