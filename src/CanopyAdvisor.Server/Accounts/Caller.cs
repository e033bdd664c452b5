using System.Security.Claims;
using CanopyAdvisor.Storage;

namespace CanopyAdvisor.Server.Accounts;

/// <summary>Who is calling: the signed-in user's id, organisation and role (read from the authenticated principal).</summary>
/// <param name="UserId">The user.</param>
/// <param name="OrganisationId">The user's organisation; every read and write is scoped to it.</param>
/// <param name="Role">The user's current role.</param>
internal sealed record Caller(string UserId, string OrganisationId, UserRole Role)
{
    /// <summary>The caller of an authenticated request.</summary>
    /// <exception cref="InvalidOperationException">The principal is not one of ours (an endpoint without authorisation).</exception>
    public static Caller From(ClaimsPrincipal principal)
    {
        ArgumentNullException.ThrowIfNull(principal);
        string? user = principal.FindFirstValue(ClaimTypes.NameIdentifier);
        string? organisation = principal.FindFirstValue(CanopyClaims.Organisation);
        string? role = principal.FindFirstValue(ClaimTypes.Role);
        if (user is null || organisation is null || role is null)
        {
            throw new InvalidOperationException("The request is not authenticated; the endpoint must require authorisation.");
        }

        return new Caller(user, organisation, RoleNames.Parse(role));
    }
}
