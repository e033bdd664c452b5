using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Core.Plants.Growth;

/// <summary>
/// Elongation factor from DIF, the mean day temperature minus the mean night temperature (day and night from the
/// site's sunrise and sunset): f = max(0.2, 1 + s·DIF).
/// </summary>
/// <remarks>
/// Erwin, Heins &amp; Karlsson (1989, American Journal of Botany 76:47–52, on <i>Lilium longiflorum</i>) found internode
/// length to rise about linearly with DIF and to depend little on the mean temperature itself (from memory: the
/// figures and slopes were not re-checked). The factor is therefore linear in DIF with the crop's sensitivity s
/// (K⁻¹) and equals 1 at DIF = 0. It is clamped below at <see cref="ModelConstants.DifFactorFloor"/> (0.2) so a strongly
/// negative DIF, outside the range the studies covered, slows elongation but never stops or reverses it.
/// </remarks>
public static class DifResponse
{
    /// <summary>The elongation factor max(0.2, 1 + s·DIF), dimensionless.</summary>
    /// <param name="difKelvin">Mean day minus mean night temperature, K (finite).</param>
    /// <param name="sensitivityPerKelvin">s, relative change of elongation per K of DIF (finite; usually ≥ 0).</param>
    /// <exception cref="InvalidInputException">An input is not finite.</exception>
    public static double Factor(double difKelvin, double sensitivityPerKelvin)
    {
        var errors = new List<ValidationError>();
        GrowthValidation.Finite(errors, "difK", difKelvin);
        GrowthValidation.Finite(errors, "difSensitivityPerKelvin", sensitivityPerKelvin);
        GrowthValidation.ThrowIfAny(errors);
        return Evaluate(difKelvin, sensitivityPerKelvin);
    }

    internal static double Evaluate(double difKelvin, double sensitivityPerKelvin) =>
        Math.Max(ModelConstants.DifFactorFloor, 1.0 + (sensitivityPerKelvin * difKelvin));
}
