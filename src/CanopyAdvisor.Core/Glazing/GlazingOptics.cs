using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Core.Glazing;

/// <summary>
/// A cover's optical constants, prepared once for fast repeated evaluation of its beam transmittance.
/// </summary>
/// <remarks>
/// Fresnel reflection with multiple inter-reflections between <c>N</c> identical layers and Bouguer absorption, as in
/// Duffie &amp; Beckman, <em>Solar Engineering of Thermal Processes</em>, ch. 5 (sections on reflection, absorption
/// and the optical properties of cover systems). The Fresnel coefficients are written with cosines,
/// r⊥ = ((cos θ₁ − n cos θ₂)/(cos θ₁ + n cos θ₂))², r∥ = ((cos θ₂ − n cos θ₁)/(cos θ₂ + n cos θ₁))²,
/// which are equal to Duffie &amp; Beckman's sin²/tan² forms and reach the normal-incidence limit ((n−1)/(n+1))²
/// without a special case. Allocation-free; safe to copy and share between threads.
/// </remarks>
internal readonly struct GlazingOptics
{
    private readonly double refractiveIndex;
    private readonly double twoNMinusOne;
    private readonly double layersTimesExtinctionLength;

    /// <summary>Prepares the optics of a cover (which must be valid, see <see cref="CoverOptics.Validate"/>).</summary>
    public GlazingOptics(Cover cover)
    {
        Opaque = cover.Opaque;
        refractiveIndex = cover.RefractiveIndex;
        twoNMinusOne = (2.0 * cover.Layers) - 1.0;
        layersTimesExtinctionLength = cover.Layers * cover.ExtinctionPerM * cover.ThicknessM;
    }

    /// <summary>Whether the cover lets no light through.</summary>
    public bool Opaque { get; }

    /// <summary>Transmittance τ ≈ τ_r·τ_a at the incidence angle whose cosine is given (absolute value used).</summary>
    public double TransmittanceAtCosine(double cosIncidence)
    {
        if (Opaque)
        {
            return 0;
        }

        double c1 = Math.Min(Math.Abs(cosIncidence), 1.0);
        if (c1 == 0)
        {
            return 0; // grazing incidence: everything is reflected (and n = 1 would give 0/0 below)
        }

        double cos2 = RefractedCosine(c1);
        return ReflectionPart(c1, cos2) * AbsorptionPart(cos2);
    }

    /// <summary>Transmittance τ_r accounting for reflection losses only.</summary>
    public double ReflectionTransmittanceAtCosine(double cosIncidence)
    {
        if (Opaque)
        {
            return 0;
        }

        double c1 = Math.Min(Math.Abs(cosIncidence), 1.0);
        return c1 == 0 ? 0 : ReflectionPart(c1, RefractedCosine(c1));
    }

    /// <summary>Transmittance τ_a accounting for absorption only.</summary>
    public double AbsorptionTransmittanceAtCosine(double cosIncidence)
    {
        if (Opaque)
        {
            return 0;
        }

        double c1 = Math.Min(Math.Abs(cosIncidence), 1.0);
        return AbsorptionPart(RefractedCosine(c1));
    }

    // Snell's law, n₁ = 1 (air): sin θ₂ = sin θ₁ / n.
    private double RefractedCosine(double cos1)
    {
        double sin2Squared = (1.0 - (cos1 * cos1)) / (refractiveIndex * refractiveIndex);
        return Math.Sqrt(1.0 - sin2Squared);
    }

    private double ReflectionPart(double cos1, double cos2)
    {
        double n = refractiveIndex;
        double perpendicular = Square(((cos1 - (n * cos2)) / (cos1 + (n * cos2))));
        double parallel = Square(((cos2 - (n * cos1)) / (cos2 + (n * cos1))));
        double tauParallel = (1.0 - parallel) / (1.0 + (twoNMinusOne * parallel));
        double tauPerpendicular = (1.0 - perpendicular) / (1.0 + (twoNMinusOne * perpendicular));
        return 0.5 * (tauParallel + tauPerpendicular);
    }

    private double AbsorptionPart(double cos2) =>
        layersTimesExtinctionLength == 0 ? 1.0 : Math.Exp(-layersTimesExtinctionLength / cos2);

    private static double Square(double x) => x * x;
}
