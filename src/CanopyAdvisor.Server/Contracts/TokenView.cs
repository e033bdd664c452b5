using CanopyAdvisor.Storage;
using NodaTime;

namespace CanopyAdvisor.Server.Contracts;

/// <summary>An API token as listed (never the token itself).</summary>
/// <param name="Id">The token id (to revoke it).</param>
/// <param name="Name">Its label.</param>
/// <param name="CreatedAt">When it was issued.</param>
/// <param name="ExpiresAt">When it stops working.</param>
/// <param name="RevokedAt">When it was revoked, or null.</param>
/// <param name="State"><c>active</c>, <c>expired</c> or <c>revoked</c>.</param>
public sealed record TokenView(string Id, string Name, Instant CreatedAt, Instant ExpiresAt, Instant? RevokedAt, string State)
{
    /// <summary>The view of a stored token at a time.</summary>
    public static TokenView Of(ApiTokenRecord token, Instant now)
    {
        ArgumentNullException.ThrowIfNull(token);
        string state = token.RevokedAt is not null ? "revoked" : token.ExpiresAt <= now ? "expired" : "active";
        return new(token.Id, token.Name, token.CreatedAt, token.ExpiresAt, token.RevokedAt, state);
    }
}
