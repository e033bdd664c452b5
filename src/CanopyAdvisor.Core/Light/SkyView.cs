using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Light;

/// <summary>
/// How much of the sky a point sees, weighted by what lies between (cover transmittance, canopy attenuation):
/// the view factor, the sky vector and the scalar factor.
/// </summary>
/// <remarks>
/// <para>
/// For a weight w(ω) ∈ [0, 1] over the upper hemisphere of directions ω (unit vectors, site frame):
/// view factor f = (1/π)∫ w cos θ dω (the configuration factor of the visible sky seen by a horizontal element,
/// Howell, <em>A Catalog of Radiation Heat Transfer Configuration Factors</em>); sky vector
/// v = (1/π)∫ w ω̂ dω, so v.Z = f; scalar factor s = (1/π)∫ w dω (the sky's share of the radiance reaching a
/// sphere, used for scalar quantities). For a uniform sky of radiance L, the irradiance on a horizontal surface is
/// π·L·f and the net photon flux vector is π·L·v. Open hemisphere: f = 1, v = ẑ, s = 2.
/// </para>
/// </remarks>
/// <param name="ViewFactor">f, in [0, 1]: share of a uniform sky's horizontal irradiance that reaches the point.</param>
/// <param name="SkyVector">v, dimensionless: net flux vector of a uniform sky of unit horizontal irradiance; v.Z equals f.</param>
/// <param name="ScalarFactor">s, in [0, 2]: (1/π)∫ w dω.</param>
public readonly record struct SkyView(double ViewFactor, Vector3 SkyVector, double ScalarFactor)
{
    /// <summary>The unobstructed upper hemisphere: f = 1, v = ẑ, s = 2.</summary>
    public static SkyView OpenHemisphere => new(1, Vector3.UnitZ, 2);

    /// <summary>No sky at all (indoors): f = 0, v = 0, s = 0.</summary>
    public static SkyView None => default;
}
