using CanopyAdvisor.Storage;
using NodaTime;

namespace CanopyAdvisor.Server.Contracts;

/// <summary>A user as the API shows it (never the password hash).</summary>
/// <param name="Id">The user id.</param>
/// <param name="OrganisationId">The organisation.</param>
/// <param name="Email">Sign-in e-mail.</param>
/// <param name="DisplayName">Display name.</param>
/// <param name="Role">Role.</param>
/// <param name="CreatedAt">When the account was created.</param>
public sealed record UserView(string Id, string OrganisationId, string Email, string DisplayName, UserRole Role, Instant CreatedAt)
{
    /// <summary>The view of a stored user.</summary>
    public static UserView Of(UserRecord user)
    {
        ArgumentNullException.ThrowIfNull(user);
        return new(user.Id, user.OrganisationId, user.Email, user.DisplayName, user.Role, user.CreatedAt);
    }
}
