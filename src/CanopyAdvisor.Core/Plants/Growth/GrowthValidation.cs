using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Core.Plants.Growth;

/// <summary>Input checks shared by the elongation models; every problem is collected with its path.</summary>
internal static class GrowthValidation
{
    public static void Finite(List<ValidationError> errors, string path, double value)
    {
        if (!double.IsFinite(value))
        {
            errors.Add(new ValidationError(path, "must be a finite number"));
        }
    }

    public static void NonNegative(List<ValidationError> errors, string path, double value)
    {
        if (!double.IsFinite(value))
        {
            errors.Add(new ValidationError(path, "must be a finite number"));
        }
        else if (value < 0)
        {
            errors.Add(new ValidationError(path, "must be ≥ 0"));
        }
    }

    public static void InRange(List<ValidationError> errors, string path, double value, double min, double max)
    {
        if (!double.IsFinite(value))
        {
            errors.Add(new ValidationError(path, "must be a finite number"));
        }
        else if (value < min || value > max)
        {
            errors.Add(new ValidationError(path, $"must be in [{min}, {max}]"));
        }
    }

    /// <summary>Base &lt; optimum &lt; maximum, all finite.</summary>
    public static void Cardinal(List<ValidationError> errors, string prefix, double baseC, double optimumC, double maximumC)
    {
        int before = errors.Count;
        Finite(errors, prefix + "baseTemperatureC", baseC);
        Finite(errors, prefix + "optimumTemperatureC", optimumC);
        Finite(errors, prefix + "maximumTemperatureC", maximumC);
        if (errors.Count > before)
        {
            return;
        }

        if (baseC >= optimumC)
        {
            errors.Add(new ValidationError(prefix + "baseTemperatureC", $"must be below the optimum ({optimumC} °C)"));
        }

        if (optimumC >= maximumC)
        {
            errors.Add(new ValidationError(prefix + "maximumTemperatureC", $"must be above the optimum ({optimumC} °C)"));
        }
    }

    /// <summary>The crop parameters the elongation model reads, with paths <c>crop.…</c>.</summary>
    public static void Crop(List<ValidationError> errors, Crop crop)
    {
        NonNegative(errors, "crop.referenceElongationMmPerDay", crop.ReferenceElongationMmPerDay.Value);
        Cardinal(errors, "crop.", crop.BaseTemperatureC.Value, crop.OptimumTemperatureC.Value, crop.MaximumTemperatureC.Value);
        Finite(errors, "crop.difSensitivityPerKelvin", crop.DifSensitivityPerKelvin.Value);
        NonNegative(errors, "crop.shadeAvoidanceSensitivity", crop.ShadeAvoidanceSensitivity.Value);
        NonNegative(errors, "crop.dliMinimum", crop.DliMinimum.Value);
        NonNegative(errors, "crop.lowLightStretchPerMole", crop.LowLightStretchPerMole.Value);
    }

    public static void ThrowIfAny(List<ValidationError> errors)
    {
        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }
    }
}
