namespace CanopyAdvisor.Core.Sites;

/// <summary>An indoor growing room: no sky, lamps only.</summary>
/// <param name="Footprint">The room's floor rectangle in the site frame.</param>
/// <param name="HeightM">Clear height from floor to ceiling, metres.</param>
public sealed record IndoorRoom(Footprint Footprint, double HeightM) : Structure;
