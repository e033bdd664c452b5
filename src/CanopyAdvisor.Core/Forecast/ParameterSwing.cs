using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Forecast;

/// <summary>How much one crop parameter moves a bench's lean at the horizon across its range (MODEL.md §7).</summary>
/// <param name="Key">The crop-file key of the parameter (see <c>CropConversions.ParameterKeys</c>).</param>
/// <param name="LeanAtMinimum">Bench lean at the horizon with the parameter at the minimum of its range.</param>
/// <param name="LeanAtMaximum">Bench lean at the horizon with the parameter at the maximum of its range.</param>
public sealed record ParameterSwing(string Key, Angle LeanAtMinimum, Angle LeanAtMaximum)
{
    /// <summary>The absolute difference between the two leans.</summary>
    public Angle Swing => Angle.FromRadians(Math.Abs(LeanAtMaximum.Radians - LeanAtMinimum.Radians));
}
