namespace CanopyAdvisor.Server.Contracts;

/// <summary>A token just issued: the only time its text is shown.</summary>
/// <param name="Token">The token text; send it as <c>Authorization: Bearer …</c>. It is not stored and cannot be shown again.</param>
/// <param name="Details">The token as it will be listed.</param>
public sealed record NewTokenView(string Token, TokenView Details);
