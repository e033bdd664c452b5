#pragma warning disable CA1812 // Instantiated by the BsonMapper through reflection.
using NodaTime;

namespace CanopyAdvisor.Storage.LiteDb;

/// <summary>An API token as stored (hash only, unique index).</summary>
internal sealed class ApiTokenDocument
{
    public string Id { get; set; } = "";

    public string OrganisationId { get; set; } = "";

    public string UserId { get; set; } = "";

    public string Name { get; set; } = "";

    public string TokenHash { get; set; } = "";

    public Instant CreatedAt { get; set; }

    public Instant ExpiresAt { get; set; }

    public Instant? RevokedAt { get; set; }

    public static ApiTokenDocument From(ApiTokenRecord r) => new()
    {
        Id = r.Id,
        OrganisationId = r.OrganisationId,
        UserId = r.UserId,
        Name = r.Name,
        TokenHash = r.TokenHash,
        CreatedAt = r.CreatedAt,
        ExpiresAt = r.ExpiresAt,
        RevokedAt = r.RevokedAt,
    };

    public ApiTokenRecord ToRecord() => new(Id, OrganisationId, UserId, Name, TokenHash, CreatedAt, ExpiresAt, RevokedAt);
}
