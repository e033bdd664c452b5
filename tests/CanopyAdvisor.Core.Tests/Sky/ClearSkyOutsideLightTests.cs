using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Sky;

public class ClearSkyOutsideLightTests
{
    // Invented demo site: 52° N, 5.67° E, 10 m, zone UTC+1 (fixed offset).
    private static readonly GeoLocation Site = new(Angle.FromDegrees(51.97), Angle.FromDegrees(5.67), 10);
    private static readonly DateTimeZone Zone = DateTimeZone.ForOffset(Offset.FromHours(1));
    private static readonly WeatherSettings Clear = new(LinkeTurbidity: 3.0, DailyClearness: 1.0);

    private static Instant Local(int month, int day, int hour, int minute = 0) =>
        new LocalDateTime(2026, month, day, hour, minute).InZoneStrictly(Zone).ToInstant();

    [Fact]
    public void Night_IsDark()
    {
        var source = new ClearSkyOutsideLight(Site, Zone, Clear);
        OutsideLight light = source.At(Local(3, 20, 0));
        Assert.Equal(0.0, light.GlobalHorizontalPpfd);
        Assert.Equal(0.0, light.DirectNormalPpfd);
        Assert.True(light.SunDirection.Z < 0);
    }

    // Closure GHI = DNI cos z + DHI holds in photon units (definition), and the sun vector is the SPA one.
    [Fact]
    public void Day_IsConsistent()
    {
        var source = new ClearSkyOutsideLight(Site, Zone, Clear);
        Instant t = Local(6, 21, 13, 40);
        OutsideLight light = source.At(t);
        Assert.Equal(light.GlobalHorizontalPpfd, (light.DirectNormalPpfd * light.SunDirection.Z) + light.DiffuseHorizontalPpfd, 6);
        Assert.Equal(SolarPosition.SunDirection(t, Site), light.SunDirection);
        Assert.True(light.DirectNormalPpfd > light.DiffuseHorizontalPpfd);
    }

    // Cross-model check: Ineichen–Perez (T_L = 3) against Haurwitz (1945), an independent clear-sky model, over a summer
    // day; the two agree within 10 % when the sun is above 20° (they differ by 1 % at z = 30°, MODEL.md §1.2 values).
    [Theory]
    [InlineData(9)]
    [InlineData(11)]
    [InlineData(13)]
    [InlineData(15)]
    [InlineData(17)]
    public void ClearDay_AgreesWithHaurwitz(int hour)
    {
        var source = new ClearSkyOutsideLight(Site, Zone, Clear);
        OutsideLight light = source.At(Local(6, 21, hour));
        Angle zenith = Direction.Zenith(light.SunDirection);
        double haurwitzPpfd = SunlightPhotons.PpfdFromGlobal(HaurwitzClearSky.GlobalHorizontalWm2(zenith));
        Assert.InRange(light.GlobalHorizontalPpfd / haurwitzPpfd, 0.9, 1.1);
    }

    // Common practice: full summer sun at noon gives about 2000 µmol m⁻² s⁻¹ outside.
    [Fact]
    public void SummerNoon_IsAboutFullSun()
    {
        var source = new ClearSkyOutsideLight(Site, Zone, Clear);
        Assert.InRange(source.At(Local(6, 21, 13, 40)).GlobalHorizontalPpfd, 1700, 2200);
    }

    // Clearness scales GHI; the override applies to the local date (08:00 on 15 January in UTC+10 is 22:00 UTC on the 14th).
    [Fact]
    public void ClearnessOverride_AppliesToLocalDate()
    {
        var zone = DateTimeZone.ForOffset(Offset.FromHours(10));
        var sydney = new GeoLocation(Angle.FromDegrees(-33.87), Angle.FromDegrees(151.21), 20);
        var date = new LocalDate(2026, 1, 15);
        Instant t = date.At(new LocalTime(8, 0)).InZoneStrictly(zone).ToInstant();
        var plain = new ClearSkyOutsideLight(sydney, zone, Clear);
        var cloudy = new ClearSkyOutsideLight(sydney, zone, Clear, new Dictionary<LocalDate, double> { [date] = 0.5 });
        Assert.Equal(0.5 * plain.At(t).GlobalHorizontalPpfd, cloudy.At(t).GlobalHorizontalPpfd, 9);
        Assert.Equal(1.0, cloudy.ClearnessOn(date.PlusDays(-1)));
        Assert.Equal(0.5, cloudy.ClearnessOn(date));
    }

    // Lower clearness → lower kt → a larger diffuse fraction (Erbs et al. 1982).
    [Fact]
    public void CloudyDay_IsMoreDiffuse()
    {
        var clear = new ClearSkyOutsideLight(Site, Zone, Clear);
        var cloudy = new ClearSkyOutsideLight(Site, Zone, Clear with { DailyClearness = 0.4 });
        OutsideLight a = clear.At(Local(6, 21, 12));
        OutsideLight b = cloudy.At(Local(6, 21, 12));
        Assert.True(b.DiffuseHorizontalPpfd / b.GlobalHorizontalPpfd > a.DiffuseHorizontalPpfd / a.GlobalHorizontalPpfd);
    }

    [Fact]
    public void BadSettings_AreAllReported()
    {
        var ex = Assert.Throws<InvalidInputException>(() => new ClearSkyOutsideLight(
            Site with { Latitude = Angle.FromDegrees(95) },
            Zone,
            new WeatherSettings(0.0, 1.5),
            new Dictionary<LocalDate, double> { [new LocalDate(2026, 3, 1)] = 0.0 }));
        Assert.Equal(
            ["location.latitudeDeg", "weather.linkeTurbidity", "weather.dailyClearness", "weather.clearnessByDate[2026-03-01]"],
            ex.Errors.Select(e => e.Path));
    }
}
