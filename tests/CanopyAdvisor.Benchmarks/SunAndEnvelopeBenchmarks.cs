using BenchmarkDotNet.Attributes;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Structures;
using NodaTime;

namespace CanopyAdvisor.Benchmarks;

/// <summary>
/// Per-call costs of the pieces a step and a compile call most: the NREL SPA (full and sun direction only), the clear
/// sky, and the glasshouse envelope's sky transmittance and blocking test.
/// </summary>
/// <remarks>
/// Sun calls cycle through 96 instants of 2026-03-04 (every 15 minutes). SkyTransmittance is called for every direction
/// of the default sky quadrature from the centre of a bench (the same mix of steep and low rays the compile uses);
/// IsBlocked for the segments from that point to every lamp of the scene.
/// </remarks>
[MemoryDiagnoser]
[SimpleJob(launchCount: 1, warmupCount: 2, iterationCount: 5)]
public class SunAndEnvelopeBenchmarks
{
    private const int Instants = 96;
    private readonly Instant[] _instants = new Instant[Instants];
    private readonly SolarPositionInput[] _inputs = new SolarPositionInput[Instants];
    private ClearSkyOutsideLight _sky = null!;
    private GlasshouseEnclosure _glasshouse = null!;
    private Vector3[] _directions = null!;
    private Vector3[] _lamps = null!;
    private Vector3 _point;

    /// <summary>Directions of the default sky quadrature (16 zenith bands); setup checks it.</summary>
    private const int SkyDirections = 651;

    /// <summary>Builds the instants, the glasshouse envelope and the ray sets.</summary>
    [GlobalSetup]
    public void Setup()
    {
        Instant start = new LocalDateTime(2026, 3, 4, 0, 0).InZoneStrictly(BenchmarkScene.Zone).ToInstant();
        for (int i = 0; i < Instants; i++)
        {
            _instants[i] = start + Duration.FromMinutes(15 * i);
            _inputs[i] = new SolarPositionInput(_instants[i], BenchmarkScene.Location);
        }

        _sky = BenchmarkScene.OutsideLight();
        Site site = BenchmarkScene.Build(BeamKind.Lambertian, indoor: false);
        _glasshouse = (GlasshouseEnclosure)EnclosureBuilder.Build(site);
        _directions = [.. HemisphereQuadrature.Default.Directions];
        if (_directions.Length != SkyDirections)
        {
            throw new InvalidOperationException($"the default sky quadrature has {_directions.Length} directions, not {SkyDirections}");
        }
        _lamps = [.. site.Lamps.Select(l => l.Position)];
        _point = new Vector3(2.5 + 0.9, 10 + 4, 1.0);
    }

    /// <summary>Full SPA (every output) per call.</summary>
    [Benchmark(OperationsPerInvoke = Instants)]
    public double SolarPositionCalculate()
    {
        double sum = 0;
        foreach (SolarPositionInput input in _inputs)
        {
            sum += SolarPosition.Calculate(input).Zenith.Radians;
        }

        return sum;
    }

    /// <summary>Sun direction only (what the clear sky calls once per step) per call.</summary>
    [Benchmark(OperationsPerInvoke = Instants)]
    public double SunDirection()
    {
        double sum = 0;
        foreach (Instant t in _instants)
        {
            sum += SolarPosition.SunDirection(t, BenchmarkScene.Location).Z;
        }

        return sum;
    }

    /// <summary>Clear-sky outside light (sun, Ineichen–Perez, Erbs, photons) per call: once per simulation step.</summary>
    [Benchmark(OperationsPerInvoke = Instants)]
    public double ClearSkyAt()
    {
        double sum = 0;
        foreach (Instant t in _instants)
        {
            sum += _sky.At(t).GlobalHorizontalPpfd;
        }

        return sum;
    }

    /// <summary>GlasshouseEnclosure.SkyTransmittance per call over the quadrature directions.</summary>
    [Benchmark(OperationsPerInvoke = SkyDirections)]
    public double SkyTransmittance()
    {
        double sum = 0;
        foreach (Vector3 d in _directions)
        {
            sum += _glasshouse.SkyTransmittance(_point, d);
        }

        return sum;
    }

    /// <summary>GlasshouseEnclosure.IsBlocked per call, point to each of the 800 lamps.</summary>
    [Benchmark(OperationsPerInvoke = BenchmarkScene.LampCount)]
    public int IsBlocked()
    {
        int count = 0;
        foreach (Vector3 lamp in _lamps)
        {
            if (_glasshouse.IsBlocked(_point, lamp))
            {
                count++;
            }
        }

        return count;
    }
}
