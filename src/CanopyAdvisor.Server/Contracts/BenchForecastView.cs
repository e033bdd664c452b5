using NodaTime;

namespace CanopyAdvisor.Server.Contracts;

/// <summary>The lean and stretch forecast of one bench (see <c>BenchForecaster</c> for the method).</summary>
/// <param name="BenchId">The bench.</param>
/// <param name="LotId">The lot on it.</param>
/// <param name="CropId">The lot's crop.</param>
/// <param name="LeanDeg">Bench-mean lean now, degrees from vertical.</param>
/// <param name="LeanAzimuthDeg">Where the tops point now, degrees clockwise from north.</param>
/// <param name="LeanDirection">The nearest of 16 compass points.</param>
/// <param name="WorstLeanDeg">The largest lean of one sample point now, degrees.</param>
/// <param name="LeanRateDegPerDay">Rate of change of the bench lean, degrees per day.</param>
/// <param name="LeanAtHorizonDeg">Bench-mean lean at the horizon end, degrees.</param>
/// <param name="LeanAtHorizonAzimuthDeg">Its direction, degrees clockwise from north.</param>
/// <param name="LeanGradeLimitDeg">The crop's lean grade limit, degrees.</param>
/// <param name="LeavesGradeAt">When the lean passes the limit (site local time), or null.</param>
/// <param name="HeightMm">Projected height now, mm.</param>
/// <param name="HeightAtHorizonMm">Projected height at the horizon end, mm.</param>
/// <param name="HeightAtSaleMm">Projected height at the sale date, mm.</param>
/// <param name="HeightGradeLimitMm">The crop's height grade limit, mm.</param>
/// <param name="DliMolPerM2Day">Mean DLI over the horizon, mol m⁻² d⁻¹.</param>
/// <param name="PhytochromeState">Mean phytochrome photostationary state over lit steps.</param>
/// <param name="DifK">Mean DIF over the horizon, K.</param>
/// <param name="LeanAtHorizonBand">The band over the parameter ranges, or null when not asked for.</param>
/// <param name="Flags">Leggy and leaning flags.</param>
/// <param name="LeanTrack">The bench lean every hour from now to the horizon end, for charts; null in forecasts stored
/// before it was kept.</param>
/// <param name="PointLeansAtHorizonDeg">Each sample point's lean at the horizon end, degrees, in the bench's grid order
/// (along the length first), for the lean map; null in forecasts stored before it was kept.</param>
public sealed record BenchForecastView(
    string BenchId,
    string LotId,
    string CropId,
    double LeanDeg,
    double LeanAzimuthDeg,
    string LeanDirection,
    double WorstLeanDeg,
    double LeanRateDegPerDay,
    double LeanAtHorizonDeg,
    double LeanAtHorizonAzimuthDeg,
    double LeanGradeLimitDeg,
    OffsetDateTime? LeavesGradeAt,
    double HeightMm,
    double HeightAtHorizonMm,
    double HeightAtSaleMm,
    double HeightGradeLimitMm,
    double DliMolPerM2Day,
    double PhytochromeState,
    double DifK,
    LeanBandView? LeanAtHorizonBand,
    IReadOnlyList<FlagView> Flags,
    IReadOnlyList<LeanTrackPointView>? LeanTrack = null,
    IReadOnlyList<double>? PointLeansAtHorizonDeg = null);
