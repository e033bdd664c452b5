using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Core.Light;

/// <summary>
/// How much of the light arriving from one direction reaches a stem at a sample point inside the bench canopy:
/// Beer–Lambert attenuation along the ray's path through the canopy layer (Monsi &amp; Saeki 1953).
/// </summary>
/// <remarks>
/// <para>
/// The canopy is a homogeneous layer over the bench footprint, from the bench top up to the canopy top, with one-sided
/// leaf area density LAD (m² m⁻³) and randomly placed leaves. Transmission along a path of length l is
/// exp(−G·LAD·l) (Monsi, M. &amp; Saeki, T. 1953, Jap. J. Bot. 14:22; the turbid-medium form of Beer–Lambert), with the
/// leaf projection G = 0.5 of a spherical leaf-angle distribution, which holds for every direction
/// (Ross, J. 1981, The Radiation Regime and Architecture of Plant Stands; <see cref="ModelConstants.SphericalLeafProjection"/>).
/// </para>
/// <para>
/// The path runs from the sensing point toward the source until the ray leaves the layer. A ray going up (elevation
/// e &gt; 0) leaves through the top after <c>SensingDepthM / sin e</c> or through a side edge after the horizontal
/// distance to that edge along the ray's heading divided by <c>cos e</c>, whichever is shorter. A ray that is
/// horizontal or goes down (a source below the sensing height) can only leave through an edge. The path never
/// exceeds the distance to the source itself (a lamp inside the canopy layer). Edge points therefore see far more
/// low-angle light than middle points (the edge effect, MODEL.md §3).
/// </para>
/// <para>
/// Limits: the bench top below the canopy is not treated as opaque here (a downward ray that would meet it inside the
/// footprint is attenuated only by its edge path); neighbouring benches are not part of this bench's layer.
/// </para>
/// </remarks>
public static class CanopyAttenuation
{
    /// <summary>Path length through the canopy layer from a sample point toward a source, metres (may be +∞).</summary>
    /// <param name="bench">The bench the point belongs to.</param>
    /// <param name="point">The sample point.</param>
    /// <param name="towardSource">Unit vector from the point toward the source.</param>
    public static double PathLengthM(Bench bench, SamplePoint point, Vector3 towardSource)
    {
        ArgumentNullException.ThrowIfNull(bench);
        Vector3 axis = bench.Footprint.AxisDirection;
        Vector3 across = bench.Footprint.WidthDirection;
        return PathLengthM(
            point.ToFrontEdgeM, point.ToBackEdgeM, point.ToLeftEdgeM, point.ToRightEdgeM,
            axis.X, axis.Y, across.X, across.Y, bench.Canopy.SensingDepthM,
            towardSource.X, towardSource.Y, towardSource.Z, double.PositiveInfinity);
    }

    /// <summary>Fraction of light from a direction that reaches the sample point through the canopy, in [0, 1].</summary>
    /// <param name="bench">The bench the point belongs to.</param>
    /// <param name="point">The sample point.</param>
    /// <param name="towardSource">Unit vector from the point toward the source.</param>
    public static double Transmission(Bench bench, SamplePoint point, Vector3 towardSource)
    {
        ArgumentNullException.ThrowIfNull(bench);
        double extinction = ExtinctionPerM(bench.Canopy);
        return extinction > 0 ? Math.Exp(-extinction * PathLengthM(bench, point, towardSource)) : 1.0;
    }

    /// <summary>The extinction coefficient per metre of path, G·LAD.</summary>
    internal static double ExtinctionPerM(Canopy canopy) =>
        ModelConstants.SphericalLeafProjection * canopy.LeafAreaDensityM2PerM3;

    /// <summary>
    /// The path length for a point given by its edge distances and its bench's horizontal axes; allocation-free, for
    /// the hot loops. (ux, uy, uz) is the unit vector toward the source; <paramref name="maxPathM"/> caps the path
    /// (the distance to the source).
    /// </summary>
    internal static double PathLengthM(
        double toFront, double toBack, double toLeft, double toRight,
        double axisX, double axisY, double acrossX, double acrossY,
        double sensingDepthM, double ux, double uy, double uz, double maxPathM)
    {
        double path = maxPathM;
        if (uz > 0)
        {
            double top = sensingDepthM / uz;
            if (top < path)
            {
                path = top;
            }
        }

        // The ray reaches a side plane after s = distance / (û · outward normal); outward normals are ±axis, ±across.
        double along = (ux * axisX) + (uy * axisY);
        if (along > 0)
        {
            double s = toBack / along;
            if (s < path)
            {
                path = s;
            }
        }
        else if (along < 0)
        {
            double s = toFront / -along;
            if (s < path)
            {
                path = s;
            }
        }

        double side = (ux * acrossX) + (uy * acrossY);
        if (side > 0)
        {
            double s = toRight / side;
            if (s < path)
            {
                path = s;
            }
        }
        else if (side < 0)
        {
            double s = toLeft / -side;
            if (s < path)
            {
                path = s;
            }
        }

        return path;
    }
}
