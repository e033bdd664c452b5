using NodaTime;

namespace CanopyAdvisor.Server.Contracts;

/// <summary>A stored forecast in a site's list.</summary>
/// <param name="Id">The forecast id.</param>
/// <param name="SiteVersion">The site's version it was computed from.</param>
/// <param name="InputHash">Hash of its inputs.</param>
/// <param name="CreatedAt">When it was computed.</param>
/// <param name="CreatedBy">The user who asked for it.</param>
public sealed record ForecastSummary(string Id, int SiteVersion, string InputHash, Instant CreatedAt, string CreatedBy);
