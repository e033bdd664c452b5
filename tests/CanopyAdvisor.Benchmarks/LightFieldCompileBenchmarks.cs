using BenchmarkDotNet.Attributes;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Structures;

namespace CanopyAdvisor.Benchmarks;

/// <summary>Compile cost: 6,400 points × 800 lamps (5.12 million point–lamp pairs) plus, in the glasshouse, the sky view of every point.</summary>
[MemoryDiagnoser]
[SimpleJob(launchCount: 1, warmupCount: 2, iterationCount: 5)]
public class LightFieldCompileBenchmarks
{
    private Site _site = null!;
    private IEnclosure _enclosure = null!;

    /// <summary>The lamps' distribution.</summary>
    [Params(BeamKind.Lambertian, BeamKind.CosinePower, BeamKind.IesTabulated)]
    public BeamKind Beam { get; set; }

    /// <summary>Indoor room (lamps only) or glasshouse (lamps and the per-point sky view).</summary>
    [Params(false, true)]
    public bool Indoor { get; set; }

    /// <summary>Builds the scene and its real enclosure.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _site = BenchmarkScene.Build(Beam, Indoor);
        _enclosure = EnclosureBuilder.Build(_site);
    }

    /// <summary>Compiles the whole field with the default sky quadrature.</summary>
    [Benchmark]
    public CompiledLightField Compile() => LightFieldCompiler.Compile(_site, _enclosure);
}
