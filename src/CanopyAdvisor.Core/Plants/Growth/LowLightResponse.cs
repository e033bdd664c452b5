using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Core.Plants.Growth;

/// <summary>Elongation factor from low light: f = 1 + c·max(0, DLI_min − DLI).</summary>
/// <remarks>
/// Below a crop's minimum DLI plants stretch and finish slowly (bedding-plant young plants need 10–12 mol m⁻² d⁻¹,
/// Craver, Boldt &amp; Lopez 2019, HortScience 54:52–59). The response is taken as linear in the shortfall with the crop's
/// <see cref="Crop.LowLightStretchPerMole"/> c, (mol m⁻² d⁻¹)⁻¹, and 1 at or above the minimum (a simple model of
/// this project; the published studies report the direction, not a general slope).
/// </remarks>
public static class LowLightResponse
{
    /// <summary>The elongation factor for a DLI.</summary>
    /// <param name="dliMolPerM2Day">The recent DLI, mol m⁻² d⁻¹ (≥ 0).</param>
    /// <param name="dliMinimum">The crop's minimum DLI, mol m⁻² d⁻¹ (≥ 0).</param>
    /// <param name="stretchPerMole">c ≥ 0, relative increase per mol m⁻² d⁻¹ of shortfall.</param>
    /// <exception cref="InvalidInputException">An input is negative or not finite.</exception>
    public static double Factor(double dliMolPerM2Day, double dliMinimum, double stretchPerMole)
    {
        var errors = new List<ValidationError>();
        GrowthValidation.NonNegative(errors, "dliMolPerM2Day", dliMolPerM2Day);
        GrowthValidation.NonNegative(errors, "dliMinimum", dliMinimum);
        GrowthValidation.NonNegative(errors, "lowLightStretchPerMole", stretchPerMole);
        GrowthValidation.ThrowIfAny(errors);
        return Evaluate(dliMolPerM2Day, dliMinimum, stretchPerMole);
    }

    internal static double Evaluate(double dli, double dliMinimum, double stretchPerMole) =>
        1.0 + (stretchPerMole * Math.Max(0.0, dliMinimum - dli));
}
