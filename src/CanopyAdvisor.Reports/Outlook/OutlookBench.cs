using System.Collections.Immutable;
using CanopyAdvisor.Core.Forecast;
using NodaTime;

namespace CanopyAdvisor.Reports.Outlook;

/// <summary>One bench of the outlook, in rank order, with what the page and the CSV print about it.</summary>
/// <param name="Rank">Rank, 1 = most at risk (<see cref="OutlookRanking"/>).</param>
/// <param name="Risk">Risk class.</param>
/// <param name="Forecast">The bench's forecast for the week (lean now and at week end, rate, band, flags, lean track).</param>
/// <param name="CropName">The crop's display name.</param>
/// <param name="SaleOn">The lot's sale date.</param>
/// <param name="DliTargetMolPerM2Day">The crop's DLI target, mol m⁻² d⁻¹.</param>
/// <param name="DliMinimumMolPerM2Day">The crop's DLI minimum (below it plants stretch), mol m⁻² d⁻¹.</param>
/// <param name="DailyDli">DLI per day of <see cref="OutlookReport.Days"/>, mol m⁻² d⁻¹ (NaN where not supplied).</param>
/// <param name="Advice">The rotation advice for the bench, or null when none was planned.</param>
public sealed record OutlookBench(
    int Rank,
    OutlookRisk Risk,
    BenchForecast Forecast,
    string CropName,
    LocalDate SaleOn,
    double DliTargetMolPerM2Day,
    double DliMinimumMolPerM2Day,
    ImmutableArray<double> DailyDli,
    BenchAdviceSummary? Advice)
{
    /// <summary>The bench id.</summary>
    public string BenchId => Forecast.BenchId;

    /// <summary>Lean at week end as a share of the crop's grade limit (1 = at the limit).</summary>
    public double ShareOfLimit => OutlookRanking.ShareOfLimit(Forecast);

    /// <summary>The stretch (leggy) flags.</summary>
    public ImmutableArray<ForecastFlag> StretchFlags => [.. Forecast.Flags.Where(f => f.Kind == ForecastFlagKind.Leggy)];

    /// <summary>The bench's change against the previous outlook, or null when there is none to compare with.</summary>
    public BenchChange? Change { get; init; }

    /// <summary>The lean track from the week's start to its end (the forecast's hourly track without the spin-up).</summary>
    public ImmutableArray<LeanSample> WeekTrack(Instant now) => [.. Forecast.LeanTrack.Where(s => s.At >= now)];
}
