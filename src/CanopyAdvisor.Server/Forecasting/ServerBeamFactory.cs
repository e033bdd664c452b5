using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Photometry;
using CanopyAdvisor.Files.Sites;

namespace CanopyAdvisor.Server.Forecasting;

/// <summary>The beams of sites sent to the service: parametric beams as usual, but never a file from the service's
/// own disk (a site file may name an absolute IES path; reading it here would let any user read the server's files).</summary>
/// <remarks>IES photometry through the API comes with the lamp planner's uploads (a later part).</remarks>
internal sealed class ServerBeamFactory : IBeamFactory
{
    /// <summary>The one instance (stateless).</summary>
    public static ServerBeamFactory Instance { get; } = new();

    public BeamDistribution Isotropic() => StandardBeamFactory.Instance.Isotropic();

    public BeamDistribution Lambertian() => StandardBeamFactory.Instance.Lambertian();

    public BeamDistribution CosinePower(Angle beamAngle) => StandardBeamFactory.Instance.CosinePower(beamAngle);

    public IesBeam LoadIes(string fullPath, IesValueUnits unit, double? micromolesPerLumen) =>
        throw new InvalidInputException("beam", "the service does not read IES files named in a site; use a parametric beam (isotropic, lambertian, cosinePower)");
}
