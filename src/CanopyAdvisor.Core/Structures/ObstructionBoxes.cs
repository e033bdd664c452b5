using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Core.Structures;

/// <summary>The site's obstructions as oriented boxes, prepared for slab tests (Kay &amp; Kajiya 1986 slab method).</summary>
/// <remarks>
/// Each box is stored in its own frame: origin at the footprint's reference corner at the base height, axes along
/// the footprint's length, width and the vertical. A ray is moved into that frame with six dot products and clipped
/// against the three slabs. Allocation-free; immutable and thread-safe.
/// </remarks>
internal sealed class ObstructionBoxes
{
    private const double GrazingM = 1e-12;

    private readonly Box[] boxes;

    public ObstructionBoxes(ImmutableArray<Obstruction> obstructions)
    {
        boxes = obstructions.IsDefault
            ? []
            : [.. obstructions.Select(o => new Box(
                new Vector3(o.Footprint.CornerXM, o.Footprint.CornerYM, o.BaseHeightM),
                o.Footprint.AxisDirection,
                o.Footprint.WidthDirection,
                o.Footprint.LengthM,
                o.Footprint.WidthM,
                o.TopHeightM - o.BaseHeightM))];
    }

    public int Count => boxes.Length;

    /// <summary>
    /// Whether any box overlaps the part of the ray <c>origin + t·direction</c> with 0 &lt; t &lt; <paramref name="tMax"/>
    /// by more than a grazing touch (10⁻¹² m). A ray that starts inside a box is blocked.
    /// </summary>
    public bool Blocks(in Vector3 origin, in Vector3 direction, double tMax)
    {
        if (boxes.Length == 0)
        {
            return false;
        }

        // A touch shorter than this (metres along the ray) is grazing, not blocking.
        double minimumOverlap = GrazingM / direction.Length;
        foreach (ref readonly Box box in boxes.AsSpan())
        {
            if (box.Overlaps(origin, direction, tMax, minimumOverlap))
            {
                return true;
            }
        }

        return false;
    }

    private readonly struct Box(Vector3 corner, Vector3 axis, Vector3 across, double length, double width, double height)
    {
        public bool Overlaps(in Vector3 origin, in Vector3 direction, double tMax, double minimumOverlap)
        {
            Vector3 d = origin - corner;
            double low = 0;
            double high = tMax;
            return Clip(Vector3.Dot(d, axis), Vector3.Dot(direction, axis), length, ref low, ref high)
                && Clip(Vector3.Dot(d, across), Vector3.Dot(direction, across), width, ref low, ref high)
                && Clip(d.Z, direction.Z, height, ref low, ref high)
                && high - low > minimumOverlap;
        }

        private static bool Clip(double start, double step, double extent, ref double low, ref double high)
        {
            if (Math.Abs(step) < 1e-300)
            {
                return start > 0 && start < extent;
            }

            double t1 = -start / step;
            double t2 = (extent - start) / step;
            if (t1 > t2)
            {
                (t1, t2) = (t2, t1);
            }

            low = Math.Max(low, t1);
            high = Math.Min(high, t2);
            return high > low;
        }
    }
}
