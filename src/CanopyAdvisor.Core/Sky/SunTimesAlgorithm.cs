using CanopyAdvisor.Core.Geometry;
using NodaTime;

namespace CanopyAdvisor.Core.Sky;

/// <summary>
/// Sunrise, sun transit and sunset by appendix A.2 of the NREL SPA report (Reda &amp; Andreas 2004, NREL/TP-560-34302,
/// eq. A9–A20): geocentric α and δ at the day's reference midnight taken as TT on the day before, the day and the day
/// after, interpolated to each event, then corrected. Degrees inside, as in the report. See <see cref="SunTimesMethod"/>
/// for the two variants.
/// </summary>
internal static class SunTimesAlgorithm
{
    private const double SecondsPerDay = ModelConstants.SecondsPerDay;
    private const double DegreesToRadians = Angle.RadiansPerDegree;
    private const double RadiansToDegrees = Angle.DegreesPerRadian;

    // Sidereal rotation per day of mean solar time, degrees (report eq. A14).
    private const double SiderealDegreesPerDay = 360.985647;

    // Iterated method: stop when a correction moves the event by less than 0.01 s, or after 10 steps.
    private const double ConvergedDayFraction = 0.01 / SecondsPerDay;
    private const int MaximumSteps = 10;

    /// <summary>Computes the sun times; the input is assumed valid.</summary>
    internal static SunTimes Calculate(SunTimesInput input)
    {
        bool report = input.Method == SunTimesMethod.ReportAppendixA2;
        double latitude = input.Location.Latitude.Degrees;
        double longitude = input.Location.Longitude.Degrees;
        double deltaT = input.DeltaTSeconds;
        Offset offset = input.Zone.AtLeniently(input.Date.At(new LocalTime(12, 0))).Offset;
        double zoneHours = offset.Ticks / (double)NodaConstants.TicksPerHour;

        // A.2.1–2: apparent sidereal time ν at the reference midnight (0 h UT in the report, local midnight otherwise);
        // α, δ at that midnight taken as TT on days D−1, D, D+1 (ΔT = 0).
        Instant midnight = report
            ? input.Date.AtMidnight().InUtc().ToInstant()
            : input.Date.AtMidnight().WithOffset(offset).ToInstant();
        double wrapHours = report ? zoneHours : 0.0;
        double julianDay0 = SpaAlgorithm.JulianDay(midnight.ToUnixTimeTicks() / (double)NodaConstants.TicksPerSecond, 0.0);
        SpaState state = default;
        SpaAlgorithm.Geocentric(julianDay0, deltaT, ref state);
        double nu = state.Nu;
        SpaAlgorithm.Geocentric(julianDay0 - 1.0, 0.0, ref state);
        double alphaBefore = state.Alpha, deltaBefore = state.Delta;
        SpaAlgorithm.Geocentric(julianDay0, 0.0, ref state);
        double alphaDay = state.Alpha, deltaDay = state.Delta;
        SpaAlgorithm.Geocentric(julianDay0 + 1.0, 0.0, ref state);
        double alphaAfter = state.Alpha, deltaAfter = state.Delta;
        var sky = new DailySky(alphaBefore, alphaDay, alphaAfter, deltaBefore, deltaDay, deltaAfter, nu, longitude, latitude, deltaT);

        // A.2.3: approximate transit (eq. A9, A10), then the transit correction (eq. A18).
        double transitApproximate = (alphaDay - longitude - nu) / 360.0;
        double mTransit = SpaAlgorithm.LimitZeroToOne(transitApproximate);
        Event transit = sky.At(mTransit);
        double transitFraction = mTransit - (transit.HourAngle / 360.0);
        if (!report)
        {
            for (int step = 0; step < MaximumSteps; step++)
            {
                transit = sky.At(transitFraction);
                double correction = -transit.HourAngle / 360.0;
                transitFraction += correction;
                if (Math.Abs(correction) < ConvergedDayFraction)
                {
                    break;
                }
            }

            transit = sky.At(transitFraction);
        }

        double transitHours = LocalHours(transitFraction, wrapHours);
        ZonedDateTime transitTime = ToZoned(input, offset, transitHours);
        var transitElevation = Angle.FromDegrees(transit.Elevation);

        // A.2.4: local hour angle at rise and set (eq. A11–A12). The report uses δ at 0 h; the iterated method δ at transit.
        double h0Prime = -(ModelConstants.SunRadiusDegrees + input.AtmosphericRefractionAtSunrise.Degrees);
        double latitudeRad = latitude * DegreesToRadians;
        double declinationRad = (report ? deltaDay : transit.Declination) * DegreesToRadians;
        double cosH0 = (Math.Sin(h0Prime * DegreesToRadians) - (Math.Sin(latitudeRad) * Math.Sin(declinationRad)))
            / (Math.Cos(latitudeRad) * Math.Cos(declinationRad));
        SunDayKind kind = cosH0 switch
        {
            > 1.0 => SunDayKind.PolarNight,
            < -1.0 => SunDayKind.PolarDay,
            _ => SunDayKind.RisesAndSets,
        };
        if (kind != SunDayKind.RisesAndSets)
        {
            return new SunTimes(input.Date, kind, transitHours, null, null, transitTime, null, null, transitElevation);
        }

        // A.2.5–11: approximate rise and set (eq. A13), then the correction (eq. A19–A20), repeated if iterating.
        double h0 = Math.Acos(cosH0) * RadiansToDegrees;
        double center = report ? transitApproximate : transitFraction;
        double riseHours = LocalHours(RiseOrSet(sky, SpaAlgorithm.LimitZeroToOne(center - (h0 / 360.0)), latitudeRad, h0Prime, report), wrapHours);
        double setHours = LocalHours(RiseOrSet(sky, SpaAlgorithm.LimitZeroToOne(center + (h0 / 360.0)), latitudeRad, h0Prime, report), wrapHours);
        return new SunTimes(
            input.Date,
            kind,
            transitHours,
            riseHours,
            setHours,
            transitTime,
            ToZoned(input, offset, riseHours),
            ToZoned(input, offset, setHours),
            transitElevation);
    }

    // Eq. A19–A20: m + (h − h0′) / (360 cos δ′ cos φ sin H′), once (report) or until converged.
    private static double RiseOrSet(in DailySky sky, double m, double latitudeRad, double h0Prime, bool once)
    {
        for (int step = 0; step < (once ? 1 : MaximumSteps); step++)
        {
            Event e = sky.At(m);
            double slope = 360.0 * Math.Cos(e.Declination * DegreesToRadians) * Math.Cos(latitudeRad) * Math.Sin(e.HourAngle * DegreesToRadians);
            double correction = (e.Elevation - h0Prime) / slope;
            if (!double.IsFinite(correction))
            {
                break;
            }

            m += correction;
            if (Math.Abs(correction) < ConvergedDayFraction)
            {
                break;
            }
        }

        return m;
    }

    // Report's dayfrac_to_local_hr: 24 · frac(day fraction + zone/24); zone = 0 when counting from local midnight.
    private static double LocalHours(double dayFraction, double zoneHours) =>
        24.0 * SpaAlgorithm.LimitZeroToOne(dayFraction + (zoneHours / 24.0));

    private static ZonedDateTime ToZoned(SunTimesInput input, Offset offset, double localHours)
    {
        long ticks = (long)Math.Round(localHours * NodaConstants.TicksPerHour);
        return input.Date.AtMidnight().PlusTicks(ticks).WithOffset(offset).ToInstant().InZone(input.Zone);
    }

    private readonly record struct Event(double HourAngle, double Declination, double Elevation);

    // α and δ on three consecutive days and the sidereal time at the reference midnight.
    private readonly record struct DailySky(
        double AlphaBefore,
        double AlphaDay,
        double AlphaAfter,
        double DeltaBefore,
        double DeltaDay,
        double DeltaAfter,
        double Nu,
        double Longitude,
        double Latitude,
        double DeltaT)
    {
        // Eq. A14–A16 for one event at day fraction m.
        public Event At(double m)
        {
            double nuEvent = Nu + (SiderealDegreesPerDay * m);
            double n = m + (DeltaT / SecondsPerDay);
            double alphaPrime = Interpolate(AlphaBefore, AlphaDay, AlphaAfter, n);
            double deltaPrime = Interpolate(DeltaBefore, DeltaDay, DeltaAfter, n);
            double hourAngle = SpaAlgorithm.LimitDegrees180PlusMinus(nuEvent + Longitude - alphaPrime);
            double latitudeRad = Latitude * DegreesToRadians;
            double deltaPrimeRad = deltaPrime * DegreesToRadians;
            double elevation = Math.Asin((Math.Sin(latitudeRad) * Math.Sin(deltaPrimeRad))
                + (Math.Cos(latitudeRad) * Math.Cos(deltaPrimeRad) * Math.Cos(hourAngle * DegreesToRadians))) * RadiansToDegrees;
            return new Event(hourAngle, deltaPrime, elevation);
        }

        // Eq. A15: second-order interpolation; a jump of more than 2° is the 360° wrap of α and is folded back.
        private static double Interpolate(double before, double day, double after, double n)
        {
            double a = day - before;
            double b = after - day;
            if (Math.Abs(a) >= 2.0)
            {
                a = SpaAlgorithm.LimitZeroToOne(a);
            }

            if (Math.Abs(b) >= 2.0)
            {
                b = SpaAlgorithm.LimitZeroToOne(b);
            }

            return day + (n * (a + b + ((b - a) * n)) / 2.0);
        }
    }
}
