using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Files.Photometry;

namespace CanopyAdvisor.Files.Sites;

/// <summary>The beam factory used everywhere outside tests: the Core distributions and the IES LM-63 reader.</summary>
/// <remarks>Stateless and thread-safe; use <see cref="Instance"/>.</remarks>
public sealed class StandardBeamFactory : IBeamFactory
{
    private StandardBeamFactory()
    {
    }

    /// <summary>The single instance.</summary>
    public static StandardBeamFactory Instance { get; } = new();

    /// <inheritdoc />
    public BeamDistribution Isotropic() => IsotropicDistribution.Instance;

    /// <inheritdoc />
    public BeamDistribution Lambertian() => LambertianDistribution.Instance;

    /// <inheritdoc />
    public BeamDistribution CosinePower(Angle beamAngle) => CosinePowerDistribution.FromBeamAngle(beamAngle);

    /// <inheritdoc />
    public IesBeam LoadIes(string fullPath, IesValueUnits unit, double? micromolesPerLumen)
    {
        string text = File.ReadAllText(fullPath);
        IesPhotometry photometry = IesReader.Read(text, Path.GetFileName(fullPath), new IesReadOptions(unit, micromolesPerLumen));
        return new IesBeam(photometry.Distribution, photometry.TotalPhotonFluxMicromolesPerSecond);
    }
}
