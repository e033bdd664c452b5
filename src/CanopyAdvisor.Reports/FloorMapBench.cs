using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Reports;

/// <summary>One bench on a floor map: a value per sample cell (the bench's grid order, along the length first) and its arrow.</summary>
/// <param name="Cells">One value per sample point (may be empty when <see cref="Category"/> fills the bench).</param>
/// <param name="ArrowTilt">Tilt the arrow stands for; its length grows with it.</param>
/// <param name="ArrowAzimuth">Compass direction of the arrow.</param>
public sealed record FloorMapBench(double[] Cells, Angle ArrowTilt, Angle ArrowAzimuth)
{
    /// <summary>A category that fills the whole bench (colour, pattern and label) instead of its cells; null for cells.</summary>
    public FloorMapCategory? Category { get; init; }

    /// <summary>A short note printed under the bench's name (e.g. "stretch"), or null.</summary>
    public string? Badge { get; init; }

    /// <summary>The bench's tooltip in the picture (e.g. its rank and numbers), or null.</summary>
    public string? Tooltip { get; init; }
}
