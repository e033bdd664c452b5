#pragma warning disable CA1812 // Instantiated by the BsonMapper through reflection.
using NodaTime;

namespace CanopyAdvisor.Storage.LiteDb;

/// <summary>A site as stored; <see cref="OrganisationSiteKey"/> makes the site key unique within an organisation.</summary>
internal sealed class SiteDocument
{
    public string Id { get; set; } = "";

    public string OrganisationId { get; set; } = "";

    public string SiteKey { get; set; } = "";

    public string OrganisationSiteKey { get; set; } = "";

    public string Name { get; set; } = "";

    public string Json { get; set; } = "";

    public int Version { get; set; }

    public Instant CreatedAt { get; set; }

    public Instant UpdatedAt { get; set; }

    public string UpdatedBy { get; set; } = "";

    public static SiteDocument From(SiteRecord r) => new()
    {
        Id = r.Id,
        OrganisationId = r.OrganisationId,
        SiteKey = r.SiteKey,
        OrganisationSiteKey = Keys.Join(r.OrganisationId, r.SiteKey),
        Name = r.Name,
        Json = r.Json,
        Version = r.Version,
        CreatedAt = r.CreatedAt,
        UpdatedAt = r.UpdatedAt,
        UpdatedBy = r.UpdatedBy,
    };

    public SiteRecord ToRecord() => new(Id, OrganisationId, SiteKey, Name, Json, Version, CreatedAt, UpdatedAt, UpdatedBy);
}
