namespace CanopyAdvisor.Server.Contracts;

/// <summary>A crop in the library list.</summary>
/// <param name="Id">The crop id.</param>
/// <param name="Name">Display name.</param>
/// <param name="Group">Trade group (camelCase).</param>
/// <param name="BaseId">The crop a variant overrides, or null.</param>
/// <param name="Source"><c>library</c> (built in) or <c>organisation</c> (a variant the organisation saved).</param>
public sealed record CropSummary(string Id, string Name, string Group, string? BaseId, string Source = CropSummary.LibrarySource)
{
    /// <summary>The source of a built-in crop.</summary>
    public const string LibrarySource = "library";

    /// <summary>The source of an organisation's variant.</summary>
    public const string OrganisationSource = "organisation";
}
