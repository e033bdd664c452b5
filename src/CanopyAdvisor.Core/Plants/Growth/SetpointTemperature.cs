using System.Collections.Concurrent;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Core.Plants.Growth;

/// <summary>
/// Air temperature as the site's climate computer holds it: the day setpoint from sunrise to sunset, the night
/// setpoint otherwise, lowered by the pre-dawn drop during the last <see cref="TemperatureSetpoints.PreDawnDropHours"/>
/// before each sunrise (the 2.8–8.3 °C drop for 2–3 h of height-control practice; common practice, extension literature).
/// </summary>
/// <remarks>
/// <para>Sunrise and sunset come from the NREL SPA (Reda &amp; Andreas 2004) for each local date in the site's zone. Each
/// local date is cut into pieces of constant setpoint, so <see cref="DayNightMeans"/> is exact (a time-weighted sum, no
/// sampling) and agrees with <see cref="AirTemperatureC"/>. The drop applies only at night: when a short summer night is
/// shorter than the drop, the drop starts at sunset. In polar day the day setpoint holds all date; in polar night the
/// night setpoint, with the drop before the next date's sunrise if there is one. The schedule ignores how fast a
/// real house follows a setpoint change.</para>
/// <para>Thread-safe; sun times are cached per local date.</para>
/// </remarks>
public sealed class SetpointTemperature : ITemperatureSource
{
    private readonly ConcurrentDictionary<LocalDate, Piece[]> _pieces = new();

    /// <summary>Creates the schedule; every problem is reported at once.</summary>
    /// <param name="setpoints">Day and night setpoints (in [−40, 60] °C), drop ≥ 0 K, drop length in [0, 12] h.</param>
    /// <param name="location">The site's location (for sunrise and sunset).</param>
    /// <param name="zone">The site's time zone (local dates).</param>
    /// <exception cref="InvalidInputException">A setpoint or the location is invalid; paths <c>temperature.dayC</c>, ….</exception>
    public SetpointTemperature(TemperatureSetpoints setpoints, GeoLocation location, DateTimeZone zone)
    {
        ArgumentNullException.ThrowIfNull(setpoints);
        ArgumentNullException.ThrowIfNull(location);
        ArgumentNullException.ThrowIfNull(zone);
        var errors = new List<ValidationError>();
        GrowthValidation.InRange(errors, "temperature.dayC", setpoints.DayC, MinimumAirC, MaximumAirC);
        GrowthValidation.InRange(errors, "temperature.nightC", setpoints.NightC, MinimumAirC, MaximumAirC);
        GrowthValidation.NonNegative(errors, "temperature.preDawnDropC", setpoints.PreDawnDropC);
        GrowthValidation.InRange(errors, "temperature.preDawnDropHours", setpoints.PreDawnDropHours, 0, 12);
        if (double.IsFinite(setpoints.NightC) && double.IsFinite(setpoints.PreDawnDropC)
            && setpoints.NightC - setpoints.PreDawnDropC < MinimumAirC)
        {
            errors.Add(new ValidationError("temperature.preDawnDropC", $"night setpoint minus drop must be ≥ {MinimumAirC} °C"));
        }

        SolarPosition.AddLocationErrors(errors, location);
        GrowthValidation.ThrowIfAny(errors);
        Setpoints = setpoints;
        Location = location;
        Zone = zone;
    }

    /// <summary>The setpoints.</summary>
    public TemperatureSetpoints Setpoints { get; }

    /// <summary>The site's location.</summary>
    public GeoLocation Location { get; }

    /// <summary>The site's time zone.</summary>
    public DateTimeZone Zone { get; }

    private static double MinimumAirC => ModelConstants.AirTemperatureMinimumC;

    private static double MaximumAirC => ModelConstants.AirTemperatureMaximumC;

    /// <inheritdoc />
    public double AirTemperatureC(Instant time)
    {
        Piece[] pieces = PiecesOf(time.InZone(Zone).Date);
        foreach (Piece p in pieces)
        {
            if (time >= p.Start && time < p.End)
            {
                return p.AirC;
            }
        }

        return pieces[^1].AirC;
    }

    /// <inheritdoc />
    public DayNightTemperatures DayNightMeans(LocalDate date)
    {
        Piece[] pieces = PiecesOf(date);
        double dayHours = 0, daySum = 0, nightHours = 0, nightSum = 0;
        foreach (Piece p in pieces)
        {
            double hours = (p.End - p.Start).TotalHours;
            if (p.IsDay)
            {
                dayHours += hours;
                daySum += hours * p.AirC;
            }
            else
            {
                nightHours += hours;
                nightSum += hours * p.AirC;
            }
        }

        double dayMean = dayHours > 0 ? daySum / dayHours : double.NaN;
        double nightMean = nightHours > 0 ? nightSum / nightHours : double.NaN;
        double dif = dayHours > 0 && nightHours > 0 ? dayMean - nightMean : 0.0;
        SunDayKind kind = pieces.Length > 0 ? pieces[0].Kind : SunDayKind.RisesAndSets;
        return new DayNightTemperatures(date, kind, dayMean, nightMean, dif, dayHours, nightHours, 1.0, 1.0);
    }

    private Piece[] PiecesOf(LocalDate date) => _pieces.GetOrAdd(date, Build);

    private Piece[] Build(LocalDate date)
    {
        SiteDay today = SiteDay.For(date, Location, Zone);
        SiteDay tomorrow = SiteDay.For(date.PlusDays(1), Location, Zone);
        Duration drop = Duration.FromSeconds(Setpoints.PreDawnDropHours * ModelConstants.SecondsPerHour);
        var windows = new List<(Instant Start, Instant End)>();
        if (drop > Duration.Zero && Setpoints.PreDawnDropC > 0)
        {
            foreach (Instant? sunrise in new[] { today.Sunrise, tomorrow.Sunrise })
            {
                if (sunrise is { } sr)
                {
                    windows.Add((sr - drop, sr));
                }
            }
        }

        var cuts = new SortedSet<Instant> { today.Start, today.End };
        foreach ((Instant s, Instant e) in today.Day.Concat(windows))
        {
            AddCut(cuts, s, today);
            AddCut(cuts, e, today);
        }

        Instant[] points = [.. cuts];
        var pieces = new List<Piece>(points.Length);
        for (int i = 1; i < points.Length; i++)
        {
            Instant a = points[i - 1];
            Instant b = points[i];
            Instant mid = a + ((b - a) / 2);
            bool isDay = today.IsDay(mid);
            double airC = isDay
                ? Setpoints.DayC
                : windows.Any(w => mid >= w.Start && mid < w.End) ? Setpoints.NightC - Setpoints.PreDawnDropC : Setpoints.NightC;
            pieces.Add(new Piece(a, b, airC, isDay, today.Kind));
        }

        return [.. pieces];
    }

    private static void AddCut(SortedSet<Instant> cuts, Instant t, SiteDay day)
    {
        if (t > day.Start && t < day.End)
        {
            cuts.Add(t);
        }
    }

    private sealed record Piece(Instant Start, Instant End, double AirC, bool IsDay, SunDayKind Kind);
}
