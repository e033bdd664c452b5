using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Structures;

namespace CanopyAdvisor.Core.Light;

/// <summary>Integrates a direction weight over the sky hemisphere into a <see cref="SkyView"/>.</summary>
/// <remarks>
/// The weight is evaluated once per quadrature cell at the cell's sample direction and treated as constant over the
/// cell; the cell integrals are exact (see <see cref="HemisphereQuadrature"/> for the scheme and its accuracy,
/// checked against Howell's catalogue of configuration factors). Cost: one weight evaluation and a few
/// multiply-adds per cell; no allocation in the struct-generic overloads. Pure and thread-safe.
/// </remarks>
public static class SkyViewIntegrator
{
    /// <summary>Integrates a weight given as a struct (specialised per type: no delegate call per direction).</summary>
    /// <typeparam name="TWeight">A struct implementing <see cref="ISkyViewWeight"/>.</typeparam>
    /// <param name="quadrature">The directions and their cell integrals.</param>
    /// <param name="weight">Weight per direction, in [0, 1].</param>
    /// <returns>f, v and s.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The weight returned a value outside [0, 1] or NaN.</exception>
    public static SkyView Integrate<TWeight>(HemisphereQuadrature quadrature, TWeight weight)
        where TWeight : struct, ISkyViewWeight =>
        IntegrateIndexed(quadrature, new ByDirection<TWeight>(weight));

    /// <summary>Integrates a weight that is told each direction's index in <paramref name="quadrature"/> (so it can use
    /// per-direction terms worked out once for many points).</summary>
    /// <typeparam name="TWeight">A struct implementing <see cref="IIndexedSkyWeight"/>.</typeparam>
    /// <param name="quadrature">The directions and their cell integrals.</param>
    /// <param name="weight">Weight per direction, in [0, 1].</param>
    /// <returns>f, v and s.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The weight returned a value outside [0, 1] or NaN.</exception>
    internal static SkyView IntegrateIndexed<TWeight>(HemisphereQuadrature quadrature, TWeight weight)
        where TWeight : struct, IIndexedSkyWeight
    {
        ArgumentNullException.ThrowIfNull(quadrature);
        ReadOnlySpan<Vector3> directions = quadrature.DirectionSpan;
        ReadOnlySpan<double> solid = quadrature.SolidAngleSpan;
        ReadOnlySpan<double> vx = quadrature.VectorXSpan;
        ReadOnlySpan<double> vy = quadrature.VectorYSpan;
        ReadOnlySpan<double> projected = quadrature.ProjectedSpan;
        double sumX = 0, sumY = 0, sumZ = 0, sumSolid = 0;
        for (int i = 0; i < directions.Length; i++)
        {
            double w = weight.Weight(i, directions[i]);
            if (!(w >= 0 && w <= 1))
            {
                throw new ArgumentOutOfRangeException(nameof(weight), w, "A sky weight must lie in [0, 1].");
            }

            if (w == 0)
            {
                continue;
            }

            sumX += w * vx[i];
            sumY += w * vy[i];
            sumZ += w * projected[i];
            sumSolid += w * solid[i];
        }

        // v.Z and f are the same sum, so v.Z == f exactly.
        double viewFactor = sumZ / Math.PI;
        return new SkyView(viewFactor, new Vector3(sumX / Math.PI, sumY / Math.PI, viewFactor), sumSolid / Math.PI);
    }

    /// <summary>Integrates a weight given as a delegate (convenient; one delegate call per direction).</summary>
    /// <param name="quadrature">The directions and their cell integrals.</param>
    /// <param name="weight">Weight per direction, in [0, 1].</param>
    /// <returns>f, v and s.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The weight returned a value outside [0, 1] or NaN.</exception>
    public static SkyView Integrate(HemisphereQuadrature quadrature, Func<Vector3, double> weight)
    {
        ArgumentNullException.ThrowIfNull(weight);
        return Integrate(quadrature, new DelegateWeight(weight));
    }

    /// <summary>The sky view of a point through an enclosure alone (no canopy): w(ω) = enclosure.SkyTransmittance(point, ω).</summary>
    /// <param name="quadrature">The directions and their cell integrals.</param>
    /// <param name="enclosure">The site's enclosure.</param>
    /// <param name="point">The point, site frame, metres.</param>
    /// <returns>f, v and s.</returns>
    public static SkyView Integrate(HemisphereQuadrature quadrature, IEnclosure enclosure, Vector3 point)
    {
        ArgumentNullException.ThrowIfNull(enclosure);
        return Integrate(quadrature, new EnclosureWeight(enclosure, point));
    }

    /// <summary>A weight of directions alone, asked through the indexed form.</summary>
    private readonly struct ByDirection<TWeight>(TWeight weight) : IIndexedSkyWeight
        where TWeight : struct, ISkyViewWeight
    {
        public double Weight(int index, Vector3 towardSky) => weight.Weight(towardSky);
    }

    private readonly struct DelegateWeight(Func<Vector3, double> weight) : ISkyViewWeight
    {
        public double Weight(Vector3 towardSky) => weight(towardSky);
    }

    private readonly struct EnclosureWeight(IEnclosure enclosure, Vector3 point) : ISkyViewWeight
    {
        public double Weight(Vector3 towardSky) => enclosure.SkyTransmittance(point, towardSky);
    }
}
