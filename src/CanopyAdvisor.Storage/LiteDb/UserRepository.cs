namespace CanopyAdvisor.Storage.LiteDb;

/// <summary>Users in the LiteDB store.</summary>
internal sealed class UserRepository(LiteDbCanopyStore store) : IUserStore
{
    public Task<UserRecord?> GetAsync(string organisationId, string id, CancellationToken cancellationToken = default)
    {
        UserDocument? user = store.UserCollection.FindById(id);
        return Task.FromResult(user is not null && user.OrganisationId == organisationId ? user.ToRecord() : null);
    }

    public Task<UserRecord?> FindAsync(string id, CancellationToken cancellationToken = default) =>
        Task.FromResult(store.UserCollection.FindById(id)?.ToRecord());

    public Task<UserRecord?> FindByEmailAsync(string email, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(email);
        string key = email.ToLowerInvariant();
        return Task.FromResult(store.UserCollection.FindOne(u => u.Email == key)?.ToRecord());
    }

    public Task<IReadOnlyList<UserRecord>> ListAsync(string organisationId, CancellationToken cancellationToken = default)
    {
        List<UserRecord> users = store.UserCollection.Find(u => u.OrganisationId == organisationId)
            .Select(u => u.ToRecord())
            .OrderBy(u => u.Email, StringComparer.Ordinal)
            .ToList();
        return Task.FromResult<IReadOnlyList<UserRecord>>(users);
    }

    public Task<WriteOutcome> AddAsync(UserRecord user, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(user);
        return Task.FromResult(store.Write(() =>
        {
            store.UserCollection.Insert(UserDocument.From(user));
            return WriteOutcome.Written;
        }));
    }

    public Task<WriteOutcome> UpdateAsync(UserRecord user, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(user);
        return Task.FromResult(store.Write(() =>
        {
            UserDocument? current = store.UserCollection.FindById(user.Id);
            if (current is null || current.OrganisationId != user.OrganisationId)
            {
                return WriteOutcome.NotFound;
            }

            store.UserCollection.Update(UserDocument.From(user));
            return WriteOutcome.Written;
        }));
    }

    public Task<bool> DeleteAsync(string organisationId, string id, CancellationToken cancellationToken = default) =>
        Task.FromResult(store.Write(() =>
        {
            UserDocument? current = store.UserCollection.FindById(id);
            if (current is null || current.OrganisationId != organisationId)
            {
                return false;
            }

            store.TokenCollection.DeleteMany(t => t.UserId == id);
            store.UserCollection.Delete(id);
            return true;
        }));
}
