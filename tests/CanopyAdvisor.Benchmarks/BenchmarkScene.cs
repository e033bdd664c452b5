using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Files.Photometry;
using NodaTime;

namespace CanopyAdvisor.Benchmarks;

/// <summary>
/// The benchmark scene (invented, not demo data of any site): 16 benches of 20 × 20 sample points (6,400 points) in a
/// 4 × 4 layout, under 800 lamps in 40 rows of 20 at 3 m, in four switching groups, at 52° N in Europe/Amsterdam.
/// </summary>
/// <remarks>
/// Structures: a glasshouse of 10 bays × 8 m, 80 m long (ridge north–south), glass roof and walls, an opaque back wall,
/// and a shed outside to the south-east as the one obstruction; or an indoor room 50 m × 20 m × 4 m. Every part is the
/// real one from Core and Files (no stand-ins).
/// </remarks>
public static class BenchmarkScene
{
    /// <summary>Number of sample points in the scene.</summary>
    public const int PointCount = 16 * 20 * 20;

    /// <summary>Number of lamps in the scene.</summary>
    public const int LampCount = 40 * 20;

    /// <summary>Outside-light cut-off of every lamp schedule, µmol m⁻² s⁻¹ (global horizontal PPFD).</summary>
    public const double CutOffPpfd = 1000;

    /// <summary>Site location: 52° N, 5° E, sea level.</summary>
    public static GeoLocation Location { get; } = new(Angle.FromDegrees(52), Angle.FromDegrees(5), 0);

    /// <summary>Site time zone.</summary>
    public static DateTimeZone Zone { get; } = DateTimeZoneProviders.Tzdb["Europe/Amsterdam"];

    /// <summary>Weather settings: Linke turbidity 3, clear days.</summary>
    public static WeatherSettings Weather { get; } = new(3, 1);

    /// <summary>The real clear-sky outside light for the site.</summary>
    public static ClearSkyOutsideLight OutsideLight() => new(Location, Zone, Weather);

    /// <summary>Builds the scene.</summary>
    /// <param name="beam">The lamps' distribution.</param>
    /// <param name="indoor">Indoor room instead of the glasshouse.</param>
    public static Site Build(BeamKind beam, bool indoor)
    {
        (BeamDistribution distribution, double ppf) = beam switch
        {
            BeamKind.Lambertian => ((BeamDistribution)LambertianDistribution.Instance, BenchmarkIes.FluxMicromolesPerSecond),
            BeamKind.CosinePower => (CosinePowerDistribution.FromBeamAngle(Angle.FromDegrees(90)), BenchmarkIes.FluxMicromolesPerSecond),
            _ => FromIes(BenchmarkIes.Read()),
        };

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
        var schedules = new LampSchedule[4];
        for (int g = 0; g < schedules.Length; g++)
        {
            schedules[g] = new LampSchedule(new LocalTime(4 + g, 0), new LocalTime(20 + (g % 2), 0), CutOffPpfd);
        }

        var lamps = ImmutableArray.CreateBuilder<Lamp>(LampCount);
        for (int row = 0; row < 40; row++)
        {
            for (int k = 0; k < 20; k++)
            {
                lamps.Add(new Lamp(
                    $"lamp-{row}-{k}",
                    new Vector3(k * 0.5, row * 1.0, 3.0),
                    LampAim.Down,
                    distribution,
                    ppf,
                    bands,
                    1,
                    650,
                    schedules[row % 4]));
            }
        }

        Structure structure = indoor
            ? new IndoorRoom(new Footprint(-5, -5, Angle.Zero, 50, 20), 4)
            : new Glasshouse(
                new Footprint(-35, -20, Angle.Zero, 80, 80), 10, 8, 5, Angle.FromDegrees(22),
                Glass, Glass, Glass, Glass, Cover.OpaqueSurface("insulated panel"), 0.15);
        ImmutableArray<Obstruction> obstructions =
            [new Obstruction("shed", new Footprint(50, -30, Angle.Zero, 20, 10), 0, 8)];
        return new Site(
            "bench", "benchmark scene", Location, Zone, structure, benches.ToImmutable(), lamps.MoveToImmutable(),
            obstructions, Weather);
    }

    private static Cover Glass { get; } = new("float glass 4 mm", false, 1.526, 4, 0.004, 1);

    private static (BeamDistribution, double) FromIes(IesPhotometry ies) => (ies.Distribution, ies.TotalPhotonFluxMicromolesPerSecond);
}
