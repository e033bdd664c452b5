using BenchmarkDotNet.Attributes;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Plants;
using NodaTime;

namespace CanopyAdvisor.Benchmarks;

/// <summary>
/// Cost of one <see cref="Stem.Step"/> (target 100–200 ns: 6,400 stems × 1,000 steps in about a second on 2 cores), and
/// of the same stems stepped 16 at a time as a <see cref="StemBundle"/> (one bench's sample points in the forecast).
/// </summary>
/// <remarks>
/// Both cases step the same 1,024 stems under the same light (so the power law M(I) is evaluated once and then
/// cached, in both); the forecast's light changes every step, which adds one <see cref="Math.Pow(double, double)"/>
/// per lit stem and step to both.
/// </remarks>
[MemoryDiagnoser]
[SimpleJob(warmupCount: 1, iterationCount: 5)]
public class StemBenchmarks
{
    private const int Stems = 1024;
    private const int BundleSize = 16;
    private Stem[] _stems = null!;
    private StemBundle[] _bundles = null!;
    private readonly Duration _dt = Duration.FromMinutes(10);
    private readonly Vector3 _blue = Direction.FromAzimuthZenith(Angle.FromDegrees(200), Angle.FromDegrees(60)) * 40;
    private Vector3[] _bundleBlue = null!;

    /// <summary>Growth-zone segments (the forecast uses 4).</summary>
    [Params(1, 4, 8)]
    public int Segments { get; set; }

    /// <summary>With delay and nutation (the full model) or without.</summary>
    [Params(true, false)]
    public bool Full { get; set; }

    /// <summary>1,024 stems of a petunia-like parameter set (invented demo values), as single stems and as 64 bundles of 16.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var p = new StemParameters(2.0, 1.5, 0.02, 0.5, 0.03, Duration.FromHours(2), Angle.FromDegrees(Full ? 8 : 0), 1,
            Duration.FromHours(Full ? 1 : 0));
        _stems = new Stem[Stems];
        for (int i = 0; i < Stems; i++)
        {
            _stems[i] = Stem.Upright(p, 0.05, Segments);
        }

        _bundles = new StemBundle[Stems / BundleSize];
        for (int i = 0; i < _bundles.Length; i++)
        {
            _bundles[i] = StemBundle.Upright(p, 0.05, BundleSize, Segments);
        }

        _bundleBlue = new Vector3[BundleSize];
        Array.Fill(_bundleBlue, _blue);
    }

    /// <summary>One step of every stem, one <see cref="Stem"/> at a time; reported per stem-step.</summary>
    [Benchmark(Baseline = true, OperationsPerInvoke = Stems)]
    public void StepPerStem()
    {
        foreach (Stem s in _stems)
        {
            s.Step(_dt, 0.0005, _blue);
        }
    }

    /// <summary>One step of every stem, 16 at a time in a <see cref="StemBundle"/>; reported per stem-step.</summary>
    [Benchmark(OperationsPerInvoke = Stems)]
    public void BundleStepPerStem()
    {
        foreach (StemBundle b in _bundles)
        {
            b.Step(_dt, 0.0005, _bundleBlue);
        }
    }
}
