using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Plants.Growth;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Plants.Growth;

// Sunrise and sunset checks use the PyEphem 4.1.4 table tests/reference/sun_times.csv (fixed UTC+1):
// Wageningen 51.97° N 5.67° E, 2026-06-16: sunrise 04:16:52, sunset 20:59:22 → day 16.708333 h, night 7.291667 h.
// Longyearbyen 78.22° N 15.65° E: polar night on 2026-01-08, polar day on 2026-06-16.
// Setpoints are invented demo values; the drop is within the 2.8–8.3 °C for 2–3 h of common practice.
public class SetpointTemperatureTests
{
    private static readonly GeoLocation Wageningen = new(Angle.FromDegrees(51.97), Angle.FromDegrees(5.67), 10);
    private static readonly GeoLocation Longyearbyen = new(Angle.FromDegrees(78.22), Angle.FromDegrees(15.65), 10);
    private static readonly DateTimeZone UtcPlus1 = DateTimeZone.ForOffset(Offset.FromHours(1));
    private static readonly LocalDate June16 = new(2026, 6, 16);
    private const double SunriseH = 4 + (16 / 60.0) + (52 / 3600.0);
    private const double SunsetH = 20 + (59 / 60.0) + (22 / 3600.0);

    private static Instant At(LocalDate date, double hours) =>
        UtcPlus1.AtStrictly(date.AtMidnight()).ToInstant() + Duration.FromSeconds(hours * 3600);

    [Theory]
    // Day 20 °C from sunrise to sunset, night 18 °C, 5 K lower in the 2 h before sunrise (02:16:52–04:16:52).
    [InlineData(12.0, 20)]
    [InlineData(1.0, 18)]
    [InlineData(3.0, 13)]
    [InlineData(4.2, 13)]    // 04:12, before sunrise
    [InlineData(4.35, 20)]   // 04:21, after sunrise
    [InlineData(20.9, 20)]   // 20:54, before sunset
    [InlineData(21.1, 18)]   // 21:06, after sunset
    [InlineData(23.9, 18)]   // the next sunrise's drop starts after 02:17 on the 17th
    public void FollowsTheSchedule(double localHour, double expectedC)
    {
        var source = new SetpointTemperature(new TemperatureSetpoints(20, 18, 5, 2), Wageningen, UtcPlus1);
        Assert.Equal(expectedC, source.AirTemperatureC(At(June16, localHour)));
    }

    [Fact]
    public void DayNightMeans_AreExact()
    {
        // Night mean = 18 − 5·2/7.291667 = 16.628571; DIF = 20 − 16.628571 = 3.371429 K (from the PyEphem day length).
        var source = new SetpointTemperature(new TemperatureSetpoints(20, 18, 5, 2), Wageningen, UtcPlus1);
        DayNightTemperatures m = source.DayNightMeans(June16);
        double nightH = 24 - (SunsetH - SunriseH);
        Assert.Equal(SunDayKind.RisesAndSets, m.Kind);
        Assert.Equal(SunsetH - SunriseH, m.DayHours, 0.003);   // ±10 s against PyEphem
        Assert.Equal(nightH, m.NightHours, 0.003);
        Assert.Equal(20, m.DayMeanC, 12);
        Assert.Equal(18 - (5 * 2 / nightH), m.NightMeanC, 0.002);
        Assert.Equal(3.371429, m.DifKelvin, 0.002);
        Assert.True(m.IsComplete);
        Assert.Equal(1, m.DayCoverage);
    }

    [Fact]
    public void DayNightMeans_AgreeWithSampling()
    {
        // Consistency: a 30 s sampled mean of AirTemperatureC over day and night matches the exact means within 0.01 K.
        var source = new SetpointTemperature(new TemperatureSetpoints(22, 17, 4, 3), Wageningen, UtcPlus1);
        DayNightTemperatures m = source.DayNightMeans(June16);
        double daySum = 0, nightSum = 0;
        int dayN = 0, nightN = 0;
        for (double h = 0.5 / 120; h < 24; h += 1.0 / 120)
        {
            double t = source.AirTemperatureC(At(June16, h));
            if (h >= SunriseH && h < SunsetH)
            {
                daySum += t;
                dayN++;
            }
            else
            {
                nightSum += t;
                nightN++;
            }
        }

        Assert.Equal(m.DayMeanC, daySum / dayN, 0.01);
        Assert.Equal(m.NightMeanC, nightSum / nightN, 0.01);
    }

    [Fact]
    public void DropLongerThanTheNight_StartsAtSunset()
    {
        // 9 h drop, 7.29 h night: the whole night is at 18 − 5 = 13 °C (the drop applies only at night).
        var source = new SetpointTemperature(new TemperatureSetpoints(20, 18, 5, 9), Wageningen, UtcPlus1);
        DayNightTemperatures m = source.DayNightMeans(June16);
        Assert.Equal(13, m.NightMeanC, 12);
        Assert.Equal(7, m.DifKelvin, 12);
        Assert.Equal(13, source.AirTemperatureC(At(June16, 22)));
    }

    [Fact]
    public void PolarNightAndPolarDay()
    {
        var source = new SetpointTemperature(new TemperatureSetpoints(20, 18, 5, 2), Longyearbyen, UtcPlus1);
        // Polar night (PyEphem: 2026-01-08 and the next day too): night setpoint all date, no sunrise so no drop.
        DayNightTemperatures night = source.DayNightMeans(new LocalDate(2026, 1, 8));
        Assert.Equal(SunDayKind.PolarNight, night.Kind);
        Assert.Equal(18, night.NightMeanC, 12);
        Assert.True(double.IsNaN(night.DayMeanC));
        Assert.Equal(0, night.DifKelvin);
        Assert.Equal(24, night.NightHours, 12);
        Assert.Equal(18, source.AirTemperatureC(At(new LocalDate(2026, 1, 8), 10)));
        // Polar day (PyEphem: 2026-06-16): day setpoint all date.
        DayNightTemperatures day = source.DayNightMeans(June16);
        Assert.Equal(SunDayKind.PolarDay, day.Kind);
        Assert.Equal(20, day.DayMeanC, 12);
        Assert.True(double.IsNaN(day.NightMeanC));
        Assert.Equal(0, day.DifKelvin);
        Assert.Equal(20, source.AirTemperatureC(At(June16, 2)));
    }

    [Fact]
    public void DaylightSavingDay_Has23Hours()
    {
        // IANA tzdb: Europe/Amsterdam moves from +01:00 to +02:00 at 02:00 on 2026-03-29, a 23 h local date.
        DateTimeZone amsterdam = DateTimeZoneProviders.Tzdb["Europe/Amsterdam"];
        var source = new SetpointTemperature(new TemperatureSetpoints(20, 18, 3, 2), Wageningen, amsterdam);
        DayNightTemperatures m = source.DayNightMeans(new LocalDate(2026, 3, 29));
        Assert.Equal(23, m.DayHours + m.NightHours, 9);
        Assert.Equal(18 - (3 * 2 / m.NightHours), m.NightMeanC, 9);
    }

    [Fact]
    public void RejectsBadSetpoints_WithPaths()
    {
        var ex = Assert.Throws<InvalidInputException>(() =>
            new SetpointTemperature(new TemperatureSetpoints(double.NaN, 75, -1, 13), Wageningen, UtcPlus1));
        Assert.Equal(
            ["temperature.dayC", "temperature.nightC", "temperature.preDawnDropC", "temperature.preDawnDropHours"],
            ex.Errors.Select(e => e.Path));
    }
}
