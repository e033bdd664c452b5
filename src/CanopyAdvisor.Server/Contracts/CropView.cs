namespace CanopyAdvisor.Server.Contracts;

/// <summary>A crop of the library with every parameter.</summary>
/// <param name="Id">The crop id (its file name).</param>
/// <param name="Name">Display name.</param>
/// <param name="Group">Trade group (camelCase, e.g. <c>beddingPlant</c>).</param>
/// <param name="BaseId">The crop a variant overrides, or null.</param>
/// <param name="Parameters">Parameters by key (the crop file's keys).</param>
public sealed record CropView(string Id, string Name, string Group, string? BaseId, IReadOnlyDictionary<string, CropParameterView> Parameters);
