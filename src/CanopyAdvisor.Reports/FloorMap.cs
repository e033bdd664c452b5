using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Reports;

/// <summary>What a floor map shows: one value per sample cell (or a category per bench) and one arrow per bench, with
/// the words of its legend.</summary>
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
    double? High = null)
{
    /// <summary>The categories benches may be filled with, in legend order; when not empty the legend shows them
    /// (swatch, pattern and label) instead of the colour ramp.</summary>
    public IReadOnlyList<FloorMapCategory> Categories { get; init; } = [];

    /// <summary>Colour of the arrows, <c>#rrggbb</c>; drawn over a white outline so they read on any fill.</summary>
    public string ArrowColour { get; init; } = "#b3202a";

    /// <summary>A longer text alternative for the picture (SVG <c>desc</c>), or null.</summary>
    public string? Description { get; init; }
}
