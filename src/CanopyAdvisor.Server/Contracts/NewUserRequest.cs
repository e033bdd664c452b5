using CanopyAdvisor.Storage;

namespace CanopyAdvisor.Server.Contracts;

/// <summary>A new user of the caller's organisation.</summary>
/// <param name="Email">Sign-in e-mail (unique over the service).</param>
/// <param name="DisplayName">Display name, 1 to 100 characters.</param>
/// <param name="Role">Role.</param>
/// <param name="Password">Initial password, 12 to 128 characters.</param>
public sealed record NewUserRequest(string Email, string DisplayName, UserRole Role, string Password);
