using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using NodaTime;

namespace CanopyAdvisor.Core.Plants.Growth;

/// <summary>A local date's extent and its day intervals from the site's sunrise and sunset (NREL SPA).</summary>
internal sealed record SiteDay(LocalDate Date, SunDayKind Kind, Instant Start, Instant End, IReadOnlyList<(Instant Start, Instant End)> Day, Instant? Sunrise)
{
    public static SiteDay For(LocalDate date, GeoLocation location, DateTimeZone zone)
    {
        Instant start = zone.AtStartOfDay(date).ToInstant();
        Instant end = zone.AtStartOfDay(date.PlusDays(1)).ToInstant();
        SunTimes sun = SolarPosition.CalculateSunTimes(new SunTimesInput(date, zone, location));
        var day = new List<(Instant, Instant)>();
        Instant? sunrise = null;
        switch (sun.Kind)
        {
            case SunDayKind.PolarDay:
                day.Add((start, end));
                break;
            case SunDayKind.RisesAndSets when sun.Sunrise is { } rise && sun.Sunset is { } set:
                Instant r = Clamp(rise.ToInstant(), start, end);
                Instant s = Clamp(set.ToInstant(), start, end);
                sunrise = rise.ToInstant();
                if (r < s)
                {
                    day.Add((r, s));
                }
                else
                {
                    // Sunset of this date falls before its sunrise (the evening of the previous day runs past midnight).
                    day.Add((start, s));
                    day.Add((r, end));
                }

                break;
            default:
                break;
        }

        return new SiteDay(date, sun.Kind, start, end, day, sunrise);
    }

    public bool IsDay(Instant t) => Day.Any(d => t >= d.Start && t < d.End);

    public double DayHours => Day.Sum(d => (d.End - d.Start).TotalHours);

    public double NightHours => (End - Start).TotalHours - DayHours;

    private static Instant Clamp(Instant t, Instant lo, Instant hi) => t < lo ? lo : t > hi ? hi : t;
}
