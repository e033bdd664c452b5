using System.Collections.Immutable;
using System.Globalization;
using CanopyAdvisor.Core;
using CanopyAdvisor.Core.Plants.Growth;
using CanopyAdvisor.Core.Validation;
using NodaTime;
using NodaTime.Text;

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
    public const string TimestampColumn = "timestamp";

    /// <summary>Name of the air temperature column, °C.</summary>
    public const string AirColumn = "airC";

    /// <summary>A reading differing from both neighbours by more than this, K, is a spike (8 K, a choice of this project).</summary>
    public const double SpikeThresholdKelvin = 8.0;

    /// <summary>Both neighbours must lie within this time of the reading for the spike test (30 min).</summary>
    public static Duration SpikeWindow { get; } = Duration.FromMinutes(30);

    private static readonly IPattern<OffsetDateTime> TimestampPattern = new CompositePatternBuilder<OffsetDateTime>
    {
        { OffsetDateTimePattern.ExtendedIso, _ => true },
        { OffsetDateTimePattern.CreateWithInvariantCulture("uuuu'-'MM'-'dd'T'HH':'mmo<G>"), _ => false },
    }.Build();

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
        ArgumentNullException.ThrowIfNull(reader);
        var errors = new List<ValidationError>();
        var rows = new List<Row>();
        Header? header = null;
        Instant? previous = null;
        int previousLine = 0;
        int lineNumber = 0;
        for (string? line = reader.ReadLine(); line is not null; line = reader.ReadLine())
        {
            lineNumber++;
            string content = lineNumber == 1 ? line.TrimStart('\uFEFF') : line;
            if (string.IsNullOrWhiteSpace(content) || content.TrimStart().StartsWith('#'))
            {
                continue;
            }

            string[] fields = [.. content.Split(',').Select(f => f.Trim())];
            string where = $"{fileName}:{lineNumber}";
            if (header is null)
            {
                header = Header.Parse(fields, where, errors);
                if (header is null)
                {
                    throw new InvalidInputException(errors);
                }

                continue;
            }

            if (fields.Length != header.FieldCount)
            {
                errors.Add(new ValidationError(where, $"expected {header.FieldCount} fields, found {fields.Length}"));
                continue;
            }

            Instant? time = ParseTimestamp(fields[header.Timestamp], where, errors);
            double? air = ParseAir(fields[header.Air], where, errors);
            if (time is not { } t)
            {
                continue;
            }

            if (previous is { } before && t <= before)
            {
                errors.Add(new ValidationError(where, $"{TimestampColumn}: not after the previous row (line {previousLine})"));
            }

            previous = t;
            previousLine = lineNumber;
            rows.Add(new Row(where, t, air));
        }

        if (header is null)
        {
            errors.Add(new ValidationError(fileName, $"empty: expected a header row with {TimestampColumn} and {AirColumn}"));
        }
        else if (rows.Count == 0 && errors.Count == 0)
        {
            errors.Add(new ValidationError(fileName, "no data rows"));
        }

        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        ImmutableArray<TemperatureSpike> spikes = FindSpikes(rows);
        var spikeTimes = new HashSet<Instant>(spikes.Select(s => s.Time));
        ImmutableArray<TemperatureRecord> records =
            [.. rows.Select(r => new TemperatureRecord(r.Time, spikeTimes.Contains(r.Time) ? null : r.AirC))];
        return new TemperatureLog(records, spikes);
    }

    private static ImmutableArray<TemperatureSpike> FindSpikes(List<Row> rows)
    {
        var spikes = ImmutableArray.CreateBuilder<TemperatureSpike>();
        for (int i = 1; i < rows.Count - 1; i++)
        {
            if (rows[i - 1].AirC is not { } before || rows[i].AirC is not { } value || rows[i + 1].AirC is not { } after)
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

    private static Instant? ParseTimestamp(string field, string where, List<ValidationError> errors)
    {
        ParseResult<OffsetDateTime> result = TimestampPattern.Parse(field);
        if (result.Success)
        {
            return result.Value.ToInstant();
        }

        errors.Add(new ValidationError(
            where,
            field.Length == 0
                ? $"{TimestampColumn}: missing"
                : $"{TimestampColumn}: not an ISO-8601 date-time with UTC offset (e.g. 2026-03-01T12:00:00+01:00)"));
        return null;
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

    private sealed record Row(string Where, Instant Time, double? AirC);

    private sealed record Header(int FieldCount, int Timestamp, int Air)
    {
        public static Header? Parse(string[] names, string where, List<ValidationError> errors)
        {
            int before = errors.Count;
            var seen = new HashSet<string>(StringComparer.OrdinalIgnoreCase);
            foreach (string name in names)
            {
                if (name.Length > 0 && !seen.Add(name))
                {
                    errors.Add(new ValidationError(where, $"header: column {name} appears twice"));
                }
            }

            int timestamp = IndexOf(names, TimestampColumn);
            int air = IndexOf(names, AirColumn);
            if (timestamp < 0)
            {
                errors.Add(new ValidationError(where, $"header: missing column {TimestampColumn}"));
            }

            if (air < 0)
            {
                errors.Add(new ValidationError(where, $"header: missing column {AirColumn}"));
            }

            return errors.Count > before ? null : new Header(names.Length, timestamp, air);
        }

        private static int IndexOf(string[] names, string column) =>
            Array.FindIndex(names, n => string.Equals(n, column, StringComparison.OrdinalIgnoreCase));
    }
}
