using System.Collections.Immutable;
using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Advice.Rotation;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Core.Advice;

/// <summary>Turns a rotation plan into the site's labour calendar: one task per planned turn, with its window, and the
/// tasks scheduled on the site's crews (<see cref="LabourScheduler"/>).</summary>
/// <remarks>
/// Task ids number a lot's turns from its first turn ever, counting the turns already done (<see cref="Lot.Rotations"/>
/// and those recorded elsewhere, <see cref="Forecast.ForecastRequest.RotationsDone"/>, before the plan's start):
/// the third turn of a lot keeps the id <c>lot/r3</c> in every later plan as long as the turns done are recorded, so a
/// calendar exported again next week updates its events instead of adding new ones.
/// </remarks>
public static class RotationCalendar
{
    /// <summary>The labour tasks of a plan: each planned turn with its window, its pots and the labour the site's settings
    /// give it.</summary>
    /// <param name="site">The site the plan was made for (its lots, labour settings and id).</param>
    /// <param name="plan">The rotation plan.</param>
    /// <param name="recordedDone">Turns done that are recorded outside the site's lots, by lot id (counted in the ids).</param>
    /// <exception cref="InvalidInputException">A planned turn names a lot the site does not have, or the labour settings
    /// cannot cost it.</exception>
    public static ImmutableArray<RotationTask> Tasks(
        Site site, RotationPlan plan, IReadOnlyDictionary<string, ImmutableArray<RotationRecord>>? recordedDone = null)
    {
        ArgumentNullException.ThrowIfNull(site);
        ArgumentNullException.ThrowIfNull(plan);
        var lots = (site.Lots.IsDefault ? [] : site.Lots).ToDictionary(l => l.Id, StringComparer.Ordinal);
        var tasks = ImmutableArray.CreateBuilder<RotationTask>();
        foreach (BenchRotationAdvice bench in plan.Benches)
        {
            if (!lots.TryGetValue(bench.LotId, out Lot? lot))
            {
                throw new InvalidInputException("plan", $"lot '{bench.LotId}' is not on site '{site.Id}'");
            }

            int number = lot.Rotations.IsDefault ? 0 : lot.Rotations.Length;
            if (recordedDone is not null && recordedDone.TryGetValue(lot.Id, out ImmutableArray<RotationRecord> recorded) && !recorded.IsDefault)
            {
                number += recorded.Count(r => r.At < plan.Now);
            }

            foreach (PlannedRotation turn in bench.Rotations.OrderBy(r => r.At))
            {
                number++;
                tasks.Add(RotationTask.Create(
                    RotationTask.IdFor(turn.LotId, number), site.Id, turn.BenchId, turn.LotId, turn.Angle, turn.Earliest, turn.Latest,
                    turn.Pots, site.Labour));
            }
        }

        return [.. tasks.OrderBy(t => t.Earliest).ThenBy(t => t.Id, StringComparer.Ordinal)];
    }

    /// <summary>The plan's tasks scheduled on the site's crews within their windows, the load levelled across days.</summary>
    /// <param name="site">The site the plan was made for.</param>
    /// <param name="plan">The rotation plan.</param>
    /// <param name="recordedDone">Turns done that are recorded outside the site's lots, by lot id (counted in the ids).</param>
    /// <exception cref="InvalidInputException">The tasks or the labour settings are invalid; carries every problem.</exception>
    public static LabourSchedule Schedule(
        Site site, RotationPlan plan, IReadOnlyDictionary<string, ImmutableArray<RotationRecord>>? recordedDone = null) =>
        LabourScheduler.Schedule(site, Tasks(site, plan, recordedDone));
}
