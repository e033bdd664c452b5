using System.Collections.Immutable;
using NodaTime;

namespace CanopyAdvisor.Core.Light;

/// <summary>The light on every bench for every local day of a period.</summary>
/// <param name="FirstDay">First local date.</param>
/// <param name="LastDay">Last local date (inclusive).</param>
/// <param name="Step">The time step used.</param>
/// <param name="Days">One entry per date and bench, ordered by date, then by bench.</param>
public sealed record LightPeriodSummary(LocalDate FirstDay, LocalDate LastDay, Duration Step, ImmutableArray<BenchDayLight> Days)
{
    /// <summary>The days of one bench, in date order.</summary>
    public IEnumerable<BenchDayLight> ForBench(int benchIndex) => Days.Where(d => d.BenchIndex == benchIndex);

    /// <summary>Total number of steps skipped for missing outside light (counted once per step, not per bench).</summary>
    public int MissingSteps => Days.Where(d => d.BenchIndex == 0).Sum(d => d.MissingSteps);
}
