using CanopyAdvisor.Core.Geometry;
using NodaTime;

namespace CanopyAdvisor.Core.Sites;

/// <summary>A pot rotation that was done: when, and by how much (positive = clockwise seen from above, like a compass).</summary>
/// <param name="At">When the pots were turned.</param>
/// <param name="Angle">How far they were turned (90° or 180° in practice).</param>
public sealed record RotationRecord(Instant At, Angle Angle);
