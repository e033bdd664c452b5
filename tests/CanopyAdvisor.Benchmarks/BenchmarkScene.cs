using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Structures;
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

/// <summary>Stand-in enclosure: a glass roof of transmittance 0.75 over an open sky; nothing blocks a lamp.</summary>
public sealed class GlassRoofEnclosure : IEnclosure
{
    /// <inheritdoc />
    public double SkyTransmittance(Vector3 origin, Vector3 towardSky) => towardSky.Z > 0 ? 0.75 : 0;

    /// <inheritdoc />
    public bool IsBlocked(Vector3 from, Vector3 to) => false;
}

/// <summary>Stand-in Lambertian beam, I = cos θ / π.</summary>
public sealed class LambertianBeam : BeamDistribution
{
    /// <inheritdoc />
    public override bool IsAxiallySymmetric => true;

    /// <inheritdoc />
    public override double IntensityPerUnitFlux(double polarRadians, double aroundRadians) =>
        polarRadians < Math.PI / 2 ? Math.Cos(polarRadians) / Math.PI : 0;
}

/// <summary>Stand-in tabulated beam: 25 C-planes (0–360° by 15°) × 37 polar angles (0–90° by 2.5°), bilinear.</summary>
public sealed class TabulatedBeam : BeamDistribution
{
    private const int Planes = 25;
    private const int Polars = 37;
    private const double PlaneStep = 2 * Math.PI / (Planes - 1);
    private const double PolarStep = Math.PI / 2 / (Polars - 1);
    private readonly double[] _table = new double[Planes * Polars];

    /// <summary>Fills the table with an elongated cosine-power beam (wider along C = 0° than across), roughly normalised.</summary>
    public TabulatedBeam()
    {
        for (int c = 0; c < Planes; c++)
        {
            double around = c * PlaneStep;
            double n = 1.5 + Math.Abs(Math.Sin(around));
            for (int p = 0; p < Polars; p++)
            {
                _table[(c * Polars) + p] = (n + 1) / (2 * Math.PI) * Math.Pow(Math.Cos(p * PolarStep), n);
            }
        }
    }

    /// <inheritdoc />
    public override bool IsAxiallySymmetric => false;

    /// <inheritdoc />
    public override double IntensityPerUnitFlux(double polarRadians, double aroundRadians)
    {
        if (polarRadians >= Math.PI / 2)
        {
            return 0;
        }

        double pc = aroundRadians / PlaneStep;
        double pp = polarRadians / PolarStep;
        int c = Math.Min((int)pc, Planes - 2);
        int p = Math.Min((int)pp, Polars - 2);
        double fc = pc - c, fp = pp - p;
        int k = (c * Polars) + p;
        double low = (_table[k] * (1 - fp)) + (_table[k + 1] * fp);
        double high = (_table[k + Polars] * (1 - fp)) + (_table[k + Polars + 1] * fp);
        return (low * (1 - fc)) + (high * fc);
    }
}

/// <summary>Stand-in outside light: a fixed mid-morning sun.</summary>
public sealed class FixedSun : IOutsideLightSource
{
    private static readonly Vector3 Sun = Direction.FromAzimuthZenith(Angle.FromDegrees(140), Angle.FromDegrees(55));

    /// <inheritdoc />
    public OutsideLight At(Instant time) => new(time, Sun, 900, 250, 250 + (900 * Sun.Z));
}
