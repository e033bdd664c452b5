using System.Collections.Immutable;
using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Core.Plants.Growth;

/// <summary>Which leggy causes are active for a lot over a period, each with its value and limit.</summary>
/// <remarks>
/// Limits: DLI below the crop's <see cref="Crop.DliMinimum"/> (Craver, Boldt &amp; Lopez 2019 for bedding plants);
/// PSS below <see cref="ModelConstants.LegginessPhytochromeStateLimit"/> (0.55, a choice of this project, about 0.13 below
/// the two-window full-sun PSS); DIF above <see cref="ModelConstants.LegginessDifLimitKelvin"/> (+2 K, a choice of this
/// project; common practice holds DIF ≤ 0 for height control); projected height above the crop's
/// <see cref="Crop.HeightGradeLimitMm"/>. A value equal to its limit is not a cause. The forecast turns each cause
/// into a flag (kind, cause, value, limit).
/// </remarks>
/// <param name="Active">The active causes, in the order of <see cref="LegginessCauseKind"/>.</param>
public sealed record LegginessCauses(ImmutableArray<LegginessCause> Active)
{
    /// <summary>Whether any cause is active.</summary>
    public bool Any => !Active.IsDefaultOrEmpty;

    /// <summary>Evaluates the causes for a lot's period.</summary>
    /// <param name="crop">The crop (its DLI minimum and height grade limit).</param>
    /// <param name="meanDliMolPerM2Day">Mean DLI over the period, mol m⁻² d⁻¹ (≥ 0).</param>
    /// <param name="meanPhytochromeState">Mean PSS over the period, in [0, 1].</param>
    /// <param name="meanDifKelvin">Mean DIF over the period, K.</param>
    /// <param name="projectedHeightMm">Projected height at the sale date, mm (≥ 0), or null when not forecast.</param>
    /// <exception cref="InvalidInputException">A value is out of range or not finite.</exception>
    public static LegginessCauses Evaluate(
        Crop crop,
        double meanDliMolPerM2Day,
        double meanPhytochromeState,
        double meanDifKelvin,
        double? projectedHeightMm)
    {
        ArgumentNullException.ThrowIfNull(crop);
        var errors = new List<ValidationError>();
        GrowthValidation.NonNegative(errors, "crop.dliMinimum", crop.DliMinimum.Value);
        GrowthValidation.NonNegative(errors, "crop.heightGradeLimitMm", crop.HeightGradeLimitMm.Value);
        GrowthValidation.NonNegative(errors, "meanDliMolPerM2Day", meanDliMolPerM2Day);
        GrowthValidation.InRange(errors, "meanPhytochromeState", meanPhytochromeState, 0, 1);
        GrowthValidation.Finite(errors, "meanDifK", meanDifKelvin);
        if (projectedHeightMm is { } h)
        {
            GrowthValidation.NonNegative(errors, "projectedHeightMm", h);
        }

        GrowthValidation.ThrowIfAny(errors);
        var active = ImmutableArray.CreateBuilder<LegginessCause>();
        if (meanDliMolPerM2Day < crop.DliMinimum.Value)
        {
            active.Add(new LegginessCause(LegginessCauseKind.LowDli, meanDliMolPerM2Day, crop.DliMinimum.Value, "mol m-2 d-1"));
        }

        if (meanPhytochromeState < ModelConstants.LegginessPhytochromeStateLimit)
        {
            active.Add(new LegginessCause(
                LegginessCauseKind.LowPhytochromeState, meanPhytochromeState, ModelConstants.LegginessPhytochromeStateLimit, "1"));
        }

        if (meanDifKelvin > ModelConstants.LegginessDifLimitKelvin)
        {
            active.Add(new LegginessCause(LegginessCauseKind.HighDif, meanDifKelvin, ModelConstants.LegginessDifLimitKelvin, "K"));
        }

        if (projectedHeightMm is { } height && height > crop.HeightGradeLimitMm.Value)
        {
            active.Add(new LegginessCause(LegginessCauseKind.HeightOverGrade, height, crop.HeightGradeLimitMm.Value, "mm"));
        }

        return new LegginessCauses(active.ToImmutable());
    }
}
