using CanopyAdvisor.Storage;
using NodaTime;

namespace CanopyAdvisor.Server.Contracts;

/// <summary>A stored site's bookkeeping.</summary>
/// <param name="Id">The site id in URLs (chosen by the service).</param>
/// <param name="SiteKey">The <c>id</c> inside the site file (unique in the organisation).</param>
/// <param name="Name">The site's name.</param>
/// <param name="Version">1 when created, one more on each change; also the ETag.</param>
/// <param name="CreatedAt">When it was created.</param>
/// <param name="UpdatedAt">When it was last changed.</param>
/// <param name="UpdatedBy">The user who last changed it.</param>
public sealed record SiteSummary(string Id, string SiteKey, string Name, int Version, Instant CreatedAt, Instant UpdatedAt, string UpdatedBy)
{
    /// <summary>The summary of a stored site.</summary>
    public static SiteSummary Of(SiteRecord site)
    {
        ArgumentNullException.ThrowIfNull(site);
        return new(site.Id, site.SiteKey, site.Name, site.Version, site.CreatedAt, site.UpdatedAt, site.UpdatedBy);
    }
}
