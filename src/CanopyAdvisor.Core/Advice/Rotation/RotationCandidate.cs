using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Advice.Rotation;

/// <summary>One policy the search simulated, so the choice can be shown.</summary>
/// <param name="Policy">The policy.</param>
/// <param name="Rotations">How many turns it takes to the sale.</param>
/// <param name="PeakLean">The largest bench lean from now to the sale with every turn on time.</param>
/// <param name="LatePeakLean">The largest bench lean with every turn at the latest end of its window (null when not
/// checked: the on-time plan failed already, or the policy is no rotation).</param>
/// <param name="WindowFraction">The window half-width, as a fraction of the interval, at which the late plan held
/// (0 when it held at none tried or was not checked).</param>
/// <param name="Holds">Whether the policy holds the lean within the target both on time and late.</param>
public sealed record RotationCandidate(RotationPolicy Policy, int Rotations, Angle PeakLean, Angle? LatePeakLean, double WindowFraction, bool Holds);
