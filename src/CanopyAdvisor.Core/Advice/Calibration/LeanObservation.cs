using CanopyAdvisor.Core.Geometry;
using NodaTime;

namespace CanopyAdvisor.Core.Advice.Calibration;

/// <summary>A measured lean of sample plants on a bench (an observation, in the glossary's words).</summary>
/// <remarks>
/// The tilt and azimuth are the mean lean of the plants measured: the direction of the mean of their lean vectors
/// (horizontal part of the unit base-to-apex direction), or one plant's lean when one was measured. The count weights
/// the observation in the fit (see <see cref="CropCalibrator"/>).
/// </remarks>
/// <param name="BenchId">The bench measured; it must carry a lot of the crop calibrated.</param>
/// <param name="At">When.</param>
/// <param name="Tilt">Tilt of the base-to-apex line from the vertical, 0 to 90°.</param>
/// <param name="Azimuth">Compass bearing the tops point to, clockwise from north (any finite angle; taken modulo 360°).</param>
/// <param name="HeightMm">Mean height measured, mm, or null. Kept with the observation and shown beside the residuals;
/// not fitted (the parameters calibrated do not change elongation).</param>
/// <param name="PlantsMeasured">How many plants the lean is the mean of, at least 1.</param>
public sealed record LeanObservation(string BenchId, Instant At, Angle Tilt, Angle Azimuth, double? HeightMm, int PlantsMeasured)
{
    /// <summary>Where the observation was read from (e.g. <c>lean.csv:12</c>), to name it in errors; null to name it
    /// by its index (<c>observations[3]</c>).</summary>
    public string? Where { get; init; }
}
