namespace CanopyAdvisor.Server.Contracts;

/// <summary>A rotation done to record (the rules of a lot's <c>rotations</c> in the site file).</summary>
/// <param name="At">When the pots were turned, ISO-8601 with an offset; within the lot's life (planting to sale), not in the future.</param>
/// <param name="AngleDeg">How far, degrees, positive clockwise seen from above; within (−360, 360) and not 0.</param>
/// <param name="LotId">The lot turned; or give <paramref name="BenchId"/>.</param>
/// <param name="BenchId">The bench whose lot was turned; or give <paramref name="LotId"/> (both must agree when both are given).</param>
public sealed record NewRotationDoneRequest(string At, double AngleDeg, string? LotId = null, string? BenchId = null);
