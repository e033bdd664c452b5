using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Reports.Outlook;

/// <summary>What the weekly outlook of a site is built from (<see cref="OutlookReport.Build"/>).</summary>
/// <param name="Site">The site the forecast is of (benches for the map, lots for sale dates, time zone).</param>
/// <param name="Forecast">The site's forecast for the week (one bench forecast per lot).</param>
/// <param name="Crops">The crops by id (at least every forecast bench's crop), for names and DLI targets.</param>
/// <param name="DailyDli">DLI per bench and local day over the week (e.g. <see cref="BenchDayDli.From"/>); may be empty.</param>
public sealed record OutlookInput(
    Site Site,
    SiteForecast Forecast,
    IReadOnlyDictionary<string, Crop> Crops,
    IReadOnlyList<BenchDayDli> DailyDli)
{
    /// <summary>The rotation advice per bench; a bench without an entry is shown as "not planned".</summary>
    public IReadOnlyList<BenchAdviceSummary> Advice { get; init; } = [];

    /// <summary>Hours of rotation work planned for the site this week (the labour calendar's total), or null when no
    /// calendar was made ("not planned" is shown).</summary>
    public double? RotationHoursThisWeek { get; init; }

    /// <summary>The key numbers of an earlier outlook of the same site to compare with, or null (see <see cref="PreviousOutlook"/>).</summary>
    public OutlookSnapshot? Previous { get; init; }

    /// <summary>Lines for the notes section: where daylight and temperatures came from, what happened to the previous
    /// outlook file, and the like.</summary>
    public IReadOnlyList<string> Notes { get; init; } = [];
}
