using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Light;

/// <summary>The light at one sample point at one instant, in photon units (µmol m⁻² s⁻¹).</summary>
/// <remarks>
/// Every source contributes its normal irradiance E times the unit vector toward it (MODEL.md §3). The light vector
/// is the sum of those vectors (the net photon flux vector); isotropic light cancels in it. Horizontal PPFD sums
/// E·max(0, û·ẑ). The R:FR window fluxes count photons from all directions (scalar flux), the way phytochrome in a
/// stem senses them; see <see cref="CompiledLightField"/> for how they are estimated from band fractions.
/// </remarks>
/// <param name="HorizontalPpfd">PPFD (400–700 nm) on a horizontal surface facing up, µmol m⁻² s⁻¹.</param>
/// <param name="LightVector">Net PAR photon flux vector, µmol m⁻² s⁻¹, pointing toward where the light comes from.</param>
/// <param name="BlueVector">Net blue (400–500 nm) photon flux vector, µmol m⁻² s⁻¹.</param>
/// <param name="Red660">Scalar photon flux in the 655–665 nm window, µmol m⁻² s⁻¹.</param>
/// <param name="FarRed730">Scalar photon flux in the 725–735 nm window, µmol m⁻² s⁻¹.</param>
public readonly record struct PointLight(
    double HorizontalPpfd,
    Vector3 LightVector,
    Vector3 BlueVector,
    double Red660,
    double FarRed730)
{
    /// <summary>Red to far-red ratio (Smith 1982 windows), or NaN when there is no far-red light.</summary>
    public double RedToFarRed => FarRed730 > 0 ? Red660 / FarRed730 : double.NaN;
}
