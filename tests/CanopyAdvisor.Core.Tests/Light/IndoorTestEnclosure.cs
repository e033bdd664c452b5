using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Structures;

namespace CanopyAdvisor.Core.Tests.Light;

/// <summary>An indoor room: no sky, nothing blocks a lamp.</summary>
internal sealed class IndoorTestEnclosure : IEnclosure
{
    public static IndoorTestEnclosure Instance { get; } = new();

    public double SkyTransmittance(Vector3 origin, Vector3 towardSky) => 0;

    public bool IsBlocked(Vector3 from, Vector3 to) => false;
}
