using CanopyAdvisor.Core.Validation;
using NodaTime;
using NodaTime.Text;

namespace CanopyAdvisor.Files.Logs;

/// <summary>The layout shared by the weather and temperature logs: a CSV of readings with an ISO-8601 timestamp per row.</summary>
/// <remarks>
/// A header row, then one row per reading, comma-separated without quoting; fields are trimmed. The <c>timestamp</c>
/// column (ISO-8601 with a UTC offset, e.g. <c>2026-03-01T12:00:00+01:00</c> or <c>…Z</c>, seconds optional) is required
/// and must increase strictly; column names are case-insensitive, in any order, and unknown columns are ignored. Blank
/// lines and lines starting with <c>#</c> are skipped; a leading byte-order mark is ignored. Every bad row is reported
/// as <c>file:line: column: message</c>, all collected, and nothing is returned from a file with any error.
/// </remarks>
internal static class TimestampedCsv
{
    /// <summary>Name of the timestamp column.</summary>
    public const string TimestampColumn = "timestamp";

    private static readonly IPattern<OffsetDateTime> TimestampPattern = new CompositePatternBuilder<OffsetDateTime>
    {
        { OffsetDateTimePattern.ExtendedIso, _ => true },
        { OffsetDateTimePattern.CreateWithInvariantCulture("uuuu'-'MM'-'dd'T'HH':'mmo<G>"), _ => false },
    }.Build();

    /// <summary>Reads every row of a log.</summary>
    /// <param name="reader">The text.</param>
    /// <param name="fileName">Names the file in messages.</param>
    /// <param name="valueColumns">The reading columns this kind of log knows.</param>
    /// <param name="missingColumns">Given which of <paramref name="valueColumns"/> the header has, the header error, or null when enough are present.</param>
    /// <param name="emptyMessage">The message for a file without a header row.</param>
    /// <param name="parseValues">Parses one row's readings (null for a column the header lacks), adding errors for bad fields.</param>
    /// <exception cref="InvalidInputException">The file has a bad header or bad rows; every problem is listed.</exception>
    public static List<TimestampedRow<T>> Read<T>(
        TextReader reader,
        string fileName,
        IReadOnlyList<string> valueColumns,
        Func<bool[], string?> missingColumns,
        string emptyMessage,
        Func<string?[], string, List<ValidationError>, T> parseValues)
    {
        ArgumentNullException.ThrowIfNull(reader);
        var errors = new List<ValidationError>();
        var rows = new List<TimestampedRow<T>>();
        int[]? columns = null;
        int fieldCount = 0;
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
            if (columns is null)
            {
                columns = ReadHeader(fields, where, valueColumns, missingColumns, errors) ?? throw new InvalidInputException(errors);
                fieldCount = fields.Length;
                continue;
            }

            if (fields.Length != fieldCount)
            {
                errors.Add(new ValidationError(where, $"expected {fieldCount} fields, found {fields.Length}"));
                continue;
            }

            Instant? time = ParseTimestamp(fields[columns[0]], where, errors);
            string?[] values = [.. columns.Skip(1).Select(c => c >= 0 ? fields[c] : null)];
            T parsed = parseValues(values, where, errors);
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
            rows.Add(new TimestampedRow<T>(where, t, parsed));
        }

        if (columns is null)
        {
            errors.Add(new ValidationError(fileName, emptyMessage));
        }
        else if (rows.Count == 0 && errors.Count == 0)
        {
            errors.Add(new ValidationError(fileName, "no data rows"));
        }

        return errors.Count > 0 ? throw new InvalidInputException(errors) : rows;
    }

    /// <summary>Column indices: the timestamp first, then each value column (−1 when absent); null after header errors.</summary>
    private static int[]? ReadHeader(
        string[] names, string where, IReadOnlyList<string> valueColumns, Func<bool[], string?> missingColumns, List<ValidationError> errors)
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
        if (timestamp < 0)
        {
            errors.Add(new ValidationError(where, $"header: missing column {TimestampColumn}"));
        }

        int[] values = [.. valueColumns.Select(c => IndexOf(names, c))];
        if (missingColumns([.. values.Select(i => i >= 0)]) is string missing)
        {
            errors.Add(new ValidationError(where, $"header: {missing}"));
        }

        return errors.Count > before ? null : [timestamp, .. values];
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

    private static int IndexOf(string[] names, string column) =>
        Array.FindIndex(names, n => string.Equals(n, column, StringComparison.OrdinalIgnoreCase));
}
