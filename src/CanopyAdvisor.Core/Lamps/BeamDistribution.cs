namespace CanopyAdvisor.Core.Lamps;

/// <summary>How a lamp spreads its output over directions: intensity per unit emitted flux, sr⁻¹.</summary>
/// <remarks>
/// Directions are given in the lamp's own frame: <c>polar</c> is the angle from the optical axis (0 on axis, π
/// straight back), <c>around</c> the angle about the axis from the photometric reference direction (IES C = 0°),
/// counter-clockwise when looking along the beam from behind the lamp (from above for a downward lamp: the usual
/// reading of IES LM-63 type C horizontal angles, "counter-clockwise seen from above"; from memory, not verified
/// against the standard's text).
/// Implementations are normalised so that the integral over the sphere is 1; multiply by the lamp's photon flux
/// to get µmol s⁻¹ sr⁻¹. Implementations are immutable and safe to share between threads.
/// </remarks>
public abstract class BeamDistribution
{
    /// <summary>Intensity per unit flux, sr⁻¹, toward a direction given by its polar angle and angle about the axis (radians).</summary>
    public abstract double IntensityPerUnitFlux(double polarRadians, double aroundRadians);

    /// <summary>The same intensity, with the polar angle given by its cosine (the form a point–lamp geometry yields
    /// directly); distributions that are functions of cos θ answer without an arc cosine. Agrees with
    /// <see cref="IntensityPerUnitFlux"/> at θ = acos(<paramref name="cosPolar"/>) to rounding.</summary>
    /// <param name="cosPolar">Cosine of the angle from the optical axis, in [−1, 1].</param>
    /// <param name="aroundRadians">Angle about the axis from the photometric reference direction.</param>
    public virtual double IntensityPerUnitFluxAtCosine(double cosPolar, double aroundRadians) =>
        IntensityPerUnitFlux(Math.Acos(cosPolar), aroundRadians);

    /// <summary>True when the intensity does not depend on the angle about the axis.</summary>
    public abstract bool IsAxiallySymmetric { get; }
}
