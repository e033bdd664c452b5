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
/// Edges: where a ray passes exactly through a ridge, gutter, eave or corner, the coincident hits count as one
/// crossing, through the facet crossed most squarely. A ray running exactly along a wall plane does not cross it.
/// </para>
/// <para>
/// Performance: allocation-free. The ray is followed in the house's own frame across the saw-tooth roof profile,
/// visiting only the bays it passes over below ridge height (one or two for steep rays), plus one test for the
/// bounding walls and one slab test per obstruction; IsBlocked tests the opaque facets only. Immutable and
/// thread-safe. Build with <see cref="EnclosureBuilder"/>.
/// </para>
/// </remarks>
public sealed class GlasshouseEnclosure : IEnclosure
{
    // Hits closer than this along the ray (metres) are one crossing: a ray through a ridge, eave or corner meets two
    // facets at the same point.
    private const double CoincidenceM = 1e-9;
    private const double InsideToleranceM = 1e-9;

    // A ray whose direction cosine with a plane's normal is below this runs along the plane (same as FacetGeometry).
    private const double ParallelCosine = FacetGeometry.ParallelCosine;

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
    private readonly double length;
    private readonly double width;
    private readonly double bay;
    private readonly double gutter;
    private readonly int bayCount;
    private readonly double ridge;
    private readonly double sinSlope;
    private readonly double cosSlope;
    private readonly GlazingOptics roofOptics;
    private readonly GlazingOptics leftOptics;
    private readonly GlazingOptics rightOptics;
    private readonly GlazingOptics frontOptics;
    private readonly GlazingOptics backOptics;

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
        length = fp.LengthM;
        width = fp.WidthM;
        bay = glasshouse.BayWidthM;
        gutter = glasshouse.GutterHeightM;
        bayCount = glasshouse.BayCount;
        ridge = glasshouse.RidgeHeightM;
        sinSlope = glasshouse.RoofSlope.Sin();
        cosSlope = glasshouse.RoofSlope.Cos();
        roofOptics = new GlazingOptics(glasshouse.Roof);
        leftOptics = new GlazingOptics(glasshouse.LeftWall);
        rightOptics = new GlazingOptics(glasshouse.RightWall);
        frontOptics = new GlazingOptics(glasshouse.FrontWall);
        backOptics = new GlazingOptics(glasshouse.BackWall);

        var facetList = new List<(EnvelopeFacet Facet, FacetGeometry Geometry)>();
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
    public double SkyTransmittance(Vector3 origin, Vector3 towardSky) => SkyTransmittance(origin, Ray(towardSky, prepared: false));

    /// <summary>A direction toward the sky with the envelope's per-direction terms (the cover transmittances of the
    /// roof planes and the walls it would cross) worked out once, for <see cref="SkyTransmittance(Vector3, in SkyRay)"/>
    /// from many points: the quadrature directions of every sample point, the sun at every point of a step.</summary>
    /// <param name="towardSky">Direction toward the sky (normalised here if it is not a unit vector).</param>
    internal SkyRay Prepare(Vector3 towardSky) => Ray(towardSky, prepared: true);

    /// <summary>The same as <see cref="SkyTransmittance(Vector3, Vector3)"/> for a prepared direction (the same result,
    /// bit for bit: the prepared transmittances are the ones the unprepared call works out per crossing).</summary>
    /// <param name="origin">The point, site frame, metres.</param>
    /// <param name="ray">The direction, prepared by <see cref="Prepare"/> of this enclosure.</param>
    internal double SkyTransmittance(Vector3 origin, in SkyRay ray)
    {
        if (!ray.AboveHorizon)
        {
            return 0;
        }

        Vector3 d = ray.Direction;
        if (obstructions.Count > 0 && obstructions.Blocks(origin, d, double.PositiveInfinity))
        {
            return 0;
        }

        Vector3 r = origin - corner;
        double u0 = Vector3.Dot(r, axis);
        double v0 = Vector3.Dot(r, across);
        return ContainsLocal(u0, v0, origin.Z) ? unshadedFraction * EnvelopeTransmittance(origin, ray, u0, v0) : 1;
    }

    private SkyRay Ray(Vector3 towardSky, bool prepared)
    {
        double squared = towardSky.LengthSquared;
        if (!(towardSky.Z > 0 && towardSky.Z * towardSky.Z > HorizonCosine * HorizonCosine * squared))
        {
            return default;
        }

        // Quadrature and sun directions are unit vectors already; normalise only when needed (saves a square root
        // and three divisions on the hot path).
        Vector3 d = Math.Abs(squared - 1) < 1e-12 ? towardSky : towardSky / Math.Sqrt(squared);
        double du = Vector3.Dot(d, axis);
        double dv = Vector3.Dot(d, across);
        du = Math.Abs(du) < ParallelCosine ? 0 : du; // a ray along a wall plane does not cross it (as in FacetGeometry)
        dv = Math.Abs(dv) < ParallelCosine ? 0 : dv;
        double leftCosine = (d.Z * cosSlope) - (dv * sinSlope);
        double rightCosine = (d.Z * cosSlope) + (dv * sinSlope);
        if (!prepared)
        {
            return new SkyRay(d, du, dv, leftCosine, rightCosine);
        }

        return new SkyRay(d, du, dv, leftCosine, rightCosine)
        {
            Prepared = true,
            RoofLeft = roofOptics.TransmittanceAtCosine(leftCosine),
            RoofRight = roofOptics.TransmittanceAtCosine(rightCosine),
            AlongWall = (du > 0 ? backOptics : frontOptics).TransmittanceAtCosine(du),
            AcrossWall = (dv > 0 ? rightOptics : leftOptics).TransmittanceAtCosine(dv),
        };
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
        return ContainsLocal(Vector3.Dot(r, axis), Vector3.Dot(r, across), point.Z);
    }

    private bool ContainsLocal(double u, double v, double z) =>
        u >= -InsideToleranceM && u <= length + InsideToleranceM && v >= -InsideToleranceM && v <= width + InsideToleranceM
        && z >= -InsideToleranceM && z <= RoofHeight(v) + InsideToleranceM;

    /// <summary>
    /// Product of the cover transmittances of every envelope crossing of the ray from an inside point, found in the
    /// glasshouse's own frame (u along the ridge, v across the bays, z up): the roof profile is a saw-tooth in (v, z),
    /// so only the bays the ray passes over are visited, and the end and side walls are planes of the bounding prism.
    /// </summary>
    /// <remarks>
    /// Crossings are visited in order along the ray, so hits on a shared edge (ridge, internal gutter, eave) are
    /// adjacent and merged. Equivalent to <see cref="EnvelopeTransmittanceByFacets"/> (checked by a property test) but
    /// costs O(bays crossed) instead of O(facets).
    /// </remarks>
    private double EnvelopeTransmittance(Vector3 origin, in SkyRay ray, double u0, double v0)
    {
        Vector3 d = ray.Direction;
        double z0 = origin.Z;
        double du = ray.Du;
        double dv = ray.Dv;
        double dz = d.Z;

        // Where the ray leaves the footprint's vertical prism; nothing of the envelope lies beyond.
        double tAlong = du > 0 ? (length - u0) / du : du < 0 ? -u0 / du : double.PositiveInfinity;
        double tAcross = dv > 0 ? (width - v0) / dv : dv < 0 ? -v0 / dv : double.PositiveInfinity;
        double tEnd = Math.Min(tAlong, tAcross);

        var crossings = new CrossingProduct();

        // Roof: visit the bays from the origin's bay toward the exit, planes in the order the ray meets them. Once
        // the ray is above the ridges it cannot meet the roof again, so the walk stops there (steep rays visit one
        // or two bays).
        int lastBay = bayCount - 1;
        int first = EntryBay(v0, dv);
        double tRoof = Math.Min(tEnd, ((ridge - z0) / dz) + CoincidenceM);
        double vEnd = double.IsPositiveInfinity(tRoof) ? v0 : v0 + (tRoof * dv);
        int step = dv >= 0 ? 1 : -1;
        int last = Math.Clamp((int)Math.Floor(vEnd / bay), 0, lastBay);
        last = step > 0 ? Math.Max(last, first) : Math.Min(last, first); // rounding must not send the walk backward
        double leftDenominator = dz - (roofRise * dv);
        double rightDenominator = dz + (roofRise * dv);
        double leftCosine = ray.LeftCosine;
        double rightCosine = ray.RightCosine;
        for (int i = first; ; i += step)
        {
            double bayStart = i * bay;
            for (int side = 0; side < 2; side++)
            {
                // dv ≥ 0 meets the left (rising) plane first; dv < 0 the right (falling) plane first.
                bool left = (side == 0) == (dv >= 0);
                double t;
                double cosine;
                if (left)
                {
                    if (Math.Abs(leftDenominator) < 1e-14)
                    {
                        continue;
                    }

                    t = (gutter + (roofRise * (v0 - bayStart)) - z0) / leftDenominator;
                    cosine = leftCosine;
                }
                else
                {
                    if (Math.Abs(rightDenominator) < 1e-14)
                    {
                        continue;
                    }

                    t = (gutter + (roofRise * (bayStart + bay - v0)) - z0) / rightDenominator;
                    cosine = rightCosine;
                }

                if (!(t >= -CoincidenceM && t <= tRoof + CoincidenceM))
                {
                    continue;
                }

                double v = v0 + (t * dv);
                double low = left ? bayStart : bayStart + (bay / 2);
                if (v < low - InsideToleranceM || v > low + (bay / 2) + InsideToleranceM)
                {
                    continue;
                }

                if (t <= CoincidenceM && (cosine <= 0 || !LeavesAtStart(origin, d)))
                {
                    continue; // the origin is on this plane and the ray does not leave the envelope through it
                }

                double transmittance = ray.Prepared
                    ? (left ? ray.RoofLeft : ray.RoofRight)
                    : roofOptics.TransmittanceAtCosine(cosine);
                crossings.Add(t, cosine, transmittance, CoincidenceM);
                if (crossings.Blocked)
                {
                    return 0;
                }
            }

            if (i == last)
            {
                break;
            }
        }

        // Walls: the ray leaves the prism at tEnd through a wall or gable if it is not above the roof profile there.
        if (!double.IsPositiveInfinity(tEnd) && (tEnd > CoincidenceM || LeavesAtStart(origin, d)))
        {
            double zEnd = z0 + (tEnd * dz);
            if (zEnd <= RoofHeight(Math.Clamp(v0 + (tEnd * dv), 0, width)) + InsideToleranceM)
            {
                // At a corner both walls are offered; the crossing keeps the squarer one.
                if (tAlong <= tAcross + CoincidenceM)
                {
                    double transmittance = ray.Prepared ? ray.AlongWall : (du > 0 ? backOptics : frontOptics).TransmittanceAtCosine(du);
                    crossings.Add(tEnd, du, transmittance, CoincidenceM);
                }

                if (tAcross <= tAlong + CoincidenceM && zEnd <= gutter + InsideToleranceM)
                {
                    double transmittance = ray.Prepared ? ray.AcrossWall : (dv > 0 ? rightOptics : leftOptics).TransmittanceAtCosine(dv);
                    crossings.Add(tEnd, dv, transmittance, CoincidenceM);
                }
            }
        }

        return crossings.Result();
    }

    /// <summary>
    /// Reference implementation of <see cref="EnvelopeTransmittance"/>: tests every facet and merges coincident hits.
    /// Kept for the equivalence test; O(facets) per call.
    /// </summary>
    internal double EnvelopeTransmittanceByFacets(Vector3 origin, Vector3 d)
    {
        var hits = new List<(double T, double Cosine, int Facet)>();
        for (int i = 0; i < facets.Length; i++)
        {
            double t = facets[i].Intersect(origin, d);
            if (!(t >= -CoincidenceM))
            {
                continue; // no hit (NaN) or behind the origin
            }

            double cosine = Vector3.Dot(d, facets[i].Normal);
            if (t <= CoincidenceM && (cosine <= 0 || !LeavesAtStart(origin, d)))
            {
                continue; // the origin lies on this facet and the ray does not leave the envelope through it
            }

            hits.Add((t, cosine, i));
        }

        var crossings = new CrossingProduct();
        foreach ((double t, double cosine, int facet) in hits.OrderBy(h => h.T))
        {
            crossings.Add(t, cosine, facets[facet].Optics.TransmittanceAtCosine(cosine), CoincidenceM);
        }

        return crossings.Result();
    }

    // Whether a ray from a point on the envelope goes straight outside. Decided from the geometry, not by stepping
    // along the ray, so that grazing rays are classified correctly: off an end or side wall if it moves outward
    // across that wall's plane; off the roof if it climbs faster than the roof profile beneath it (a ray from an
    // internal gutter line may instead run into the neighbouring bay without crossing anything).
    private bool LeavesAtStart(Vector3 origin, Vector3 d)
    {
        Vector3 r = origin - corner;
        double u0 = Vector3.Dot(r, axis);
        double v0 = Vector3.Dot(r, across);
        double du = Vector3.Dot(d, axis);
        double dv = Vector3.Dot(d, across);
        du = Math.Abs(du) < ParallelCosine ? 0 : du;
        dv = Math.Abs(dv) < ParallelCosine ? 0 : dv;
        const double tol = InsideToleranceM;
        if ((u0 <= tol && du < 0) || (u0 >= length - tol && du > 0) || (v0 <= tol && dv < 0) || (v0 >= width - tol && dv > 0))
        {
            return true;
        }

        if (origin.Z < RoofHeight(Math.Clamp(v0, 0, width)) - tol)
        {
            return false;
        }

        if (dv == 0)
        {
            return d.Z > 0;
        }

        int i = EntryBay(v0, dv);
        double w = v0 - (i * bay);
        bool towardRidge = dv > 0 ? w < (bay / 2) - tol : w > (bay / 2) + tol;
        double roofClimb = (towardRidge ? roofRise : -roofRise) * Math.Abs(dv);
        return d.Z > roofClimb;
    }

    // The bay a ray at distance v across the bays moves over next: on a bay boundary, the bay on the side it moves to.
    private int EntryBay(double v, double dv)
    {
        double position = dv >= 0 ? Math.Floor((v + InsideToleranceM) / bay) : Math.Ceiling((v - InsideToleranceM) / bay) - 1;
        return (int)Math.Clamp(position, 0, bayCount - 1);
    }

    // Height of the roof profile at a distance v across the bays (v within the footprint).
    private double RoofHeight(double v)
    {
        double withinBay = v - (Math.Clamp(Math.Floor(v / bay), 0, bayCount - 1) * bay);
        double fromGutter = Math.Max(0, Math.Min(withinBay, bay - withinBay));
        return gutter + (fromGutter * roofRise);
    }

    private Vector3 Position(double along, double acrossM, double height) =>
        corner + (along * axis) + (acrossM * across) + new Vector3(0, 0, height);
}
