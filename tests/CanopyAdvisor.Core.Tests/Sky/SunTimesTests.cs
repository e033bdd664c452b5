using CanopyAdvisor.Core.Sky;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Sky;

public class SunTimesTests
{
    private static readonly SunTimes Example = SolarPosition.CalculateSunTimes(SpaWorkedExample.SunTimesInput);

    // Worked example of Reda & Andreas 2004 (appendix A.5; MODEL.md §1.1): sunrise 06:12:43, transit 11:46:05
    // (11.768045 h, the report's C code), sunset 17:20:19 local time (UTC−7). The printed times are whole seconds, so the
    // tolerance is half a second; transit is also checked to the printed fractional hours (1e-6 h = 0.004 s).
    [Fact]
    public void WorkedExample_RisesAndSets() => Assert.Equal(SunDayKind.RisesAndSets, Example.Kind);

    [Fact]
    public void WorkedExample_Transit()
    {
        Assert.Equal(11.768045, Example.TransitHours, 6);
        Assert.Equal(new LocalTime(11, 46, 5), RoundToSecond(Example.Transit.TimeOfDay));
    }

    [Fact]
    public void WorkedExample_Sunrise()
    {
        Assert.InRange(Example.SunriseHours!.Value * 3600.0, (6 * 3600) + (12 * 60) + 43 - 0.5, (6 * 3600) + (12 * 60) + 43 + 0.5);
        Assert.Equal(new LocalTime(6, 12, 43), RoundToSecond(Example.Sunrise!.Value.TimeOfDay));
    }

    [Fact]
    public void WorkedExample_Sunset()
    {
        Assert.InRange(Example.SunsetHours!.Value * 3600.0, (17 * 3600) + (20 * 60) + 19 - 0.5, (17 * 3600) + (20 * 60) + 19 + 0.5);
        Assert.Equal(new LocalTime(17, 20, 19), RoundToSecond(Example.Sunset!.Value.TimeOfDay));
    }

    private static LocalTime RoundToSecond(LocalTime t) =>
        LocalTime.FromTicksSinceMidnight(((t.TickOfDay + (NodaConstants.TicksPerSecond / 2)) / NodaConstants.TicksPerSecond) * NodaConstants.TicksPerSecond);

    // The two methods share the report's equations: at a site on UTC (Greenwich meridian, zone offset 0) they count
    // from the same midnight and differ only by the extra correction steps, a few seconds at most (report appendix A.2).
    [Theory]
    [InlineData(51.4769, 2026, 3, 20)]
    [InlineData(51.4769, 2026, 6, 21)]
    [InlineData(-35.0, 2026, 12, 4)]
    public void Methods_AgreeAtGreenwich(double latitudeDeg, int year, int month, int day)
    {
        var location = new CanopyAdvisor.Core.Sites.GeoLocation(
            CanopyAdvisor.Core.Geometry.Angle.FromDegrees(latitudeDeg), CanopyAdvisor.Core.Geometry.Angle.Zero, 0);
        var input = new SunTimesInput(new LocalDate(year, month, day), DateTimeZone.Utc, location);
        SunTimes iterated = SolarPosition.CalculateSunTimes(input);
        SunTimes report = SolarPosition.CalculateSunTimes(input with { Method = SunTimesMethod.ReportAppendixA2 });
        Assert.InRange((iterated.SunriseHours!.Value - report.SunriseHours!.Value) * 3600, -5, 5);
        Assert.InRange((iterated.SunsetHours!.Value - report.SunsetHours!.Value) * 3600, -5, 5);
        Assert.InRange((iterated.TransitHours - report.TransitHours) * 3600, -1, 1);
    }

    // West of Greenwich the report's method returns the previous local day's sunset (see SunTimesMethod): at the worked
    // example's site and date the local-day sunset is earlier than the report's 17:20:19 by roughly one day's change of
    // sunset time in October (about 1.5 min/day at 40° N; from the ephem table at Golden, 2026-10-17, 17:18:14).
    [Fact]
    public void LocalDayMethod_GivesThatDatesOwnSunset()
    {
        SunTimes local = SolarPosition.CalculateSunTimes(SpaWorkedExample.SunTimesInput with { Method = SunTimesMethod.LocalDayIterated });
        double differenceSeconds = (Example.SunsetHours!.Value - local.SunsetHours!.Value) * 3600;
        Assert.InRange(differenceSeconds, 60, 120);
        Assert.InRange((Example.SunriseHours!.Value - local.SunriseHours!.Value) * 3600, -5, 5);
    }

    // Polar night and polar day give no sunrise or sunset but still a transit (the report flags them with -99999).
    // 78.22° N at the solstices: transit elevation 90° − φ + δ with δ = ∓23.44° (the obliquity) → −11.66° in December
    // and +35.22° in June (geometry; the June lower culmination is φ + δ − 90° = +11.66°, so the sun never sets).
    [Theory]
    [InlineData(12, 21, SunDayKind.PolarNight, -11.66)]
    [InlineData(6, 21, SunDayKind.PolarDay, 35.22)]
    public void PolarDays_HaveNoSunriseOrSunset(int month, int day, SunDayKind expected, double transitElevationDeg)
    {
        var location = new CanopyAdvisor.Core.Sites.GeoLocation(
            CanopyAdvisor.Core.Geometry.Angle.FromDegrees(78.22), CanopyAdvisor.Core.Geometry.Angle.FromDegrees(15.65), 10);
        SunTimes t = SolarPosition.CalculateSunTimes(
            new SunTimesInput(new LocalDate(2026, month, day), DateTimeZone.ForOffset(Offset.FromHours(1)), location));
        Assert.Equal(expected, t.Kind);
        Assert.Null(t.Sunrise);
        Assert.Null(t.SunsetHours);
        Assert.InRange(t.TransitHours, 11.5, 12.5);
        Assert.Equal(transitElevationDeg, t.TransitElevation.Degrees, 0.02);
    }

    // On the day daylight saving starts (Europe/Amsterdam, 29 March 2026, 02:00 CET → 03:00 CEST; IANA tzdb), the events
    // are reported in the offset in force at noon (+02:00) and equal those of a fixed +02:00 zone.
    [Fact]
    public void DaylightSavingDay_UsesTheNoonOffset()
    {
        var location = new CanopyAdvisor.Core.Sites.GeoLocation(
            CanopyAdvisor.Core.Geometry.Angle.FromDegrees(52.37), CanopyAdvisor.Core.Geometry.Angle.FromDegrees(4.90), 0);
        var date = new LocalDate(2026, 3, 29);
        SunTimes amsterdam = SolarPosition.CalculateSunTimes(new SunTimesInput(date, DateTimeZoneProviders.Tzdb["Europe/Amsterdam"], location));
        SunTimes fixedOffset = SolarPosition.CalculateSunTimes(new SunTimesInput(date, DateTimeZone.ForOffset(Offset.FromHours(2)), location));
        Assert.Equal(Offset.FromHours(2), amsterdam.Sunrise!.Value.Offset);
        Assert.Equal(fixedOffset.Sunrise!.Value.ToInstant(), amsterdam.Sunrise.Value.ToInstant());
        Assert.Equal(fixedOffset.SunriseHours, amsterdam.SunriseHours);
        Assert.InRange(amsterdam.SunriseHours!.Value, 7.0, 7.5);
    }
}
