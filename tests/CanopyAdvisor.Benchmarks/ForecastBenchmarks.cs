using BenchmarkDotNet.Attributes;
using CanopyAdvisor.Core.Forecast;

namespace CanopyAdvisor.Benchmarks;

/// <summary>
/// The bench lean forecast of <see cref="ForecastScene"/>: a 7-day horizon at 10-minute steps (1,008 steps) after the
/// 14-day spin-up (2,016 steps), 16 stems per bench, heights projected hourly to each sale date, for 100, 200 and 400
/// benches (cost should be linear in benches × steps); with and without the uncertainty band (four parameters at both
/// range ends on two points per bench).
/// </summary>
/// <remarks>
/// <para>Run once with few iterations: <c>dotnet run -c Release --project tests/CanopyAdvisor.Benchmarks -- --filter '*ForecastBenchmarks*'</c>.</para>
/// <para>Measured 2026-12-02 on the shared 2-core machine (load average 2–3.5 from other work; 1 launch, 1 warm-up,
/// 3 iterations): 100 / 200 / 400 benches took 0.42 / 0.68 / 1.38 s without the band and 0.59 / 1.08 / 2.23 s with
/// it (67.5 MB and 93.6 MB allocated at 400). Of the 1.4 s at 400 benches about 0.5 s is the light-field compile
/// (6,400 points × 840 lamps and the sky view) and about 0.5 s the 14-day spin-up (672 steps of 30 min); the 7-day
/// horizon alone (1,008 steps × 6,400 stems, with the hourly height projection) is about 0.45 s.</para>
/// <para>After the band reruns moved to the spin-up step (30 min) over the horizon too (same settings, load average
/// about 0.3–7 during the run): 0.41 / 0.85 / 1.35 s without the band and 0.68 / 1.08 / 1.98 s with it (67.5 MB and
/// 100.2 MB allocated at 400); the band now adds about 0.6 s at 400 benches instead of about 0.85 s.</para>
/// <para>After the spin-up and band moved to 60-minute steps, the glasshouse's per-direction cover terms were worked out
/// once per direction, and the stems of a bench were stepped together on vector lanes (StemBundle): measured
/// 2026-12-02 with a timing probe (process CPU time and wall clock of whole runs, same scene, 5–7 runs, load average
/// 9–10 from other work on the 2 cores): 100 / 200 / 400 benches 0.35 / 0.64 / 1.27 s CPU at the best run (linear:
/// about 0.31 s CPU per 100 benches plus a little fixed cost), 0.66 s wall at best and 0.74 s median at 400 without the
/// band; with the band 1.67 s CPU (about 0.9 s wall on two free cores). Before these three changes the same probe gave
/// 2.6–2.9 s CPU at 400 without the band.</para>
/// </remarks>
[MemoryDiagnoser]
[SimpleJob(launchCount: 1, warmupCount: 1, iterationCount: 3)]
public class ForecastBenchmarks
{
    private ForecastRequest _request = null!;

    /// <summary>Number of benches.</summary>
    [Params(100, 200, 400)]
    public int Benches { get; set; }

    /// <summary>Whether the uncertainty band is computed.</summary>
    [Params(false, true)]
    public bool Band { get; set; }

    /// <summary>Builds the request (site, crops, sources) once.</summary>
    [GlobalSetup]
    public void Setup() => _request = ForecastScene.Request(Benches) with { IncludeUncertainty = Band };

    /// <summary>One full forecast run: compile, spin-up, horizon, heights to sale, flags (and band).</summary>
    [Benchmark]
    public SiteForecast Forecast() => BenchForecaster.Run(_request);
}
