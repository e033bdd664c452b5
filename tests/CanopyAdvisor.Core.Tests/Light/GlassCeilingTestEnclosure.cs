using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Structures;

namespace CanopyAdvisor.Core.Tests.Light;

/// <summary>A single horizontal glass ceiling with one transmittance for every direction.</summary>
internal sealed class GlassCeilingTestEnclosure(double transmittance) : IEnclosure
{
    public double SkyTransmittance(Vector3 origin, Vector3 towardSky) => towardSky.Z > 0 ? transmittance : 0;

    public bool IsBlocked(Vector3 from, Vector3 to) => false;
}
