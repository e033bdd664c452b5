using CanopyAdvisor.Storage;

namespace CanopyAdvisor.Server.Accounts;

/// <summary>The roles' names in the API and in claims (camelCase, as in JSON).</summary>
internal static class RoleNames
{
    /// <summary>The admin role's name (for authorisation policies).</summary>
    public const string Admin = "admin";

    /// <summary>The name of a role.</summary>
    public static string Of(UserRole role) => role switch
    {
        UserRole.Grower => "grower",
        UserRole.LightingDesigner => "lightingDesigner",
        UserRole.Manager => "manager",
        UserRole.Admin => Admin,
        _ => throw new ArgumentOutOfRangeException(nameof(role), role, "unknown role"),
    };

    /// <summary>The role with this name.</summary>
    public static UserRole Parse(string name) => name switch
    {
        "grower" => UserRole.Grower,
        "lightingDesigner" => UserRole.LightingDesigner,
        "manager" => UserRole.Manager,
        Admin => UserRole.Admin,
        _ => throw new ArgumentOutOfRangeException(nameof(name), name, "unknown role"),
    };
}
