using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Structures;

namespace CanopyAdvisor.Core.Tests.Light;

/// <summary>
/// A glass ceiling whose transmittance falls with incidence, plus a low opaque wall on one side (sign of x) that hides
/// the sky below 30° elevation on that side and blocks lamps on that side below 1 m. Mirror-symmetric to the same
/// double with the opposite side.
/// </summary>
internal sealed class OneSidedWallTestEnclosure(double side) : IEnclosure
{
    public double SkyTransmittance(Vector3 origin, Vector3 towardSky)
    {
        if (towardSky.Z <= 0)
        {
            return 0;
        }

        if (side * towardSky.X > 0 && towardSky.Z < 0.5)
        {
            return 0;
        }

        return 0.9 * (0.5 + (0.5 * towardSky.Z));
    }

    public bool IsBlocked(Vector3 from, Vector3 to) => side * to.X > 2.5 && to.Z < 1;
}
