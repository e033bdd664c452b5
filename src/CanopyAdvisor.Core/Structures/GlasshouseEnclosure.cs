using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Glazing;
using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Core.Structures;

/// <summary>
/// The envelope of a gutter-connected glasshouse as planar facets with covers, plus the site's obstructions: answers
/// how much sky light reaches a point along a direction, and whether a segment is blocked.
/// </summary>
/// <remarks>
/// <para>
/// Geometry (see <see cref="Glasshouse"/>): per bay two roof planes from gutter to ridge along the whole footprint
/// length; the left and right side walls up to gutter height; the front and back end walls up to gutter height, each
/// closed above by one gable triangle per bay. Internal gutters and the walls between bays are not modelled (a ray
/// leaves through the roof planes).
/// </para>
/// <para>
/// Sky transmittance for a point inside the envelope: every envelope facet the ray crosses multiplies the result by its
/// cover's beam transmittance at the local incidence angle (Fresnel and absorption, Duffie &amp; Beckman ch. 5; see
/// <see cref="CoverOptics"/>); the structural shading factor (1 − s) is applied once per ray, because s is defined as
/// the share of light the frame takes from the house as a whole. The first crossing is the facet the ray exits
/// through; further crossings occur only for low rays that pass through the roofs of neighbouring bays (a ray leaving
/// one bay's roof plane at an elevation, seen across the ridges, below the roof slope re-enters the next bay), which
/// a first-hit-only model would treat as open sky. Any opaque facet or obstruction on the ray gives 0; a direction at
/// or below the horizon gives 0.
/// </para>
/// <para>
/// For a point outside the envelope (for example a bench outdoors) only obstructions count: the result is 1 when no
/// obstruction is on the ray and 0 otherwise; the glasshouse itself is not treated as a shading body for outside
/// points. Points on the envelope surface count as inside; a facet the point lies on counts only for rays leaving
/// outward through it.
/// </para>
/// <para>
/// Performance: allocation-free; one plane test per facet (4·bays + 4 facets for pitched roofs) and one slab test per
/// obstruction. Immutable and thread-safe. Build with <see cref="EnclosureBuilder"/>.
/// </para>
/// </remarks>
public sealed class GlasshouseEnclosure : IEnclosure
{
    // Hits closer than this along the ray (metres) are one crossing: a ray through a ridge, eave or corner meets two
    // facets at the same point.
    private const double CoincidenceM = 1e-9;
    private const double InsideToleranceM = 1e-9;

    // Directions whose vertical component is within rounding of zero (cos(90°) = 6e-17) count as the horizon.
    private const double HorizonCosine = 1e-12;

    private readonly FacetGeometry[] facets;
    private readonly FacetGeometry[] opaqueFacets;
    private readonly ObstructionBoxes obstructions;
    private readonly double unshadedFraction;
    private readonly Vector3 corner;
    private readonly Vector3 axis;
    private readonly Vector3 across;
    private readonly double roofRise;

    internal GlasshouseEnclosure(Glasshouse glasshouse, ObstructionBoxes obstructions)
    {
        Glasshouse = glasshouse;
        this.obstructions = obstructions;
        unshadedFraction = 1.0 - glasshouse.StructuralShading;
        Footprint fp = glasshouse.Footprint;
        corner = fp.Corner;
        axis = fp.AxisDirection;
        across = fp.WidthDirection;
        roofRise = glasshouse.RoofSlope.Tan();

        var facetList = new List<(EnvelopeFacet Facet, FacetGeometry Geometry)>();
        double length = fp.LengthM;
        double width = fp.WidthM;
        double bay = glasshouse.BayWidthM;
        double gutter = glasshouse.GutterHeightM;
        double rise = glasshouse.RidgeHeightM - gutter;
        Vector3 up = Vector3.UnitZ;

        void Add(string name, Cover cover, Vector3 p0, Vector3 e1, Vector3 e2, bool triangle, Vector3 outwardHint)
        {
            var geometry = new FacetGeometry(p0, e1, e2, triangle, outwardHint, new GlazingOptics(cover));
            ImmutableArray<Vector3> corners = triangle ? [p0, p0 + e1, p0 + e2] : [p0, p0 + e1, p0 + e1 + e2, p0 + e2];
            facetList.Add((new EnvelopeFacet(name, cover, corners, geometry.Normal), geometry));
        }

        for (int i = 0; i < glasshouse.BayCount; i++)
        {
            double v0 = i * bay;
            string index = i.ToString(System.Globalization.CultureInfo.InvariantCulture);
            Add($"roof[{index}].left", glasshouse.Roof, Position(0, v0, gutter), length * axis, (bay / 2 * across) + (rise * up), false, up);
            Add($"roof[{index}].right", glasshouse.Roof, Position(0, v0 + (bay / 2), gutter + rise), length * axis, (bay / 2 * across) - (rise * up), false, up);
        }

        Add("wall.left", glasshouse.LeftWall, Position(0, 0, 0), length * axis, gutter * up, false, -across);
        Add("wall.right", glasshouse.RightWall, Position(0, width, 0), length * axis, gutter * up, false, across);
        Add("wall.front", glasshouse.FrontWall, Position(0, 0, 0), width * across, gutter * up, false, -axis);
        Add("wall.back", glasshouse.BackWall, Position(length, 0, 0), width * across, gutter * up, false, axis);
        if (rise > 1e-9)
        {
            for (int i = 0; i < glasshouse.BayCount; i++)
            {
                double v0 = i * bay;
                string index = i.ToString(System.Globalization.CultureInfo.InvariantCulture);
                Vector3 apex = (bay / 2 * across) + (rise * up);
                Add($"gable.front[{index}]", glasshouse.FrontWall, Position(0, v0, gutter), bay * across, apex, true, -axis);
                Add($"gable.back[{index}]", glasshouse.BackWall, Position(length, v0, gutter), bay * across, apex, true, axis);
            }
        }

        Facets = [.. facetList.Select(f => f.Facet)];
        facets = [.. facetList.Select(f => f.Geometry)];
        opaqueFacets = [.. facets.Where(f => f.Optics.Opaque)];
    }

    /// <summary>The glasshouse this envelope was built from.</summary>
    public Glasshouse Glasshouse { get; }

    /// <summary>The envelope's facets with their covers, in the site frame (for drawing and inspection).</summary>
    public ImmutableArray<EnvelopeFacet> Facets { get; }

    /// <summary>
    /// Fraction of sky light along <paramref name="towardSky"/> that reaches <paramref name="origin"/>: the product of
    /// the cover transmittances of every envelope facet crossed, times (1 − structural shading); 0 if an opaque facet
    /// or an obstruction is on the ray or the direction is not above the horizon. Outside the envelope only
    /// obstructions count (see the class remarks).
    /// </summary>
    /// <param name="origin">The point, site frame, metres.</param>
    /// <param name="towardSky">Direction toward the sky (normalised here if it is not a unit vector).</param>
    /// <returns>A fraction in [0, 1].</returns>
    public double SkyTransmittance(Vector3 origin, Vector3 towardSky)
    {
        double length = towardSky.Length;
        if (!(towardSky.Z > HorizonCosine * length))
        {
            return 0;
        }

        Vector3 d = towardSky / length;
        if (obstructions.Count > 0 && obstructions.Blocks(origin, d, double.PositiveInfinity))
        {
            return 0;
        }

        if (!Contains(origin))
        {
            return 1;
        }

        // Small stack buffer of the crossing distances found so far, to merge hits on shared edges.
        Span<double> crossings = facets.Length <= 512 ? stackalloc double[facets.Length] : new double[facets.Length];
        int crossingCount = 0;
        double transmittance = unshadedFraction;
        foreach (ref readonly FacetGeometry facet in facets.AsSpan())
        {
            double t = facet.Intersect(origin, d);
            if (!(t >= -CoincidenceM))
            {
                continue; // no hit (NaN) or behind the origin
            }

            double cosine = Vector3.Dot(d, facet.Normal);
            if (t <= CoincidenceM && cosine <= 0)
            {
                continue; // the origin lies on this facet and the ray goes inward
            }

            if (IsRepeat(crossings[..crossingCount], t))
            {
                continue;
            }

            crossings[crossingCount++] = t;
            if (facet.Optics.Opaque)
            {
                return 0;
            }

            transmittance *= facet.Optics.TransmittanceAtCosine(cosine);
        }

        return transmittance;
    }

    /// <summary>Whether an opaque envelope facet or an obstruction lies on the segment between two points (ends excluded).</summary>
    /// <param name="from">One end, site frame, metres.</param>
    /// <param name="to">The other end, site frame, metres.</param>
    /// <returns>True when the open segment crosses an opaque facet or overlaps an obstruction.</returns>
    public bool IsBlocked(Vector3 from, Vector3 to)
    {
        Vector3 segment = to - from;
        double length = segment.Length;
        if (!(length > 0))
        {
            return false;
        }

        double margin = CoincidenceM / length;
        foreach (ref readonly FacetGeometry facet in opaqueFacets.AsSpan())
        {
            double t = facet.Intersect(from, segment);
            if (t > margin && t < 1 - margin)
            {
                return true;
            }
        }

        return obstructions.Blocks(from, segment, 1.0);
    }

    /// <summary>Whether a point lies inside the envelope or on its surface (1 nm tolerance).</summary>
    /// <param name="point">The point, site frame, metres.</param>
    /// <returns>True inside or on the envelope.</returns>
    public bool Contains(Vector3 point)
    {
        Vector3 r = point - corner;
        double u = Vector3.Dot(r, axis);
        double v = Vector3.Dot(r, across);
        Footprint fp = Glasshouse.Footprint;
        if (u < -InsideToleranceM || u > fp.LengthM + InsideToleranceM || v < -InsideToleranceM
            || v > fp.WidthM + InsideToleranceM || point.Z < -InsideToleranceM)
        {
            return false;
        }

        double bay = Glasshouse.BayWidthM;
        double withinBay = v - (Math.Clamp(Math.Floor(v / bay), 0, Glasshouse.BayCount - 1) * bay);
        double fromGutter = Math.Max(0, Math.Min(withinBay, bay - withinBay));
        return point.Z <= Glasshouse.GutterHeightM + (fromGutter * roofRise) + InsideToleranceM;
    }

    private static bool IsRepeat(ReadOnlySpan<double> seen, double t)
    {
        foreach (double s in seen)
        {
            if (Math.Abs(s - t) <= CoincidenceM)
            {
                return true;
            }
        }

        return false;
    }

    private Vector3 Position(double along, double acrossM, double height) =>
        corner + (along * axis) + (acrossM * across) + new Vector3(0, 0, height);
}
