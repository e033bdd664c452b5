using CanopyAdvisor.Core.Forecast;
using NodaTime;

namespace CanopyAdvisor.Core.Advice.Calibration;

/// <summary>How the fitted model meets one observation.</summary>
/// <param name="Index">The observation's index in the list given.</param>
/// <param name="Where">Where it was read from, or null.</param>
/// <param name="BenchId">The bench.</param>
/// <param name="At">When.</param>
/// <param name="Observed">The lean measured.</param>
/// <param name="Modelled">The fitted model's bench lean at that time (interpolated on the lean track).</param>
/// <param name="EastResidual">Modelled minus observed east component of the lean vector (sin tilt · sin azimuth).</param>
/// <param name="NorthResidual">Modelled minus observed north component of the lean vector (sin tilt · cos azimuth).</param>
/// <param name="Weight">The observation's weight: the plants measured (residuals enter the fit multiplied by √weight).</param>
/// <param name="HeightMm">The height measured, if any (not fitted).</param>
public sealed record ObservationResidual(
    int Index, string? Where, string BenchId, Instant At, LeanReading Observed, LeanReading Modelled, double EastResidual,
    double NorthResidual, double Weight, double? HeightMm)
{
    /// <summary>The length of the residual lean vector as an angle, degrees: asin of √(east² + north²), about the
    /// tilt error for small leans.</summary>
    public double MisfitDegrees => Math.Asin(Math.Min(1, Math.Sqrt((EastResidual * EastResidual) + (NorthResidual * NorthResidual)))) * Geometry.Angle.DegreesPerRadian;
}
