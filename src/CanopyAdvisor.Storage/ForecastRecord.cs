using NodaTime;

namespace CanopyAdvisor.Storage;

/// <summary>A computed forecast kept under the hash of its inputs, so a repeat request is served from the store.</summary>
/// <param name="Id">Opaque id (unique).</param>
/// <param name="OrganisationId">The owning organisation.</param>
/// <param name="SiteId">The site it was computed for.</param>
/// <param name="SiteVersion">The site's version at the time.</param>
/// <param name="InputHash">Lower-case hex SHA-256 of every input (unique per organisation and site).</param>
/// <param name="CreatedAt">When it was computed.</param>
/// <param name="CreatedBy">The id of the user who asked for it.</param>
/// <param name="ResultJson">The forecast document as the API serves it (JSON).</param>
public sealed record ForecastRecord(
    string Id,
    string OrganisationId,
    string SiteId,
    int SiteVersion,
    string InputHash,
    Instant CreatedAt,
    string CreatedBy,
    string ResultJson);
