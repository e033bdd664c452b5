using System.Globalization;
using System.Text.RegularExpressions;
using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Core.Plants;

/// <summary>The rules every crop must keep, whether read from a crop file or made in code: units, ranges,
/// provenance and the cross-field rules (cardinal temperatures in order, DLI minimum not above target).</summary>
/// <remarks>
/// Error paths use the crop-file names: <c>balanceNumber.value</c>, <c>balanceNumber.range</c>,
/// <c>balanceNumber.unit</c>, <c>balanceNumber.source</c>, <c>id</c>, <c>name</c>, <c>group</c>, <c>base</c>.
/// Ranges of ordered parameters must not overlap, so that a crop with any one parameter moved to either end of its
/// range (<see cref="CropConversions.WithParameterAtMinimum"/>) is still valid.
/// </remarks>
public static partial class CropValidator
{
    private static readonly Dictionary<string, Rule> Rules = new(StringComparer.Ordinal)
    {
        ["balanceNumber"] = new("1", 0, true, 50, false),
        ["proprioceptiveSensitivity"] = new("1", 0, true, 100, false),
        ["photoCoefficient"] = new("(umol m-2 s-1)^-b", 0, false, 100, false),
        ["photoExponent"] = new("1", 0, false, 2, false),
        ["growthZoneLengthMm"] = new("mm", 0, true, 1000, false),
        ["referenceElongationMmPerDay"] = new("mm/d", 0, true, 200, false),
        ["baseTemperatureC"] = new("°C", -10, false, 50, false),
        ["optimumTemperatureC"] = new("°C", -10, false, 50, false),
        ["maximumTemperatureC"] = new("°C", -10, false, 60, false),
        ["difSensitivityPerKelvin"] = new("K-1", 0, false, 1, false),
        ["shadeAvoidanceSensitivity"] = new("1", 0, false, 10, false),
        ["dliMinimum"] = new("mol m-2 d-1", 0, true, 100, false),
        ["dliTarget"] = new("mol m-2 d-1", 0, true, 100, false),
        ["lowLightStretchPerMole"] = new("(mol m-2 d-1)-1", 0, false, 1, false),
        ["nutationPeriodHours"] = new("h", 0, true, 48, false),
        ["nutationAmplitudeDeg"] = new("deg", 0, false, 90, true),
        ["nutationSense"] = new("1", -1, false, 1, false),
        ["gravitropicDelayHours"] = new("h", 0, false, 24, false),
        ["leafAreaDensityM2PerM3"] = new("m2 m-3", 0, true, 100, false),
        ["leanGradeLimitDeg"] = new("deg", 0, true, 90, true),
        ["heightGradeLimitMm"] = new("mm", 0, true, 5000, false),
    };

    /// <summary>The provenance forms a parameter's source may start with, as shown in error messages.</summary>
    public const string ProvenanceForms =
        "'published: <source>', 'common practice', 'estimate (from memory)', 'calibrated: <site>, <dates>, n = <count>' or 'demo'";

    /// <summary>The unit string a crop file must give for a parameter (e.g. <c>mm</c>, <c>mm/d</c>, <c>°C</c>,
    /// <c>K-1</c>, <c>mol m-2 d-1</c>, <c>h</c>, <c>deg</c>, <c>1</c> for dimensionless).</summary>
    /// <param name="key">One of <see cref="CropConversions.ParameterKeys"/>.</param>
    /// <returns>The expected unit string.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The key is not a parameter key (a programming error).</exception>
    public static string ExpectedUnit(string key) =>
        Rules.TryGetValue(key, out Rule? rule) ? rule.Unit : throw new ArgumentOutOfRangeException(nameof(key), key, "not a crop parameter key");

    /// <summary>The physical limits any value of a parameter must keep (wider than the plausible ranges in the
    /// files), as text such as <c>&gt; 0 and ≤ 50</c>.</summary>
    /// <param name="key">One of <see cref="CropConversions.ParameterKeys"/>.</param>
    /// <returns>The limits as text.</returns>
    public static string LimitsText(string key) =>
        Rules.TryGetValue(key, out Rule? rule) ? rule.Describe() : throw new ArgumentOutOfRangeException(nameof(key), key, "not a crop parameter key");

    /// <summary>Whether a crop id is well formed: lower-case letters and digits in words joined by single hyphens
    /// (<c>pot-chrysanthemum</c>), as crop file names are.</summary>
    /// <param name="id">The id.</param>
    /// <returns>True when well formed.</returns>
    public static bool IsValidId(string? id) => id is not null && IdPattern().IsMatch(id);

    /// <summary>Whether a provenance string starts with one of the allowed forms (<see cref="ProvenanceForms"/>).</summary>
    /// <param name="provenance">The provenance text.</param>
    /// <returns>True when allowed.</returns>
    public static bool IsValidProvenance(string? provenance) => provenance is not null && ProvenancePattern().IsMatch(provenance);

    /// <summary>Every problem with a crop: its header, each parameter and the cross-field rules.</summary>
    /// <param name="crop">The crop.</param>
    /// <returns>The problems, empty when the crop is valid.</returns>
    public static IReadOnlyList<ValidationError> Validate(Crop crop)
    {
        ArgumentNullException.ThrowIfNull(crop);
        var errors = new List<ValidationError>();
        if (!IsValidId(crop.Id))
        {
            errors.Add(new ValidationError("id", $"'{crop.Id}' must be lower-case letters and digits joined by hyphens, e.g. pot-chrysanthemum"));
        }

        if (string.IsNullOrWhiteSpace(crop.Name))
        {
            errors.Add(new ValidationError("name", "must not be empty"));
        }

        if (!Enum.IsDefined(crop.Group))
        {
            errors.Add(new ValidationError("group", $"{(int)crop.Group} is not a crop group"));
        }

        if (crop.BaseId is not null)
        {
            if (!IsValidId(crop.BaseId))
            {
                errors.Add(new ValidationError("base", $"'{crop.BaseId}' is not a well-formed crop id"));
            }
            else if (crop.BaseId == crop.Id)
            {
                errors.Add(new ValidationError("base", "a crop cannot be its own base"));
            }
        }

        foreach (string key in CropConversions.ParameterKeys)
        {
            errors.AddRange(ValidateParameter(key, crop.GetParameter(key)));
        }

        errors.AddRange(ValidateCrossField(crop));
        return errors;
    }

    /// <summary>The problems of one parameter on its own: unit, finite numbers, range order, value inside its range,
    /// physical limits and provenance.</summary>
    /// <param name="key">One of <see cref="CropConversions.ParameterKeys"/>.</param>
    /// <param name="parameter">The parameter.</param>
    /// <returns>The problems, with paths <c>key.value</c>, <c>key.range</c>, <c>key.unit</c>, <c>key.source</c>.</returns>
    public static IReadOnlyList<ValidationError> ValidateParameter(string key, CropParameter parameter)
    {
        ArgumentNullException.ThrowIfNull(parameter);
        if (!Rules.TryGetValue(key, out Rule? rule))
        {
            return [new ValidationError(key, "not a crop parameter")];
        }

        var errors = new List<ValidationError>();
        if (parameter.Unit != rule.Unit)
        {
            errors.Add(new ValidationError($"{key}.unit", $"'{parameter.Unit}' is not the unit of {key}; write \"{rule.Unit}\""));
        }

        bool valueFinite = double.IsFinite(parameter.Value);
        bool rangeFinite = double.IsFinite(parameter.Minimum) && double.IsFinite(parameter.Maximum);
        if (!valueFinite)
        {
            errors.Add(new ValidationError($"{key}.value", $"{Format(parameter.Value)} is not a finite number"));
        }

        if (!rangeFinite)
        {
            errors.Add(new ValidationError($"{key}.range", $"[{Format(parameter.Minimum)}, {Format(parameter.Maximum)}] must hold finite numbers"));
        }

        if (rangeFinite && parameter.Minimum > parameter.Maximum)
        {
            errors.Add(new ValidationError($"{key}.range", $"minimum {Format(parameter.Minimum)} is above maximum {Format(parameter.Maximum)}"));
        }
        else if (rangeFinite && valueFinite && (parameter.Value < parameter.Minimum || parameter.Value > parameter.Maximum))
        {
            errors.Add(new ValidationError($"{key}.value", $"{Format(parameter.Value)} is outside its range [{Format(parameter.Minimum)}, {Format(parameter.Maximum)}]"));
        }

        if (key == "nutationSense")
        {
            if (valueFinite && Math.Abs(parameter.Value) != 1)
            {
                errors.Add(new ValidationError($"{key}.value", $"{Format(parameter.Value)} must be 1 (counter-clockwise seen from above) or -1 (clockwise)"));
            }

            if (rangeFinite && (Math.Abs(parameter.Minimum) != 1 || Math.Abs(parameter.Maximum) != 1))
            {
                errors.Add(new ValidationError($"{key}.range", "must be [-1, 1], [1, 1] or [-1, -1]"));
            }
        }
        else
        {
            if (valueFinite && !rule.Allows(parameter.Value))
            {
                errors.Add(new ValidationError($"{key}.value", $"{Format(parameter.Value)} must be {rule.Describe()}"));
            }

            if (rangeFinite && !(rule.Allows(parameter.Minimum) && rule.Allows(parameter.Maximum)))
            {
                errors.Add(new ValidationError($"{key}.range", $"[{Format(parameter.Minimum)}, {Format(parameter.Maximum)}] must lie within {rule.Describe()}"));
            }
        }

        if (!IsValidProvenance(parameter.Provenance))
        {
            errors.Add(new ValidationError($"{key}.source", $"'{parameter.Provenance}' must start with {ProvenanceForms}"));
        }

        return errors;
    }

    /// <summary>The rules that tie parameters together: base &lt; optimum &lt; maximum temperature and
    /// dliMinimum ≤ dliTarget, for the values and for the ranges (which must not overlap, so that moving any one
    /// parameter to an end of its range keeps the rule).</summary>
    /// <param name="crop">The crop.</param>
    /// <returns>The problems, empty when consistent.</returns>
    public static IReadOnlyList<ValidationError> ValidateCrossField(Crop crop)
    {
        ArgumentNullException.ThrowIfNull(crop);
        var errors = new List<ValidationError>();
        Below(errors, "baseTemperatureC", crop.BaseTemperatureC, "optimumTemperatureC", crop.OptimumTemperatureC, strict: true);
        Below(errors, "optimumTemperatureC", crop.OptimumTemperatureC, "maximumTemperatureC", crop.MaximumTemperatureC, strict: true);
        Below(errors, "dliMinimum", crop.DliMinimum, "dliTarget", crop.DliTarget, strict: false);
        return errors;
    }

    /// <summary>Throws <see cref="InvalidInputException"/> with every problem when the crop is not valid.</summary>
    /// <param name="crop">The crop.</param>
    /// <returns>The same crop, for chaining.</returns>
    public static Crop EnsureValid(Crop crop)
    {
        IReadOnlyList<ValidationError> errors = Validate(crop);
        return errors.Count == 0 ? crop : throw new InvalidInputException(errors);
    }

    private static void Below(List<ValidationError> errors, string lowKey, CropParameter low, string highKey, CropParameter high, bool strict)
    {
        string relation = strict ? "below" : "at most";
        bool Ok(double a, double b) => strict ? a < b : a <= b;
        if (!Ok(low.Value, high.Value))
        {
            errors.Add(new ValidationError($"{highKey}.value", $"{Format(high.Value)} must be {(strict ? "above" : "at least")} {lowKey} ({Format(low.Value)}): {lowKey} must be {relation} {highKey}"));
            return;
        }

        // Ranges that do not overlap keep the rule for every single-parameter extreme (the uncertainty band).
        if (!Ok(low.Maximum, high.Minimum))
        {
            errors.Add(new ValidationError($"{lowKey}.range", $"maximum {Format(low.Maximum)} must be {relation} the minimum of {highKey}.range ({Format(high.Minimum)}), so that any value of either range keeps {lowKey} {relation} {highKey}"));
        }
    }

    private static string Format(double x) => x.ToString(CultureInfo.InvariantCulture);

    [GeneratedRegex("^[a-z0-9]+(-[a-z0-9]+)*$")]
    private static partial Regex IdPattern();

    [GeneratedRegex(@"^(published: \S.*|common practice\b.*|estimate \(from memory\).*|calibrated: [^,]+, [^,]+, n = [0-9]+\b.*|demo\b.*)$", RegexOptions.Singleline)]
    private static partial Regex ProvenancePattern();

    private sealed record Rule(string Unit, double Low, bool LowOpen, double High, bool HighOpen)
    {
        public bool Allows(double x) => (LowOpen ? x > Low : x >= Low) && (HighOpen ? x < High : x <= High);

        public string Describe() =>
            $"{(LowOpen ? ">" : "≥")} {Format(Low)} and {(HighOpen ? "<" : "≤")} {Format(High)}";
    }
}
