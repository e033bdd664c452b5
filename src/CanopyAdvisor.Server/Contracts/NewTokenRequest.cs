namespace CanopyAdvisor.Server.Contracts;

/// <summary>A new API token for the caller.</summary>
/// <param name="Name">A label, 1 to 100 characters ("nightly export").</param>
/// <param name="ExpiresInDays">Lifetime in whole days, 1 to 366 (default 90).</param>
public sealed record NewTokenRequest(string Name, int ExpiresInDays = 90);
