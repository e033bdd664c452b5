namespace CanopyAdvisor.Core.Sites;

/// <summary>How <see cref="SiteValidator"/> names the parts of a site in its error paths.</summary>
/// <remarks>
/// A site built in code has one natural naming (<see cref="Default"/>: <c>benches[2]</c>, <c>lamps[5]</c>,
/// <c>structure.covers.roof</c>). A site read from a file may name the same parts differently: a lamp placed by a
/// row of lamps is <c>lampRows[1]</c>, a lamp's photon output lives in its type (<c>lampTypes.top</c>), a wall's cover
/// is a named cover type (<c>coverTypes.glass</c>). The file reader passes its own naming so that every error
/// points at a place the user can find in the file. Field names after the prefix are the site file's camelCase
/// names with units (<c>.footprint.widthM</c>, <c>.ppfUmolPerS</c>).
/// </remarks>
/// <param name="Bench">Path prefix of the bench at an index of <see cref="Site.Benches"/>.</param>
/// <param name="Lamp">Path prefix of the lamp at an index of <see cref="Site.Lamps"/> (placement, aim, dimming, schedule).</param>
/// <param name="LampType">Path prefix of the photon output (PPF, watts, bands) of the lamp at an index of <see cref="Site.Lamps"/>.</param>
/// <param name="Obstruction">Path prefix of the obstruction at an index of <see cref="Site.Obstructions"/>.</param>
/// <param name="Cover">Path prefix of the cover of a glasshouse surface, by surface name (roof, leftWall, rightWall, frontWall, backWall).</param>
public sealed record SitePaths(
    Func<int, string> Bench,
    Func<int, string> Lamp,
    Func<int, string> LampType,
    Func<int, string> Obstruction,
    Func<string, string> Cover)
{
    /// <summary>The naming of a site built in code: the shape of the site file with every lamp listed in <c>lamps</c>.</summary>
    public static SitePaths Default { get; } = new(
        i => $"benches[{i}]",
        i => $"lamps[{i}]",
        i => $"lamps[{i}]",
        i => $"obstructions[{i}]",
        surface => $"structure.covers.{surface}");
}
