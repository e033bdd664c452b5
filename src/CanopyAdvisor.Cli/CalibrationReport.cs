namespace CanopyAdvisor.Cli;

/// <summary>What <c>canopy calibrate</c> prints (as JSON with <c>--json</c>).</summary>
internal sealed record CalibrationReport(
    string SiteId,
    string SiteName,
    string TimeZone,
    string Crop,
    string Now,
    int Observations,
    string FirstObservation,
    string LastObservation,
    string Weather,
    string Temperatures,
    int Iterations,
    int SimulatorRuns,
    bool Converged,
    double InitialRmsMisfitDeg,
    double RmsMisfitDeg,
    IReadOnlyList<CalibrationEstimateReport> Estimates,
    IReadOnlyList<IReadOnlyList<double>> Correlation,
    IReadOnlyList<string> Warnings,
    bool Identified,
    IReadOnlyList<CalibrationResidualReport> Residuals,
    string VariantId,
    string? VariantWrittenTo);
