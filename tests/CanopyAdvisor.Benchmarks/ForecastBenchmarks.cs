using BenchmarkDotNet.Attributes;
using CanopyAdvisor.Core.Forecast;

namespace CanopyAdvisor.Benchmarks;

/// <summary>
/// The bench lean forecast of <see cref="ForecastScene"/>: a 7-day horizon at 10-minute steps (1,008 steps) after the
/// 14-day spin-up (2,016 steps), 16 stems per bench, heights projected hourly to each sale date, for 100, 200 and 400
/// benches (cost should be linear in benches × steps); with and without the uncertainty band (four parameters at both
/// range ends on two points per bench).
/// </summary>
/// <remarks>Run once with few iterations: <c>dotnet run -c Release --project tests/CanopyAdvisor.Benchmarks -- --filter '*Forecast*'</c>.</remarks>
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
