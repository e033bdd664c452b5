using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Core.Structures;

/// <summary>The enclosure of an indoor room: no daylight, only obstructions block lamp light.</summary>
/// <remarks>
/// The room's walls and ceiling are not modelled as blockers (lamps and benches are inside the room). Immutable and
/// thread-safe. Build with <see cref="EnclosureBuilder"/>.
/// </remarks>
public sealed class IndoorEnclosure : IEnclosure
{
    private readonly ObstructionBoxes obstructions;

    internal IndoorEnclosure(IndoorRoom room, ObstructionBoxes obstructions)
    {
        Room = room;
        this.obstructions = obstructions;
    }

    /// <summary>The room this enclosure was built from.</summary>
    public IndoorRoom Room { get; }

    /// <summary>Always 0: an indoor room has no sky.</summary>
    /// <param name="origin">Ignored.</param>
    /// <param name="towardSky">Ignored.</param>
    /// <returns>0.</returns>
    public double SkyTransmittance(Vector3 origin, Vector3 towardSky) => 0;

    /// <summary>Whether an obstruction box lies on the segment between two points (segment ends excluded).</summary>
    /// <param name="from">One end, site frame, metres.</param>
    /// <param name="to">The other end, site frame, metres.</param>
    /// <returns>True when an obstruction overlaps the open segment.</returns>
    public bool IsBlocked(Vector3 from, Vector3 to) => obstructions.Blocks(from, to - from, 1.0);
}
