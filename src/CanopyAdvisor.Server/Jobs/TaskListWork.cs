using System.Text.Json;
using CanopyAdvisor.Core.Advice;
using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Advice.Rotation;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Server.Forecasting;
using CanopyAdvisor.Storage;
using NodaTime;
using NodaTime.Text;

namespace CanopyAdvisor.Server.Jobs;

/// <summary>The day's rotation task list: the rotation plan to each lot's sale (as <c>canopy plan</c> and the outlook
/// make it), scheduled on the site's crews, and the tasks that fall on the fire time's local date, kept with the run.</summary>
internal sealed class TaskListWork(ForecastRunner runner) : ISiteJobWork
{
    private static readonly Duration MaximumPlanHorizon = Duration.FromDays(366);
    private static readonly Duration MinimumPlanHorizon = Duration.FromDays(7);
    private static readonly LocalDatePattern DatePattern = LocalDatePattern.Iso;
    private static readonly OffsetDateTimePattern TimePattern = OffsetDateTimePattern.ExtendedIso;

    /// <inheritdoc />
    public string Kind => JobKinds.TaskList;

    /// <inheritdoc />
    public async Task<JobResult> RunAsync(SiteRecord site, Instant scheduledFor, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(site);
        (Site model, ForecastRequest request) = await runner.BuildRequestAsync(site, scheduledFor, 7, band: false, cancellationToken);
        Instant lastSale = model.Lots.Max(l => l.SaleOn.AtStartOfDayInZone(model.Zone).ToInstant());
        Duration toSale = lastSale - scheduledFor;
        Duration horizon = toSale > MaximumPlanHorizon ? MaximumPlanHorizon : toSale < MinimumPlanHorizon ? MinimumPlanHorizon : toSale;
        LabourSchedule schedule = await Task.Run(
            () =>
            {
                ForecastSession planning = ForecastSession.Prepare(request with { Horizon = horizon, IncludeUncertainty = false });
                RotationPlan plan = RotationPolicyPlanner.Plan(planning, RotationPolicyOptions.Default, cancellationToken: cancellationToken);
                return RotationCalendar.Schedule(model, plan, request.RotationsDone);
            },
            cancellationToken);
        LocalDate today = scheduledFor.InZone(model.Zone).Date;
        var tasks = schedule.Scheduled.Where(t => t.Date == today).Select(t => new
        {
            taskId = t.Task.Id,
            benchId = t.Task.BenchId,
            lotId = t.Task.LotId,
            crewId = t.CrewId,
            turnDeg = Math.Round(t.Task.Angle.Degrees, 1),
            pots = t.Task.Pots,
            start = TimePattern.Format(t.Start.ToOffsetDateTime()),
            end = TimePattern.Format(t.End.ToOffsetDateTime()),
            labourMinutes = Math.Round(t.Task.Labour.TotalMinutes, 1),
        }).ToList();
        string output = JsonSerializer.Serialize(new { date = DatePattern.Format(today), timeZone = model.Zone.Id, tasks });
        return new JobResult($"{tasks.Count} rotation task(s) on {DatePattern.Format(today)}", output);
    }
}
