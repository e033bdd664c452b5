using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Reports;

/// <summary>The lean floor map of a forecast: each plant's lean at the horizon per sample cell, and each bench's lean arrow.</summary>
/// <remarks>
/// Cells are coloured by lean as a share of the crop's own grade limit, from upright (0 %) to the limit (100 %), so benches
/// of different crops compare at a glance; a cell at the top colour is at or past its limit. Benches without a lot are
/// drawn as outlines only.
/// </remarks>
public static class LeanMapSvg
{
    /// <summary>Renders the map of a site forecast.</summary>
    public static string Render(Site site, SiteForecast forecast, string title)
    {
        ArgumentNullException.ThrowIfNull(site);
        ArgumentNullException.ThrowIfNull(forecast);
        var byBench = forecast.Benches.ToDictionary(b => b.BenchId, StringComparer.Ordinal);
        var benches = site.Benches
            .Select(bench => byBench.TryGetValue(bench.Id, out BenchForecast? f)
                ? new FloorMapBench(
                    [.. f.PointLeansAtHorizon.Select(l => 100 * l.Tilt.Degrees / f.LeanGradeLimit.Degrees)],
                    f.LeanAtHorizon.Tilt,
                    f.LeanAtHorizon.Azimuth)
                : null)
            .ToList();
        return FloorMapSvg.Render(new FloorMap(
            site,
            title,
            benches,
            "lean at the horizon (% of the grade limit)",
            "lean of each plant at the end of the forecast, % of its crop's grade limit",
            "where the tops lean (bench mean); length ∝ lean",
            Low: 0,
            High: 100));
    }
}
