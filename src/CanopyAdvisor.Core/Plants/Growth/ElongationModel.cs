using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Core.Plants.Growth;

/// <summary>
/// Stem elongation rate: Ė = Ė_ref · r(T) · f_DIF · f_shade · f_lowlight (MODEL.md §5).
/// </summary>
/// <remarks>
/// <para>Ė_ref is the crop's <see cref="Crop.ReferenceElongationMmPerDay"/> at the optimum temperature (mm d⁻¹);
/// r(T) is the cardinal-temperature beta function of Yan &amp; Hunt (1999, Ann Bot 84:607); f_DIF follows Erwin, Heins
/// &amp; Karlsson (1989, Am J Bot 76:47); f_shade is linear in the phytochrome photostationary state (Smith 1982); f_lowlight
/// rises with the DLI shortfall below the crop's minimum (Craver, Boldt &amp; Lopez 2019 for the minimum). The factors
/// multiply: each is a relative change measured with the others held near their reference, and a product is the
/// simplest combination that keeps r(T) = 0 meaning no growth whatever the stretch; interactions (for example a DIF
/// response that depends on light) are not modelled.</para>
/// <para>Units: <see cref="RateMmPerDay"/> returns mm d⁻¹, <see cref="RateMetresPerHour"/> m h⁻¹ for the stem model
/// (1 mm d⁻¹ = 1/24 000 m h⁻¹). Pure functions: no state, no clock.</para>
/// </remarks>
public static class ElongationModel
{
    /// <summary>The four factors for one step.</summary>
    /// <exception cref="InvalidInputException">A crop parameter or a condition is invalid; paths <c>crop.…</c> and <c>conditions.…</c>.</exception>
    public static ElongationFactors Factors(Crop crop, ElongationConditions conditions)
    {
        ArgumentNullException.ThrowIfNull(crop);
        ArgumentNullException.ThrowIfNull(conditions);
        var errors = new List<ValidationError>();
        GrowthValidation.Crop(errors, crop);
        GrowthValidation.Finite(errors, "conditions.airTemperatureC", conditions.AirTemperatureC);
        GrowthValidation.Finite(errors, "conditions.difK", conditions.DifKelvin);
        GrowthValidation.InRange(errors, "conditions.phytochromeState", conditions.PhytochromeState, 0, 1);
        GrowthValidation.NonNegative(errors, "conditions.recentDliMolPerM2Day", conditions.RecentDliMolPerM2Day);
        GrowthValidation.ThrowIfAny(errors);
        return new ElongationFactors(
            CardinalTemperatureResponse.Evaluate(
                conditions.AirTemperatureC,
                crop.BaseTemperatureC.Value,
                crop.OptimumTemperatureC.Value,
                crop.MaximumTemperatureC.Value),
            DifResponse.Evaluate(conditions.DifKelvin, crop.DifSensitivityPerKelvin.Value),
            ShadeAvoidanceResponse.Evaluate(conditions.PhytochromeState, crop.ShadeAvoidanceSensitivity.Value),
            LowLightResponse.Evaluate(conditions.RecentDliMolPerM2Day, crop.DliMinimum.Value, crop.LowLightStretchPerMole.Value));
    }

    /// <summary>The elongation rate, mm d⁻¹.</summary>
    /// <exception cref="InvalidInputException">A crop parameter or a condition is invalid.</exception>
    public static double RateMmPerDay(Crop crop, ElongationConditions conditions)
    {
        ElongationFactors factors = Factors(crop, conditions);
        return crop.ReferenceElongationMmPerDay.Value * factors.Product;
    }

    /// <summary>The elongation rate, m h⁻¹ (the unit of the stem model).</summary>
    /// <exception cref="InvalidInputException">A crop parameter or a condition is invalid.</exception>
    public static double RateMetresPerHour(Crop crop, ElongationConditions conditions) =>
        RateMmPerDay(crop, conditions) / ModelConstants.MillimetresPerMetre / HoursPerDay;


    private const double HoursPerDay = ModelConstants.SecondsPerDay / ModelConstants.SecondsPerHour;
}
