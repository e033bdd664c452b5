using System.Reflection;
using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Files.Sites;

/// <summary>The invented demo sites shipped with the program (marked <c>"demoData": true</c>; not a real business).</summary>
/// <remarks>
/// <c>glasshouse</c>: a glasshouse range at 52° N in Europe/Amsterdam (daylight saving), six 8 m bays with north–south
/// ridges, float-glass roof and walls, an opaque insulated north end wall, eight rolling benches, 300 toplights in
/// rows, four side lamps on the north wall, a water tank and a boiler house to the south.
/// <c>indoor-farm</c>: an indoor room in America/Chicago with three racks of four tiers, LED bars over each tier,
/// 16 h and 18 h photoperiods (one past midnight), no daylight. Both carry temperature setpoints and one crop lot per
/// bench, dated for the season of early December 2026 to late January 2027 (measured on 2026-12-01). The files are embedded resources
/// <c>DemoSites.&lt;name&gt;.json</c>. Thread-safe.
/// </remarks>
public static class DemoSites
{
    private const string ResourcePrefix = "DemoSites.";

    /// <summary>The demo site names, for <see cref="Load"/> and <see cref="ReadText"/>.</summary>
    public static IReadOnlyList<string> Names { get; } = ["glasshouse", "indoor-farm"];

    /// <summary>The JSON text of a demo site file.</summary>
    /// <exception cref="ArgumentException">No demo site has that name.</exception>
    public static string ReadText(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        if (!Names.Contains(name, StringComparer.Ordinal))
        {
            throw new ArgumentException($"No demo site '{name}'; the demo sites are: {string.Join(", ", Names)}.", nameof(name));
        }

        Assembly assembly = typeof(DemoSites).Assembly;
        using Stream stream = assembly.GetManifestResourceStream(ResourcePrefix + name + ".json")
            ?? throw new InvalidOperationException($"The demo site resource '{ResourcePrefix}{name}.json' is missing from the build.");
        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }

    /// <summary>Reads a demo site, making its beams with the given factory.</summary>
    /// <exception cref="ArgumentException">No demo site has that name.</exception>
    public static Site Load(string name, IBeamFactory beams) =>
        new SiteFileReader(beams).Parse(ReadText(name), name + ".json", baseDirectory: null);
}
