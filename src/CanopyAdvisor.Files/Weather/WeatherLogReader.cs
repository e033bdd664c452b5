using System.Collections.Immutable;
using System.Globalization;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Validation;
using NodaTime;
using NodaTime.Text;

namespace CanopyAdvisor.Files.Weather;

/// <summary>Reads a site's outside light log from CSV into <see cref="WeatherRecord"/>s.</summary>
/// <remarks>
/// <para>Format: a header row, then one row per reading, comma-separated without quoting (no field contains a comma);
/// fields are trimmed; numbers use a dot as decimal separator. Columns (names case-insensitive, any order,
/// other columns ignored): <c>timestamp</c> (required; ISO-8601 with a UTC offset, e.g. <c>2026-03-01T12:00:00+01:00</c>
/// or <c>…Z</c>, seconds and fractions optional), <c>ghiWm2</c> (global horizontal irradiance, W m⁻²) and/or
/// <c>parUmolM2S</c> (outside PAR, µmol m⁻² s⁻¹); at least one of the two must be present. Either value may be blank in
/// a row; a row with both blank is a missing reading. Blank lines and lines starting with <c>#</c> are skipped.</para>
/// <para>Errors: every bad row is reported with file, line and column (<c>weather.csv:14: parUmolM2S: not a number</c>),
/// all of them collected, and nothing is returned from a file with any error (<see cref="InvalidInputException"/>).
/// Timestamps must increase strictly; values must be finite and ≥ 0 (small negative night-time pyranometer offsets
/// must be cleaned before import).</para>
/// </remarks>
public static class WeatherLogReader
{
    /// <summary>Name of the timestamp column.</summary>
    public const string TimestampColumn = "timestamp";

    /// <summary>Name of the global horizontal irradiance column, W m⁻².</summary>
    public const string GhiColumn = "ghiWm2";

    /// <summary>Name of the outside PAR column, µmol m⁻² s⁻¹.</summary>
    public const string ParColumn = "parUmolM2S";

    private static readonly IPattern<OffsetDateTime> TimestampPattern = new CompositePatternBuilder<OffsetDateTime>
    {
        { OffsetDateTimePattern.ExtendedIso, _ => true },
        { OffsetDateTimePattern.CreateWithInvariantCulture("uuuu'-'MM'-'dd'T'HH':'mmo<G>"), _ => false },
    }.Build();

    /// <summary>Reads a log file; errors name the file by its file name.</summary>
    /// <exception cref="InvalidInputException">The file has one or more bad rows or a bad header; every problem is listed.</exception>
    public static ImmutableArray<WeatherRecord> ReadFile(string path)
    {
        using var reader = new StreamReader(path);
        return Read(reader, Path.GetFileName(path));
    }

    /// <summary>Reads a log from text; <paramref name="fileName"/> names it in error messages.</summary>
    /// <exception cref="InvalidInputException">The text has one or more bad rows or a bad header; every problem is listed.</exception>
    public static ImmutableArray<WeatherRecord> Parse(string text, string fileName)
    {
        using var reader = new StringReader(text);
        return Read(reader, fileName);
    }

    /// <summary>Reads a log from a text reader; <paramref name="fileName"/> names it in error messages.</summary>
    /// <exception cref="InvalidInputException">The input has one or more bad rows or a bad header; every problem is listed.</exception>
    public static ImmutableArray<WeatherRecord> Read(TextReader reader, string fileName)
    {
        ArgumentNullException.ThrowIfNull(reader);
        var errors = new List<ValidationError>();
        var records = ImmutableArray.CreateBuilder<WeatherRecord>();
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

            string[] fields = content.Split(',').Select(f => f.Trim()).ToArray();
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
            double? ghi = header.Ghi is int g ? ParseValue(fields[g], GhiColumn, where, errors) : null;
            double? par = header.Par is int p ? ParseValue(fields[p], ParColumn, where, errors) : null;
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
            records.Add(new WeatherRecord(t, ghi, par));
        }

        if (header is null)
        {
            errors.Add(new ValidationError(fileName, $"empty: expected a header row with {TimestampColumn} and {GhiColumn} and/or {ParColumn}"));
        }
        else if (records.Count == 0 && errors.Count == 0)
        {
            errors.Add(new ValidationError(fileName, "no data rows"));
        }

        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        return records.ToImmutable();
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

    private static double? ParseValue(string field, string column, string where, List<ValidationError> errors)
    {
        if (field.Length == 0)
        {
            return null;
        }

        if (!double.TryParse(field, NumberStyles.Float, CultureInfo.InvariantCulture, out double value))
        {
            errors.Add(new ValidationError(where, $"{column}: not a number"));
            return null;
        }

        if (!double.IsFinite(value))
        {
            errors.Add(new ValidationError(where, $"{column}: not a finite number"));
            return null;
        }

        if (value < 0)
        {
            errors.Add(new ValidationError(where, $"{column}: must be ≥ 0"));
            return null;
        }

        return value;
    }

    private sealed record Header(int FieldCount, int Timestamp, int? Ghi, int? Par)
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
            int ghi = IndexOf(names, GhiColumn);
            int par = IndexOf(names, ParColumn);
            if (timestamp < 0)
            {
                errors.Add(new ValidationError(where, $"header: missing column {TimestampColumn}"));
            }

            if (ghi < 0 && par < 0)
            {
                errors.Add(new ValidationError(where, $"header: missing column {GhiColumn} or {ParColumn} (at least one is required)"));
            }

            return errors.Count > before
                ? null
                : new Header(names.Length, timestamp, ghi >= 0 ? ghi : null, par >= 0 ? par : null);
        }

        private static int IndexOf(string[] names, string column) =>
            Array.FindIndex(names, n => string.Equals(n, column, StringComparison.OrdinalIgnoreCase));
    }
}
