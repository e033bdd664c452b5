using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Reports;

/// <summary>The light floor map: mean DLI per sample cell over a period and, per bench, where the mean light comes from.</summary>
public static class LightMapSvg
{
    /// <summary>Renders the map for a light simulation's summary of the given site.</summary>
    public static string Render(Site site, LightPeriodSummary summary, string title)
    {
        ArgumentNullException.ThrowIfNull(site);
        ArgumentNullException.ThrowIfNull(summary);
        var benches = new List<FloorMapBench?>(site.Benches.Length);
        for (int b = 0; b < site.Benches.Length; b++)
        {
            List<BenchDayLight> days = [.. summary.ForBench(b)];
            var cells = new double[days[0].Points.Length];
            foreach (BenchDayLight d in days)
            {
                for (int p = 0; p < cells.Length; p++)
                {
                    cells[p] += d.Points[p].Dli / days.Count;
                }
            }

            BenchPeriodLight period = BenchPeriodLight.From(days);
            benches.Add(new FloorMapBench(cells, period.LightVectorTilt, period.LightVectorAzimuth));
        }

        return FloorMapSvg.Render(new FloorMap(
            site,
            title,
            benches,
            "DLI (mol m-2 d-1)",
            "DLI, mol m⁻² d⁻¹ (mean over the period)",
            "light comes from (plants lean that way); length ∝ tilt"));
    }
}
