using CanopyAdvisor.Core.Lamps;

namespace CanopyAdvisor.Core.Advice.SideLamps;

/// <summary>A fixture model the designer allows as a side lamp: photometry, photon output, spectrum and power.</summary>
/// <remarks>The same quantities as a site's lamp types (the site file's <c>lampTypes</c>), so the brief names them.</remarks>
/// <param name="Name">The lamp type's name (as in the site file).</param>
/// <param name="Distribution">Relative intensity distribution about the optical axis.</param>
/// <param name="PpfMicromolesPerSecond">Photosynthetic photon flux at full output, µmol s⁻¹ (&gt; 0).</param>
/// <param name="Bands">Spectral make-up; the blue fraction is what moves the blue light vector.</param>
/// <param name="Watts">Electrical input power at full output, W (≥ 0).</param>
public sealed record SideLampType(
    string Name,
    BeamDistribution Distribution,
    double PpfMicromolesPerSecond,
    BandFractions Bands,
    double Watts);
