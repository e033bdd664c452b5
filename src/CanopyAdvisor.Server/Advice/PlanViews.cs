using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Advice.Rotation;
using CanopyAdvisor.Core.Advice.SideLamps;
using CanopyAdvisor.Reports.Calendar;
using CanopyAdvisor.Server.Contracts;
using NodaTime;

namespace CanopyAdvisor.Server.Advice;

/// <summary>The API's view of a plan (the same figures, rounding and names as <c>canopy plan --json</c>).</summary>
internal static class PlanViews
{
    /// <summary>The view of a planned site; <paramref name="siteId"/> is its store id.</summary>
    public static PlanView From(string siteId, PlannedSite planned)
    {
        ArgumentNullException.ThrowIfNull(planned);
        DateTimeZone zone = planned.Model.Zone;
        OffsetDateTime L(Instant t) => t.InZone(zone).ToOffsetDateTime();
        RotationPlan plan = planned.Plan;
        LabourSchedule schedule = planned.Schedule;
        var benches = plan.Benches.Select(b => new BenchPlanView(
            b.BenchId, b.LotId, b.CropId, b.Pots, L(b.SaleAt), L(b.CheckedUntil), VerdictName(b.Verdict), b.Policy.ToString(),
            b.Policy.IsNone ? null : R(b.Policy.Angle.Degrees, 0),
            b.Policy.IsNone ? null : R(b.Policy.Interval.TotalHours, 2),
            b.RotationsToSale, R(b.LeanNow.Degrees, 2), R(b.PeakLeanWithPlan.Degrees, 2), R(b.PeakLeanWithoutPlan.Degrees, 2),
            R(b.TargetLean.Degrees, 2), R(b.GradeLimit.Degrees, 1), b.Remedy)).ToList();
        var scheduled = schedule.Scheduled.Select(s => new PlanTaskView(
            s.Task.Id, RotationCalendarIcs.Uid(planned.Model.Id, s.Task.LotId, s.Task.Id), s.CrewId, s.Start.ToOffsetDateTime(), s.End.ToOffsetDateTime(),
            s.Task.BenchId, s.Task.LotId, s.Task.Pots, R(s.Task.Angle.Degrees, 0), R(s.Task.Labour.TotalHours, 2),
            L(s.Task.Earliest), L(s.Task.Latest))).ToList();
        var unscheduled = schedule.Unscheduled.Select(u => new UnscheduledTaskView(
            u.Task.Id, u.Task.BenchId, u.Task.LotId, u.Task.Pots, R(u.Task.Labour.TotalHours, 2), L(u.Task.Earliest), L(u.Task.Latest),
            ReasonName(u.Reason))).ToList();
        List<string> cautions = benches.Any(b => b.Remedy is not null) ? [.. SideLampCautions.All] : [];
        return new PlanView(
            siteId, zone.Id, L(plan.Now), L(plan.ForecastEnd), R(plan.Options.Margin * 100, 1), plan.Options.WindowFraction, planned.RotationsDone,
            benches, scheduled, unscheduled, R(schedule.TotalLabour.TotalHours, 2), R(schedule.PeakDailyLabour.TotalHours, 2), cautions);
    }

    /// <summary>A verdict's camelCase name.</summary>
    public static string VerdictName(RotationVerdict verdict) => verdict switch
    {
        RotationVerdict.NoRotationNeeded => "noRotationNeeded",
        RotationVerdict.Rotate => "rotate",
        _ => "rotationCannotHold",
    };

    private static string ReasonName(UnscheduledReason reason) => reason switch
    {
        UnscheduledReason.NoWorkingTimeInWindow => "noWorkingTimeInWindow",
        UnscheduledReason.LongerThanWorkingTimeInWindow => "longerThanWorkingTimeInWindow",
        _ => "crewsFullyBooked",
    };

    private static double R(double value, int decimals) => Math.Round(value, decimals);
}
