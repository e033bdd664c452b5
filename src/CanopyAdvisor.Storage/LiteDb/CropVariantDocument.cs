#pragma warning disable CA1812 // Instantiated by the BsonMapper through reflection.
using NodaTime;

namespace CanopyAdvisor.Storage.LiteDb;

/// <summary>A crop variant as stored; the id is the organisation and crop id joined (unique).</summary>
internal sealed class CropVariantDocument
{
    public string Id { get; set; } = "";

    public string OrganisationId { get; set; } = "";

    public string CropId { get; set; } = "";

    public string BaseId { get; set; } = "";

    public string Name { get; set; } = "";

    public string Toml { get; set; } = "";

    public string? SiteId { get; set; }

    public Instant CreatedAt { get; set; }

    public string CreatedBy { get; set; } = "";

    public static CropVariantDocument From(CropVariantRecord r) => new()
    {
        Id = Keys.Join(r.OrganisationId, r.CropId),
        OrganisationId = r.OrganisationId,
        CropId = r.CropId,
        BaseId = r.BaseId,
        Name = r.Name,
        Toml = r.Toml,
        SiteId = r.SiteId,
        CreatedAt = r.CreatedAt,
        CreatedBy = r.CreatedBy,
    };

    public CropVariantRecord ToRecord() => new(OrganisationId, CropId, BaseId, Name, Toml, SiteId, CreatedAt, CreatedBy);
}
