using System.Collections.Immutable;
using NodaTime;

namespace CanopyAdvisor.Core.Sites;

/// <summary>The plants of one crop on a bench: when they were planted and are sold, how tall, how spaced, how many pots.</summary>
/// <param name="Id">Identifier, unique within the site.</param>
/// <param name="BenchId">The bench the lot stands on.</param>
/// <param name="CropId">The crop or variant id in the crop library (its file name, e.g. <c>petunia-compact</c>).</param>
/// <param name="PlantedOn">Local date of planting (potting or sowing).</param>
/// <param name="SaleOn">Local date the lot is sold (after <paramref name="PlantedOn"/>).</param>
/// <param name="HeightMm">Plant height measured now (at the forecast start), mm.</param>
/// <param name="MeasuredOn">Local date of the height measurement.</param>
/// <param name="SpacingM">Distance between pot centres, m (&gt; 0).</param>
/// <param name="Pots">Number of pots on the bench (≥ 1).</param>
/// <param name="Rotations">Pot rotations already done, in time order.</param>
public sealed record Lot(
    string Id,
    string BenchId,
    string CropId,
    LocalDate PlantedOn,
    LocalDate SaleOn,
    double HeightMm,
    LocalDate MeasuredOn,
    double SpacingM,
    int Pots,
    ImmutableArray<RotationRecord> Rotations);
