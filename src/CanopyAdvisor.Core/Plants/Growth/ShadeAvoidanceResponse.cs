using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Core.Plants.Growth;

/// <summary>Elongation factor from shade avoidance: f = 1 + k·max(0, PSS_sun − PSS).</summary>
/// <remarks>
/// Smith (1982, Annual Review of Plant Physiology 33:481–518) found internode extension close to linear in the
/// estimated phytochrome photostationary state (from memory). The factor is 1 at or above the full-sun PSS
/// (<see cref="PhytochromeState.FullSun"/>, the two-window value at R:FR 1.14) and rises with slope k (the crop's
/// <see cref="Crop.ShadeAvoidanceSensitivity"/>) per unit of PSS below it; a PSS above full sun's (red-rich lamps)
/// does not shorten internodes in this model.
/// </remarks>
public static class ShadeAvoidanceResponse
{
    /// <summary>The elongation factor for a phytochrome photostationary state.</summary>
    /// <param name="phytochromeState">PSS in [0, 1].</param>
    /// <param name="sensitivity">k ≥ 0, relative increase per unit PSS below full sun's.</param>
    /// <exception cref="InvalidInputException">PSS outside [0, 1] or k negative or not finite.</exception>
    public static double Factor(double phytochromeState, double sensitivity)
    {
        var errors = new List<ValidationError>();
        GrowthValidation.InRange(errors, "phytochromeState", phytochromeState, 0, 1);
        GrowthValidation.NonNegative(errors, "shadeAvoidanceSensitivity", sensitivity);
        GrowthValidation.ThrowIfAny(errors);
        return Evaluate(phytochromeState, sensitivity);
    }

    internal static double Evaluate(double phytochromeState, double sensitivity) =>
        1.0 + (sensitivity * Math.Max(0.0, PhytochromeState.FullSun - phytochromeState));
}
