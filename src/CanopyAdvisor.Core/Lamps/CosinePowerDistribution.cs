using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Core.Lamps;

/// <summary>A rotationally symmetric beam I(θ) ∝ cosⁿ θ on the front hemisphere, normalised to (n + 1)/(2π) cosⁿ θ.</summary>
/// <remarks>
/// ∫₀^{π/2} cosⁿ θ sin θ dθ · 2π = 2π/(n + 1), hence the factor (n + 1)/(2π). n = 0 is a uniform hemisphere, n = 1 is
/// Lambertian; larger n narrows the beam. The generalised-Lambertian (cosⁿ) model is the usual description of LED
/// emitters (e.g. Moreno &amp; Sun 2008, Opt. Express 16:1808). <see cref="FromBeamAngle"/> uses the half-intensity
/// beam angle (the angle between the two directions where intensity is 50 % of the axial value, IES/common practice):
/// n = ln 0.5 / ln cos(beam/2). Immutable and thread safe.
/// </remarks>
public sealed class CosinePowerDistribution : BeamDistribution
{
    private readonly double normalisation;

    /// <summary>Creates the distribution with exponent n.</summary>
    /// <param name="exponent">n ≥ 0 and finite (at most 10⁶).</param>
    /// <exception cref="InvalidInputException">When the exponent is negative, not finite or absurdly large.</exception>
    public CosinePowerDistribution(double exponent)
    {
        if (!double.IsFinite(exponent) || exponent < 0 || exponent > MaximumExponent)
        {
            throw new InvalidInputException("exponent", $"must be a finite number in [0, {MaximumExponent:0}], got {exponent}");
        }

        Exponent = exponent;
        normalisation = (exponent + 1.0) / (2.0 * Math.PI);
    }

    /// <summary>The largest exponent accepted (a beam of about 0.1° full angle).</summary>
    public const double MaximumExponent = 1e6;

    /// <summary>The exponent n.</summary>
    public double Exponent { get; }

    /// <summary>The full half-intensity beam angle, 2 acos(0.5^(1/n)); 180° for n = 0.</summary>
    public Angle BeamAngle => Exponent == 0
        ? Angle.FromRadians(Math.PI)
        : Angle.FromRadians(2.0 * Math.Acos(Math.Pow(ModelConstants.BeamAngleIntensityFraction, 1.0 / Exponent)));

    /// <inheritdoc />
    public override bool IsAxiallySymmetric => true;

    /// <summary>The cosⁿ beam whose intensity falls to 50 % of the axial value at half the given full beam angle.</summary>
    /// <param name="fullBeamAngle">Full beam angle, strictly between 0° and 180°.</param>
    /// <exception cref="InvalidInputException">When the angle is outside (0°, 180°) or so narrow that n exceeds the maximum.</exception>
    public static CosinePowerDistribution FromBeamAngle(Angle fullBeamAngle)
    {
        double half = fullBeamAngle.Radians / 2.0;
        if (!(half > 0 && half < Math.PI / 2))
        {
            throw new InvalidInputException("beamAngleDeg", $"must be between 0° and 180° (exclusive), got {fullBeamAngle}");
        }

        double n = Math.Log(ModelConstants.BeamAngleIntensityFraction) / Math.Log(Math.Cos(half));
        if (!(n <= MaximumExponent))
        {
            throw new InvalidInputException("beamAngleDeg", $"is too narrow to model as a cosⁿ beam: {fullBeamAngle}");
        }

        return new CosinePowerDistribution(n);
    }

    /// <inheritdoc />
    public override double IntensityPerUnitFlux(double polarRadians, double aroundRadians) =>
        IntensityPerUnitFluxAtCosine(Math.Cos(polarRadians), aroundRadians);

    /// <inheritdoc />
    public override double IntensityPerUnitFluxAtCosine(double cosPolar, double aroundRadians)
    {
        double c = cosPolar;
        if (!(c > 0))
        {
            // n = 0 is a uniform hemisphere: on the boundary itself (c = 0) the value is taken as 0, a set of measure zero.
            return 0.0;
        }

        return normalisation * Math.Pow(c, Exponent);
    }
}
