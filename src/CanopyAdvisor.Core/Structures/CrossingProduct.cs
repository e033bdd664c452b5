namespace CanopyAdvisor.Core.Structures;

/// <summary>
/// Multiplies the transmittances of the envelope crossings along one ray, offered in order of distance, merging
/// crossings at the same point (a ray through a ridge, gutter, eave or corner meets two or three facets there).
/// </summary>
/// <remarks>
/// Of coincident hits the one the ray crosses most squarely (largest |cos θ|; on a tie the lower transmittance) is kept: the ray passes through the
/// shared edge, and that facet is the one it would cross for any nearby ray that is not grazing. Each crossing comes
/// with its transmittance already worked out (the caller's cover optics at |cos θ|, 0 for an opaque facet), so a
/// direction shared by many points needs its Fresnel terms only once. Mutable value type used as a local;
/// allocation-free.
/// </remarks>
internal struct CrossingProduct
{
    private double product;
    private bool pending;
    private double pendingDistance;
    private double pendingCosine;
    private double pendingTransmittance;

    public CrossingProduct() => product = 1;

    /// <summary>Whether a crossing that lets nothing through (an opaque facet) has been committed: the result is 0.</summary>
    public readonly bool Blocked => product == 0;

    /// <summary>Offers a crossing at ray distance <paramref name="distance"/> (not before the last one offered).</summary>
    /// <param name="distance">Distance along the ray, metres.</param>
    /// <param name="cosine">Cosine between the ray and the facet normal (sign ignored).</param>
    /// <param name="transmittance">The facet's transmittance at that cosine, in [0, 1] (0 for an opaque facet).</param>
    /// <param name="coincidence">Hits closer than this to the previous one are the same crossing.</param>
    public void Add(double distance, double cosine, double transmittance, double coincidence)
    {
        double c = Math.Abs(cosine);
        if (pending && distance - pendingDistance <= coincidence)
        {
            // Squarer crossing wins; on a tie (a ray through a corner at equal angles) the darker one, so that
            // the result does not depend on the order the hits were found in.
            if (c > pendingCosine + 1e-12 || (c >= pendingCosine - 1e-12 && transmittance < pendingTransmittance))
            {
                pendingCosine = c;
                pendingTransmittance = transmittance;
            }

            return;
        }

        Commit();
        pending = true;
        pendingDistance = distance;
        pendingCosine = c;
        pendingTransmittance = transmittance;
    }

    /// <summary>The product of the committed crossings' transmittances (0 when blocked).</summary>
    public double Result()
    {
        Commit();
        return product;
    }

    private void Commit()
    {
        if (!pending)
        {
            return;
        }

        pending = false;
        product *= pendingTransmittance;
    }
}
