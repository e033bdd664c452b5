using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Structures;

namespace CanopyAdvisor.Benchmarks;

/// <summary>Stand-in enclosure: a glass roof of transmittance 0.75 over an open sky; nothing blocks a lamp.</summary>
public sealed class GlassRoofEnclosure : IEnclosure
{
    /// <inheritdoc />
    public double SkyTransmittance(Vector3 origin, Vector3 towardSky) => towardSky.Z > 0 ? 0.75 : 0;

    /// <inheritdoc />
    public bool IsBlocked(Vector3 from, Vector3 to) => false;
}
