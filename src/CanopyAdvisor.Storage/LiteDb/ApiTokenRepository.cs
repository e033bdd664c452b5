using NodaTime;

namespace CanopyAdvisor.Storage.LiteDb;

/// <summary>API tokens in the LiteDB store.</summary>
internal sealed class ApiTokenRepository(LiteDbCanopyStore store) : IApiTokenStore
{
    public Task<WriteOutcome> AddAsync(ApiTokenRecord token, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(token);
        return Task.FromResult(store.Write(() =>
        {
            store.TokenCollection.Insert(ApiTokenDocument.From(token));
            return WriteOutcome.Written;
        }));
    }

    public Task<ApiTokenRecord?> FindByHashAsync(string tokenHash, CancellationToken cancellationToken = default) =>
        Task.FromResult(store.TokenCollection.FindOne(t => t.TokenHash == tokenHash)?.ToRecord());

    public Task<IReadOnlyList<ApiTokenRecord>> ListForUserAsync(string organisationId, string userId, CancellationToken cancellationToken = default)
    {
        List<ApiTokenRecord> tokens = store.TokenCollection.Find(t => t.UserId == userId)
            .Where(t => t.OrganisationId == organisationId)
            .Select(t => t.ToRecord())
            .OrderByDescending(t => t.CreatedAt)
            .ToList();
        return Task.FromResult<IReadOnlyList<ApiTokenRecord>>(tokens);
    }

    public Task<bool> RevokeAsync(string organisationId, string userId, string id, Instant at, CancellationToken cancellationToken = default) =>
        Task.FromResult(store.Write(() =>
        {
            ApiTokenDocument? token = store.TokenCollection.FindById(id);
            if (token is null || token.OrganisationId != organisationId || token.UserId != userId)
            {
                return false;
            }

            if (token.RevokedAt is null)
            {
                token.RevokedAt = at;
                store.TokenCollection.Update(token);
            }

            return true;
        }));
}
