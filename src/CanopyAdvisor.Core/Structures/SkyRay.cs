using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Structures;

/// <summary>A unit direction toward the sky in a glasshouse's own frame, with (when prepared) the cover transmittances
/// of the roof planes and walls it would cross; see <see cref="GlasshouseEnclosure.Prepare"/>.</summary>
/// <remarks>The default value is a direction at or below the horizon (no sky).</remarks>
/// <param name="Direction">Unit direction toward the sky, site frame.</param>
/// <param name="Du">Its component along the ridges (0 when it runs along an end wall's plane).</param>
/// <param name="Dv">Its component across the bays (0 when it runs along a side wall's plane).</param>
/// <param name="LeftCosine">Cosine with the normal of the bays' rising (left) roof planes.</param>
/// <param name="RightCosine">Cosine with the normal of the bays' falling (right) roof planes.</param>
internal readonly record struct SkyRay(Vector3 Direction, double Du, double Dv, double LeftCosine, double RightCosine)
{
    /// <summary>Whether the direction is above the horizon (false for the default value).</summary>
    public bool AboveHorizon => Direction.Z > 0;

    /// <summary>Whether the transmittances below were worked out.</summary>
    public bool Prepared { get; init; }

    /// <summary>Roof cover transmittance through a rising (left) roof plane.</summary>
    public double RoofLeft { get; init; }

    /// <summary>Roof cover transmittance through a falling (right) roof plane.</summary>
    public double RoofRight { get; init; }

    /// <summary>Transmittance of the end wall the ray would leave through (back when moving along the ridges, else front).</summary>
    public double AlongWall { get; init; }

    /// <summary>Transmittance of the side wall the ray would leave through (right when moving across the bays, else left).</summary>
    public double AcrossWall { get; init; }
}
