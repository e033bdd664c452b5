using System.Collections.Frozen;
using CanopyAdvisor.Storage;

namespace CanopyAdvisor.Server.Accounts;

/// <summary>Which parts of a site file each role may change (the permission matrix; see the server README).</summary>
/// <remarks>
/// A site is stored as one site file; a replace is allowed when every top-level section that differs from the stored
/// file is one the caller's role may change. Growers own the crop lots, the labour settings and the temperature
/// setpoints; lighting designers own the lamp types, lamps and lamp rows; managers read and change nothing; admins
/// change everything and alone create and delete sites. Every role reads everything of its organisation.
/// </remarks>
internal static class SitePermissions
{
    private static readonly FrozenSet<string> GrowerSections = FrozenSet.Create(StringComparer.Ordinal, "lots", "labour", "temperatures");

    private static readonly FrozenSet<string> DesignerSections = FrozenSet.Create(StringComparer.Ordinal, "lampTypes", "lamps", "lampRows");

    /// <summary>Whether the role may create and delete sites.</summary>
    public static bool MayCreateOrDelete(UserRole role) => role == UserRole.Admin;

    /// <summary>Whether the role may change any part of a site.</summary>
    public static bool MayChangeAnything(UserRole role) => role != UserRole.Manager;

    /// <summary>Whether the role may change this top-level section of a site file.</summary>
    public static bool MayChange(UserRole role, string section) => role switch
    {
        UserRole.Admin => true,
        UserRole.Grower => GrowerSections.Contains(section),
        UserRole.LightingDesigner => DesignerSections.Contains(section),
        _ => false,
    };

    /// <summary>The sections the role may change, for messages.</summary>
    public static string Describe(UserRole role) => role switch
    {
        UserRole.Admin => "every section",
        UserRole.Grower => string.Join(", ", GrowerSections.Order(StringComparer.Ordinal)),
        UserRole.LightingDesigner => string.Join(", ", DesignerSections.Order(StringComparer.Ordinal)),
        _ => "none",
    };
}
