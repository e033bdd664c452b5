namespace CanopyAdvisor.Files.SideLamps;

/// <summary>The invented demo side-lamp briefs shipped with the program, one per demo site that has one (demo data).</summary>
/// <remarks>
/// <c>glasshouse</c>: for the <c>glasshouse</c> demo site: a rail along the east wall by the north benches and one
/// along the west wall by the south benches, 2.5 m up; the site's <c>side-600</c> lamp type; at most four lamps; the
/// benches at risk chosen at 0.3 of their grade limit. Embedded resources <c>SideLamps.Demo.&lt;name&gt;.json</c>.
/// </remarks>
public static class DemoSideLampBriefs
{
    private const string ResourcePrefix = "SideLamps.Demo.";

    /// <summary>The demo brief names (each the name of the demo site it is written for).</summary>
    public static IReadOnlyList<string> Names { get; } = ["glasshouse"];

    /// <summary>The JSON text of a demo brief.</summary>
    /// <exception cref="ArgumentException">No demo brief has that name.</exception>
    public static string ReadText(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        if (!Names.Contains(name, StringComparer.Ordinal))
        {
            throw new ArgumentException($"No demo side-lamp brief '{name}'; the demo briefs are: {string.Join(", ", Names)}.", nameof(name));
        }

        using Stream stream = typeof(DemoSideLampBriefs).Assembly.GetManifestResourceStream(ResourcePrefix + name + ".json")
            ?? throw new InvalidOperationException($"The demo brief resource '{ResourcePrefix}{name}.json' is missing from the build.");
        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }
}
