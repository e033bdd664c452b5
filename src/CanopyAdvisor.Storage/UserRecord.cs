using NodaTime;

namespace CanopyAdvisor.Storage;

/// <summary>A user account of one organisation.</summary>
/// <param name="Id">Opaque id (unique).</param>
/// <param name="OrganisationId">The organisation the user belongs to.</param>
/// <param name="Email">Sign-in name, stored lower-case; unique over all organisations.</param>
/// <param name="DisplayName">Name shown in pages and records.</param>
/// <param name="Role">What the user may do.</param>
/// <param name="PasswordHash">The password hash in the hasher's own self-describing format; never the password.</param>
/// <param name="SecurityStamp">Changes whenever the password or role changes, so older sign-in cookies stop working.</param>
/// <param name="CreatedAt">When the account was created.</param>
public sealed record UserRecord(
    string Id,
    string OrganisationId,
    string Email,
    string DisplayName,
    UserRole Role,
    string PasswordHash,
    string SecurityStamp,
    Instant CreatedAt);
