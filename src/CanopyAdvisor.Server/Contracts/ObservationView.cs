using NodaTime;

namespace CanopyAdvisor.Server.Contracts;

/// <summary>A stored observation.</summary>
/// <param name="Id">Its id.</param>
/// <param name="BenchId">The bench measured.</param>
/// <param name="At">When, in the site's local time.</param>
/// <param name="TiltDeg">Mean tilt from the vertical, degrees.</param>
/// <param name="AzimuthDeg">Compass bearing the tops point to, degrees.</param>
/// <param name="HeightMm">Mean height, mm, or null.</param>
/// <param name="Plants">Plants measured.</param>
/// <param name="CreatedAt">When it was recorded.</param>
/// <param name="CreatedBy">Who recorded it.</param>
public sealed record ObservationView(string Id, string BenchId, OffsetDateTime At, double TiltDeg, double AzimuthDeg, double? HeightMm, int Plants, Instant CreatedAt, string CreatedBy);
