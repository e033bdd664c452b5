using System.Collections.Immutable;
using System.Reflection;
using CanopyAdvisor.Core.Advice.Calibration;

namespace CanopyAdvisor.Files.Observations;

/// <summary>Invented demo lean observations for the demo sites (<see cref="Sites.DemoSites"/>), marked as demo data.</summary>
/// <remarks>
/// <c>glasshouse</c>: leans of the petunia lot on bench <c>south-1</c> of the glasshouse demo site, 2026-11-14 to
/// 2026-12-01, made by the simulator from chosen parameters plus seeded noise (the file's header says which); not
/// measurements of real plants. Embedded as <c>DemoObservations.&lt;name&gt;.csv</c>. Thread-safe.
/// </remarks>
public static class DemoObservations
{
    private const string ResourcePrefix = "DemoObservations.";

    /// <summary>The names of the demo observation files.</summary>
    public static IReadOnlyList<string> Names { get; } = ["glasshouse"];

    /// <summary>The CSV text of a demo observations file.</summary>
    /// <param name="name">One of <see cref="Names"/>.</param>
    /// <returns>The text.</returns>
    /// <exception cref="ArgumentException">No demo observations have that name.</exception>
    public static string ReadText(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        if (!Names.Contains(name, StringComparer.Ordinal))
        {
            throw new ArgumentException($"No demo observations '{name}'; the demo observations are: {string.Join(", ", Names)}.", nameof(name));
        }

        Assembly assembly = typeof(DemoObservations).Assembly;
        using Stream stream = assembly.GetManifestResourceStream(ResourcePrefix + name + ".csv")
            ?? throw new InvalidOperationException($"The demo observations resource '{ResourcePrefix}{name}.csv' is missing from the build.");
        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }

    /// <summary>Reads a demo observations file; errors and <see cref="LeanObservation.Where"/> name it <c>demo:&lt;name&gt;</c>.</summary>
    /// <param name="name">One of <see cref="Names"/>.</param>
    /// <returns>The observations.</returns>
    public static ImmutableArray<LeanObservation> Load(string name) => LeanObservationReader.Parse(ReadText(name), $"demo:{name}");
}
