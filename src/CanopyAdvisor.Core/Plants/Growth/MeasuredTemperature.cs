using System.Collections.Concurrent;
using System.Collections.Immutable;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Core.Plants.Growth;

/// <summary>
/// Air temperature from a measured log, interpolated linearly between neighbouring readings no further apart than
/// <see cref="MaximumGap"/>; never invented across a longer gap, before the first or after the last reading.
/// </summary>
/// <remarks>
/// <para>Missing readings (null values, such as rejected spikes) are dropped; the readings around them are then
/// bridged only if they lie within the maximum gap. <see cref="AirTemperatureC"/> returns NaN where nothing is known,
/// and every unbridged stretch is listed in <see cref="Gaps"/>.</para>
/// <para><see cref="DayNightMeans"/> integrates the piecewise-linear log exactly (trapezoids clipped to day and night,
/// day from sunrise to sunset by the NREL SPA, Reda &amp; Andreas 2004) over the known part of each period; a period
/// known for less than <see cref="MinimumCoverage"/> of its length has mean NaN and the date's DIF is NaN.</para>
/// <para>Immutable and thread-safe.</para>
/// </remarks>
public sealed class MeasuredTemperature : ITemperatureSource
{
    private readonly Instant[] _times;
    private readonly double[] _values;
    private readonly ConcurrentDictionary<LocalDate, SiteDay> _days = new();

    /// <summary>Creates the source from readings in strictly increasing time order; every problem is reported at once.</summary>
    /// <param name="records">The readings; values in [−40, 60] °C or null (missing); at least one value.</param>
    /// <param name="location">The site's location (for sunrise and sunset).</param>
    /// <param name="zone">The site's time zone (local dates).</param>
    /// <param name="maximumGap">Largest spacing still interpolated (default <see cref="DefaultMaximumGap"/>, 1 h).</param>
    /// <param name="minimumCoverage">Fraction of a day or night period that must be known for its mean (default 0.9).</param>
    /// <exception cref="InvalidInputException">The log is empty, out of order or holds invalid values; paths <c>records[i].airC</c>, ….</exception>
    public MeasuredTemperature(
        IEnumerable<TemperatureRecord> records,
        GeoLocation location,
        DateTimeZone zone,
        Duration? maximumGap = null,
        double minimumCoverage = DefaultMinimumCoverage)
    {
        ArgumentNullException.ThrowIfNull(records);
        ArgumentNullException.ThrowIfNull(location);
        ArgumentNullException.ThrowIfNull(zone);
        ImmutableArray<TemperatureRecord> all = [.. records];
        Duration gap = maximumGap ?? DefaultMaximumGap;
        var errors = new List<ValidationError>();
        if (gap <= Duration.Zero)
        {
            errors.Add(new ValidationError("maximumGap", "must be > 0"));
        }

        GrowthValidation.InRange(errors, "minimumCoverage", minimumCoverage, 0, 1);
        for (int i = 0; i < all.Length; i++)
        {
            if (all[i] is null)
            {
                errors.Add(new ValidationError($"records[{i}]", "must not be null"));
                continue;
            }

            if (all[i].AirC is { } v)
            {
                GrowthValidation.InRange(
                    errors, $"records[{i}].airC", v, ModelConstants.AirTemperatureMinimumC, ModelConstants.AirTemperatureMaximumC);
            }

            if (i > 0 && all[i - 1] is { } before && all[i].Time <= before.Time)
            {
                errors.Add(new ValidationError($"records[{i}].time", $"must be after records[{i - 1}].time"));
            }
        }

        if (!all.Any(r => r?.AirC is not null))
        {
            errors.Add(new ValidationError("records", "no reading with a value"));
        }

        SolarPosition.AddLocationErrors(errors, location);
        GrowthValidation.ThrowIfAny(errors);

        Records = all;
        Location = location;
        Zone = zone;
        MaximumGap = gap;
        MinimumCoverage = minimumCoverage;
        TemperatureRecord[] valued = [.. all.Where(r => r.AirC is not null)];
        _times = [.. valued.Select(r => r.Time)];
        _values = [.. valued.Select(r => r.AirC!.Value)];
        var gaps = ImmutableArray.CreateBuilder<TemperatureGap>();
        for (int i = 1; i < _times.Length; i++)
        {
            if (_times[i] - _times[i - 1] > gap)
            {
                gaps.Add(new TemperatureGap(_times[i - 1], _times[i]));
            }
        }

        Gaps = gaps.ToImmutable();
        Coverage = new Interval(_times[0], _times[^1]);
    }

    /// <summary>One hour: the default largest spacing between readings still interpolated (a choice of this project).</summary>
    public static Duration DefaultMaximumGap { get; } = Duration.FromHours(1);

    /// <summary>0.9: the default fraction of a day or night period that must be known for its mean (a choice of this project).</summary>
    public const double DefaultMinimumCoverage = 0.9;

    /// <summary>The readings as given, including missing ones.</summary>
    public ImmutableArray<TemperatureRecord> Records { get; }

    /// <summary>The site's location.</summary>
    public GeoLocation Location { get; }

    /// <summary>The site's time zone.</summary>
    public DateTimeZone Zone { get; }

    /// <summary>Largest spacing of two readings still interpolated.</summary>
    public Duration MaximumGap { get; }

    /// <summary>Fraction of a period that must be known for its mean.</summary>
    public double MinimumCoverage { get; }

    /// <summary>Every stretch between two valued readings further apart than <see cref="MaximumGap"/>.</summary>
    public ImmutableArray<TemperatureGap> Gaps { get; }

    /// <summary>From the first to the last valued reading (inclusive).</summary>
    public Interval Coverage { get; }

    /// <inheritdoc />
    public double AirTemperatureC(Instant time)
    {
        int i = Array.BinarySearch(_times, time);
        if (i >= 0)
        {
            return _values[i];
        }

        int after = ~i;
        if (after == 0 || after == _times.Length)
        {
            return double.NaN;
        }

        Instant t0 = _times[after - 1];
        Instant t1 = _times[after];
        if (t1 - t0 > MaximumGap)
        {
            return double.NaN;
        }

        double f = (time - t0).TotalSeconds / (t1 - t0).TotalSeconds;
        return _values[after - 1] + (f * (_values[after] - _values[after - 1]));
    }

    /// <inheritdoc />
    public DayNightTemperatures DayNightMeans(LocalDate date)
    {
        SiteDay day = _days.GetOrAdd(date, d => SiteDay.For(d, Location, Zone));
        var night = new List<(Instant Start, Instant End)>();
        Instant cursor = day.Start;
        foreach ((Instant s, Instant e) in day.Day.OrderBy(d => d.Start))
        {
            if (s > cursor)
            {
                night.Add((cursor, s));
            }

            cursor = e;
        }

        if (cursor < day.End)
        {
            night.Add((cursor, day.End));
        }

        (double dayMean, double dayCoverage) = Mean(day.Day);
        (double nightMean, double nightCoverage) = Mean(night);
        double dayHours = day.DayHours;
        double nightHours = day.NightHours;
        double dif = dayHours <= 0 || nightHours <= 0 ? 0.0 : dayMean - nightMean;
        return new DayNightTemperatures(date, day.Kind, dayMean, nightMean, dif, dayHours, nightHours, dayCoverage, nightCoverage);
    }

    /// <summary>Exact time-weighted mean of the interpolated log over intervals, and the known fraction.</summary>
    private (double Mean, double Coverage) Mean(IEnumerable<(Instant Start, Instant End)> intervals)
    {
        double total = 0, known = 0, integral = 0;
        foreach ((Instant a, Instant b) in intervals)
        {
            total += (b - a).TotalSeconds;
            int first = Array.BinarySearch(_times, a);
            first = Math.Max(1, first >= 0 ? first + 1 : ~first);
            for (int i = first; i < _times.Length && _times[i - 1] < b; i++)
            {
                Instant t0 = _times[i - 1];
                Instant t1 = _times[i];
                if (t1 <= a || t1 - t0 > MaximumGap)
                {
                    continue;
                }

                Instant lo = t0 > a ? t0 : a;
                Instant hi = t1 < b ? t1 : b;
                double seconds = (hi - lo).TotalSeconds;
                known += seconds;
                integral += seconds * 0.5 * (AirTemperatureC(lo) + AirTemperatureC(hi));
            }
        }

        if (total <= 0)
        {
            return (double.NaN, 0.0);
        }

        double coverage = known / total;
        return (coverage >= MinimumCoverage && known > 0 ? integral / known : double.NaN, coverage);
    }
}
