namespace CanopyAdvisor.Cli;

/// <summary>The JSON shape of <c>canopy plan --json</c>. Angles in degrees, intervals in hours, instants ISO-8601 with
/// the site's offset.</summary>
internal sealed record PlanReport(
    string SiteId,
    string SiteName,
    string TimeZone,
    string Now,
    string ForecastEnd,
    double MarginPercent,
    double WindowFraction,
    string Weather,
    string Temperatures,
    IReadOnlyList<BenchPlanReport> Benches,
    IReadOnlyList<RotationTaskReport> Tasks,
    CalendarReport Calendar);
