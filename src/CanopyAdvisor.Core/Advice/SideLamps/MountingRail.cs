using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Advice.SideLamps;

/// <summary>A line where the lighting designer allows side lamps to be mounted (a rail, a wall batten, a truss).</summary>
/// <remarks>
/// A lamp on the rail hangs at <c>Start + f·(End − Start)</c> for a position fraction f in [0, 1]; a rail may slope, and
/// a rail of zero length is one allowed mounting point. <see cref="Facing"/> limits where lamps on the rail may be
/// aimed: the yaw stays within <see cref="YawHalfRange"/> of it (a wall lamp cannot shine into the wall); without it the
/// yaw is free.
/// </remarks>
/// <param name="Id">Identifier, unique within the brief.</param>
/// <param name="Start">One end, site frame (x east, y north, z up), metres.</param>
/// <param name="End">The other end, site frame, metres.</param>
public sealed record MountingRail(string Id, Vector3 Start, Vector3 End)
{
    /// <summary>Compass direction lamps on the rail face by default (the middle of their yaw range); null = any yaw.</summary>
    public Angle? Facing { get; init; }

    /// <summary>How far the yaw may turn either side of <see cref="Facing"/>, in (0°, 180°]; 90° by default.</summary>
    public Angle YawHalfRange { get; init; } = Angle.RightAngle;

    /// <summary>Length of the rail, metres.</summary>
    public double LengthM => (End - Start).Length;

    /// <summary>The point at a position fraction along the rail (0 = <see cref="Start"/>, 1 = <see cref="End"/>).</summary>
    /// <param name="fraction">Position fraction in [0, 1].</param>
    public Vector3 At(double fraction) => Start + ((End - Start) * fraction);
}
