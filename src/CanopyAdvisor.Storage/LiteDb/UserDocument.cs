#pragma warning disable CA1812 // Instantiated by the BsonMapper through reflection.
using NodaTime;

namespace CanopyAdvisor.Storage.LiteDb;

/// <summary>A user as stored (e-mail lower-case, unique index).</summary>
internal sealed class UserDocument
{
    public string Id { get; set; } = "";

    public string OrganisationId { get; set; } = "";

    public string Email { get; set; } = "";

    public string DisplayName { get; set; } = "";

    public UserRole Role { get; set; }

    public string PasswordHash { get; set; } = "";

    public string SecurityStamp { get; set; } = "";

    public Instant CreatedAt { get; set; }

    public static UserDocument From(UserRecord r) => new()
    {
        Id = r.Id,
        OrganisationId = r.OrganisationId,
        Email = r.Email.ToLowerInvariant(),
        DisplayName = r.DisplayName,
        Role = r.Role,
        PasswordHash = r.PasswordHash,
        SecurityStamp = r.SecurityStamp,
        CreatedAt = r.CreatedAt,
    };

    public UserRecord ToRecord() => new(Id, OrganisationId, Email, DisplayName, Role, PasswordHash, SecurityStamp, CreatedAt);
}
