using CanopyAdvisor.Core.Geometry;
using NodaTime;

namespace CanopyAdvisor.Core.Sky;

/// <summary>The daylight outside the structure at one instant, in photon units (PAR, µmol m⁻² s⁻¹).</summary>
/// <param name="Time">The instant.</param>
/// <param name="SunDirection">Unit vector toward the sun (may point below the horizon at night).</param>
/// <param name="DirectNormalPpfd">Beam PAR on a surface facing the sun.</param>
/// <param name="DiffuseHorizontalPpfd">Sky PAR on a horizontal surface (isotropic sky).</param>
/// <param name="GlobalHorizontalPpfd">Total PAR on a horizontal surface outside.</param>
public readonly record struct OutsideLight(
    Instant Time,
    Vector3 SunDirection,
    double DirectNormalPpfd,
    double DiffuseHorizontalPpfd,
    double GlobalHorizontalPpfd)
{
    /// <summary>Darkness at the given instant with the sun where it is.</summary>
    public static OutsideLight Dark(Instant time, Vector3 sunDirection) => new(time, sunDirection, 0, 0, 0);
}
