using BenchmarkDotNet.Attributes;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Plants;
using NodaTime;

namespace CanopyAdvisor.Benchmarks;

/// <summary>Cost of one <see cref="Stem.Step"/> (target 100–200 ns: 6,400 stems × 1,000 steps in about a second on 2 cores).</summary>
[MemoryDiagnoser]
[SimpleJob(warmupCount: 1, iterationCount: 5)]
public class StemBenchmarks
{
    private const int Stems = 1000;
    private Stem[] _stems = null!;
    private readonly Duration _dt = Duration.FromMinutes(10);
    private readonly Vector3 _blue = Direction.FromAzimuthZenith(Angle.FromDegrees(200), Angle.FromDegrees(60)) * 40;

    /// <summary>Growth-zone segments (the forecast uses 4).</summary>
    [Params(1, 4, 8)]
    public int Segments { get; set; }

    /// <summary>With delay and nutation (the full model) or without.</summary>
    [Params(true, false)]
    public bool Full { get; set; }

    /// <summary>1,000 stems of a petunia-like parameter set (invented demo values).</summary>
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
    }

    /// <summary>One step of every stem; reported per stem-step.</summary>
    [Benchmark(OperationsPerInvoke = Stems)]
    public void StepPerStem()
    {
        foreach (Stem s in _stems)
        {
            s.Step(_dt, 0.0005, _blue);
        }
    }
}
