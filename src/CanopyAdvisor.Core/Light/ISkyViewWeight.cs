using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Light;

/// <summary>The weight of a sky direction in a <see cref="SkyView"/> integral: transmittance × attenuation, in [0, 1].</summary>
/// <remarks>
/// Implement it on a struct and pass it to <see cref="SkyViewIntegrator.Integrate{TWeight}(HemisphereQuadrature, TWeight)"/>
/// so the call is specialised and inlined (no delegate call per direction).
/// </remarks>
public interface ISkyViewWeight
{
    /// <summary>The weight of the direction <paramref name="towardSky"/> (unit vector, z &gt; 0), in [0, 1].</summary>
    /// <param name="towardSky">Direction toward the sky.</param>
    /// <returns>The fraction of the sky radiance from that direction that reaches the point.</returns>
    double Weight(Vector3 towardSky);
}
