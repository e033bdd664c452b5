using System.Globalization;
using CanopyAdvisor.Core.Forecast;
using NodaTime;
using NodaTime.Text;

namespace CanopyAdvisor.Reports.Outlook;

/// <summary>How the outlook writes times, flags and numbers in words (shared by the page and the CSV).</summary>
internal static class OutlookText
{
    private static readonly ZonedDateTimePattern Short = ZonedDateTimePattern.CreateWithInvariantCulture("ddd d MMM HH':'mm", null);
    private static readonly OffsetDateTimePattern Iso = OffsetDateTimePattern.CreateWithInvariantCulture("uuuu'-'MM'-'dd'T'HH':'mmo<+HH:mm>");

    /// <summary>A local time for people, e.g. <c>Wed 2 Dec 14:00</c>.</summary>
    public static string When(Instant at, DateTimeZone zone) => Short.Format(at.InZone(zone));

    /// <summary>A local time with its offset, ISO 8601, e.g. <c>2026-12-02T14:00+01:00</c>.</summary>
    public static string IsoLocal(Instant at, DateTimeZone zone) => Iso.Format(at.InZone(zone).ToOffsetDateTime());

    /// <summary>A flag in words with its numbers, e.g. <c>height at sale 153 mm over 150 mm</c>.</summary>
    public static string Flag(ForecastFlag flag) => flag.Cause switch
    {
        "lowDli" => Markup.Invariant($"low DLI {flag.Value:0.0} under {flag.Limit:0.#} mol m⁻² d⁻¹"),
        "lowPhytochromeState" => Markup.Invariant($"low R:FR: phytochrome state {flag.Value:0.000} under {flag.Limit:0.000}"),
        "highDif" => Markup.Invariant($"high DIF {flag.Value:0.0} over {flag.Limit:0.#} K"),
        "heightOverGrade" => Markup.Invariant($"height at sale {flag.Value:0} mm over {flag.Limit:0} mm"),
        "leanOverGrade" => Markup.Invariant($"lean {flag.Value:0.0}° over {flag.Limit:0.#}°"),
        _ => Markup.Invariant($"{flag.Cause} {flag.Value:0.##} (limit {flag.Limit:0.##} {flag.Unit})"),
    };

    /// <summary>A flag cause in words, e.g. <c>low DLI</c>.</summary>
    public static string Cause(string cause) => cause switch
    {
        "lowDli" => "low DLI",
        "lowPhytochromeState" => "low R:FR",
        "highDif" => "high DIF",
        "heightOverGrade" => "height over grade",
        "leanOverGrade" => "lean over grade",
        _ => cause,
    };

    /// <summary>A signed number, e.g. <c>+1.2</c>, <c>−0.4</c> (true minus sign), <c>0.0</c>.</summary>
    public static string Signed(double value, string format)
    {
        string magnitude = Math.Abs(value).ToString(format, CultureInfo.InvariantCulture);
        if (magnitude.Trim('0', '.').Length == 0)
        {
            return magnitude;
        }

        return (value > 0 ? "+" : "−") + magnitude;
    }

    /// <summary>When a bench leaves grade, in words.</summary>
    public static string LeavesGrade(BenchForecast f, Instant now, DateTimeZone zone) =>
        f.LeavesGradeAt is Instant at ? (at <= now ? "already over" : When(at, zone)) : "stays within";
}
