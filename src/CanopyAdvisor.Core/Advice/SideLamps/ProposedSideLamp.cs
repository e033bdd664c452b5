using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Core.Advice.SideLamps;

/// <summary>One lamp the plan adds: the lamp as it would stand in the site, and where on which rail it hangs.</summary>
/// <param name="Lamp">The lamp record (position, aim, dimming, photometry, schedule), ready to add to the site.</param>
/// <param name="RailId">The rail it hangs on.</param>
/// <param name="LampType">The name of its lamp type.</param>
/// <param name="PositionFraction">Where along the rail, 0 = the rail's start, 1 = its end.</param>
/// <param name="DistanceAlongRailM">The same as a distance from the rail's start, metres.</param>
public sealed record ProposedSideLamp(Lamp Lamp, string RailId, string LampType, double PositionFraction, double DistanceAlongRailM);
