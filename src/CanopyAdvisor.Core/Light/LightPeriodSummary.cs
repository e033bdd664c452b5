using System.Collections.Immutable;
using NodaTime;

namespace CanopyAdvisor.Core.Light;

/// <summary>The light on every bench for every local day of a period.</summary>
/// <param name="FirstDay">First local date.</param>
/// <param name="LastDay">Last local date (inclusive).</param>
/// <param name="Step">The time step used.</param>
/// <param name="Days">One entry per date and bench, ordered by date, then by bench.</param>
/// <param name="MissingSteps">Steps skipped in the whole period because the outside light was missing.</param>
public sealed record LightPeriodSummary(
    LocalDate FirstDay, LocalDate LastDay, Duration Step, ImmutableArray<BenchDayLight> Days, int MissingSteps)
{
    /// <summary>The days of one bench, in date order.</summary>
    public IEnumerable<BenchDayLight> ForBench(int benchIndex) => Days.Where(d => d.BenchIndex == benchIndex);
}
