using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Core.Plants.Growth;

/// <summary>
/// Relative development or elongation rate as a function of temperature: the beta function of Yan &amp; Hunt (1999,
/// Annals of Botany 84:607–614, eq. 4).
/// </summary>
/// <remarks>
/// r(T) = ((Tmax − T)/(Tmax − Topt)) · ((T − Tmin)/(Topt − Tmin))^((Topt − Tmin)/(Tmax − Topt)) for Tmin &lt; T &lt; Tmax,
/// else 0. r(Topt) = 1, r rises monotonically from Tmin to Topt and falls monotonically from Topt to Tmax; the
/// curve is skewed towards Tmax when the optimum lies nearer the maximum (the usual case).
/// </remarks>
public static class CardinalTemperatureResponse
{
    /// <summary>The relative rate r(T) in [0, 1] for cardinal temperatures given directly.</summary>
    /// <param name="temperatureC">Air temperature, °C (finite).</param>
    /// <param name="baseTemperatureC">Tmin, °C: no growth at or below.</param>
    /// <param name="optimumTemperatureC">Topt, °C: r = 1.</param>
    /// <param name="maximumTemperatureC">Tmax, °C: no growth at or above.</param>
    /// <exception cref="InvalidInputException">A value is not finite, or not Tmin &lt; Topt &lt; Tmax.</exception>
    public static double Relative(double temperatureC, double baseTemperatureC, double optimumTemperatureC, double maximumTemperatureC)
    {
        var errors = new List<ValidationError>();
        GrowthValidation.Finite(errors, "temperatureC", temperatureC);
        GrowthValidation.Cardinal(errors, string.Empty, baseTemperatureC, optimumTemperatureC, maximumTemperatureC);
        GrowthValidation.ThrowIfAny(errors);
        return Evaluate(temperatureC, baseTemperatureC, optimumTemperatureC, maximumTemperatureC);
    }

    /// <summary>The relative rate r(T) in [0, 1] with the crop's cardinal temperatures.</summary>
    /// <exception cref="InvalidInputException">The temperature is not finite or the crop's cardinal temperatures are not ordered (paths <c>crop.baseTemperatureC</c>, …).</exception>
    public static double Relative(double temperatureC, Crop crop)
    {
        ArgumentNullException.ThrowIfNull(crop);
        var errors = new List<ValidationError>();
        GrowthValidation.Finite(errors, "temperatureC", temperatureC);
        GrowthValidation.Cardinal(errors, "crop.", crop.BaseTemperatureC.Value, crop.OptimumTemperatureC.Value, crop.MaximumTemperatureC.Value);
        GrowthValidation.ThrowIfAny(errors);
        return Evaluate(temperatureC, crop.BaseTemperatureC.Value, crop.OptimumTemperatureC.Value, crop.MaximumTemperatureC.Value);
    }

    /// <summary>The beta function without checks (callers have validated).</summary>
    internal static double Evaluate(double t, double tMin, double tOpt, double tMax)
    {
        if (t <= tMin || t >= tMax)
        {
            return 0.0;
        }

        double exponent = (tOpt - tMin) / (tMax - tOpt);
        return (tMax - t) / (tMax - tOpt) * Math.Pow((t - tMin) / (tOpt - tMin), exponent);
    }
}
