namespace CanopyAdvisor.Files.SideLamps;

/// <summary>The JSON Schema (draft 2020-12) of the side-lamp brief file, as shipped in the program.</summary>
/// <remarks>Shapes and simple ranges only; <see cref="SideLampBriefReader"/> is the authority (it also checks lamp type
/// names, benches and rails against the site).</remarks>
public static class SideLampBriefSchema
{
    /// <summary>The embedded resource name of the schema.</summary>
    public const string ResourceName = "side-lamp-brief.schema.json";

    /// <summary>The schema's JSON text.</summary>
    public static string ReadText()
    {
        using Stream stream = typeof(SideLampBriefSchema).Assembly.GetManifestResourceStream(ResourceName)
            ?? throw new InvalidOperationException($"The resource '{ResourceName}' is missing from the build.");
        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }
}
