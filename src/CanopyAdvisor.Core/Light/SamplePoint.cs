using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Light;

/// <summary>One sample point of a bench's grid: where a stem senses light, and how far it is from the bench's edges.</summary>
/// <remarks>
/// The edge distances are horizontal, in metres, measured along the bench's own axes: the <em>front</em> edge is
/// the end at the footprint's reference corner, the <em>back</em> edge the far end of the length axis, the
/// <em>left</em> edge the long side through the reference corner and the <em>right</em> edge the side across the
/// width (the same naming as the glasshouse walls). They set the canopy path of low-angle light
/// (<see cref="CanopyAttenuation"/>).
/// </remarks>
/// <param name="BenchIndex">Index of the bench in <c>Site.Benches</c>.</param>
/// <param name="AlongIndex">Grid index along the bench length, from the front edge (0-based).</param>
/// <param name="AcrossIndex">Grid index across the bench width, from the left edge (0-based).</param>
/// <param name="Position">Sensing position in the site frame, metres.</param>
/// <param name="ToFrontEdgeM">Horizontal distance to the front edge, metres.</param>
/// <param name="ToBackEdgeM">Horizontal distance to the back edge, metres.</param>
/// <param name="ToLeftEdgeM">Horizontal distance to the left edge, metres.</param>
/// <param name="ToRightEdgeM">Horizontal distance to the right edge, metres.</param>
public readonly record struct SamplePoint(
    int BenchIndex,
    int AlongIndex,
    int AcrossIndex,
    Vector3 Position,
    double ToFrontEdgeM,
    double ToBackEdgeM,
    double ToLeftEdgeM,
    double ToRightEdgeM);
