using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Plants.Growth;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Plants.Growth;

// Invented logs (demo data). Day and night at Wageningen 2026-06-16 (fixed UTC+1) from the PyEphem 4.1.4 table
// tests/reference/sun_times.csv: sunrise 04:16:52, sunset 20:59:22.
public class MeasuredTemperatureTests
{
    private static readonly GeoLocation Wageningen = new(Angle.FromDegrees(51.97), Angle.FromDegrees(5.67), 10);
    private static readonly DateTimeZone UtcPlus1 = DateTimeZone.ForOffset(Offset.FromHours(1));
    private static readonly LocalDate June16 = new(2026, 6, 16);
    private const double SunriseH = 4 + (16 / 60.0) + (52 / 3600.0);
    private const double SunsetH = 20 + (59 / 60.0) + (22 / 3600.0);

    private static Instant At(double hours) =>
        UtcPlus1.AtStrictly(June16.AtMidnight()).ToInstant() + Duration.FromSeconds(hours * 3600);

    // T(h) = 10 + 0.5·h °C, read every 10 min from 00:00 to 24:00 (linear, so interpolation is exact).
    private static List<TemperatureRecord> LinearLog(Func<double, bool>? keep = null) =>
        [.. Enumerable.Range(0, 145).Select(i => i / 6.0).Where(h => keep?.Invoke(h) ?? true)
            .Select(h => new TemperatureRecord(At(h), 10 + (0.5 * h)))];

    // ∫ (10 + 0.5h) dh from a to b = 10(b − a) + 0.25(b² − a²)
    private static double Integral(double a, double b) => (10 * (b - a)) + (0.25 * ((b * b) - (a * a)));

    [Fact]
    public void InterpolatesLinearly_WithinTheMaximumGap()
    {
        var log = new MeasuredTemperature(
            [new(At(0), 10), new(At(0.5), 12), new(At(1), null), new(At(1.5), 13)], Wageningen, UtcPlus1);
        Assert.Equal(11, log.AirTemperatureC(At(0.25)), 12);   // halfway between 10 and 12
        Assert.Equal(12.5, log.AirTemperatureC(At(1)), 12);   // the missing reading is bridged: 1 h ≤ 1 h
        Assert.Equal(13, log.AirTemperatureC(At(1.5)), 12);
        Assert.True(double.IsNaN(log.AirTemperatureC(At(-0.1))));  // before the first reading
        Assert.True(double.IsNaN(log.AirTemperatureC(At(1.6))));   // after the last
        Assert.Empty(log.Gaps);
    }

    [Fact]
    public void NothingIsInventedAcrossAGap()
    {
        var log = new MeasuredTemperature([new(At(1), 15), new(At(3), 17)], Wageningen, UtcPlus1);
        Assert.True(double.IsNaN(log.AirTemperatureC(At(2))));
        Assert.Equal([new TemperatureGap(At(1), At(3))], log.Gaps.ToArray());
        Assert.Equal(Duration.FromHours(2), log.Gaps[0].Length);
    }

    [Fact]
    public void DayNightMeans_AreExactForALinearLog()
    {
        // Day mean = 10 + 0.5·(sunrise + sunset)/2 = 16.317639 °C; night mean = (∫₀^sr + ∫ₛₛ^24)/(sr + 24 − ss).
        var log = new MeasuredTemperature(LinearLog(), Wageningen, UtcPlus1);
        DayNightTemperatures m = log.DayNightMeans(June16);
        double nightExpected = (Integral(0, SunriseH) + Integral(SunsetH, 24)) / (SunriseH + 24 - SunsetH);
        Assert.Equal(10 + (0.5 * (SunriseH + SunsetH) / 2), m.DayMeanC, 0.002);   // ±10 s of sun time against PyEphem
        Assert.Equal(nightExpected, m.NightMeanC, 0.002);
        Assert.Equal(m.DayMeanC - m.NightMeanC, m.DifKelvin, 12);
        Assert.Equal(1, m.DayCoverage, 9);
        Assert.Equal(1, m.NightCoverage, 9);
        Assert.True(m.IsComplete);
    }

    [Fact]
    public void TooMuchMissing_GivesNoDif()
    {
        // Readings between 01:00 and 03:00 removed: 2 h of a 7.29 h night unknown → coverage 0.726 < 0.9.
        var log = new MeasuredTemperature(LinearLog(h => h <= 1 || h >= 3), Wageningen, UtcPlus1);
        DayNightTemperatures m = log.DayNightMeans(June16);
        Assert.Equal(1 - (2 / (SunriseH + 24 - SunsetH)), m.NightCoverage, 0.001);
        Assert.True(double.IsNaN(m.NightMeanC));
        Assert.True(double.IsNaN(m.DifKelvin));
        Assert.False(m.IsComplete);
        Assert.Single(log.Gaps);
        // With a lower demand the same log gives a mean of the known part.
        var lenient = new MeasuredTemperature(LinearLog(h => h <= 1 || h >= 3), Wageningen, UtcPlus1, minimumCoverage: 0.5);
        Assert.True(lenient.DayNightMeans(June16).IsComplete);
    }

    [Fact]
    public void RejectsBadLogs_WithPaths()
    {
        var ex = Assert.Throws<InvalidInputException>(() => new MeasuredTemperature(
            [new(At(1), 15), new(At(1), 75), new(At(0.5), double.NaN)], Wageningen, UtcPlus1, Duration.Zero));
        Assert.Equal(
            ["maximumGap", "records[1].airC", "records[1].time", "records[2].airC", "records[2].time"],
            ex.Errors.Select(e => e.Path));
        var empty = Assert.Throws<InvalidInputException>(() => new MeasuredTemperature([new(At(1), null)], Wageningen, UtcPlus1));
        Assert.Equal("records", empty.Errors.Single().Path);
    }
}
