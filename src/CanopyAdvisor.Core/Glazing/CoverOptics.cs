using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Core.Glazing;

/// <summary>Beam and diffuse transmittance of a cover (one or more identical glazing layers).</summary>
/// <remarks>
/// <para>
/// Model: Duffie &amp; Beckman, <em>Solar Engineering of Thermal Processes</em>, ch. 5. Fresnel reflectances of the
/// two polarisations, r∥ and r⊥, at the incidence angle θ₁ and the refraction angle θ₂ from Snell's law
/// (sin θ₂ = sin θ₁ / n); multiple reflections between N layers,
/// τ_r = ½[(1−r∥)/(1+(2N−1)r∥) + (1−r⊥)/(1+(2N−1)r⊥)]; absorption τ_a = exp(−N·K·L / cos θ₂); and the product
/// approximation τ ≈ τ_r·τ_a, which Duffie &amp; Beckman give for covers with small absorption (K·L ≪ 1, as for glazing).
/// </para>
/// <para>
/// An opaque cover transmits nothing. All members are pure and thread-safe. Angles are incidence angles measured from
/// the facet normal; values beyond 90° are folded back (light may cross a facet from either side).
/// </para>
/// </remarks>
public static class CoverOptics
{
    /// <summary>Beam transmittance τ ≈ τ_r·τ_a of a cover at an incidence angle.</summary>
    /// <param name="cover">The cover (see <see cref="Validate"/> for the accepted values).</param>
    /// <param name="incidence">Angle between the ray and the facet normal.</param>
    /// <returns>The transmittance in [0, 1]; 0 for an opaque cover and at grazing incidence.</returns>
    public static double Transmittance(Cover cover, Angle incidence)
    {
        ArgumentNullException.ThrowIfNull(cover);
        return new GlazingOptics(cover).TransmittanceAtCosine(incidence.Cos());
    }

    /// <summary>Transmittance τ_r with reflection losses only (absorption ignored).</summary>
    /// <param name="cover">The cover.</param>
    /// <param name="incidence">Angle between the ray and the facet normal.</param>
    /// <returns>τ_r in [0, 1]; 0 for an opaque cover.</returns>
    public static double ReflectionTransmittance(Cover cover, Angle incidence)
    {
        ArgumentNullException.ThrowIfNull(cover);
        return new GlazingOptics(cover).ReflectionTransmittanceAtCosine(incidence.Cos());
    }

    /// <summary>Transmittance τ_a with absorption losses only, exp(−N·K·L / cos θ₂).</summary>
    /// <param name="cover">The cover.</param>
    /// <param name="incidence">Angle between the ray and the facet normal.</param>
    /// <returns>τ_a in (0, 1]; 0 for an opaque cover.</returns>
    public static double AbsorptionTransmittance(Cover cover, Angle incidence)
    {
        ArgumentNullException.ThrowIfNull(cover);
        return new GlazingOptics(cover).AbsorptionTransmittanceAtCosine(incidence.Cos());
    }

    /// <summary>
    /// Hemispherical diffuse transmittance: the beam transmittance averaged over an isotropic hemisphere of incoming
    /// radiance, τ_d = 2∫₀^{π/2} τ(θ) cos θ sin θ dθ (Duffie &amp; Beckman, ch. 5, diffuse radiation).
    /// </summary>
    /// <remarks>
    /// This is the transmittance of a horizontal cover under a uniform sky. Duffie &amp; Beckman (after Brandemuehl
    /// &amp; Beckman 1980; from memory) summarise it by an equivalent beam incidence angle of about 60° for a horizontal cover;
    /// <see cref="EquivalentDiffuseIncidence"/> returns the exact equivalent for a given cover. Integrated by
    /// composite Simpson's rule in θ with 512 intervals (integrand smooth; error far below 10⁻⁶).
    /// </remarks>
    /// <param name="cover">The cover.</param>
    /// <returns>τ_d in [0, 1]; 0 for an opaque cover.</returns>
    public static double DiffuseTransmittance(Cover cover)
    {
        ArgumentNullException.ThrowIfNull(cover);
        var optics = new GlazingOptics(cover);
        if (optics.Opaque)
        {
            return 0;
        }

        const int intervals = 512;
        double h = (Math.PI / 2) / intervals;
        double sum = 0;
        for (int i = 0; i <= intervals; i++)
        {
            double theta = i * h;
            double c = Math.Cos(theta);
            double f = optics.TransmittanceAtCosine(c) * c * Math.Sin(theta);
            double simpsonWeight = i == 0 || i == intervals ? 1 : (i % 2 == 1 ? 4 : 2);
            sum += simpsonWeight * f;
        }

        return 2.0 * sum * h / 3.0;
    }

    /// <summary>
    /// The beam incidence angle at which the cover's beam transmittance equals its hemispherical diffuse transmittance
    /// (<see cref="DiffuseTransmittance"/>), found by bisection (τ falls monotonically with incidence).
    /// </summary>
    /// <param name="cover">The cover.</param>
    /// <returns>The equivalent incidence angle; a right angle for an opaque cover.</returns>
    public static Angle EquivalentDiffuseIncidence(Cover cover)
    {
        ArgumentNullException.ThrowIfNull(cover);
        var optics = new GlazingOptics(cover);
        if (optics.Opaque)
        {
            return Angle.RightAngle;
        }

        double target = DiffuseTransmittance(cover);
        double low = 0;
        double high = Math.PI / 2;
        for (int i = 0; i < 60; i++)
        {
            double mid = 0.5 * (low + high);
            if (optics.TransmittanceAtCosine(Math.Cos(mid)) > target)
            {
                low = mid;
            }
            else
            {
                high = mid;
            }
        }

        return Angle.FromRadians(0.5 * (low + high));
    }

    /// <summary>Checks a cover's fields; an opaque cover's optical fields are not checked.</summary>
    /// <param name="cover">The cover to check.</param>
    /// <param name="path">Where the cover sits in the input, used as the prefix of each error path (e.g. <c>structure.roof</c>).</param>
    /// <returns>Every problem found; empty when the cover is usable.</returns>
    public static IReadOnlyList<ValidationError> Validate(Cover? cover, string path)
    {
        if (cover is null)
        {
            return [new ValidationError(path, "is required")];
        }

        if (cover.Opaque)
        {
            return [];
        }

        var errors = new List<ValidationError>();
        if (!(cover.RefractiveIndex >= 1) || double.IsInfinity(cover.RefractiveIndex))
        {
            errors.Add(new ValidationError(path + ".refractiveIndex", "must be a finite number ≥ 1"));
        }

        if (!(cover.ExtinctionPerM >= 0) || double.IsInfinity(cover.ExtinctionPerM))
        {
            errors.Add(new ValidationError(path + ".extinctionPerM", "must be a finite number ≥ 0"));
        }

        if (!(cover.ThicknessM >= 0) || double.IsInfinity(cover.ThicknessM))
        {
            errors.Add(new ValidationError(path + ".thicknessM", "must be a finite number ≥ 0"));
        }

        if (cover.Layers < 1)
        {
            errors.Add(new ValidationError(path + ".layers", "must be ≥ 1 for a glazed cover"));
        }

        return errors;
    }
}
