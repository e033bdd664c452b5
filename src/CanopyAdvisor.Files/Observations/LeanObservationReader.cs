using System.Collections.Immutable;
using System.Globalization;
using CanopyAdvisor.Core.Advice.Calibration;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Validation;
using NodaTime;
using NodaTime.Text;

namespace CanopyAdvisor.Files.Observations;

/// <summary>Reads measured leans (observations) from CSV into <see cref="LeanObservation"/>s for calibration.</summary>
/// <remarks>
/// <para>Format: a header row, then one row per observation, comma-separated without quoting; fields are trimmed;
/// numbers use a dot as decimal separator. Columns (names case-insensitive, any order, other columns ignored):
/// <c>benchId</c> (the bench's id in the site), <c>at</c> (ISO-8601 with a UTC offset, e.g.
/// <c>2026-11-20T10:00:00+01:00</c> or <c>…Z</c>, seconds optional), <c>tiltDeg</c> (mean lean of the plants measured
/// from the vertical, 0 to 90), <c>azimuthDeg</c> (compass bearing the tops point to, 0 to 360), and optionally
/// <c>heightMm</c> (mean height, &gt; 0; blank when not measured) and <c>plants</c> (how many plants the lean is the mean
/// of, a whole number ≥ 1; blank or a missing column means 1). Rows may come in any order and several benches may share
/// a time. Blank lines and lines starting with <c>#</c> are skipped; a leading byte-order mark is ignored.</para>
/// <para>Errors: every bad row is reported as <c>file:line: column: message</c>, all collected, and nothing is returned
/// from a file with any error (<see cref="InvalidInputException"/>). Whether each bench exists and carries the crop, and
/// whether each time lies between planting and now, is checked by <see cref="CropCalibrator.Fit"/>, which names the
/// same file and line (<see cref="LeanObservation.Where"/>).</para>
/// </remarks>
public static class LeanObservationReader
{
    /// <summary>Name of the bench column.</summary>
    public const string BenchColumn = "benchId";

    /// <summary>Name of the time column.</summary>
    public const string TimeColumn = "at";

    /// <summary>Name of the tilt column, degrees.</summary>
    public const string TiltColumn = "tiltDeg";

    /// <summary>Name of the azimuth column, degrees.</summary>
    public const string AzimuthColumn = "azimuthDeg";

    /// <summary>Name of the optional height column, mm.</summary>
    public const string HeightColumn = "heightMm";

    /// <summary>Name of the optional column of plants measured.</summary>
    public const string PlantsColumn = "plants";

    private static readonly string[] Required = [BenchColumn, TimeColumn, TiltColumn, AzimuthColumn];

    private static readonly IPattern<OffsetDateTime> TimePattern = new CompositePatternBuilder<OffsetDateTime>
    {
        { OffsetDateTimePattern.ExtendedIso, _ => true },
        { OffsetDateTimePattern.CreateWithInvariantCulture("uuuu'-'MM'-'dd'T'HH':'mmo<G>"), _ => false },
    }.Build();

    /// <summary>Reads an observations file; errors name the file by its file name.</summary>
    /// <param name="path">The file.</param>
    /// <returns>The observations in file order.</returns>
    /// <exception cref="InvalidInputException">The file has a bad header or bad rows; every problem is listed.</exception>
    public static ImmutableArray<LeanObservation> ReadFile(string path)
    {
        using var reader = new StreamReader(path);
        return Read(reader, Path.GetFileName(path));
    }

    /// <summary>Reads observations from text; <paramref name="fileName"/> names it in messages.</summary>
    /// <param name="text">The CSV text.</param>
    /// <param name="fileName">Names the text in messages.</param>
    /// <returns>The observations in file order.</returns>
    /// <exception cref="InvalidInputException">The text has a bad header or bad rows; every problem is listed.</exception>
    public static ImmutableArray<LeanObservation> Parse(string text, string fileName)
    {
        using var reader = new StringReader(text);
        return Read(reader, fileName);
    }

    /// <summary>Reads observations from a text reader; <paramref name="fileName"/> names it in messages.</summary>
    /// <param name="reader">The CSV text.</param>
    /// <param name="fileName">Names the text in messages.</param>
    /// <returns>The observations in file order.</returns>
    /// <exception cref="InvalidInputException">The input has a bad header or bad rows; every problem is listed.</exception>
    public static ImmutableArray<LeanObservation> Read(TextReader reader, string fileName)
    {
        ArgumentNullException.ThrowIfNull(reader);
        var errors = new List<ValidationError>();
        var rows = ImmutableArray.CreateBuilder<LeanObservation>();
        Dictionary<string, int>? columns = null;
        int fieldCount = 0;
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
                columns = ReadHeader(fields, where, errors) ?? throw new InvalidInputException(errors);
                fieldCount = fields.Length;
                continue;
            }

            if (fields.Length != fieldCount)
            {
                errors.Add(new ValidationError(where, $"expected {fieldCount} fields, found {fields.Length}"));
                continue;
            }

            if (ReadRow(fields, columns, where, errors) is LeanObservation observation)
            {
                rows.Add(observation);
            }
        }

        if (columns is null)
        {
            errors.Add(new ValidationError(fileName, $"empty: expected a header row with {string.Join(", ", Required)} (and optionally {HeightColumn}, {PlantsColumn})"));
        }
        else if (rows.Count == 0 && errors.Count == 0)
        {
            errors.Add(new ValidationError(fileName, "no observations"));
        }

        return errors.Count > 0 ? throw new InvalidInputException(errors) : rows.ToImmutable();
    }

    private static Dictionary<string, int>? ReadHeader(string[] names, string where, List<ValidationError> errors)
    {
        int before = errors.Count;
        var columns = new Dictionary<string, int>(StringComparer.OrdinalIgnoreCase);
        for (int i = 0; i < names.Length; i++)
        {
            if (names[i].Length > 0 && !columns.TryAdd(names[i], i))
            {
                errors.Add(new ValidationError(where, $"header: column {names[i]} appears twice"));
            }
        }

        foreach (string column in Required.Where(c => !columns.ContainsKey(c)))
        {
            errors.Add(new ValidationError(where, $"header: missing column {column}"));
        }

        return errors.Count > before ? null : columns;
    }

    private static LeanObservation? ReadRow(string[] fields, Dictionary<string, int> columns, string where, List<ValidationError> errors)
    {
        int before = errors.Count;
        string? Field(string column) => columns.TryGetValue(column, out int i) ? fields[i] : null;
        void Error(string column, string message) => errors.Add(new ValidationError(where, $"{column}: {message}"));

        string bench = Field(BenchColumn)!;
        if (bench.Length == 0)
        {
            Error(BenchColumn, "missing");
        }

        Instant at = default;
        string time = Field(TimeColumn)!;
        ParseResult<OffsetDateTime> parsed = TimePattern.Parse(time);
        if (parsed.Success)
        {
            at = parsed.Value.ToInstant();
        }
        else
        {
            Error(TimeColumn, time.Length == 0 ? "missing" : "not an ISO-8601 date-time with UTC offset (e.g. 2026-11-20T10:00:00+01:00)");
        }

        double tilt = Number(Field(TiltColumn)!, TiltColumn, 0, 90, errors, where);
        double azimuth = Number(Field(AzimuthColumn)!, AzimuthColumn, 0, 360, errors, where);
        double? height = null;
        if (Field(HeightColumn) is { Length: > 0 } heightText)
        {
            if (!double.TryParse(heightText, NumberStyles.Float, CultureInfo.InvariantCulture, out double h) || !double.IsFinite(h))
            {
                Error(HeightColumn, "not a number");
            }
            else if (h <= 0)
            {
                Error(HeightColumn, FormattableString.Invariant($"{h} must be more than 0"));
            }
            else
            {
                height = h;
            }
        }

        int plants = 1;
        if (Field(PlantsColumn) is { Length: > 0 } plantsText)
        {
            if (!int.TryParse(plantsText, NumberStyles.None, CultureInfo.InvariantCulture, out plants) || plants < 1)
            {
                Error(PlantsColumn, $"'{plantsText}' must be a whole number of at least 1");
            }
        }

        return errors.Count > before
            ? null
            : new LeanObservation(bench, at, Angle.FromDegrees(tilt), Angle.FromDegrees(azimuth), height, plants) { Where = where };
    }

    private static double Number(string text, string column, double min, double max, List<ValidationError> errors, string where)
    {
        if (text.Length == 0)
        {
            errors.Add(new ValidationError(where, $"{column}: missing"));
            return double.NaN;
        }

        if (!double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out double value) || !double.IsFinite(value))
        {
            errors.Add(new ValidationError(where, $"{column}: not a number"));
            return double.NaN;
        }

        if (value < min || value > max)
        {
            errors.Add(new ValidationError(where, FormattableString.Invariant($"{column}: {value} is outside {min} to {max}")));
        }

        return value;
    }
}
