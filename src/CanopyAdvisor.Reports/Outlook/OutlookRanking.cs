using CanopyAdvisor.Core.Forecast;

namespace CanopyAdvisor.Reports.Outlook;

/// <summary>The outlook's rule for ranking benches by lean risk and for their risk class.</summary>
/// <remarks>
/// <para>Ranking, most at risk first:</para>
/// <list type="number">
/// <item>Benches that leave grade within the week (<see cref="BenchForecast.LeavesGradeAt"/> set: before the week end
/// or the sale, whichever is first), the earliest first; a bench already over grade now comes first of all.</item>
/// <item>Then by lean at week end as a share of the crop's grade limit, largest first, compared in whole percent so
/// that differences under 1 % of the limit (well inside the forecast's uncertainty) do not decide.</item>
/// <item>Then by the number of stretch (leggy) flags, most first.</item>
/// <item>Then in the site's bench order.</item>
/// </list>
/// <para>Risk class: <see cref="OutlookRisk.LeavesGrade"/> for rule 1; <see cref="OutlookRisk.Watch"/> when the lean
/// at week end reaches <see cref="WatchShareOfLimit"/> of the limit or the upper end of the uncertainty band reaches the
/// limit; <see cref="OutlookRisk.Low"/> otherwise. Stretch flags are shown beside the class, not folded into it.</para>
/// </remarks>
public static class OutlookRanking
{
    /// <summary>The share of the grade limit at which a bench is put on watch, 0.5 (our own choice for the outlook, not a
    /// published figure: half the limit leaves about a week's margin at the lean rates the demo crops show).</summary>
    public const double WatchShareOfLimit = 0.5;

    /// <summary>Lean at the week end as a share of the crop's lean grade limit (1 = at the limit).</summary>
    public static double ShareOfLimit(BenchForecast forecast)
    {
        ArgumentNullException.ThrowIfNull(forecast);
        double limit = forecast.LeanGradeLimit.Degrees;
        return limit > 0 ? forecast.LeanAtHorizon.Tilt.Degrees / limit : double.PositiveInfinity;
    }

    /// <summary>The risk class of a bench forecast (see the remarks).</summary>
    public static OutlookRisk RiskOf(BenchForecast forecast)
    {
        ArgumentNullException.ThrowIfNull(forecast);
        if (forecast.LeavesGradeAt is not null)
        {
            return OutlookRisk.LeavesGrade;
        }

        bool bandReaches = forecast.Uncertainty is LeanUncertainty band && band.High >= forecast.LeanGradeLimit;
        return ShareOfLimit(forecast) >= WatchShareOfLimit || bandReaches ? OutlookRisk.Watch : OutlookRisk.Low;
    }

    /// <summary>Orders bench forecasts by the rule in the remarks (stable: equal benches keep their given order).</summary>
    public static IReadOnlyList<BenchForecast> Rank(IEnumerable<BenchForecast> forecasts)
    {
        ArgumentNullException.ThrowIfNull(forecasts);
        return [.. forecasts
            .Select((f, i) => (Forecast: f, Index: i))
            .OrderBy(x => x.Forecast.LeavesGradeAt is null ? 1 : 0)
            .ThenBy(x => x.Forecast.LeavesGradeAt?.ToUnixTimeTicks() ?? 0)
            .ThenByDescending(x => Math.Round(100 * ShareOfLimit(x.Forecast)))
            .ThenByDescending(x => x.Forecast.Flags.Count(flag => flag.Kind == ForecastFlagKind.Leggy))
            .ThenBy(x => x.Index)
            .Select(x => x.Forecast)];
    }
}
