using System.Collections.Immutable;

namespace CanopyAdvisor.Reports.Outlook;

/// <summary>Compares an outlook's ranked benches with an earlier outlook of the same site.</summary>
/// <remarks>A bench is matched by bench id and lot id: the same bench with another lot on it is new. Lean change is
/// this week's lean at week end minus last week's (each the forecast of its own week end); rank change is previous rank
/// minus this rank (positive: moved toward the top); flags are compared by cause.</remarks>
public static class OutlookComparison
{
    /// <summary>The change of <paramref name="current"/> against <paramref name="previous"/>.</summary>
    public static OutlookChange Compare(OutlookSnapshot current, OutlookSnapshot previous)
    {
        ArgumentNullException.ThrowIfNull(current);
        ArgumentNullException.ThrowIfNull(previous);
        var before = new Dictionary<(string, string), SnapshotBench>();
        foreach (SnapshotBench b in previous.Benches)
        {
            before.TryAdd((b.BenchId, b.LotId), b);
        }

        var changes = ImmutableArray.CreateBuilder<BenchChange>(current.Benches.Length);
        var matched = new HashSet<(string, string)>();
        foreach (SnapshotBench now in current.Benches)
        {
            if (!before.TryGetValue((now.BenchId, now.LotId), out SnapshotBench? old))
            {
                changes.Add(new BenchChange(now.BenchId, true, null, null, null, [.. now.Flags], []));
                continue;
            }

            matched.Add((now.BenchId, now.LotId));
            ImmutableArray<string> raised = [.. now.Flags.Except(old.Flags, StringComparer.Ordinal)];
            ImmutableArray<string> cleared = [.. old.Flags.Except(now.Flags, StringComparer.Ordinal)];
            changes.Add(new BenchChange(
                now.BenchId,
                false,
                old.Rank,
                old.Rank - now.Rank,
                now.LeanAtWeekEndDeg - old.LeanAtWeekEndDeg,
                raised,
                cleared));
        }

        ImmutableArray<SnapshotBench> gone = [.. previous.Benches.Where(b => !matched.Contains((b.BenchId, b.LotId))).OrderBy(b => b.Rank)];
        return new OutlookChange(previous.Now, previous.WeekLabel, changes.MoveToImmutable(), gone);
    }
}
