using CanopyAdvisor.Core.Geometry;
using NodaTime;

namespace CanopyAdvisor.Core.Sky;

/// <summary>
/// Sunrise, sun transit and sunset by appendix A.2 of the NREL SPA report (Reda &amp; Andreas 2004, NREL/TP-560-34302,
/// eq. A9–A20): geocentric α and δ at 0 h TT of the day before, the day and the day after, interpolated to each
/// event, with one correction step. Degrees inside, as in the report.
/// </summary>
internal static class SunTimesAlgorithm
{
    private const double SecondsPerDay = 86400.0;
    private const double DegreesToRadians = Math.PI / 180.0;
    private const double RadiansToDegrees = 180.0 / Math.PI;

    // Sidereal rotation per day of mean solar time, degrees (report eq. A14).
    private const double SiderealDegreesPerDay = 360.985647;

    /// <summary>Computes the sun times; the input is assumed valid.</summary>
    internal static SunTimes Calculate(SunTimesInput input)
    {
        double latitude = input.Location.Latitude.Degrees;
        double longitude = input.Location.Longitude.Degrees;
        double deltaT = input.DeltaTSeconds;
        Offset offset = input.Zone.AtLeniently(input.Date.At(new LocalTime(12, 0))).Offset;
        double zoneHours = offset.Ticks / (double)NodaConstants.TicksPerHour;

        // A.2.1–2: apparent sidereal time at 0 h UT of the date; α, δ at 0 h TT of days D−1, D, D+1 (ΔT = 0).
        double unixSeconds = input.Date.AtMidnight().InUtc().ToInstant().ToUnixTimeTicks() / (double)NodaConstants.TicksPerSecond;
        double julianDay0 = SpaAlgorithm.JulianDay(unixSeconds, 0.0);
        SpaState state = default;
        SpaAlgorithm.Geocentric(julianDay0, deltaT, ref state);
        double nu = state.Nu;
        SpaAlgorithm.Geocentric(julianDay0 - 1.0, 0.0, ref state);
        double alphaBefore = state.Alpha, deltaBefore = state.Delta;
        SpaAlgorithm.Geocentric(julianDay0, 0.0, ref state);
        double alphaDay = state.Alpha, deltaDay = state.Delta;
        SpaAlgorithm.Geocentric(julianDay0 + 1.0, 0.0, ref state);
        double alphaAfter = state.Alpha, deltaAfter = state.Delta;

        // A.2.3: approximate transit (eq. A9); A.2.4: local hour angle at rise and set (eq. A11–A12).
        double transitApproximate = (alphaDay - longitude - nu) / 360.0;
        double h0Prime = -(ModelConstants.SunRadiusDegrees + input.AtmosphericRefractionAtSunrise.Degrees);
        double latitudeRad = latitude * DegreesToRadians;
        double deltaDayRad = deltaDay * DegreesToRadians;
        double cosH0 = (Math.Sin(h0Prime * DegreesToRadians) - (Math.Sin(latitudeRad) * Math.Sin(deltaDayRad)))
            / (Math.Cos(latitudeRad) * Math.Cos(deltaDayRad));
        SunDayKind kind = cosH0 switch
        {
            > 1.0 => SunDayKind.PolarNight,
            < -1.0 => SunDayKind.PolarDay,
            _ => SunDayKind.RisesAndSets,
        };

        var interpolation = new Interpolation(alphaBefore, alphaDay, alphaAfter, deltaBefore, deltaDay, deltaAfter, nu, longitude, latitude, deltaT);

        // A.2.5–11 for transit (eq. A13–A19).
        double mTransit = SpaAlgorithm.LimitZeroToOne(transitApproximate);
        Event transit = interpolation.At(mTransit);
        double transitHours = LocalHours(mTransit - (transit.HourAngle / 360.0), zoneHours);
        ZonedDateTime transitTime = ToZoned(input, offset, transitHours);
        Angle transitElevation = Angle.FromDegrees(transit.Elevation);
        if (kind != SunDayKind.RisesAndSets)
        {
            return new SunTimes(input.Date, kind, transitHours, null, null, transitTime, null, null, transitElevation);
        }

        double h0 = Math.Acos(cosH0) * RadiansToDegrees;
        double mRise = SpaAlgorithm.LimitZeroToOne(transitApproximate - (h0 / 360.0));
        double mSet = SpaAlgorithm.LimitZeroToOne(transitApproximate + (h0 / 360.0));
        double riseHours = LocalHours(RiseOrSet(mRise, interpolation.At(mRise), latitudeRad, h0Prime), zoneHours);
        double setHours = LocalHours(RiseOrSet(mSet, interpolation.At(mSet), latitudeRad, h0Prime), zoneHours);
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

    // Eq. A19–A20: the corrected rise or set day fraction.
    private static double RiseOrSet(double m, Event e, double latitudeRad, double h0Prime) =>
        m + ((e.Elevation - h0Prime)
            / (360.0 * Math.Cos(e.Declination * DegreesToRadians) * Math.Cos(latitudeRad) * Math.Sin(e.HourAngle * DegreesToRadians)));

    // Report's dayfrac_to_local_hr: 24 · frac(day fraction + zone/24).
    private static double LocalHours(double dayFraction, double zoneHours) =>
        24.0 * SpaAlgorithm.LimitZeroToOne(dayFraction + (zoneHours / 24.0));

    private static ZonedDateTime ToZoned(SunTimesInput input, Offset offset, double localHours)
    {
        long ticks = (long)Math.Round(localHours * NodaConstants.TicksPerHour);
        return input.Date.AtMidnight().PlusTicks(ticks).WithOffset(offset).ToInstant().InZone(input.Zone);
    }

    private readonly record struct Event(double HourAngle, double Declination, double Elevation);

    private readonly record struct Interpolation(
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
