using System.Collections.Immutable;
using System.Globalization;
using CanopyAdvisor.Core;
using CanopyAdvisor.Core.Advice;
using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Advice.Rotation;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Light;
using NodaTime;

namespace CanopyAdvisor.Reports.Outlook;

/// <summary>Computes a site's weekly outlook from a forecast request, as the outlook command and the service do: the
/// forecast (with its band), the daily light of its days, the rotation plan to each lot's sale on the site's crews
/// (<see cref="RotationPlanning"/>), and the report built from them.</summary>
public static class OutlookComputation
{
    /// <summary>The outlook of a request.</summary>
    /// <param name="request">The forecast request (its horizon is the outlook's week).</param>
    /// <param name="notes">Notes for the page (e.g. where daylight and air temperatures came from); the rotation note is added.</param>
    /// <param name="previous">Last week's gist to compare with, or null.</param>
    /// <param name="progress">Progress of the three stages (forecast, daily light, rotation plan), each in (0, 1]; any may be null.</param>
    /// <param name="cancellationToken">Stops the computation between steps.</param>
    /// <returns>The report and the rotation schedule (for the calendar written beside the page).</returns>
    /// <exception cref="Core.Validation.InvalidInputException">The request is not usable; every problem.</exception>
    public static (OutlookReport Report, LabourSchedule Schedule) Compute(
        ForecastRequest request,
        IReadOnlyList<string> notes,
        OutlookSnapshot? previous = null,
        (IProgress<double>? Forecast, IProgress<double>? Light, IProgress<double>? Plan) progress = default,
        CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(notes);
        ForecastSession session = ForecastSession.Prepare(request);
        SiteForecast forecast = session.Run(progress.Forecast, cancellationToken);
        var site = request.Site;
        LocalDate first = forecast.Now.InZone(site.Zone).Date;
        LocalDate last = (forecast.HorizonEnd - Duration.Epsilon).InZone(site.Zone).Date;
        LightPeriodSummary light = LightSimulation.Run(session.Field, request.OutsideLight, first, last, progress: progress.Light, cancellationToken: cancellationToken);

        // The rotation advice to each lot's sale, and its turns on the site's crews.
        (Duration planHorizon, _) = RotationPlanning.HorizonToSales(site, request.Now, request.Horizon);
        (RotationPlan plan, LabourSchedule schedule) = RotationPlanning.PlanAndSchedule(
            request with { Horizon = planHorizon }, RotationPolicyOptions.Default, progress.Plan, cancellationToken);
        (ImmutableArray<BenchAdviceSummary> advice, double rotationHours) = OutlookAdvice.From(plan, schedule, forecast.Now, forecast.HorizonEnd);
        var allNotes = notes.ToList();
        allNotes.Add(string.Create(
            CultureInfo.InvariantCulture,
            $"Rotation: the least turning that keeps each bench's lean at least {ModelConstants.RotationGradeMargin * 100:0} % under its grade limit to the sale, scheduled on the site's crews (rotations.ics); the lean figures assume nobody turns the pots."));

        OutlookReport report = OutlookReport.Build(new OutlookInput(site, forecast, request.Crops, BenchDayDli.From(light))
        {
            Previous = previous,
            Notes = allNotes,
            Advice = advice,
            RotationHoursThisWeek = rotationHours,
        });
        return (report, schedule);
    }
}
