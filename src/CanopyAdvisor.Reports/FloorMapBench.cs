using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Reports;

/// <summary>One bench on a floor map: a value per sample cell (the bench's grid order, along the length first) and its arrow.</summary>
/// <param name="Cells">One value per sample point.</param>
/// <param name="ArrowTilt">Tilt the arrow stands for; its length grows with it.</param>
/// <param name="ArrowAzimuth">Compass direction of the arrow.</param>
public sealed record FloorMapBench(double[] Cells, Angle ArrowTilt, Angle ArrowAzimuth);
