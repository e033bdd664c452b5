using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Sky;

public class MeasuredOutsideLightTests
{
    // Invented demo log at an invented site, 52° N.
    private static readonly GeoLocation Site = new(Angle.FromDegrees(51.97), Angle.FromDegrees(5.67), 10);

    private static Instant Utc(int hour, int minute = 0) => Instant.FromUtc(2026, 6, 21, hour, minute);

    private static WeatherRecord Ghi(int hour, double wm2) => new(Utc(hour), wm2, null);

    private static WeatherRecord Par(int hour, double ppfd) => new(Utc(hour), null, ppfd);

    // PAR given → used as is; GHI only → × 0.47 × 4.57 (Thimijan & Heins 1983): 500 W m⁻² → 1073.95 (computed).
    [Fact]
    public void Readings_ConvertToPpfd()
    {
        var log = new MeasuredOutsideLight([Ghi(10, 500), Par(11, 1200), new WeatherRecord(Utc(12), 500, 1300)], Site);
        Assert.Equal(1073.95, log.At(Utc(10)).GlobalHorizontalPpfd, 2);
        Assert.Equal(1200, log.At(Utc(11)).GlobalHorizontalPpfd, 9);
        Assert.Equal(1300, log.At(Utc(12)).GlobalHorizontalPpfd, 9);
    }

    // Linear interpolation between neighbours within the maximum gap (definition).
    [Fact]
    public void BetweenReadings_IsLinear()
    {
        var log = new MeasuredOutsideLight([Par(10, 1000), Par(11, 1400)], Site);
        Assert.Equal(1100, log.At(Utc(10, 15)).GlobalHorizontalPpfd, 9);
        Assert.True(log.TryAt(Utc(10, 30), out OutsideLight light));
        Assert.Equal(1200, light.GlobalHorizontalPpfd, 9);
    }

    // Beam and diffuse split by Erbs: the parts add up to the global (GHI = DNI cos z + DHI, definition).
    [Fact]
    public void Split_AddsUp()
    {
        var log = new MeasuredOutsideLight([Par(11, 1500), Par(12, 1600)], Site);
        OutsideLight light = log.At(Utc(11, 30));
        Assert.Equal(light.GlobalHorizontalPpfd, (light.DirectNormalPpfd * light.SunDirection.Z) + light.DiffuseHorizontalPpfd, 6);
        Assert.True(light.DirectNormalPpfd > 0);
    }

    // Twilight reading with the sun below the horizon: all diffuse (documented guard), not dark, not beam.
    [Fact]
    public void TwilightReading_IsAllDiffuse()
    {
        // 21 June 2026 at 52° N, 5.67° E: sunset near 20:00 UTC; at 20:30 UTC the sun is below the horizon.
        var log = new MeasuredOutsideLight([new WeatherRecord(Instant.FromUtc(2026, 6, 21, 20, 30), null, 15.0)], Site);
        OutsideLight light = log.At(Instant.FromUtc(2026, 6, 21, 20, 30));
        Assert.True(light.SunDirection.Z < 0);
        Assert.Equal(0.0, light.DirectNormalPpfd);
        Assert.Equal(15.0, light.DiffuseHorizontalPpfd, 9);
    }

    // A gap longer than the maximum (2 h by default) is reported and never filled in.
    [Fact]
    public void LongGap_IsReportedAndNotInvented()
    {
        var log = new MeasuredOutsideLight([Par(8, 500), Par(9, 800), Par(12, 1500), Par(13, 1400)], Site);
        Assert.Equal([new WeatherGap(Utc(9), Utc(12))], log.Gaps.ToArray());
        Assert.False(log.TryAt(Utc(10), out _));
        OutsideLight missing = log.At(Utc(10));
        Assert.True(MeasuredOutsideLight.IsMissing(missing));
        Assert.True(double.IsNaN(missing.DirectNormalPpfd) && double.IsNaN(missing.DiffuseHorizontalPpfd));
        Assert.Equal(SolarPosition.SunDirection(Utc(10), Site), missing.SunDirection);
        Assert.False(MeasuredOutsideLight.IsMissing(log.At(Utc(12))));
    }

    [Fact]
    public void MaximumGap_IsConfigurable()
    {
        var log = new MeasuredOutsideLight([Par(9, 800), Par(12, 1500)], Site, Duration.FromHours(3));
        Assert.Empty(log.Gaps);
        Assert.Equal(1150, log.At(Utc(10, 30)).GlobalHorizontalPpfd, 9);
    }

    // A row with no value is a missing reading: it does not bridge the gap around it.
    [Fact]
    public void EmptyReading_DoesNotBridgeGap()
    {
        var log = new MeasuredOutsideLight([Par(8, 500), new WeatherRecord(Utc(10), null, null), Par(11, 900)], Site);
        Assert.Equal([new WeatherGap(Utc(8), Utc(11))], log.Gaps.ToArray());
        Assert.False(log.TryAt(Utc(10), out _));
    }

    [Fact]
    public void OutsideTheLog_IsMissing()
    {
        var log = new MeasuredOutsideLight([Par(9, 800), Par(10, 900)], Site);
        Assert.False(log.TryAt(Utc(8), out _));
        Assert.False(log.TryAt(Utc(11), out _));
        Assert.True(log.TryAt(Utc(10), out _));
        Assert.Equal(new Interval(Utc(9), Utc(10)), log.Coverage);
    }

    [Fact]
    public void BadRecords_AreAllReported()
    {
        var ex = Assert.Throws<InvalidInputException>(() => new MeasuredOutsideLight(
            [Par(10, 800), Par(10, 900), new WeatherRecord(Utc(11), -1, double.NaN)],
            Site));
        Assert.Equal(
            ["records[1].time", "records[2].globalHorizontalWm2", "records[2].globalHorizontalPpfd"],
            ex.Errors.Select(e => e.Path));
    }

    [Fact]
    public void EmptyLog_IsRejected()
    {
        var ex = Assert.Throws<InvalidInputException>(() => new MeasuredOutsideLight([], Site));
        Assert.Equal("records", Assert.Single(ex.Errors).Path);
    }
}
