namespace CanopyAdvisor.Cli;

/// <summary>The JSON shape of <c>canopy forecast --json</c>. Angles in degrees, heights in mm, instants ISO-8601 with offset.</summary>
internal sealed record ForecastReport(
    string SiteId,
    string SiteName,
    string TimeZone,
    string Now,
    string HorizonEnd,
    double StepMinutes,
    string Weather,
    string Temperatures,
    int MissingLightSteps,
    int MissingTemperatureSteps,
    IReadOnlyList<BenchForecastReport> Benches);
