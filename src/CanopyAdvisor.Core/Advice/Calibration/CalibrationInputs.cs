using System.Collections.Frozen;
using System.Collections.Immutable;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Core.Advice.Calibration;

/// <summary>The inputs of a calibration as the calibrate command and the service take them: the names a user may give
/// the fitted parameters, and the default "now" of the fit.</summary>
public static class CalibrationInputs
{
    private static readonly FrozenDictionary<string, string> Aliases = new Dictionary<string, string>(StringComparer.OrdinalIgnoreCase)
    {
        ["M"] = "photoCoefficient",
        ["photoCoefficient"] = "photoCoefficient",
        ["gamma"] = "proprioceptiveSensitivity",
        ["γ"] = "proprioceptiveSensitivity",
        ["proprioceptiveSensitivity"] = "proprioceptiveSensitivity",
        ["B"] = "balanceNumber",
        ["balanceNumber"] = "balanceNumber",
    }.ToFrozenDictionary(StringComparer.OrdinalIgnoreCase);

    /// <summary>The crop-file keys of the parameters named (M, gamma/γ, B or their keys, any case), in order.</summary>
    /// <param name="names">The names given.</param>
    /// <param name="path">The path of the names in errors (e.g. <c>--params</c> or <c>parameters</c>).</param>
    /// <exception cref="InvalidInputException">An unknown name (each one listed), or none at all.</exception>
    public static ImmutableArray<string> ParameterKeys(IEnumerable<string> names, string path)
    {
        ArgumentNullException.ThrowIfNull(names);
        var keys = new List<string>();
        var errors = new List<ValidationError>();
        foreach (string name in names)
        {
            if (Aliases.TryGetValue(name.Trim(), out string? key))
            {
                keys.Add(key);
            }
            else
            {
                errors.Add(new ValidationError(path, $"'{name}' is not a parameter to fit; use M, gamma and B (or photoCoefficient, proprioceptiveSensitivity, balanceNumber)"));
            }
        }

        if (keys.Count == 0 && errors.Count == 0)
        {
            errors.Add(new ValidationError(path, "name at least one of M, gamma, B"));
        }

        return errors.Count > 0 ? throw new InvalidInputException(errors) : [.. keys];
    }

    /// <summary>The default "now" of a fit: the last observation, or noon of the latest height measurement of an
    /// observed bench's lot when that is later (a forecast cannot start before the lot's height was measured).</summary>
    /// <param name="site">The site.</param>
    /// <param name="observations">The observations (at least one).</param>
    public static Instant DefaultNow(Site site, IReadOnlyList<LeanObservation> observations)
    {
        ArgumentNullException.ThrowIfNull(site);
        ArgumentNullException.ThrowIfNull(observations);
        if (observations.Count == 0)
        {
            throw new InvalidInputException("observations", "no observations to calibrate from");
        }

        Instant last = observations.Max(o => o.At);
        var benches = new HashSet<string>(observations.Select(o => o.BenchId), StringComparer.Ordinal);
        foreach (Lot lot in site.Lots.IsDefault ? [] : site.Lots)
        {
            if (lot is not null && benches.Contains(lot.BenchId))
            {
                Instant heightMeasured = lot.MeasuredOn.At(new LocalTime(12, 0)).InZoneLeniently(site.Zone).ToInstant();
                last = heightMeasured > last ? heightMeasured : last;
            }
        }

        return last;
    }
}
