using CanopyAdvisor.Core.Glazing;

namespace CanopyAdvisor.Core.Structures;

/// <summary>
/// Multiplies the transmittances of the envelope crossings along one ray, offered in order of distance, merging
/// crossings at the same point (a ray through a ridge, gutter, eave or corner meets two or three facets there).
/// </summary>
/// <remarks>
/// Of coincident hits the one the ray crosses most squarely (largest |cos θ|; on a tie the lower transmittance) is kept: the ray passes through the
/// shared edge, and that facet is the one it would cross for any nearby ray that is not grazing. Mutable value type
/// used as a local; allocation-free.
/// </remarks>
internal struct CrossingProduct
{
    private double product;
    private bool blocked;
    private bool pending;
    private double pendingDistance;
    private double pendingCosine;
    private GlazingOptics pendingOptics;

    public CrossingProduct() => product = 1;

    /// <summary>Whether an opaque crossing has been committed (the result is then 0).</summary>
    public readonly bool Blocked => blocked;

    /// <summary>Offers a crossing at ray distance <paramref name="distance"/> (not before the last one offered).</summary>
    public void Add(double distance, double cosine, in GlazingOptics optics, double coincidence)
    {
        double c = Math.Abs(cosine);
        if (pending && distance - pendingDistance <= coincidence)
        {
            // Squarer crossing wins; on a tie (a ray through a corner at equal angles) the darker one, so that
            // the result does not depend on the order the hits were found in.
            if (c > pendingCosine + 1e-12
                || (c >= pendingCosine - 1e-12 && optics.TransmittanceAtCosine(c) < pendingOptics.TransmittanceAtCosine(pendingCosine)))
            {
                pendingCosine = c;
                pendingOptics = optics;
            }

            return;
        }

        Commit();
        pending = true;
        pendingDistance = distance;
        pendingCosine = c;
        pendingOptics = optics;
    }

    /// <summary>The product of all crossings offered; 0 if any kept crossing is opaque.</summary>
    public double Result()
    {
        Commit();
        return blocked ? 0 : product;
    }

    private void Commit()
    {
        if (!pending)
        {
            return;
        }

        pending = false;
        if (pendingOptics.Opaque)
        {
            blocked = true;
        }
        else
        {
            product *= pendingOptics.TransmittanceAtCosine(pendingCosine);
        }
    }
}
