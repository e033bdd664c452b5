using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Core.Sky;

/// <summary>
/// Outside light from a measured log of global horizontal irradiance and/or outside PAR, interpolated linearly between
/// neighbouring readings no further apart than <see cref="MaximumGap"/>; never invented across a longer gap.
/// </summary>
/// <remarks>
/// <para>Each reading becomes a global PPFD: the PAR reading if given, else GHI × 0.47 × 4.57 (Thimijan &amp; Heins 1983).
/// The interpolated PPFD is split into beam and diffuse by Erbs, Klein &amp; Duffie (1982) on the equivalent GHI
/// (PPFD / (0.47 × 4.57)), with the sun's direction from the NREL SPA (Reda &amp; Andreas 2004) and Spencer's (1971)
/// extraterrestrial irradiance; light logged while the sun is below 3° elevation or under the horizon (twilight) is all diffuse.</para>
/// <para>Missing data: inside a <see cref="WeatherGap"/>, before the first reading and after the last one there is no value.
/// <see cref="TryAt"/> then returns false; <see cref="At"/> returns a light whose three PPFD values are NaN (with the
/// true sun direction), which <see cref="IsMissing"/> detects. Callers skip or flag such steps; NaN also poisons any sum
/// that forgets to check, rather than passing for darkness.</para>
/// <para>Immutable and thread-safe.</para>
/// </remarks>
public sealed class MeasuredOutsideLight : IOutsideLightSource
{
    private readonly Instant[] _times;
    private readonly double[] _ppfd;

    /// <summary>Creates the source from readings in increasing time order; every problem is reported at once.</summary>
    /// <param name="records">The readings, strictly increasing in time; values finite and ≥ 0.</param>
    /// <param name="location">Site latitude, longitude and elevation.</param>
    /// <param name="maximumGap">Largest spacing of two readings still interpolated (default <see cref="DefaultMaximumGap"/>, 2 h).</param>
    /// <param name="deltaTSeconds">ΔT = TT − UT1 for the sun position, seconds.</param>
    /// <exception cref="InvalidInputException">The log is empty, out of order or holds invalid values.</exception>
    public MeasuredOutsideLight(
        IEnumerable<WeatherRecord> records,
        GeoLocation location,
        Duration? maximumGap = null,
        double deltaTSeconds = ModelConstants.DefaultDeltaTSeconds)
    {
        ArgumentNullException.ThrowIfNull(records);
        ArgumentNullException.ThrowIfNull(location);
        ImmutableArray<WeatherRecord> all = [.. records];
        Duration gap = maximumGap ?? DefaultMaximumGap;
        List<ValidationError> errors = Validate(all, gap);
        SolarPosition.AddLocationErrors(errors, location);
        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        Records = all;
        Location = location;
        MaximumGap = gap;
        DeltaTSeconds = deltaTSeconds;
        WeatherRecord[] valued = [.. all.Where(r => r.HasValue)];
        _times = [.. valued.Select(r => r.Time)];
        _ppfd = [.. valued.Select(r => r.GlobalHorizontalPpfd ?? SunlightPhotons.PpfdFromGlobal(r.GlobalHorizontalWm2!.Value))];
        var gaps = ImmutableArray.CreateBuilder<WeatherGap>();
        for (int i = 1; i < _times.Length; i++)
        {
            if (_times[i] - _times[i - 1] > gap)
            {
                gaps.Add(new WeatherGap(_times[i - 1], _times[i]));
            }
        }

        Gaps = gaps.ToImmutable();
        Coverage = new Interval(_times[0], _times[^1]);
    }

    /// <summary>Two hours: the default largest spacing between readings that is still interpolated (a choice of this project).</summary>
    public static Duration DefaultMaximumGap { get; } = Duration.FromHours(2);

    /// <summary>The readings as given, including missing ones.</summary>
    public ImmutableArray<WeatherRecord> Records { get; }

    /// <summary>The site.</summary>
    public GeoLocation Location { get; }

    /// <summary>Largest spacing of two readings that is still interpolated.</summary>
    public Duration MaximumGap { get; }

    /// <summary>ΔT used for the sun position, seconds.</summary>
    public double DeltaTSeconds { get; }

    /// <summary>Every stretch between two readings longer than <see cref="MaximumGap"/>, in time order.</summary>
    public ImmutableArray<WeatherGap> Gaps { get; }

    /// <summary>From the first to the last reading with a value (the end is itself covered).</summary>
    public Interval Coverage { get; }

    /// <summary>Whether a light returned by <see cref="At"/> is the "no data" value (NaN PPFD).</summary>
    public static bool IsMissing(OutsideLight light) => double.IsNaN(light.GlobalHorizontalPpfd);

    /// <summary>The light at an instant, or NaN PPFD values where the log has no data (see remarks).</summary>
    public OutsideLight At(Instant time)
    {
        if (TryAt(time, out OutsideLight light))
        {
            return light;
        }

        return light with { DirectNormalPpfd = double.NaN, DiffuseHorizontalPpfd = double.NaN, GlobalHorizontalPpfd = double.NaN };
    }

    /// <summary>The light at an instant; false, with a dark light toward the sun, where the log has no data.</summary>
    public bool TryAt(Instant time, out OutsideLight light)
    {
        Vector3 sun = SolarPosition.SunDirection(time, Location, DeltaTSeconds);
        if (!TryInterpolate(time, out double ppfd))
        {
            light = OutsideLight.Dark(time, sun);
            return false;
        }

        Angle zenith = Direction.Zenith(sun);
        int dayOfYear = time.InUtc().DayOfYear;
        DiffuseSplit split = ErbsDecomposition.Split(SunlightPhotons.GlobalFromPpfd(ppfd), zenith, ExtraterrestrialIrradiance.Spencer(dayOfYear));
        light = SunlightPhotons.ToOutsideLight(time, sun, split.Irradiance);
        return true;
    }

    private bool TryInterpolate(Instant time, out double ppfd)
    {
        ppfd = double.NaN;
        int index = Array.BinarySearch(_times, time);
        if (index >= 0)
        {
            ppfd = _ppfd[index];
            return true;
        }

        int after = ~index;
        if (after == 0 || after == _times.Length)
        {
            return false;
        }

        Instant t0 = _times[after - 1], t1 = _times[after];
        Duration span = t1 - t0;
        if (span > MaximumGap)
        {
            return false;
        }

        double f = (time - t0).TotalTicks / span.TotalTicks;
        ppfd = _ppfd[after - 1] + (f * (_ppfd[after] - _ppfd[after - 1]));
        return true;
    }

    private static List<ValidationError> Validate(ImmutableArray<WeatherRecord> records, Duration maximumGap)
    {
        var errors = new List<ValidationError>();
        if (maximumGap <= Duration.Zero)
        {
            errors.Add(new ValidationError("maximumGap", "must be > 0"));
        }

        if (!records.Any(r => r is not null && r.HasValue))
        {
            errors.Add(new ValidationError("records", "no reading with a value"));
        }

        for (int i = 0; i < records.Length; i++)
        {
            WeatherRecord r = records[i];
            if (r is null)
            {
                errors.Add(new ValidationError($"records[{i}]", "is null"));
                continue;
            }

            if (i > 0 && records[i - 1] is { } previous && r.Time <= previous.Time)
            {
                errors.Add(new ValidationError($"records[{i}].time", "not after the previous reading"));
            }

            CheckValue(errors, $"records[{i}].globalHorizontalWm2", r.GlobalHorizontalWm2);
            CheckValue(errors, $"records[{i}].globalHorizontalPpfd", r.GlobalHorizontalPpfd);
        }

        return errors;
    }

    private static void CheckValue(List<ValidationError> errors, string path, double? value)
    {
        if (value is { } v && !(double.IsFinite(v) && v >= 0))
        {
            errors.Add(new ValidationError(path, "must be a finite number ≥ 0"));
        }
    }
}
