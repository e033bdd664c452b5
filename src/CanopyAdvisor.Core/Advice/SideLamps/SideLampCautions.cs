using System.Collections.Immutable;

namespace CanopyAdvisor.Core.Advice.SideLamps;

/// <summary>The safety cautions every side-lamp proposal carries (COMMON.md: advice touching electrical work, work at
/// height, intense blue or UV light and heat defers to local codes and licensed practice).</summary>
public static class SideLampCautions
{
    /// <summary>The cautions, one sentence each, in the order they are printed.</summary>
    public static ImmutableArray<string> All { get; } =
    [
        "Electrical: installing, wiring and connecting lamps is work for a licensed electrician, to the local electrical code; isolate and lock off circuits before work.",
        "Wet locations: glasshouses are damp and sprayed; use fixtures, drivers and connectors rated for wet locations (suitable IP rating) and protect circuits with residual-current devices as the local code requires.",
        "Work at height: mounting and aiming lamps on rails means ladders, lifts or trusses; follow local work-at-height rules and use fall protection.",
        "Eyes: do not look into the lamps; intense blue (and any UV) light can harm the eyes, so switch lamps off or wear suitable protective eyewear while aiming or working near them.",
        "Heat: keep the maker's clearances between lamps and plants, covers, screens and anything that burns; check that rails and fixings carry the lamps' weight.",
        "This is a model's proposal: check the light with a quantum sensor after installation before relying on it.",
    ];
}
