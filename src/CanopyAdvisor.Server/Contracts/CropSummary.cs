namespace CanopyAdvisor.Server.Contracts;

/// <summary>A crop in the library list.</summary>
/// <param name="Id">The crop id.</param>
/// <param name="Name">Display name.</param>
/// <param name="Group">Trade group (camelCase).</param>
/// <param name="BaseId">The crop a variant overrides, or null.</param>
public sealed record CropSummary(string Id, string Name, string Group, string? BaseId);
