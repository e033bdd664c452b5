using System.Collections.Immutable;
using System.Globalization;
using CanopyAdvisor.Core;
using CanopyAdvisor.Core.Plants.Growth;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Logs;
using NodaTime;

namespace CanopyAdvisor.Files.Temperature;

/// <summary>Reads a site's air temperature log from CSV into <see cref="TemperatureRecord"/>s, rejecting spikes.</summary>
/// <remarks>
/// <para>Format: a header row, then one row per reading, comma-separated without quoting; fields are trimmed; numbers
/// use a dot as decimal separator. Columns (names case-insensitive, any order, other columns ignored):
/// <c>timestamp</c> (ISO-8601 with a UTC offset, e.g. <c>2026-03-01T12:00:00+01:00</c> or <c>…Z</c>) and <c>airC</c>
/// (air temperature, °C; blank = a missing reading). Blank lines and lines starting with <c>#</c> are skipped.</para>
/// <para>Errors: every bad row is reported as <c>file:line: column: message</c> (not a number, outside the physical range
/// −40…60 °C, timestamp not after the previous row, wrong field count), all collected, and nothing is returned from a
/// file with any error (<see cref="InvalidInputException"/>).</para>
/// <para>Spikes are warnings, not errors: a sensor glitch does not make the rest of a log wrong, so the file is read,
/// the spike's reading becomes missing (a null value, bridged later only within the temperature source's maximum gap)
/// and the spike is listed in <see cref="TemperatureLog.Spikes"/> with its file and line for the grower to see. A spike
/// is a reading that differs from both its neighbouring readings, in the same direction, by more than
/// <see cref="SpikeThresholdKelvin"/> (8 K), with both neighbours within <see cref="SpikeWindow"/> (30 min) of it: air in a
/// house does not jump 8 K and back within half an hour (a choice of this project). A step (a change that stays) is
/// not a spike. The first and last readings, readings next to a missing one, and two glitches in a row are not tested.</para>
/// </remarks>
public static class TemperatureLogReader
{
    /// <summary>Name of the timestamp column.</summary>
    public const string TimestampColumn = TimestampedCsv.TimestampColumn;

    /// <summary>Name of the air temperature column, °C.</summary>
    public const string AirColumn = "airC";

    /// <summary>A reading differing from both neighbours by more than this, K, is a spike (8 K, a choice of this project).</summary>
    public const double SpikeThresholdKelvin = 8.0;

    /// <summary>Both neighbours must lie within this time of the reading for the spike test (30 min).</summary>
    public static Duration SpikeWindow { get; } = Duration.FromMinutes(30);

    /// <summary>Reads a log file; errors name the file by its file name.</summary>
    /// <exception cref="InvalidInputException">The file has one or more bad rows or a bad header; every problem is listed.</exception>
    public static TemperatureLog ReadFile(string path)
    {
        using var reader = new StreamReader(path);
        return Read(reader, Path.GetFileName(path));
    }

    /// <summary>Reads a log from text; <paramref name="fileName"/> names it in messages.</summary>
    /// <exception cref="InvalidInputException">The text has one or more bad rows or a bad header; every problem is listed.</exception>
    public static TemperatureLog Parse(string text, string fileName)
    {
        using var reader = new StringReader(text);
        return Read(reader, fileName);
    }

    /// <summary>Reads a log from a text reader; <paramref name="fileName"/> names it in messages.</summary>
    /// <exception cref="InvalidInputException">The input has one or more bad rows or a bad header; every problem is listed.</exception>
    public static TemperatureLog Read(TextReader reader, string fileName)
    {
        List<TimestampedRow<double?>> rows = TimestampedCsv.Read(
            reader,
            fileName,
            [AirColumn],
            present => present[0] ? null : $"missing column {AirColumn}",
            $"empty: expected a header row with {TimestampColumn} and {AirColumn}",
            (values, where, errors) => values[0] is string air ? ParseAir(air, where, errors) : null);
        ImmutableArray<TemperatureSpike> spikes = FindSpikes(rows);
        var spikeTimes = new HashSet<Instant>(spikes.Select(s => s.Time));
        ImmutableArray<TemperatureRecord> records =
            [.. rows.Select(r => new TemperatureRecord(r.Time, spikeTimes.Contains(r.Time) ? null : r.Values))];
        return new TemperatureLog(records, spikes);
    }

    private static ImmutableArray<TemperatureSpike> FindSpikes(List<TimestampedRow<double?>> rows)
    {
        var spikes = ImmutableArray.CreateBuilder<TemperatureSpike>();
        for (int i = 1; i < rows.Count - 1; i++)
        {
            if (rows[i - 1].Values is not { } before || rows[i].Values is not { } value || rows[i + 1].Values is not { } after)
            {
                continue;
            }

            if (rows[i].Time - rows[i - 1].Time > SpikeWindow || rows[i + 1].Time - rows[i].Time > SpikeWindow)
            {
                continue;
            }

            double up = Math.Min(value - before, value - after);
            double down = Math.Min(before - value, after - value);
            if (up > SpikeThresholdKelvin || down > SpikeThresholdKelvin)
            {
                spikes.Add(new TemperatureSpike(rows[i].Where, rows[i].Time, value, before, after));
            }
        }

        return spikes.ToImmutable();
    }

    private static double? ParseAir(string field, string where, List<ValidationError> errors)
    {
        if (field.Length == 0)
        {
            return null;
        }

        if (!double.TryParse(field, NumberStyles.Float, CultureInfo.InvariantCulture, out double value) || !double.IsFinite(value))
        {
            errors.Add(new ValidationError(where, $"{AirColumn}: not a number"));
            return null;
        }

        if (value < ModelConstants.AirTemperatureMinimumC || value > ModelConstants.AirTemperatureMaximumC)
        {
            errors.Add(new ValidationError(
                where,
                FormattableString.Invariant(
                    $"{AirColumn}: {value} °C is outside the physical range {ModelConstants.AirTemperatureMinimumC}…{ModelConstants.AirTemperatureMaximumC} °C")));
            return null;
        }

        return value;
    }
}
