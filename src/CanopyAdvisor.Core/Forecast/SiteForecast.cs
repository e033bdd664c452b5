using System.Collections.Immutable;
using NodaTime;

namespace CanopyAdvisor.Core.Forecast;

/// <summary>The forecast of every bench that carries a lot, in site bench order.</summary>
/// <param name="Now">The forecast start.</param>
/// <param name="HorizonEnd">The forecast end (now + horizon).</param>
/// <param name="Step">The time step used.</param>
/// <param name="Benches">One forecast per bench with a lot, in the order of <c>Site.Benches</c>.</param>
/// <param name="MissingLightSteps">Steps whose outside light was missing (treated as dark outside; lamps followed their schedules).</param>
/// <param name="MissingTemperatureSteps">Steps whose air temperature was missing (no growth and no bending in them).</param>
public sealed record SiteForecast(
    Instant Now,
    Instant HorizonEnd,
    Duration Step,
    ImmutableArray<BenchForecast> Benches,
    int MissingLightSteps,
    int MissingTemperatureSteps);
