using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Core.Plants.Growth;

/// <summary>
/// The phytochrome photostationary state PSS = Pfr/(Pr + Pfr) estimated from R:FR for a two-window spectrum (photons in
/// 655–665 nm and 725–735 nm only, represented by 660 and 730 nm).
/// </summary>
/// <remarks>
/// <para>At photo-equilibrium the rates Pr→Pfr and Pfr→Pr balance, so with photon fluxes N660, N730 and photoconversion
/// cross-sections σ (Hayward 1984, in Smith &amp; Holmes, Techniques in Photomorphogenesis):
/// PSS = (σr,660·N660 + σr,730·N730) / ((σr,660 + σfr,660)·N660 + (σr,730 + σfr,730)·N730); only the ratio
/// ζ = N660/N730 = R:FR matters. The σ values are relative, rounded from memory after Mancinelli (1994)
/// (<see cref="ModelConstants.PhytochromeSigmaRedAt660"/> and its three siblings) and not verified against his table.</para>
/// <para>This is exact only for a two-line spectrum. For broadband light it is an approximation: at the R:FR of direct
/// sunlight (1.14) it gives 0.677. For comparison, Mancinelli's full spectral data applied to a reference sunlight
/// spectrum (R:FR 1.267) give 0.683, and the same data for two lines at that R:FR give 0.705 (R for Photobiology,
/// photobiologyPlants user guide); the design's "≈ 0.6 in full sun" (Sager et al. 1988, Trans. ASAE 31:1882) is
/// quoted from memory and sits about 0.08 lower. Shade-avoidance factors use this function both for the lot and for
/// the full-sun reference (<see cref="FullSun"/>), so a common bias cancels to first order.</para>
/// </remarks>
public static class PhytochromeState
{
    /// <summary>PSS under pure 660 nm light (ζ → ∞): σr,660/(σr,660 + σfr,660) ≈ 0.885.</summary>
    public static double PureRed { get; } =
        ModelConstants.PhytochromeSigmaRedAt660 / (ModelConstants.PhytochromeSigmaRedAt660 + ModelConstants.PhytochromeSigmaFarRedAt660);

    /// <summary>PSS under pure 730 nm light (ζ = 0): σr,730/(σr,730 + σfr,730) ≈ 0.024.</summary>
    public static double PureFarRed { get; } =
        ModelConstants.PhytochromeSigmaRedAt730 / (ModelConstants.PhytochromeSigmaRedAt730 + ModelConstants.PhytochromeSigmaFarRedAt730);

    /// <summary>PSS at the R:FR of direct sunlight, <see cref="ModelConstants.SunlightRedToFarRed"/> (1.14): the shade-avoidance reference.</summary>
    public static double FullSun { get; } = Evaluate(ModelConstants.SunlightRedToFarRed);

    /// <summary>The two-window PSS for a red to far-red photon ratio ζ ≥ 0 (positive infinity allowed: pure red).</summary>
    /// <exception cref="InvalidInputException">ζ is NaN or negative (path <c>redToFarRed</c>).</exception>
    public static double FromRedToFarRed(double redToFarRed)
    {
        if (double.IsNaN(redToFarRed) || redToFarRed < 0)
        {
            throw new InvalidInputException("redToFarRed", "must be a number ≥ 0");
        }

        return Evaluate(redToFarRed);
    }

    internal static double Evaluate(double zeta)
    {
        if (double.IsPositiveInfinity(zeta))
        {
            return PureRedValue();
        }

        double numerator = (ModelConstants.PhytochromeSigmaRedAt660 * zeta) + ModelConstants.PhytochromeSigmaRedAt730;
        double denominator =
            ((ModelConstants.PhytochromeSigmaRedAt660 + ModelConstants.PhytochromeSigmaFarRedAt660) * zeta)
            + ModelConstants.PhytochromeSigmaRedAt730 + ModelConstants.PhytochromeSigmaFarRedAt730;
        return numerator / denominator;
    }

    private static double PureRedValue() =>
        ModelConstants.PhytochromeSigmaRedAt660 / (ModelConstants.PhytochromeSigmaRedAt660 + ModelConstants.PhytochromeSigmaFarRedAt660);
}
