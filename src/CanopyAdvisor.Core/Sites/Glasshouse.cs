using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Sites;

/// <summary>A range of gutter-connected bays with a glazed (or partly opaque) envelope.</summary>
/// <remarks>
/// The footprint's axis is the ridge direction; bays sit side by side across the width, each
/// <see cref="BayWidthM"/> wide, so <c>Footprint.WidthM = BayCount × BayWidthM</c>. Each bay has a symmetric
/// pitched roof from gutter height up to the ridge at the roof slope. Wall names follow the ridge:
/// the end walls close the ridge ends (the <em>front</em> end at the footprint's reference corner, the
/// <em>back</em> end at the far end of the axis), the side walls run along the ridge (<em>left</em> at the
/// reference corner, <em>right</em> across the width).
/// </remarks>
/// <param name="Footprint">Ground rectangle; its axis is the ridge direction.</param>
/// <param name="BayCount">Number of bays across the width (≥ 1).</param>
/// <param name="BayWidthM">Width of one bay, metres.</param>
/// <param name="GutterHeightM">Height of the gutters (top of the side walls), metres.</param>
/// <param name="RoofSlope">Slope of each roof plane from the horizontal.</param>
/// <param name="Roof">Cover of the roof planes.</param>
/// <param name="LeftWall">Cover of the side wall along the ridge at the reference corner.</param>
/// <param name="RightWall">Cover of the opposite side wall.</param>
/// <param name="FrontWall">Cover of the end wall at the reference corner (gable ends included).</param>
/// <param name="BackWall">Cover of the end wall at the far end of the ridge (gable ends included).</param>
/// <param name="StructuralShading">Fraction of light lost to frames, gutters and bars, in [0, 1); 0.1–0.2 is common practice.</param>
public sealed record Glasshouse(
    Footprint Footprint,
    int BayCount,
    double BayWidthM,
    double GutterHeightM,
    Angle RoofSlope,
    Cover Roof,
    Cover LeftWall,
    Cover RightWall,
    Cover FrontWall,
    Cover BackWall,
    double StructuralShading) : Structure
{
    /// <summary>Ridge height derived from gutter height, bay width and roof slope, metres.</summary>
    public double RidgeHeightM => GutterHeightM + (BayWidthM / 2 * RoofSlope.Tan());
}
