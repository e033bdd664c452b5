using NodaTime;

namespace CanopyAdvisor.Server.Contracts;

/// <summary>A calibration's result (what <c>canopy calibrate --json</c> gives).</summary>
/// <param name="SiteId">The site's store id.</param>
/// <param name="TimeZone">The site's IANA zone.</param>
/// <param name="CropId">The crop calibrated.</param>
/// <param name="Now">The fit's "now".</param>
/// <param name="Observations">Observations used.</param>
/// <param name="FirstObservation">The earliest.</param>
/// <param name="LastObservation">The latest.</param>
/// <param name="Iterations">Iterations of the fit.</param>
/// <param name="SimulatorRuns">Single-lot simulator runs.</param>
/// <param name="Converged">Whether the fit met its tolerance.</param>
/// <param name="InitialRmsMisfitDeg">RMS misfit with the library values, degrees.</param>
/// <param name="RmsMisfitDeg">RMS misfit with the estimates, degrees.</param>
/// <param name="Estimates">Each parameter's estimate and standard error.</param>
/// <param name="Correlation">The estimates' correlation matrix, in <paramref name="Estimates"/> order (null where it cannot be estimated).</param>
/// <param name="Warnings">Plain-words warnings.</param>
/// <param name="Identified">Whether the data identify the parameters (standard errors exist, no pair correlates at 0.95 or more).</param>
/// <param name="Residuals">Each observation against the model.</param>
/// <param name="VariantId">The calibrated variant's crop id.</param>
/// <param name="Saved">Whether the variant was saved to the organisation's crops.</param>
public sealed record CalibrationView(
    string SiteId,
    string TimeZone,
    string CropId,
    OffsetDateTime Now,
    int Observations,
    OffsetDateTime FirstObservation,
    OffsetDateTime LastObservation,
    int Iterations,
    int SimulatorRuns,
    bool Converged,
    double InitialRmsMisfitDeg,
    double RmsMisfitDeg,
    IReadOnlyList<CalibrationEstimateView> Estimates,
    IReadOnlyList<IReadOnlyList<double?>> Correlation,
    IReadOnlyList<string> Warnings,
    bool Identified,
    IReadOnlyList<CalibrationResidualView> Residuals,
    string VariantId,
    bool Saved);
