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
    private static readonly Duration MaximumPlanHorizon = Duration.FromDays(366);

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
        Site site = request.Site;
        ForecastSession session = ForecastSession.Prepare(request);
        SiteForecast forecast = session.Run(progress?.Invoke("forecasting"), cancellationToken);
        LocalDate first = forecast.Now.InZone(site.Zone).Date;
        LocalDate last = (forecast.HorizonEnd - Duration.Epsilon).InZone(site.Zone).Date;
        LightPeriodSummary light = LightSimulation.Run(session.Field, request.OutsideLight, first, last, progress: progress?.Invoke("daily light"), cancellationToken: cancellationToken);

        var notes = new List<string>(leadingNotes);
        if (earlier.Note is string remark)
        {
            notes.Add(char.ToUpperInvariant(remark[0]) + remark[1..] + ".");
        }

        // The rotation advice to each lot's sale, and its turns on the site's crews.
        Instant lastSale = site.Lots.Max(l => l.SaleOn.AtStartOfDayInZone(site.Zone).ToInstant());
        Duration toSale = lastSale - request.Now;
        Duration planHorizon = toSale > MaximumPlanHorizon ? MaximumPlanHorizon : toSale < request.Horizon ? request.Horizon : toSale;
        ForecastSession planning = ForecastSession.Prepare(request with { Horizon = planHorizon, IncludeUncertainty = false });
        RotationPlan plan = RotationPolicyPlanner.Plan(planning, RotationPolicyOptions.Default, progress?.Invoke("rotation plan"), cancellationToken);
        LabourSchedule schedule = RotationCalendar.Schedule(site, plan);
        (System.Collections.Immutable.ImmutableArray<BenchAdviceSummary> advice, double rotationHours) = OutlookAdvice.From(plan, schedule, forecast.Now, forecast.HorizonEnd);
        notes.Add(string.Create(
            CultureInfo.InvariantCulture,
            $"Rotation: the least turning that keeps each bench's lean at least {ModelConstants.RotationGradeMargin * 100:0} % under its grade limit to the sale, scheduled on the site's crews (rotations.ics); the lean figures assume nobody turns the pots."));

        OutlookReport report = OutlookReport.Build(new OutlookInput(site, forecast, request.Crops, BenchDayDli.From(light))
        {
            Previous = earlier.Snapshot,
            Notes = notes,
            Advice = advice,
            RotationHoursThisWeek = rotationHours,
        });
        return new WeeklyOutlookFiles(
            report,
            schedule,
            OutlookPage.Render(report),
            OutlookCsv.Write(report),
            OutlookSnapshotJson.Write(OutlookSnapshot.From(report)),
            RotationCalendarIcs.Write(site, schedule, writtenAt));
    }
}
