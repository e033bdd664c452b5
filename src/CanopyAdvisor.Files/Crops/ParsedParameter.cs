using CanopyAdvisor.Core.Plants;

namespace CanopyAdvisor.Files.Crops;

/// <summary>A parameter table read from a crop file, with the line of each field (1-based) for error messages.</summary>
internal sealed record ParsedParameter(CropParameter Parameter, int TableLine, IReadOnlyDictionary<string, int> FieldLines)
{
    /// <summary>The line of a field (<c>value</c>, <c>unit</c>, <c>range</c>, <c>source</c>), else of the table header.</summary>
    public int LineOf(string field) => FieldLines.TryGetValue(field, out int line) ? line : TableLine;
}
