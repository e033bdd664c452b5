using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Lamps;

/// <summary>A direction in a lamp's own frame (see <see cref="BeamDistribution"/> for the convention).</summary>
/// <param name="Polar">Angle from the optical axis, in [0°, 180°] (IES type C vertical angle γ).</param>
/// <param name="Around">Angle about the axis from the C = 0° reference, in [0°, 360°) (IES type C horizontal angle).</param>
public readonly record struct LampAngles(Angle Polar, Angle Around);
