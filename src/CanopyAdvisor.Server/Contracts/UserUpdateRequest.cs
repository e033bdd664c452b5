using CanopyAdvisor.Storage;

namespace CanopyAdvisor.Server.Contracts;

/// <summary>A change to a user: every member replaces the stored one; a password is optional.</summary>
/// <param name="Email">Sign-in e-mail.</param>
/// <param name="DisplayName">Display name, 1 to 100 characters.</param>
/// <param name="Role">Role.</param>
/// <param name="Password">A new password (12 to 128 characters), or null to keep it.</param>
public sealed record UserUpdateRequest(string Email, string DisplayName, UserRole Role, string? Password = null);
