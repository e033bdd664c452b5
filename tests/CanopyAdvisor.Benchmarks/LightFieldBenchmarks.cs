using BenchmarkDotNet.Attributes;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using NodaTime;

namespace CanopyAdvisor.Benchmarks;

/// <summary>Compile cost: 6,400 points × 800 lamps, with and without the per-point sky view.</summary>
[MemoryDiagnoser]
[SimpleJob(warmupCount: 1, iterationCount: 5)]
public class LightFieldCompileBenchmarks
{
    private Site _site = null!;
    private readonly GlassRoofEnclosure _enclosure = new();

    /// <summary>Tabulated (asymmetric, bilinear) or Lambertian beams.</summary>
    [Params(false, true)]
    public bool Tabulated { get; set; }

    /// <summary>Indoor room (lamps only) or glasshouse (lamps and the sky view of every point, 324 directions).</summary>
    [Params(true, false)]
    public bool Indoor { get; set; }

    /// <summary>Builds the scene.</summary>
    [GlobalSetup]
    public void Setup() => _site = BenchmarkScene.Build(Tabulated, Indoor);

    /// <summary>Compiles the whole field (6,400 × 800 point–lamp pairs).</summary>
    [Benchmark]
    public CompiledLightField Compile() => LightFieldCompiler.Compile(_site, _enclosure);
}

/// <summary>Per-step cost, reported per point (OperationsPerInvoke = 6,400), and one simulated week.</summary>
[MemoryDiagnoser]
[SimpleJob(warmupCount: 1, iterationCount: 5)]
public class LightFieldStepBenchmarks
{
    private CompiledLightField _field = null!;
    private PointLight[] _into = null!;
    private OutsideLight _outside;

    /// <summary>Compiles the glasshouse scene once.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _field = LightFieldCompiler.Compile(BenchmarkScene.Build(tabulated: false, indoor: false), new GlassRoofEnclosure());
        _into = new PointLight[_field.Points.Length];
        _outside = new FixedSun().At(Instant.FromUtc(2026, 3, 1, 9, 0)) with { GlobalHorizontalPpfd = 500 };
    }

    /// <summary>One time step over all points with the sun up and every lamp group on; cost per point.</summary>
    [Benchmark(OperationsPerInvoke = BenchmarkScene.PointCount)]
    public void StepPerPoint() => _field.Step(_outside, new LocalTime(9, 0), _into);

    /// <summary>A week at 15-minute steps (672 steps × 6,400 points), with daily summaries.</summary>
    [Benchmark]
    public LightPeriodSummary SimulateWeek() =>
        LightSimulation.Run(_field, new FixedSun(), new LocalDate(2026, 3, 2), new LocalDate(2026, 3, 8));
}
