#pragma warning disable CA1812 // Instantiated by the BsonMapper through reflection.
using NodaTime;

namespace CanopyAdvisor.Storage.LiteDb;

/// <summary>A forecast as stored; <see cref="InputKey"/> (organisation, site, hash) is unique.</summary>
internal sealed class ForecastDocument
{
    public string Id { get; set; } = "";

    public string OrganisationId { get; set; } = "";

    public string SiteId { get; set; } = "";

    public string InputKey { get; set; } = "";

    public int SiteVersion { get; set; }

    public string InputHash { get; set; } = "";

    public Instant CreatedAt { get; set; }

    public string CreatedBy { get; set; } = "";

    public string ResultJson { get; set; } = "";

    public static ForecastDocument From(ForecastRecord r) => new()
    {
        Id = r.Id,
        OrganisationId = r.OrganisationId,
        SiteId = r.SiteId,
        InputKey = Keys.Join(r.OrganisationId, r.SiteId, r.InputHash),
        SiteVersion = r.SiteVersion,
        InputHash = r.InputHash,
        CreatedAt = r.CreatedAt,
        CreatedBy = r.CreatedBy,
        ResultJson = r.ResultJson,
    };

    public ForecastRecord ToRecord() => new(Id, OrganisationId, SiteId, SiteVersion, InputHash, CreatedAt, CreatedBy, ResultJson);
}
