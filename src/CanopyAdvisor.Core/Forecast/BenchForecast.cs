using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using NodaTime;

namespace CanopyAdvisor.Core.Forecast;

/// <summary>The lean and stretch forecast of one bench's lot (see <see cref="BenchForecaster"/> for the method).</summary>
/// <param name="BenchId">The bench.</param>
/// <param name="LotId">The lot on it.</param>
/// <param name="CropId">The lot's crop id.</param>
/// <param name="LeanNow">
/// Bench lean now: the mean over the bench's sample-point stems of the lean vector (horizontal part of the unit
/// base-to-apex direction), averaged over the last nutation period before now so circumnutation does not show.
/// </param>
/// <param name="WorstLeanNow">The largest lean of a single sample point now (same period averaging).</param>
/// <param name="LeanAtHorizon">Bench lean at the end of the horizon (mean vector, averaged over the last nutation period).</param>
/// <param name="WorstLeanAtHorizon">The largest lean of a single sample point at the end of the horizon.</param>
/// <param name="LeanRateDegreesPerDay">Rate of change of the bench lean from now to the horizon end, degrees per day, with circumnutation averaged out over whole periods (<c>LeanRate</c>).</param>
/// <param name="LeanGradeLimit">The crop's lean grade limit.</param>
/// <param name="LeavesGradeAt">
/// When the bench lean (mean vector, averaged over the trailing nutation period) first exceeds the grade limit, within
/// now … the earlier of the horizon end and the sale; now itself when it is already over; null if it stays within.
/// </param>
/// <param name="HeightNowMm">Projected height now, mm (the measured height carried from the measurement date).</param>
/// <param name="HeightAtHorizonMm">Projected height at the horizon end, mm.</param>
/// <param name="HeightAtSaleMm">Projected height at the start of the sale date, mm.</param>
/// <param name="HeightGradeLimitMm">The crop's height grade limit, mm.</param>
/// <param name="MeanDliMolPerM2Day">Mean DLI at the bench's sample points over the horizon, mol m⁻² d⁻¹.</param>
/// <param name="MeanPhytochromeState">Mean phytochrome photostationary state over the lit steps of the horizon.</param>
/// <param name="MeanDifKelvin">Mean DIF over the horizon, K.</param>
/// <param name="Uncertainty">The band of <see cref="LeanAtHorizon"/> over the parameter ranges, or null when not asked for.</param>
/// <param name="Flags">Leggy and leaning flags, leggy first.</param>
/// <param name="PointLeansAtHorizon">The lean of each sample point's stem at the horizon end (period-averaged), in the
/// order of the bench's points in the compiled light field (along the length first), for maps with lean arrows.</param>
public sealed record BenchForecast(
    string BenchId,
    string LotId,
    string CropId,
    LeanReading LeanNow,
    LeanReading WorstLeanNow,
    LeanReading LeanAtHorizon,
    LeanReading WorstLeanAtHorizon,
    double LeanRateDegreesPerDay,
    Angle LeanGradeLimit,
    Instant? LeavesGradeAt,
    double HeightNowMm,
    double HeightAtHorizonMm,
    double HeightAtSaleMm,
    double HeightGradeLimitMm,
    double MeanDliMolPerM2Day,
    double MeanPhytochromeState,
    double MeanDifKelvin,
    LeanUncertainty? Uncertainty,
    ImmutableArray<ForecastFlag> Flags,
    ImmutableArray<LeanReading> PointLeansAtHorizon)
{
    /// <summary>The bench-mean lean, averaged over the nutation period before each sample, every hour of the run from
    /// the lot's simulation start (the spin-up before now) to the end of the horizon; for charts, rotation policies and
    /// calibration against measured lean. Samples fall on the first step edge at or after each whole hour before
    /// and after now (on the hours themselves after now when the step divides an hour), and on the end; in the spin-up, whose steps are coarser (<see cref="BenchForecaster.SpinUpStep"/>), the average takes the fewer
    /// step edges that fall within the period.</summary>
    public ImmutableArray<LeanSample> LeanTrack { get; init; } = [];
}
