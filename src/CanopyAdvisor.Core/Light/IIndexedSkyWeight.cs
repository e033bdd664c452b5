using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Light;

/// <summary>A sky weight told each direction's index in the quadrature as well as the direction.</summary>
internal interface IIndexedSkyWeight
{
    /// <summary>The weight of a direction, in [0, 1].</summary>
    /// <param name="index">The direction's index in the quadrature.</param>
    /// <param name="towardSky">The unit direction toward the sky.</param>
    double Weight(int index, Vector3 towardSky);
}
