using NodaTime;

namespace CanopyAdvisor.Server.Contracts;

/// <summary>One hourly sample of a bench's lean track (bench-mean lean, averaged over the nutation period before it).</summary>
/// <param name="At">When, in the site's local time.</param>
/// <param name="LeanDeg">Lean from vertical, degrees.</param>
/// <param name="AzimuthDeg">Where the tops point, degrees clockwise from north.</param>
public sealed record LeanTrackPointView(OffsetDateTime At, double LeanDeg, double AzimuthDeg);
