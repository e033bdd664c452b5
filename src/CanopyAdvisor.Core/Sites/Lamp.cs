using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;

namespace CanopyAdvisor.Core.Sites;

/// <summary>One fixture: where it hangs, where it points, how it spreads its photons, what spectrum, when it is on.</summary>
/// <param name="Id">Identifier, unique within the site.</param>
/// <param name="Position">Centre of the light-emitting surface in the site frame, metres.</param>
/// <param name="Aim">Direction of the optical axis.</param>
/// <param name="Distribution">Relative intensity distribution about the optical axis.</param>
/// <param name="PpfMicromolesPerSecond">Photosynthetic photon flux (400–700 nm) at full output, µmol s⁻¹.</param>
/// <param name="Bands">Spectral make-up of the output.</param>
/// <param name="Dimming">Output fraction in [0, 1]; 1 = full output.</param>
/// <param name="Watts">Electrical input power at full output, W.</param>
/// <param name="Schedule">When the lamp is on.</param>
public sealed record Lamp(
    string Id,
    Vector3 Position,
    LampAim Aim,
    BeamDistribution Distribution,
    double PpfMicromolesPerSecond,
    BandFractions Bands,
    double Dimming,
    double Watts,
    LampSchedule Schedule);
