using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Files.Photometry;

namespace CanopyAdvisor.Files.Sites;

/// <summary>Makes the beam distributions that a site file's lamp types name.</summary>
/// <remarks>
/// The site file reader turns each lamp type's <c>beam</c> into one distribution through this seam, so the reader
/// does not depend on how distributions or IES LM-63 files are implemented. Each method is called once per lamp
/// type; the result is shared by every lamp of that type, so it must be immutable.
/// </remarks>
public interface IBeamFactory
{
    /// <summary>The same intensity in every direction (1/4π sr⁻¹ per unit flux).</summary>
    BeamDistribution Isotropic();

    /// <summary>A Lambertian beam: intensity ∝ cos(polar) over the forward hemisphere (1/π sr⁻¹ on axis per unit flux).</summary>
    BeamDistribution Lambertian();

    /// <summary>A cosⁿ beam whose full angle at half the on-axis intensity is <paramref name="beamAngle"/> (0° &lt; angle &lt; 180°).</summary>
    /// <exception cref="ArgumentOutOfRangeException">The beam angle is outside what the distribution supports.</exception>
    BeamDistribution CosinePower(Angle beamAngle);

    /// <summary>Reads an IES LM-63 photometric file and returns its distribution and total photon flux.</summary>
    /// <param name="fullPath">Absolute path of the file.</param>
    /// <param name="unit">What the file's intensity values are: photon intensity or candela (never guessed from the numbers).</param>
    /// <param name="micromolesPerLumen">Photon flux per lumen of the lamp's spectrum, µmol s⁻¹ lm⁻¹; given exactly when <paramref name="unit"/> is lumen.</param>
    /// <exception cref="CanopyAdvisor.Core.Validation.InvalidInputException">The file is not valid IES LM-63; the errors carry the file's own positions.</exception>
    /// <exception cref="IOException">The file cannot be read.</exception>
    IesBeam LoadIes(string fullPath, IesValueUnits unit, double? micromolesPerLumen);
}
