using BenchmarkDotNet.Attributes;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Structures;
using NodaTime;

namespace CanopyAdvisor.Benchmarks;

/// <summary>Per-step cost, reported per point (OperationsPerInvoke = 6,400), and one simulated week at 15-minute steps.</summary>
/// <remarks>
/// The step instant is 2026-03-04 10:00 Europe/Amsterdam under the real clear sky: the sun is up and the outside light
/// is below every schedule's cut-off, so the step does the sky, the sun beam through the envelope and all four lamp
/// groups. Setup checks that and refuses to run otherwise (a check of the scene, not of speed).
/// </remarks>
[MemoryDiagnoser]
[SimpleJob(launchCount: 1, warmupCount: 2, iterationCount: 5)]
public class LightFieldStepBenchmarks
{
    private CompiledLightField _field = null!;
    private ClearSkyOutsideLight _sky = null!;
    private PointLight[] _into = null!;
    private OutsideLight _outside;
    private LocalTime _localTime;

    /// <summary>Indoor room (lamp groups only) or glasshouse (sky, sun and lamp groups).</summary>
    [Params(false, true)]
    public bool Indoor { get; set; }

    /// <summary>Compiles the Lambertian scene once and fixes the step's outside light.</summary>
    [GlobalSetup]
    public void Setup()
    {
        Site site = BenchmarkScene.Build(BeamKind.Lambertian, Indoor);
        _field = LightFieldCompiler.Compile(site, EnclosureBuilder.Build(site));
        _into = new PointLight[_field.Points.Length];
        _sky = BenchmarkScene.OutsideLight();
        ZonedDateTime when = new LocalDateTime(2026, 3, 4, 10, 0).InZoneStrictly(BenchmarkScene.Zone);
        _outside = _sky.At(when.ToInstant());
        _localTime = when.TimeOfDay;
        bool allOn = _field.Groups.All(g => g.Schedule.IsOn(_localTime, _outside.GlobalHorizontalPpfd));
        if (_outside.SunDirection.Z <= 0 || _outside.DirectNormalPpfd <= 0 || !allOn || _field.Groups.Length != 4)
        {
            throw new InvalidOperationException(
                $"step scene is not sun-up with all lamp groups on: sun z {_outside.SunDirection.Z}, DNI {_outside.DirectNormalPpfd}, GHI {_outside.GlobalHorizontalPpfd}, groups {_field.Groups.Length}");
        }
    }

    /// <summary>One time step over all points; cost per point.</summary>
    [Benchmark(OperationsPerInvoke = BenchmarkScene.PointCount)]
    public void StepPerPoint() => _field.Step(_outside, _localTime, _into);

    /// <summary>A week (2026-03-02 to 03-08) at 15-minute steps: 672 steps × 6,400 points with the clear sky and daily summaries.</summary>
    [Benchmark]
    public LightPeriodSummary SimulateWeek() =>
        LightSimulation.Run(_field, _sky, new LocalDate(2026, 3, 2), new LocalDate(2026, 3, 8), Duration.FromMinutes(15));
}
