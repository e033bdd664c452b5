using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Glazing;

namespace CanopyAdvisor.Core.Structures;

/// <summary>
/// A planar convex facet (parallelogram or triangle) prepared for fast ray tests: its plane, outward normal, and a
/// reciprocal in-plane basis that turns a hit point into edge coordinates with two dot products.
/// </summary>
/// <remarks>
/// Points of the facet are <c>P0 + a·E1 + b·E2</c> with 0 ≤ a, b ≤ 1 (parallelogram) or a, b ≥ 0, a + b ≤ 1
/// (triangle). With G1 = (E2 × n)/(E1·(E2 × n)) and G2 = (n × E1)/(E2·(n × E1)), a = (q − P0)·G1 and b = (q − P0)·G2.
/// Edges are inclusive with a small tolerance so that rays cannot slip through the seams between facets; the
/// caller merges hits that coincide.
/// </remarks>
internal readonly struct FacetGeometry
{
    /// <summary>Below this |n·d| a ray counts as running along the facet's plane.</summary>
    public const double ParallelCosine = 1e-14;

    private const double EdgeTolerance = 1e-9;

    public FacetGeometry(Vector3 p0, Vector3 e1, Vector3 e2, bool triangle, Vector3 outward, GlazingOptics optics)
    {
        Vector3 n = Vector3.Cross(e1, e2).Normalized();
        if (Vector3.Dot(n, outward) < 0)
        {
            n = -n;
        }

        Origin = p0;
        Normal = n;
        PlaneOffset = Vector3.Dot(n, p0);
        Vector3 e2xn = Vector3.Cross(e2, n);
        Vector3 nxe1 = Vector3.Cross(n, e1);
        G1 = e2xn / Vector3.Dot(e1, e2xn);
        G2 = nxe1 / Vector3.Dot(e2, nxe1);
        IsTriangle = triangle;
        Optics = optics;
    }

    public Vector3 Origin { get; }

    /// <summary>Unit normal pointing out of the enclosure.</summary>
    public Vector3 Normal { get; }

    public double PlaneOffset { get; }

    public Vector3 G1 { get; }

    public Vector3 G2 { get; }

    public bool IsTriangle { get; }

    public GlazingOptics Optics { get; }

    /// <summary>
    /// Ray parameter t at which <c>origin + t·direction</c> meets the facet, or NaN when the ray is parallel to the
    /// plane or meets it outside the facet. Negative t are returned too; the caller chooses the range.
    /// </summary>
    public double Intersect(in Vector3 origin, in Vector3 direction)
    {
        double denominator = Vector3.Dot(Normal, direction);
        if (Math.Abs(denominator) < ParallelCosine)
        {
            return double.NaN;
        }

        double t = (PlaneOffset - Vector3.Dot(Normal, origin)) / denominator;
        Vector3 r = origin + (t * direction) - Origin;
        double a = Vector3.Dot(r, G1);
        double b = Vector3.Dot(r, G2);
        bool inside = IsTriangle
            ? a >= -EdgeTolerance && b >= -EdgeTolerance && a + b <= 1 + EdgeTolerance
            : a >= -EdgeTolerance && b >= -EdgeTolerance && a <= 1 + EdgeTolerance && b <= 1 + EdgeTolerance;
        return inside ? t : double.NaN;
    }
}
