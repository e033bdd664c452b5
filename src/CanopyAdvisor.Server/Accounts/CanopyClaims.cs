using System.Security.Claims;
using CanopyAdvisor.Storage;

namespace CanopyAdvisor.Server.Accounts;

/// <summary>The claims a signed-in caller carries: user id, organisation, role and the account's security stamp.</summary>
internal static class CanopyClaims
{
    /// <summary>The organisation id claim.</summary>
    public const string Organisation = "canopy:org";

    /// <summary>The security stamp claim (a changed stamp ends older sign-ins).</summary>
    public const string Stamp = "canopy:stamp";

    /// <summary>The principal for a user, as signed in with the given scheme.</summary>
    public static ClaimsPrincipal For(UserRecord user, string scheme) =>
        new(new ClaimsIdentity(
            [
                new Claim(ClaimTypes.NameIdentifier, user.Id),
                new Claim(ClaimTypes.Name, user.Email),
                new Claim(Organisation, user.OrganisationId),
                new Claim(ClaimTypes.Role, RoleNames.Of(user.Role)),
                new Claim(Stamp, user.SecurityStamp),
            ],
            scheme));
}
