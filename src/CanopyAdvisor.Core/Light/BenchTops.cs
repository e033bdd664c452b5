using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Core.Light;

/// <summary>The bench tops of a site as opaque horizontal rectangles: a rack tier shades the tiers below it.</summary>
/// <remarks>
/// A bench top (where the pots stand, at <see cref="Bench.SurfaceHeightM"/>) lets no light through, so light from a lamp
/// over one tier does not reach the tier below, and a point below a bench sees no sky through it. Rays are tested
/// against the plane of each bench top and the footprint rectangle; benches outside the height range of a ray cost one
/// comparison, and a ray or segment that stays at or above the highest bench top costs one comparison in all (the common
/// case of a single level of benches, where the per-bench loop made compile and step quadratic in the number of benches).
/// Immutable and thread-safe.
/// </remarks>
internal sealed class BenchTops
{
    private readonly double _highest = double.NegativeInfinity;
    private readonly double[] _height, _cornerX, _cornerY, _axisX, _axisY, _acrossX, _acrossY, _length, _width;

    public BenchTops(ImmutableArray<Bench> benches)
    {
        int n = benches.Length;
        _height = new double[n];
        _cornerX = new double[n];
        _cornerY = new double[n];
        _axisX = new double[n];
        _axisY = new double[n];
        _acrossX = new double[n];
        _acrossY = new double[n];
        _length = new double[n];
        _width = new double[n];
        for (int b = 0; b < n; b++)
        {
            Footprint f = benches[b].Footprint;
            _height[b] = benches[b].SurfaceHeightM;
            _highest = Math.Max(_highest, _height[b]);
            _cornerX[b] = f.CornerXM;
            _cornerY[b] = f.CornerYM;
            _axisX[b] = f.AxisDirection.X;
            _axisY[b] = f.AxisDirection.Y;
            _acrossX[b] = f.WidthDirection.X;
            _acrossY[b] = f.WidthDirection.Y;
            _length[b] = f.LengthM;
            _width[b] = f.WidthM;
        }
    }

    /// <summary>Whether a bench top lies across the segment between two points.</summary>
    public bool BlocksSegment(Vector3 from, Vector3 to)
    {
        double low = Math.Min(from.Z, to.Z), high = Math.Max(from.Z, to.Z);
        if (low >= _highest)
        {
            return false;
        }

        double dz = to.Z - from.Z;
        for (int b = 0; b < _height.Length; b++)
        {
            double h = _height[b];
            if (h <= low || h >= high)
            {
                continue;
            }

            double t = (h - from.Z) / dz;
            if (Inside(b, from.X + (t * (to.X - from.X)), from.Y + (t * (to.Y - from.Y))))
            {
                return true;
            }
        }

        return false;
    }

    /// <summary>Whether a bench top lies across the upward ray from a point (directions with no upward part are never blocked here).</summary>
    public bool BlocksRay(Vector3 origin, Vector3 direction)
    {
        if (direction.Z <= 0 || origin.Z >= _highest)
        {
            return false;
        }

        for (int b = 0; b < _height.Length; b++)
        {
            double h = _height[b];
            if (h <= origin.Z)
            {
                continue;
            }

            double t = (h - origin.Z) / direction.Z;
            if (Inside(b, origin.X + (t * direction.X), origin.Y + (t * direction.Y)))
            {
                return true;
            }
        }

        return false;
    }

    private bool Inside(int b, double x, double y)
    {
        double dx = x - _cornerX[b], dy = y - _cornerY[b];
        double along = (dx * _axisX[b]) + (dy * _axisY[b]);
        double across = (dx * _acrossX[b]) + (dy * _acrossY[b]);
        return along > 0 && along < _length[b] && across > 0 && across < _width[b];
    }
}
