using System.Globalization;
using CanopyAdvisor.Core;
using CanopyAdvisor.Core.Advice;
using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Advice.Rotation;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Reports.Calendar;
using NodaTime;

namespace CanopyAdvisor.Reports.Outlook;

/// <summary>Makes a site's weekly outlook from a forecast request: the week's forecast, each bench's daily light, the
/// rotation plan to each lot's sale scheduled on the site's crews, the comparison with last week, and the files (page,
/// CSV, snapshot, calendar). Used by <c>canopy outlook</c> and by the service's weekly job alike.</summary>
public static class WeeklyOutlook
{
    /// <summary>The longest rotation plan checked, 366 days (<c>ForecastRequest.Horizon</c>).</summary>
    /// <summary>Builds the outlook.</summary>
    /// <param name="request">The week's forecast request (its horizon is the outlook's week).</param>
    /// <param name="earlier">Last week's outlook, resolved (<see cref="PreviousOutlook.Resolve"/>).</param>
    /// <param name="leadingNotes">The caller's notes first (e.g. where daylight and air temperatures come from).</param>
    /// <param name="writtenAt">When the calendar is written (its DTSTAMP).</param>
    /// <param name="progress">A progress reporter for each stage by name (<c>forecasting</c>, <c>daily light</c>,
    /// <c>rotation plan</c>), or null.</param>
    /// <param name="cancellationToken">Stops the rotation search between runs.</param>
    /// <exception cref="Core.Validation.InvalidInputException">The request cannot be forecast or planned; every problem.</exception>
    public static WeeklyOutlookFiles Build(
        ForecastRequest request,
        PreviousOutlook earlier,
        IReadOnlyList<string> leadingNotes,
        Instant writtenAt,
        Func<string, IProgress<double>?>? progress = null,
        CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(earlier);
        ArgumentNullException.ThrowIfNull(leadingNotes);
        var notes = new List<string>(leadingNotes);
        if (earlier.Note is string remark)
        {
            notes.Add(char.ToUpperInvariant(remark[0]) + remark[1..] + ".");
        }

        (OutlookReport report, LabourSchedule schedule) = OutlookComputation.Compute(
            request,
            notes,
            earlier.Snapshot,
            (progress?.Invoke("forecasting"), progress?.Invoke("daily light"), progress?.Invoke("rotation plan")),
            cancellationToken);
        return new WeeklyOutlookFiles(
            report,
            schedule,
            OutlookPage.Render(report),
            OutlookCsv.Write(report),
            OutlookSnapshotJson.Write(OutlookSnapshot.From(report)),
            RotationCalendarIcs.Write(request.Site, schedule, writtenAt));
    }
}
