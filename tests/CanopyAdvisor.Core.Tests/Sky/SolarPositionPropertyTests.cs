using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CsCheck;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Sky;

public class SolarPositionPropertyTests
{
    private static readonly Gen<(Instant Time, GeoLocation Location)> Cases =
        Gen.Select(
            Gen.Long[Instant.FromUtc(1950, 1, 1, 0, 0).ToUnixTimeSeconds(), Instant.FromUtc(2100, 1, 1, 0, 0).ToUnixTimeSeconds()],
            Gen.Double[-90, 90],
            Gen.Double[-180, 180],
            Gen.Double[0, 4000],
            (s, lat, lon, h) => (Instant.FromUnixTimeSeconds(s), new GeoLocation(Angle.FromDegrees(lat), Angle.FromDegrees(lon), h)));

    // Geometry (definitions): the sun vector is a unit vector; zenith in [0°, 180°], azimuth in [0°, 360°);
    // refraction only lifts the sun (Δe ≥ 0, report eq. 42–43), by less than 1° (about 0.57° at the horizon, common practice).
    [Fact]
    public void Outputs_AreWithinTheirRanges() =>
        Cases.Sample(c =>
        {
            var r = SolarPosition.Calculate(new SolarPositionInput(c.Time, c.Location));
            return Math.Abs(r.SunDirection.Length - 1.0) < 1e-12
                && r.Zenith.Degrees is >= 0 and <= 180
                && r.Azimuth.Degrees is >= 0 and < 360
                && r.RefractionCorrection.Degrees is >= 0 and < 1.0
                && Math.Abs(r.Zenith.Degrees + r.RefractionCorrection.Degrees - r.ZenithWithoutRefraction.Degrees) < 1e-9;
        });

    // The sun's declination never exceeds the obliquity of the ecliptic plus the sun's tiny ecliptic latitude
    // (|δ| ≤ ε + |β|, spherical triangle inequality on report eq. 31; |β| < 0.0003°).
    [Fact]
    public void Declination_StaysWithinObliquity() =>
        Cases.Sample(c =>
        {
            var r = SolarPosition.Calculate(new SolarPositionInput(c.Time, c.Location));
            return Math.Abs(r.GeocentricDeclination.Degrees)
                <= r.TrueObliquity.Degrees + Math.Abs(r.GeocentricLatitude.Degrees) + 1e-9;
        });

    // The light field calls SunDirection once per time step: it must not allocate (a design promise; counted, not timed).
    [Fact]
    public void SunDirection_DoesNotAllocate()
    {
        var location = new GeoLocation(Angle.FromDegrees(51.97), Angle.FromDegrees(5.67), 10);
        Instant t = Instant.FromUtc(2026, 6, 21, 12, 0);
        _ = SolarPosition.SunDirection(t, location);
        long before = GC.GetAllocatedBytesForCurrentThread();
        double sum = 0;
        for (int i = 0; i < 100; i++)
        {
            sum += SolarPosition.SunDirection(t + Duration.FromMinutes(i), location).Z;
        }

        long allocated = GC.GetAllocatedBytesForCurrentThread() - before;
        Assert.True(sum > 0);
        Assert.Equal(0, allocated);
    }
}
