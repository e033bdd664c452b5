using System.Collections.Immutable;
using System.Globalization;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Logs;

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
    public const string TimestampColumn = TimestampedCsv.TimestampColumn;

    /// <summary>Name of the global horizontal irradiance column, W m⁻².</summary>
    public const string GhiColumn = "ghiWm2";

    /// <summary>Name of the outside PAR column, µmol m⁻² s⁻¹.</summary>
    public const string ParColumn = "parUmolM2S";

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
        List<TimestampedRow<(double? Ghi, double? Par)>> rows = TimestampedCsv.Read(
            reader,
            fileName,
            [GhiColumn, ParColumn],
            present => present[0] || present[1] ? null : $"missing column {GhiColumn} or {ParColumn} (at least one is required)",
            $"empty: expected a header row with {TimestampColumn} and {GhiColumn} and/or {ParColumn}",
            (values, where, errors) => (
                values[0] is string ghi ? ParseValue(ghi, GhiColumn, where, errors) : null,
                values[1] is string par ? ParseValue(par, ParColumn, where, errors) : null));
        return [.. rows.Select(r => new WeatherRecord(r.Time, r.Values.Ghi, r.Values.Par))];
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
}
