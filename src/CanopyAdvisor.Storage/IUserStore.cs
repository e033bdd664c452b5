namespace CanopyAdvisor.Storage;

/// <summary>User accounts.</summary>
public interface IUserStore
{
    /// <summary>The user with this id in this organisation, or null (also for a user of another organisation).</summary>
    Task<UserRecord?> GetAsync(string organisationId, string id, CancellationToken cancellationToken = default);

    /// <summary>The user with this id in any organisation, or null; for checking a signed-in principal.</summary>
    Task<UserRecord?> FindAsync(string id, CancellationToken cancellationToken = default);

    /// <summary>The user with this e-mail (compared lower-case), or null; for sign-in.</summary>
    Task<UserRecord?> FindByEmailAsync(string email, CancellationToken cancellationToken = default);

    /// <summary>The organisation's users, by e-mail.</summary>
    Task<IReadOnlyList<UserRecord>> ListAsync(string organisationId, CancellationToken cancellationToken = default);

    /// <summary>Adds a user; <see cref="WriteOutcome.KeyTaken"/> when the id or e-mail is taken.</summary>
    Task<WriteOutcome> AddAsync(UserRecord user, CancellationToken cancellationToken = default);

    /// <summary>Replaces a user of the same organisation and id; <see cref="WriteOutcome.NotFound"/> when there is none,
    /// <see cref="WriteOutcome.KeyTaken"/> when the new e-mail belongs to another user.</summary>
    Task<WriteOutcome> UpdateAsync(UserRecord user, CancellationToken cancellationToken = default);

    /// <summary>Deletes a user and all of the user's API tokens in one atomic write; false when there is no such user
    /// in the organisation.</summary>
    Task<bool> DeleteAsync(string organisationId, string id, CancellationToken cancellationToken = default);
}
