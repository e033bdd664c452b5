using CanopyAdvisor.Storage;

namespace CanopyAdvisor.Server.Accounts;

/// <summary>Who may write the growers' records and run the advice (the permission matrix; see the server README).</summary>
internal static class AdvicePermissions
{
    /// <summary>Whether the role may add and delete observations and rotations done (growers and admins).</summary>
    public static bool MayRecordGrowerWork(UserRole role) => role is UserRole.Grower or UserRole.Admin;

    /// <summary>Whether the role may ask for side-lamp proposals (lighting designers and admins: lamps are their sections).</summary>
    public static bool MayProposeLamps(UserRole role) => role is UserRole.LightingDesigner or UserRole.Admin;

    /// <summary>Whether the role may save a calibrated crop variant for the organisation (growers and admins: the lots'
    /// crops are the growers' section).</summary>
    public static bool MaySaveVariants(UserRole role) => role is UserRole.Grower or UserRole.Admin;
}
