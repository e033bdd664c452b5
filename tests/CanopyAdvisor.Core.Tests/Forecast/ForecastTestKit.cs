using System.Collections.Immutable;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Plants.Growth;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Tests.Plants;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Forecast;

/// <summary>Small sites, lots and requests for the forecast tests (invented test data, not demo data of a business).</summary>
internal static class ForecastTestKit
{
    public static DateTimeZone London => DateTimeZoneProviders.Tzdb["Europe/London"];

    public static GeoLocation At52North { get; } = new(Angle.FromDegrees(52), Angle.FromDegrees(0), 0);

    /// <summary>10 December 2026, 12:00 UTC: a winter forecast start at 52° N.</summary>
    public static Instant WinterNow { get; } = Instant.FromUtc(2026, 12, 10, 12, 0);

    public static Cover Glass { get; } = new("float glass 4 mm", false, 1.526, 4, 0.004, 1);

    public static BandFractions White { get; } = new(0.2, 0.4, 0.4, 0.05);

    /// <summary>The valid test crop of the crop validator tests (B 3, γ 1.5, a 0.8, b 0.3, growth zone 20 mm, 5 mm/d,
    /// base 4 °C, nutation 2 h, lean limit 15°, height limit 150 mm).</summary>
    public static Crop TestCrop { get; } = CropValidatorTests.Sample();

    /// <summary>A one-bay glasshouse 8 m wide (x) and 20 m long (ridge north–south, y), all glass but an opaque north end wall.</summary>
    public static Glasshouse OpaqueNorthGlasshouse { get; } = new(
        new Footprint(0, 0, Angle.Zero, 20, 8), 1, 8, 4, Angle.FromDegrees(22),
        Glass, Glass, Glass, Glass, Cover.OpaqueSurface("insulated panel"), 0.1);

    public static Site Site(Structure structure, IEnumerable<Bench> benches, IEnumerable<Lamp> lamps, params Lot[] lots) =>
        new("forecast-test", "forecast test site", At52North, London, structure, [.. benches], [.. lamps], [], new WeatherSettings(3, 1))
        {
            Lots = [.. lots],
        };

    /// <summary>A bench whose length runs north from (x, y).</summary>
    public static Bench Bench(string id, double x, double y, double lengthM, double widthM, int along, int across) =>
        new(id, new Footprint(x, y, Angle.Zero, lengthM, widthM), 0.8, new Canopy(0.1, 0.01, 0), along, across);

    public static Lot Lot(
        string benchId, Instant now, string cropId = "test-crop", double heightMm = 80, int saleInDays = 21,
        double spacingM = 0.15, int pots = 20, params RotationRecord[] rotations)
    {
        LocalDate today = now.InZone(London).Date;
        return new Lot(
            "lot-" + benchId, benchId, cropId, today.PlusDays(-30), today.PlusDays(saleInDays), heightMm, today, spacingM, pots,
            [.. rotations]);
    }

    public static ForecastRequest Request(
        Site site, IOutsideLightSource? outside = null, ITemperatureSource? temperature = null, Instant? now = null,
        params Crop[] crops)
    {
        Crop[] all = crops.Length == 0 ? [TestCrop] : crops;
        return new ForecastRequest(
            site,
            all.ToDictionary(c => c.Id),
            outside ?? new ClearSkyOutsideLight(site.Location, site.Zone, site.Weather),
            temperature ?? new SetpointTemperature(TemperatureSetpoints.Default, site.Location, site.Zone),
            now ?? WinterNow);
    }

    /// <summary>A square grid of downward Lambertian lamps at 1 m pitch over a room 10 m × 10 m, 2.5 m up.</summary>
    public static IEnumerable<Lamp> UniformLampGrid()
    {
        for (int i = 0; i < 10; i++)
        {
            for (int j = 0; j < 10; j++)
            {
                yield return new Lamp(
                    $"top-{i}-{j}", new Vector3(0.5 + i, 0.5 + j, 2.5), LampAim.Down, LambertianDistribution.Instance, 300,
                    White, 1, 100, LampSchedule.AlwaysOn);
            }
        }
    }

    public static IndoorRoom Room { get; } = new(new Footprint(0, 0, Angle.Zero, 10, 10), 4);

    /// <summary>Horizontal lean vector (east, north) of a reading.</summary>
    public static (double East, double North) Vector(LeanReading lean) =>
        (lean.Tilt.Sin() * lean.Azimuth.Sin(), lean.Tilt.Sin() * lean.Azimuth.Cos());

    /// <summary>Smallest difference between two compass bearings, degrees in [0, 180].</summary>
    public static double BearingDifferenceDeg(Angle a, Angle b)
    {
        double d = Math.Abs(a.Degrees - b.Degrees) % 360;
        return d > 180 ? 360 - d : d;
    }
}
