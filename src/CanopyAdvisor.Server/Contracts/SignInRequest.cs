namespace CanopyAdvisor.Server.Contracts;

/// <summary>A sign-in.</summary>
/// <param name="Email">The account's e-mail (any case).</param>
/// <param name="Password">The password.</param>
public sealed record SignInRequest(string Email, string Password);
