using System.Globalization;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Files.Weather;

namespace CanopyAdvisor.Cli;

/// <summary>Where the commands take outside light from: a measured log when given, else clear sky × the site's clearness.</summary>
internal static class DaylightSource
{
    /// <summary>The outside light source for a site and an optional weather log path.</summary>
    public static IOutsideLightSource Create(Site site, string? weatherPath) =>
        weatherPath is null
            ? new ClearSkyOutsideLight(site.Location, site.Zone, site.Weather)
            : new MeasuredOutsideLight(WeatherLogReader.ReadFile(weatherPath), site.Location);

    /// <summary>One line saying where the daylight came from, for reports.</summary>
    public static string Describe(Site site, string? weatherPath) =>
        site.Structure is IndoorRoom ? "none (indoor room)"
        : weatherPath is not null ? $"measured log {Path.GetFileName(weatherPath)}"
        : string.Create(CultureInfo.InvariantCulture, $"clear sky (Ineichen–Perez, Linke turbidity {site.Weather.LinkeTurbidity}) × daily clearness {site.Weather.DailyClearness}");
}
