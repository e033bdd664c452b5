using System.Collections.Immutable;
using NodaTime;

namespace CanopyAdvisor.Reports.Outlook;

/// <summary>The machine-readable gist of an outlook (<c>outlook.json</c>): the week and each ranked bench's key numbers,
/// kept so next week's outlook can show the change (<see cref="OutlookComparison"/>).</summary>
/// <param name="SiteId">The site.</param>
/// <param name="SiteName">The site's display name.</param>
/// <param name="Now">The start of the week forecast.</param>
/// <param name="WeekEnd">The end of the week forecast.</param>
/// <param name="WeekLabel">The ISO week of the start's local date, e.g. <c>2026-W49</c>.</param>
/// <param name="Benches">The benches in rank order.</param>
public sealed record OutlookSnapshot(
    string SiteId,
    string SiteName,
    Instant Now,
    Instant WeekEnd,
    string WeekLabel,
    ImmutableArray<SnapshotBench> Benches)
{
    /// <summary>The gist of a built outlook.</summary>
    public static OutlookSnapshot From(OutlookReport report)
    {
        ArgumentNullException.ThrowIfNull(report);
        return new OutlookSnapshot(
            report.Site.Id,
            report.Site.Name,
            report.Now,
            report.WeekEnd,
            report.WeekLabel,
            [.. report.Benches.Select(b => new SnapshotBench(
                b.Rank,
                b.BenchId,
                b.Forecast.LotId,
                b.Forecast.CropId,
                b.Risk,
                Math.Round(b.Forecast.LeanNow.Tilt.Degrees, 3),
                Math.Round(b.Forecast.LeanAtHorizon.Tilt.Degrees, 3),
                Math.Round(b.Forecast.LeanAtHorizon.Azimuth.Degrees, 1),
                Math.Round(b.Forecast.LeanGradeLimit.Degrees, 3),
                Math.Round(b.Forecast.LeanRateDegreesPerDay, 4),
                b.Forecast.LeavesGradeAt,
                [.. b.Forecast.Flags.Select(f => f.Cause).Distinct(StringComparer.Ordinal)]))]);
    }
}
