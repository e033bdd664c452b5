using NodaTime;

namespace CanopyAdvisor.Storage;

/// <summary>A stored site: the site file text (JSON, site file format) as accepted, with its bookkeeping.</summary>
/// <remarks>The store does not read the JSON; the service validates it with the site file reader before storing.</remarks>
/// <param name="Id">Opaque id chosen by the service (unique over all organisations); used in URLs.</param>
/// <param name="OrganisationId">The owning organisation.</param>
/// <param name="SiteKey">The <c>id</c> inside the site file (unique within the organisation).</param>
/// <param name="Name">The <c>name</c> inside the site file, for lists.</param>
/// <param name="Json">The site file text.</param>
/// <param name="Version">1 when created, one more on each replace (for optimistic concurrency).</param>
/// <param name="CreatedAt">When it was created.</param>
/// <param name="UpdatedAt">When it was last written.</param>
/// <param name="UpdatedBy">The id of the user who last wrote it.</param>
public sealed record SiteRecord(
    string Id,
    string OrganisationId,
    string SiteKey,
    string Name,
    string Json,
    int Version,
    Instant CreatedAt,
    Instant UpdatedAt,
    string UpdatedBy);
