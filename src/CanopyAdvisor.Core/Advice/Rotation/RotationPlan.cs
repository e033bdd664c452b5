using System.Collections.Immutable;
using CanopyAdvisor.Core.Sites;
using NodaTime;

namespace CanopyAdvisor.Core.Advice.Rotation;

/// <summary>The rotation advice of every lot of a forecast session, in site bench order.</summary>
/// <param name="Now">The forecast start.</param>
/// <param name="ForecastEnd">The forecast end; sales after it are checked only to here.</param>
/// <param name="Options">The options the search used.</param>
/// <param name="Benches">One advice per lot, in the session's lot order (site bench order).</param>
public sealed record RotationPlan(Instant Now, Instant ForecastEnd, RotationPolicyOptions Options, ImmutableArray<BenchRotationAdvice> Benches)
{
    /// <summary>Every planned turn of every bench, ordered by nominal time, then bench order: the rotation tasks for
    /// the labour calendar.</summary>
    public ImmutableArray<PlannedRotation> Tasks =>
        [.. Benches.SelectMany((b, i) => b.Rotations.Select(r => (r, i))).OrderBy(x => x.r.At).ThenBy(x => x.i).Select(x => x.r)];

    /// <summary>The planned turns at their nominal times, by lot id (lots with none left out), for
    /// <c>ForecastRequest.PlannedRotations</c> to forecast the site under the plan.</summary>
    public ImmutableDictionary<string, ImmutableArray<RotationRecord>> PlannedRotationsByLot =>
        Benches.Where(b => b.Rotations.Length > 0)
            .ToImmutableDictionary(b => b.LotId, b => b.Rotations.Select(r => r.ToRecord()).ToImmutableArray(), StringComparer.Ordinal);
}
