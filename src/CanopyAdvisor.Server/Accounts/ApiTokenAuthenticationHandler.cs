using System.Text.Encodings.Web;
using CanopyAdvisor.Storage;
using Microsoft.AspNetCore.Authentication;
using Microsoft.AspNetCore.Mvc;
using Microsoft.Extensions.Options;
using NodaTime;

namespace CanopyAdvisor.Server.Accounts;

/// <summary>The bearer-token scheme (RFC 6750): <c>Authorization: Bearer cat_…</c>, checked against the stored hash; a
/// revoked or expired token, or one of a deleted user, is refused with <c>401</c> and
/// <c>WWW-Authenticate: Bearer error="invalid_token"</c> (RFC 6750 §3, §3.1).</summary>
internal sealed class ApiTokenAuthenticationHandler(
    IOptionsMonitor<AuthenticationSchemeOptions> options,
    ILoggerFactory logger,
    UrlEncoder encoder,
    ICanopyStore store,
    IClock clock,
    IProblemDetailsService problems)
    : AuthenticationHandler<AuthenticationSchemeOptions>(options, logger, encoder)
{
    /// <summary>The scheme name.</summary>
    public const string SchemeName = "ApiToken";

    /// <summary>The realm named in challenges.</summary>
    public const string Realm = "CanopyAdvisor";

    private const string BearerPrefix = "Bearer ";

    private string? _failure;

    /// <summary>Whether a request carries a bearer token (then this scheme, not the cookie, decides).</summary>
    public static bool HasBearer(HttpRequest request) => IsBearer(request.Headers.Authorization.ToString());

    // "Bearer" alone (an empty token, perhaps trimmed on the way) is a bearer attempt too, refused below.
    private static bool IsBearer(string header) =>
        header.StartsWith(BearerPrefix, StringComparison.OrdinalIgnoreCase) || header.Equals(BearerPrefix.TrimEnd(), StringComparison.OrdinalIgnoreCase);

    protected override async Task<AuthenticateResult> HandleAuthenticateAsync()
    {
        string header = Request.Headers.Authorization.ToString();
        if (!IsBearer(header))
        {
            return AuthenticateResult.NoResult();
        }

        string token = header.Length > BearerPrefix.Length ? header[BearerPrefix.Length..].Trim() : "";
        ApiTokenRecord? record = token.StartsWith(ApiTokens.Prefix, StringComparison.Ordinal) && token.Length < 200
            ? await store.ApiTokens.FindByHashAsync(ApiTokens.Hash(token), Context.RequestAborted)
            : null;
        Instant now = clock.GetCurrentInstant();
        _failure = record switch
        {
            null => "the token is not known",
            { RevokedAt: not null } => "the token has been revoked",
            _ when record.ExpiresAt <= now => "the token has expired",
            _ => null,
        };
        if (_failure is not null)
        {
            return AuthenticateResult.Fail(_failure);
        }

        UserRecord? user = await store.Users.FindAsync(record!.UserId, Context.RequestAborted);
        if (user is null || user.OrganisationId != record.OrganisationId)
        {
            _failure = "the token's user no longer exists";
            return AuthenticateResult.Fail(_failure);
        }

        return AuthenticateResult.Success(new AuthenticationTicket(CanopyClaims.For(user, SchemeName), SchemeName));
    }

    protected override async Task HandleChallengeAsync(AuthenticationProperties properties)
    {
        Response.StatusCode = StatusCodes.Status401Unauthorized;
        // RFC 6750 §3: error attributes only when a token was sent and refused; the description is for developers.
        Response.Headers.WWWAuthenticate = _failure is null
            ? $"Bearer realm=\"{Realm}\""
            : $"Bearer realm=\"{Realm}\", error=\"invalid_token\", error_description=\"{_failure}\"";
        await problems.TryWriteAsync(new ProblemDetailsContext
        {
            HttpContext = Context,
            ProblemDetails = new ProblemDetails
            {
                Status = StatusCodes.Status401Unauthorized,
                Title = "Not signed in",
                Detail = _failure ?? "sign in or send an API token (Authorization: Bearer …)",
            },
        });
    }
}
