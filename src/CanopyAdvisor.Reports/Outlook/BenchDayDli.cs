using CanopyAdvisor.Core.Light;
using NodaTime;

namespace CanopyAdvisor.Reports.Outlook;

/// <summary>The daily light integral of one bench on one local day, for the outlook's DLI chart.</summary>
/// <param name="BenchId">The bench.</param>
/// <param name="Date">The local date (site time zone).</param>
/// <param name="DliMolPerM2Day">Mean DLI of the bench's sample points that day, mol m⁻² d⁻¹ (MODEL.md §0).</param>
public sealed record BenchDayDli(string BenchId, LocalDate Date, double DliMolPerM2Day)
{
    /// <summary>The bench-day DLIs of a light simulation (<see cref="LightSimulation.Run"/>), in its order.</summary>
    public static IReadOnlyList<BenchDayDli> From(LightPeriodSummary summary)
    {
        ArgumentNullException.ThrowIfNull(summary);
        return [.. summary.Days.Select(d => new BenchDayDli(d.BenchId, d.Date, d.Dli))];
    }
}
