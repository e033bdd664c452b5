namespace CanopyAdvisor.Cli;

/// <summary>The JSON shape of <c>canopy light --json</c>: per bench, the whole period and each local day.</summary>
internal sealed record LightReport(
    string SiteId,
    string SiteName,
    string TimeZone,
    string From,
    int Days,
    double StepMinutes,
    string Weather,
    int MissingSteps,
    IReadOnlyList<BenchLightReport> Benches);
