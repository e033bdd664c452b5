using CanopyAdvisor.Core.Geometry;
using NodaTime;

namespace CanopyAdvisor.Core.Plants;

/// <summary>Conversions from a <see cref="Crop"/> (file units: mm, hours, degrees) to model units, and access to its
/// parameters by their crop-file key (for the forecast's uncertainty band, MODEL.md §7).</summary>
public static class CropConversions
{
    // A unit definition (SI), not a model constant.

    private static readonly (string Key, Func<Crop, CropParameter> Get, Func<Crop, CropParameter, Crop> Set)[] Accessors =
    [
        ("balanceNumber", c => c.BalanceNumber, (c, p) => c with { BalanceNumber = p }),
        ("proprioceptiveSensitivity", c => c.ProprioceptiveSensitivity, (c, p) => c with { ProprioceptiveSensitivity = p }),
        ("photoCoefficient", c => c.PhotoCoefficient, (c, p) => c with { PhotoCoefficient = p }),
        ("photoExponent", c => c.PhotoExponent, (c, p) => c with { PhotoExponent = p }),
        ("growthZoneLengthMm", c => c.GrowthZoneLengthMm, (c, p) => c with { GrowthZoneLengthMm = p }),
        ("referenceElongationMmPerDay", c => c.ReferenceElongationMmPerDay, (c, p) => c with { ReferenceElongationMmPerDay = p }),
        ("baseTemperatureC", c => c.BaseTemperatureC, (c, p) => c with { BaseTemperatureC = p }),
        ("optimumTemperatureC", c => c.OptimumTemperatureC, (c, p) => c with { OptimumTemperatureC = p }),
        ("maximumTemperatureC", c => c.MaximumTemperatureC, (c, p) => c with { MaximumTemperatureC = p }),
        ("difSensitivityPerKelvin", c => c.DifSensitivityPerKelvin, (c, p) => c with { DifSensitivityPerKelvin = p }),
        ("shadeAvoidanceSensitivity", c => c.ShadeAvoidanceSensitivity, (c, p) => c with { ShadeAvoidanceSensitivity = p }),
        ("dliMinimum", c => c.DliMinimum, (c, p) => c with { DliMinimum = p }),
        ("dliTarget", c => c.DliTarget, (c, p) => c with { DliTarget = p }),
        ("lowLightStretchPerMole", c => c.LowLightStretchPerMole, (c, p) => c with { LowLightStretchPerMole = p }),
        ("nutationPeriodHours", c => c.NutationPeriodHours, (c, p) => c with { NutationPeriodHours = p }),
        ("nutationAmplitudeDeg", c => c.NutationAmplitudeDeg, (c, p) => c with { NutationAmplitudeDeg = p }),
        ("nutationSense", c => c.NutationSense, (c, p) => c with { NutationSense = p }),
        ("gravitropicDelayHours", c => c.GravitropicDelayHours, (c, p) => c with { GravitropicDelayHours = p }),
        ("leafAreaDensityM2PerM3", c => c.LeafAreaDensityM2PerM3, (c, p) => c with { LeafAreaDensityM2PerM3 = p }),
        ("leanGradeLimitDeg", c => c.LeanGradeLimitDeg, (c, p) => c with { LeanGradeLimitDeg = p }),
        ("heightGradeLimitMm", c => c.HeightGradeLimitMm, (c, p) => c with { HeightGradeLimitMm = p }),
    ];

    /// <summary>The crop-file keys of every parameter, in the order of the <see cref="Crop"/> record: each is the
    /// record's property name in camelCase (<c>balanceNumber</c>, …, <c>heightGradeLimitMm</c>).</summary>
    public static IReadOnlyList<string> ParameterKeys { get; } = Array.AsReadOnly(Accessors.Select(a => a.Key).ToArray());

    /// <summary>The stem-model parameters of a crop, in model units: mm → m, hours → <see cref="Duration"/>,
    /// degrees → <see cref="Angle"/>; the nutation sense is rounded to ±1 (a valid crop holds exactly ±1).</summary>
    /// <param name="crop">The crop (validated by <see cref="CropValidator"/>).</param>
    /// <returns>The parameters of the AC stem model (MODEL.md §4).</returns>
    public static StemParameters ToStemParameters(this Crop crop)
    {
        ArgumentNullException.ThrowIfNull(crop);
        return new StemParameters(
            crop.BalanceNumber.Value,
            crop.ProprioceptiveSensitivity.Value,
            crop.PhotoCoefficient.Value,
            crop.PhotoExponent.Value,
            crop.GrowthZoneLengthMm.Value / ModelConstants.MillimetresPerMetre,
            Duration.FromHours(crop.NutationPeriodHours.Value),
            Angle.FromDegrees(crop.NutationAmplitudeDeg.Value),
            crop.NutationSense.Value < 0 ? -1 : 1,
            Duration.FromHours(crop.GravitropicDelayHours.Value));
    }

    /// <summary>Whether <paramref name="key"/> names a crop parameter (see <see cref="ParameterKeys"/>).</summary>
    /// <param name="key">A crop-file key, case-sensitive.</param>
    /// <returns>True for one of the 21 parameter keys.</returns>
    public static bool IsParameterKey(string key) => Array.Exists(Accessors, a => a.Key == key);

    /// <summary>The parameter of a crop named by its crop-file key.</summary>
    /// <param name="crop">The crop.</param>
    /// <param name="key">One of <see cref="ParameterKeys"/>.</param>
    /// <returns>The parameter.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The key is not a parameter key (a programming error).</exception>
    public static CropParameter GetParameter(this Crop crop, string key)
    {
        ArgumentNullException.ThrowIfNull(crop);
        return Find(key).Get(crop);
    }

    /// <summary>The crop with one parameter replaced (not validated: see <see cref="CropValidator"/>).</summary>
    /// <param name="crop">The crop.</param>
    /// <param name="key">One of <see cref="ParameterKeys"/>.</param>
    /// <param name="parameter">The new parameter.</param>
    /// <returns>A copy of the crop with that parameter.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The key is not a parameter key (a programming error).</exception>
    public static Crop WithParameter(this Crop crop, string key, CropParameter parameter)
    {
        ArgumentNullException.ThrowIfNull(crop);
        ArgumentNullException.ThrowIfNull(parameter);
        return Find(key).Set(crop, parameter);
    }

    /// <summary>The crop with one parameter's value replaced, keeping its unit, range and provenance (not validated: a
    /// value outside the range makes an invalid crop, see <see cref="CropValidator"/>).</summary>
    /// <param name="crop">The crop.</param>
    /// <param name="key">One of <see cref="ParameterKeys"/>.</param>
    /// <param name="value">The new value, in the parameter's unit.</param>
    /// <returns>A copy of the crop with that value.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The key is not a parameter key (a programming error).</exception>
    public static Crop WithParameter(this Crop crop, string key, double value)
    {
        CropParameter p = crop.GetParameter(key);
        return crop.WithParameter(key, p.WithValue(value));
    }

    /// <summary>The crop with one parameter's value set to the lower end of its range, for the forecast's
    /// uncertainty band (MODEL.md §7). A crop that passes <see cref="CropValidator"/> stays valid: its ranges are
    /// checked against the other parameters' values.</summary>
    /// <param name="crop">The crop.</param>
    /// <param name="key">One of <see cref="ParameterKeys"/>.</param>
    /// <returns>A copy of the crop with that parameter at its minimum.</returns>
    public static Crop WithParameterAtMinimum(this Crop crop, string key)
    {
        CropParameter p = crop.GetParameter(key);
        return crop.WithParameter(key, p.WithValue(p.Minimum));
    }

    /// <summary>The crop with one parameter's value set to the upper end of its range (see
    /// <see cref="WithParameterAtMinimum"/>).</summary>
    /// <param name="crop">The crop.</param>
    /// <param name="key">One of <see cref="ParameterKeys"/>.</param>
    /// <returns>A copy of the crop with that parameter at its maximum.</returns>
    public static Crop WithParameterAtMaximum(this Crop crop, string key)
    {
        CropParameter p = crop.GetParameter(key);
        return crop.WithParameter(key, p.WithValue(p.Maximum));
    }

    private static (string Key, Func<Crop, CropParameter> Get, Func<Crop, CropParameter, Crop> Set) Find(string key)
    {
        foreach (var a in Accessors)
        {
            if (a.Key == key)
            {
                return a;
            }
        }

        throw new ArgumentOutOfRangeException(nameof(key), key, "not a crop parameter key");
    }
}
