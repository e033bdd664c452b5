using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Sites;
using NodaTime;

namespace CanopyAdvisor.Benchmarks;

/// <summary>
/// The benchmark scene (invented, not demo data of any site): 16 benches of 20 × 20 sample points (6,400 points) in a
/// 4 × 4 layout, under 800 lamps in 40 rows of 20 at 2.5 m, in four switching groups.
/// </summary>
/// <remarks>
/// Until the enclosure and lamp photometry parts are merged, the scene uses stand-ins written here: an open sky with a
/// uniform glass roof, a Lambertian beam and a tabulated (C-plane × polar grid, bilinear) beam like an IES type C file.
/// </remarks>
public static class BenchmarkScene
{
    /// <summary>Number of sample points in the scene.</summary>
    public const int PointCount = 16 * 20 * 20;

    /// <summary>Builds the scene.</summary>
    public static Site Build(bool tabulated, bool indoor)
    {
        BeamDistribution distribution = tabulated ? new TabulatedBeam() : new LambertianBeam();
        var benches = ImmutableArray.CreateBuilder<Bench>();
        for (int i = 0; i < 4; i++)
        {
            for (int j = 0; j < 4; j++)
            {
                benches.Add(new Bench(
                    $"bench-{i}-{j}",
                    new Footprint(j * 2.5, i * 10.0, Angle.Zero, 8, 1.8),
                    0.8,
                    new Canopy(0.25, 0.05, 3),
                    20,
                    20));
            }
        }

        var bands = new BandFractions(0.1, 0.2, 0.7, 0.03);
        var lamps = ImmutableArray.CreateBuilder<Lamp>();
        for (int row = 0; row < 40; row++)
        {
            for (int k = 0; k < 20; k++)
            {
                var schedule = new LampSchedule(new LocalTime(4 + (row % 4), 0), new LocalTime(20, 0), 600);
                lamps.Add(new Lamp(
                    $"lamp-{row}-{k}",
                    new Vector3(k * 0.5, row * 1.0, 2.5),
                    LampAim.Down,
                    distribution,
                    1800,
                    bands,
                    1,
                    650,
                    schedule));
            }
        }

        Structure structure = indoor
            ? new IndoorRoom(new Footprint(-5, -5, Angle.Zero, 60, 20), 4)
            : new Glasshouse(
                new Footprint(-5, -5, Angle.Zero, 60, 20), 2, 10, 4, Angle.FromDegrees(22),
                Glass, Glass, Glass, Glass, Glass, 0.15);
        return new Site(
            "bench", "benchmark scene", new GeoLocation(Angle.FromDegrees(52), Angle.FromDegrees(5), 0),
            DateTimeZoneProviders.Tzdb["Europe/Amsterdam"], structure, benches.ToImmutable(), lamps.ToImmutable(),
            ImmutableArray<Obstruction>.Empty, new WeatherSettings(3, 1));
    }

    private static Cover Glass { get; } = new("glass", false, 1.526, 4, 0.004, 1);
}
