using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Structures;

/// <summary>What stands between a point inside a site and the sky or a lamp: covers, walls, frames and obstructions.</summary>
/// <remarks>Implementations are immutable and thread-safe; they are built once per site and queried many times.</remarks>
public interface IEnclosure
{
    /// <summary>
    /// Fraction of light arriving from the sky along <paramref name="towardSky"/> (unit vector, pointing away from
    /// <paramref name="origin"/>) that reaches <paramref name="origin"/>: cover transmittance at the incidence
    /// angle on the facet the ray crosses, times (1 − structural shading), times 0 if an opaque surface or
    /// obstruction is on the ray. Always 0 indoors and for directions below the horizon.
    /// </summary>
    double SkyTransmittance(Vector3 origin, Vector3 towardSky);

    /// <summary>Whether an opaque surface or obstruction lies on the segment between two points.</summary>
    bool IsBlocked(Vector3 from, Vector3 to);
}
