using NodaTime;

namespace CanopyAdvisor.Storage;

/// <summary>API tokens, stored as hashes.</summary>
public interface IApiTokenStore
{
    /// <summary>Adds a token; <see cref="WriteOutcome.KeyTaken"/> when its id or hash is taken.</summary>
    Task<WriteOutcome> AddAsync(ApiTokenRecord token, CancellationToken cancellationToken = default);

    /// <summary>The token with this hash, or null (revoked and expired tokens are returned too; the caller decides).</summary>
    Task<ApiTokenRecord?> FindByHashAsync(string tokenHash, CancellationToken cancellationToken = default);

    /// <summary>A user's tokens, newest first (revoked and expired included).</summary>
    Task<IReadOnlyList<ApiTokenRecord>> ListForUserAsync(string organisationId, string userId, CancellationToken cancellationToken = default);

    /// <summary>Marks a token of this user revoked at the given time (kept for the record); false when the user has no
    /// such token. Revoking a revoked token keeps the first time and returns true.</summary>
    Task<bool> RevokeAsync(string organisationId, string userId, string id, Instant at, CancellationToken cancellationToken = default);
}
