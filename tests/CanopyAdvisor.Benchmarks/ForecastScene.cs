using System.Collections.Immutable;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Plants.Growth;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Files.Crops;
using NodaTime;

namespace CanopyAdvisor.Benchmarks;

/// <summary>
/// The forecast benchmark scene (invented, not demo data of any site): a one-hectare glasshouse (100 m × 100 m, ten
/// 10 m bays, ridges north–south, opaque north end wall) at 52° N in Europe/Amsterdam with up to 400 benches of
/// 4 m × 1.8 m in a 20 × 20 layout, 4 × 4 sample points each, 800 overhead lamps at 4.5 m in 40 rows of 20 and 40 side
/// lamps along the south wall aimed north; one lot per bench of petunia, basil or poinsettia from the built-in crop library.
/// </summary>
public static class ForecastScene
{
    /// <summary>Forecast start: 2026-12-10 10:00 Europe/Amsterdam.</summary>
    public static Instant Now { get; } = new LocalDateTime(2026, 12, 10, 10, 0).InZoneStrictly(BenchmarkScene.Zone).ToInstant();

    /// <summary>The crops used.</summary>
    public static IReadOnlyList<string> CropIds { get; } = ["petunia", "basil", "poinsettia"];

    /// <summary>Builds the forecast request for the first <paramref name="benchCount"/> benches (row by row).</summary>
    /// <param name="benchCount">1 to 400 benches.</param>
    public static ForecastRequest Request(int benchCount)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(benchCount, 1);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(benchCount, 400);
        DateTimeZone zone = BenchmarkScene.Zone;
        LocalDate today = Now.InZone(zone).Date;
        var benches = ImmutableArray.CreateBuilder<Bench>(benchCount);
        var lots = ImmutableArray.CreateBuilder<Lot>(benchCount);
        for (int k = 0; k < benchCount; k++)
        {
            int row = k / 20, column = k % 20;
            string id = $"bench-{row:00}-{column:00}";
            benches.Add(new Bench(
                id, new Footprint(1.5 + (column * 4.9), 2 + (row * 4.9), Angle.Zero, 4, 1.8), 0.8, new Canopy(0.1, 0.01, 0), 4, 4));
            ImmutableArray<RotationRecord> rotations = k % 3 == 0
                ? [new RotationRecord(Now - Duration.FromDays(4), Angle.FromDegrees(180))]
                : [];
            lots.Add(new Lot(
                "lot-" + id, id, CropIds[k % 3], today.PlusDays(-35), today.PlusDays(21 + (k % 14)), 60 + (k % 40), today.PlusDays(-(k % 3)),
                0.15, 100, rotations));
        }

        var bands = new BandFractions(0.1, 0.2, 0.7, 0.03);
        var schedule = new LampSchedule(new LocalTime(4, 0), new LocalTime(22, 0), 300);
        var lamps = ImmutableArray.CreateBuilder<Lamp>(840);
        for (int row = 0; row < 40; row++)
        {
            for (int k = 0; k < 20; k++)
            {
                lamps.Add(new Lamp(
                    $"top-{row}-{k}", new Vector3(2.5 + (k * 5.0), 1.25 + (row * 2.5), 4.5), LampAim.Down,
                    LambertianDistribution.Instance, BenchmarkIes.FluxMicromolesPerSecond, bands, 1, 650, schedule));
            }
        }

        var side = new LampAim(Angle.Zero, Angle.FromDegrees(80), Angle.Zero);
        for (int k = 0; k < 40; k++)
        {
            lamps.Add(new Lamp(
                $"side-{k}", new Vector3(1.25 + (k * 2.5), 0.5, 2), side, CosinePowerDistribution.FromBeamAngle(Angle.FromDegrees(60)),
                300, bands, 1, 250, schedule));
        }

        var glass = new Cover("float glass 4 mm", false, 1.526, 4, 0.004, 1);
        var structure = new Glasshouse(
            new Footprint(0, 0, Angle.Zero, 100, 100), 10, 10, 5, Angle.FromDegrees(22),
            glass, glass, glass, glass, Cover.OpaqueSurface("insulated panel"), 0.15);
        var site = new Site(
            "forecast-bench", "forecast benchmark scene", BenchmarkScene.Location, zone, structure, benches.MoveToImmutable(),
            lamps.MoveToImmutable(), [], BenchmarkScene.Weather)
        {
            Lots = lots.MoveToImmutable(),
            Temperatures = new TemperatureSetpoints(20, 17, 3, 2),
        };

        CropLibrary library = CropLibrary.LoadBuiltIn();
        Dictionary<string, Crop> crops = CropIds.ToDictionary(id => id, library.Get);
        return new ForecastRequest(
            site, crops, BenchmarkScene.OutsideLight(), new SetpointTemperature(site.Temperatures, site.Location, zone), Now)
        {
            Step = Duration.FromMinutes(10),
        };
    }
}
