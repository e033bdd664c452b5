using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Reports;

/// <summary>What a floor map shows: one value per sample cell and one arrow per bench, with the words of its legend.</summary>
/// <param name="Site">The site drawn (structure, benches, lamps, obstructions).</param>
/// <param name="Title">Title printed at the top.</param>
/// <param name="Benches">Per site bench (same order), its cells and arrow, or null for a bench with nothing to show.</param>
/// <param name="CellLabel">Name and unit of a cell's value in its tooltip, e.g. "DLI (mol m-2 d-1)".</param>
/// <param name="ValueLegend">Caption of the colour scale.</param>
/// <param name="ArrowLegend">What the arrows mean.</param>
/// <param name="Low">Value at the bottom of the colour scale; the lowest cell when null.</param>
/// <param name="High">Value at the top of the colour scale; the highest cell when null.</param>
public sealed record FloorMap(
    Site Site,
    string Title,
    IReadOnlyList<FloorMapBench?> Benches,
    string CellLabel,
    string ValueLegend,
    string ArrowLegend,
    double? Low = null,
    double? High = null);
