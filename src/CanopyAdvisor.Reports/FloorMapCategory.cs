namespace CanopyAdvisor.Reports;

/// <summary>A category a whole bench is filled with on a floor map (instead of per-cell values), with its legend words.</summary>
/// <remarks>Colour is never the only cue: each category also has a pattern and a short label printed on the bench.</remarks>
/// <param name="Key">Short identifier, used for the pattern's id (letters, digits and hyphens).</param>
/// <param name="Label">Words printed on the bench and in the legend, e.g. "leaves grade".</param>
/// <param name="Fill">Fill colour, <c>#rrggbb</c>.</param>
/// <param name="Ink">Colour of text and pattern drawn on the fill, chosen to contrast with it, <c>#rrggbb</c>.</param>
/// <param name="Pattern">The pattern laid over the fill.</param>
public sealed record FloorMapCategory(string Key, string Label, string Fill, string Ink, FloorMapPattern Pattern);
