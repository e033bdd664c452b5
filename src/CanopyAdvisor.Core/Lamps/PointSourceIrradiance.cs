using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Core.Lamps;

/// <summary>Photon irradiance from a lamp treated as a point source: the inverse-square and cosine laws, E = I cos i / d².</summary>
/// <remarks>
/// I is the intensity toward the point (µmol s⁻¹ sr⁻¹), d the distance and i the angle between the surface normal and
/// the direction back to the lamp (MODEL.md §3; any photometry text, e.g. the IES Lighting Handbook point method).
/// The point-source idealisation holds when d is at least about five times the luminous opening's largest dimension
/// (the "five-times rule", common practice); closer than that it overestimates near the axis. Pure functions.
/// </remarks>
public static class PointSourceIrradiance
{
    /// <summary>
    /// Irradiance on a surface facing the lamp (normal to the ray), I/d², in µmol m⁻² s⁻¹.
    /// </summary>
    /// <param name="lampPosition">Lamp position, site frame, m.</param>
    /// <param name="frame">The lamp's frame (from its aim).</param>
    /// <param name="distribution">The lamp's distribution (per unit flux).</param>
    /// <param name="photonFluxMicromolesPerSecond">Photon flux the lamp emits, µmol s⁻¹.</param>
    /// <param name="point">The receiving point, site frame, m.</param>
    /// <exception cref="InvalidInputException">When the point coincides with the lamp.</exception>
    public static double Normal(
        Vector3 lampPosition,
        LampFrame frame,
        BeamDistribution distribution,
        double photonFluxMicromolesPerSecond,
        Vector3 point)
    {
        ArgumentNullException.ThrowIfNull(frame);
        Vector3 toPoint = point - lampPosition;
        double d2 = toPoint.LengthSquared;
        if (!(d2 > 0))
        {
            throw new InvalidInputException("point", "coincides with the lamp position: the point-source law does not apply there");
        }

        return photonFluxMicromolesPerSecond * frame.IntensityPerUnitFlux(distribution, toPoint) / d2;
    }

    /// <summary>
    /// Irradiance on a surface with the given outward normal, E = I cos i / d² (zero when the surface faces away), µmol m⁻² s⁻¹.
    /// </summary>
    /// <param name="lampPosition">Lamp position, site frame, m.</param>
    /// <param name="frame">The lamp's frame (from its aim).</param>
    /// <param name="distribution">The lamp's distribution (per unit flux).</param>
    /// <param name="photonFluxMicromolesPerSecond">Photon flux the lamp emits, µmol s⁻¹.</param>
    /// <param name="point">The receiving point, site frame, m.</param>
    /// <param name="surfaceNormal">Unit normal of the receiving surface (ẑ for a horizontal surface facing up).</param>
    public static double OnSurface(
        Vector3 lampPosition,
        LampFrame frame,
        BeamDistribution distribution,
        double photonFluxMicromolesPerSecond,
        Vector3 point,
        Vector3 surfaceNormal)
    {
        double normal = Normal(lampPosition, frame, distribution, photonFluxMicromolesPerSecond, point);
        Vector3 towardLamp = (lampPosition - point).Normalized();
        double cosIncidence = Vector3.Dot(towardLamp, surfaceNormal);
        return cosIncidence > 0 ? normal * cosIncidence : 0.0;
    }

    /// <summary>
    /// The photon flux vector at the point (MODEL.md §3): the normal irradiance times the unit vector from the point toward
    /// the lamp, µmol m⁻² s⁻¹. Its dot product with a surface normal, floored at zero, is the irradiance on that surface.
    /// </summary>
    /// <param name="lampPosition">Lamp position, site frame, m.</param>
    /// <param name="frame">The lamp's frame (from its aim).</param>
    /// <param name="distribution">The lamp's distribution (per unit flux).</param>
    /// <param name="photonFluxMicromolesPerSecond">Photon flux the lamp emits, µmol s⁻¹.</param>
    /// <param name="point">The receiving point, site frame, m.</param>
    public static Vector3 FluxVector(
        Vector3 lampPosition,
        LampFrame frame,
        BeamDistribution distribution,
        double photonFluxMicromolesPerSecond,
        Vector3 point)
    {
        double normal = Normal(lampPosition, frame, distribution, photonFluxMicromolesPerSecond, point);
        return normal * (lampPosition - point).Normalized();
    }
}
