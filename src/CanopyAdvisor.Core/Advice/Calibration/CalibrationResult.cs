using System.Collections.Immutable;
using CanopyAdvisor.Core.Plants;
using NodaTime;

namespace CanopyAdvisor.Core.Advice.Calibration;

/// <summary>The outcome of a calibration: estimates with standard errors, their correlations, the residuals, plain
/// warnings and the calibrated variant.</summary>
/// <param name="CropId">The crop calibrated.</param>
/// <param name="Estimates">The fitted parameters, in the order asked for.</param>
/// <param name="Correlation">The correlation matrix of the estimates (rows and columns in <see cref="Estimates"/> order);
/// NaN entries when it cannot be computed.</param>
/// <param name="Residuals">One per observation, in the order given.</param>
/// <param name="RmsMisfitDegrees">Root mean square of the residual lean-vector length over the observations, weighted by
/// plants measured, as an angle in degrees (asin of the RMS length).</param>
/// <param name="InitialRmsMisfitDegrees">The same for the crop's own parameters before the fit.</param>
/// <param name="ResidualStandardDeviation">σ = √(weighted sum of squares / (2n − p)), in lean-vector units for one
/// plant; NaN without degrees of freedom.</param>
/// <param name="Iterations">Iterations of the search (Jacobians evaluated).</param>
/// <param name="SimulatorRuns">Single-lot simulator runs made, all told.</param>
/// <param name="Converged">Whether the search met its tolerance before the iteration limit.</param>
/// <param name="Warnings">Plain-words warnings: parameters the data cannot separate, few observations, estimates at a
/// bound, no convergence.</param>
/// <param name="Variant">The calibrated variant: the crop with the fitted values, ranges narrowed to ±2 standard errors
/// within the crop's range, and provenance <c>calibrated: &lt;site&gt;, &lt;first date&gt; to &lt;last date&gt;, n = &lt;count&gt;</c>.</param>
/// <param name="FirstObservation">The earliest observation.</param>
/// <param name="LastObservation">The latest observation.</param>
public sealed record CalibrationResult(
    string CropId,
    ImmutableArray<ParameterEstimate> Estimates,
    ImmutableArray<ImmutableArray<double>> Correlation,
    ImmutableArray<ObservationResidual> Residuals,
    double RmsMisfitDegrees,
    double InitialRmsMisfitDegrees,
    double ResidualStandardDeviation,
    int Iterations,
    int SimulatorRuns,
    bool Converged,
    ImmutableArray<string> Warnings,
    Crop Variant,
    Instant FirstObservation,
    Instant LastObservation)
{
    /// <summary>Whether the data identify the fitted parameters: standard errors could be estimated (more lean
    /// components than parameters, a covariance matrix) and no two estimates correlate at or above
    /// <see cref="CalibrationOptions.CorrelationWarningLimit"/>. When false the estimates are not to be trusted apart and
    /// the variant is not to be saved (the warnings say why).</summary>
    public bool Identified { get; init; }
}
