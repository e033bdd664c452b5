using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Advice.Rotation;

/// <summary>One policy the search simulated, so the choice can be shown.</summary>
/// <param name="Policy">The policy.</param>
/// <param name="Rotations">How many turns it takes to the sale.</param>
/// <param name="PeakLean">The largest bench lean from now to the sale with every turn on time.</param>
/// <param name="LatePeakLean">The largest bench lean with the turns timed badly inside their windows: the worse of every
/// turn at the latest end and turns alternately at the earliest and the latest end (null when not checked: the on-time
/// plan failed already, or the policy is no rotation); at the last window width tried.</param>
/// <param name="WindowFraction">The window half-width, as a fraction of the interval, at which the badly timed plans
/// held (0 when they held at none tried, were not checked, or the windows are of zero width).</param>
/// <param name="Holds">Whether the policy holds the lean within the target both on time and late.</param>
public sealed record RotationCandidate(RotationPolicy Policy, int Rotations, Angle PeakLean, Angle? LatePeakLean, double WindowFraction, bool Holds);
