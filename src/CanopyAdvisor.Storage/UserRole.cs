namespace CanopyAdvisor.Storage;

/// <summary>What a user of an organisation may do (the permission matrix is in the server's README).</summary>
public enum UserRole
{
    /// <summary>Enters crop lots, rotations done and observations; reads everything of the organisation.</summary>
    Grower,

    /// <summary>Enters lamp types, lamps and lamp rows; reads everything of the organisation.</summary>
    LightingDesigner,

    /// <summary>Reads everything of the organisation and runs forecasts; changes nothing.</summary>
    Manager,

    /// <summary>Manages users and sites; may change every part of a site.</summary>
    Admin,
}
