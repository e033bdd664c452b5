using CanopyAdvisor.Core.Validation;
using NodaTime;
using NodaTime.Text;

namespace CanopyAdvisor.Cli;

/// <summary>Parses the time and date arguments of the command line (ISO 8601) and IANA zone names.</summary>
internal static class TimeArguments
{
    private static readonly OffsetDateTimePattern[] OffsetPatterns =
    [
        OffsetDateTimePattern.ExtendedIso,
        OffsetDateTimePattern.CreateWithInvariantCulture("uuuu'-'MM'-'dd'T'HH':'mmo<G>"),
    ];

    /// <summary>An ISO-8601 date and time with its UTC offset, e.g. 2027-06-21T12:00:00+02:00 or ...Z.</summary>
    public static OffsetDateTime ParseOffsetDateTime(string text, string optionName)
    {
        foreach (OffsetDateTimePattern pattern in OffsetPatterns)
        {
            ParseResult<OffsetDateTime> result = pattern.Parse(text);
            if (result.Success)
            {
                return result.Value;
            }
        }

        throw new InvalidInputException(optionName, $"'{text}' is not an ISO-8601 date and time with an offset (e.g. 2027-06-21T12:00:00+02:00)");
    }

    /// <summary>An ISO-8601 calendar date, e.g. 2027-03-15.</summary>
    public static LocalDate ParseDate(string text, string optionName)
    {
        ParseResult<LocalDate> result = LocalDatePattern.Iso.Parse(text);
        return result.Success
            ? result.Value
            : throw new InvalidInputException(optionName, $"'{text}' is not an ISO-8601 date (e.g. 2027-03-15)");
    }

    /// <summary>An IANA time zone from the TZDB bundled with NodaTime.</summary>
    public static DateTimeZone ParseZone(string id, string optionName) =>
        DateTimeZoneProviders.Tzdb.GetZoneOrNull(id)
        ?? throw new InvalidInputException(optionName, $"unknown IANA time zone '{id}'");
}
