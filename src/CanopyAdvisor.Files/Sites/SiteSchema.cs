namespace CanopyAdvisor.Files.Sites;

/// <summary>The JSON Schema (draft 2020-12) of the site file, as shipped in the program.</summary>
/// <remarks>
/// The schema documents every property with its unit and meaning, for editors and for publishing beside the API.
/// It checks shapes and simple ranges only; <see cref="SiteFileReader"/> is the authority (it also checks references,
/// time zones and geometry).
/// </remarks>
public static class SiteSchema
{
    /// <summary>The embedded resource name of the schema.</summary>
    public const string ResourceName = "site.schema.json";

    /// <summary>The schema's JSON text.</summary>
    public static string ReadText()
    {
        using Stream stream = typeof(SiteSchema).Assembly.GetManifestResourceStream(ResourceName)
            ?? throw new InvalidOperationException($"The resource '{ResourceName}' is missing from the build.");
        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }
}
