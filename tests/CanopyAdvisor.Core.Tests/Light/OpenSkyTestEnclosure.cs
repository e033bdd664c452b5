using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Structures;

namespace CanopyAdvisor.Core.Tests.Light;

/// <summary>No structure at all: the whole upper hemisphere is sky, nothing blocks a lamp.</summary>
internal sealed class OpenSkyTestEnclosure : IEnclosure
{
    public static OpenSkyTestEnclosure Instance { get; } = new();

    public double SkyTransmittance(Vector3 origin, Vector3 towardSky) => towardSky.Z > 0 ? 1 : 0;

    public bool IsBlocked(Vector3 from, Vector3 to) => false;
}
