using NodaTime;

namespace CanopyAdvisor.Storage;

/// <summary>An API token of a user, for scripts; the token itself is never stored, only its hash.</summary>
/// <param name="Id">Opaque id (unique), used to list and revoke the token.</param>
/// <param name="OrganisationId">The organisation of the user.</param>
/// <param name="UserId">The user the token acts as.</param>
/// <param name="Name">A label the user chose ("nightly export").</param>
/// <param name="TokenHash">Lower-case hex SHA-256 of the token text (unique).</param>
/// <param name="CreatedAt">When it was issued.</param>
/// <param name="ExpiresAt">When it stops working.</param>
/// <param name="RevokedAt">When it was revoked, or null while it is not.</param>
public sealed record ApiTokenRecord(
    string Id,
    string OrganisationId,
    string UserId,
    string Name,
    string TokenHash,
    Instant CreatedAt,
    Instant ExpiresAt,
    Instant? RevokedAt);
