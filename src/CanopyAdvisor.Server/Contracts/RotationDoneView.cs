using NodaTime;

namespace CanopyAdvisor.Server.Contracts;

/// <summary>A stored rotation done.</summary>
/// <param name="Id">Its id.</param>
/// <param name="LotId">The lot turned.</param>
/// <param name="BenchId">Its bench.</param>
/// <param name="At">When, in the site's local time.</param>
/// <param name="AngleDeg">How far, degrees, positive clockwise seen from above.</param>
/// <param name="CreatedAt">When it was recorded.</param>
/// <param name="CreatedBy">Who recorded it.</param>
public sealed record RotationDoneView(string Id, string LotId, string BenchId, OffsetDateTime At, double AngleDeg, Instant CreatedAt, string CreatedBy);
