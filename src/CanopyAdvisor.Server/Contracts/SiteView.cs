using System.Text.Json;

namespace CanopyAdvisor.Server.Contracts;

/// <summary>A stored site: its bookkeeping and the site file (the format of the site file README), which can be sent
/// back as it is to replace the site.</summary>
/// <param name="Summary">Id, key, name, version and times.</param>
/// <param name="Site">The site file.</param>
public sealed record SiteView(SiteSummary Summary, JsonElement Site);
