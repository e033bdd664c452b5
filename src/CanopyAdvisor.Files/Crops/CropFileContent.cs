using CanopyAdvisor.Core.Plants;

namespace CanopyAdvisor.Files.Crops;

/// <summary>What one crop file says, before variants are resolved.</summary>
/// <param name="Source">The file.</param>
/// <param name="Name">The <c>name</c> header field, or null when absent or wrong.</param>
/// <param name="Group">The <c>group</c> header field, or null when absent or wrong.</param>
/// <param name="BaseId">The <c>base</c> header field (a variant), or null.</param>
/// <param name="HeaderLines">The line of each header field.</param>
/// <param name="Parameters">The parameter tables that parsed, by key.</param>
/// <param name="HasErrors">Whether the file itself had any problem.</param>
internal sealed record CropFileContent(
    CropSourceFile Source,
    string? Name,
    CropGroup? Group,
    string? BaseId,
    IReadOnlyDictionary<string, int> HeaderLines,
    IReadOnlyDictionary<string, ParsedParameter> Parameters,
    bool HasErrors)
{
    /// <summary>The line of a header field, or 1 when it is absent.</summary>
    public int HeaderLine(string field) => HeaderLines.TryGetValue(field, out int line) ? line : 1;
}
