namespace CanopyAdvisor.Core.Sites;

/// <summary>An opaque box that casts shade: a wall, a tank, a neighbouring building.</summary>
/// <param name="Id">Identifier.</param>
/// <param name="Footprint">Ground rectangle.</param>
/// <param name="BaseHeightM">Height of the box's underside above ground, metres (0 for a building).</param>
/// <param name="TopHeightM">Height of the box's top above ground, metres.</param>
public sealed record Obstruction(string Id, Footprint Footprint, double BaseHeightM, double TopHeightM);
