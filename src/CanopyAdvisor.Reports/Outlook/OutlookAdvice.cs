using System.Collections.Immutable;
using System.Globalization;
using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Advice.Rotation;
using NodaTime;

namespace CanopyAdvisor.Reports.Outlook;

/// <summary>The outlook's rotation column and hours from a rotation plan and its labour calendar.</summary>
public static class OutlookAdvice
{
    /// <summary>Per bench: the recommendation in words, the turns planned within the week and the labour the calendar
    /// gives them; and the site's rotation hours in the week (tasks whose scheduled start falls in it).</summary>
    /// <param name="plan">The rotation plan (<see cref="RotationPolicyPlanner"/>).</param>
    /// <param name="schedule">The plan's tasks on the site's crews.</param>
    /// <param name="weekStart">The outlook's start (now).</param>
    /// <param name="weekEnd">The outlook's end.</param>
    public static (ImmutableArray<BenchAdviceSummary> Benches, double RotationHoursThisWeek) From(
        RotationPlan plan, LabourSchedule schedule, Instant weekStart, Instant weekEnd)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(schedule);
        bool InWeek(Instant t) => t >= weekStart && t < weekEnd;
        ScheduledTask[] thisWeek = [.. schedule.Scheduled.Where(s => InWeek(s.Start.ToInstant()))];
        var benches = plan.Benches.Select(b => new BenchAdviceSummary(
            b.BenchId,
            Recommendation(b),
            b.Rotations.Count(r => InWeek(r.At)),
            thisWeek.Where(s => s.Task.LotId == b.LotId).Sum(s => s.Task.Labour.TotalHours)));
        return ([.. benches], thisWeek.Sum(s => s.Task.Labour.TotalHours));
    }

    /// <summary>The advice in words: "no rotation needed", "turn 180° every 3 d", or that turning cannot hold the grade.</summary>
    /// <param name="advice">One bench's rotation advice.</param>
    public static string Recommendation(BenchRotationAdvice advice)
    {
        ArgumentNullException.ThrowIfNull(advice);
        return advice.Verdict switch
        {
            RotationVerdict.NoRotationNeeded => "no rotation needed",
            RotationVerdict.Rotate => string.Create(CultureInfo.InvariantCulture, $"turn {advice.Policy}"),
            _ => "turning cannot hold the grade: balance the light (side lamps)",
        };
    }
}
