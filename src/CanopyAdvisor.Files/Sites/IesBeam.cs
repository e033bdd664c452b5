using CanopyAdvisor.Core.Lamps;

namespace CanopyAdvisor.Files.Sites;

/// <summary>What a site file needs from an IES LM-63 photometric file.</summary>
/// <param name="Distribution">The intensity distribution, normalised to unit flux.</param>
/// <param name="PpfMicromolesPerSecond">The fixture's total photon flux from the file (intensities integrated over the sphere, converted with the lamp type's µmol per lumen for candela files), µmol s⁻¹.</param>
public sealed record IesBeam(BeamDistribution Distribution, double PpfMicromolesPerSecond);
