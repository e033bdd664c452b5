using CanopyAdvisor.Server.Hosting;
using CanopyAdvisor.Storage;
using Microsoft.AspNetCore.Authentication;
using Microsoft.AspNetCore.Authentication.Cookies;
using Microsoft.AspNetCore.Authorization;
using Microsoft.AspNetCore.DataProtection;
using Microsoft.AspNetCore.DataProtection.KeyManagement;
using Microsoft.AspNetCore.DataProtection.Repositories;
using Microsoft.Extensions.Options;

namespace CanopyAdvisor.Server.Accounts;

/// <summary>Sign-in for people (a cookie) and for scripts (API tokens), one policy scheme choosing between them, and the
/// authorisation policies.</summary>
internal static class AuthenticationSetup
{
    /// <summary>The default scheme: the token scheme when a bearer token is sent, else the cookie.</summary>
    public const string Scheme = "Canopy";

    /// <summary>The policy for organisation administration.</summary>
    public const string AdminPolicy = "admin";

    /// <summary>The sign-in cookie's name.</summary>
    public const string CookieName = "canopy.session";

    /// <summary>Adds authentication, authorisation and the cookie keys (kept in the data folder so sign-ins survive a restart).</summary>
    public static IServiceCollection AddCanopyAccounts(this IServiceCollection services)
    {
        services.AddSingleton<Passwords>();
        services.AddDataProtection().SetApplicationName("CanopyAdvisor");
        services.AddOptions<KeyManagementOptions>().Configure<IOptions<CanopyServerOptions>, ILoggerFactory>((keys, options, logging) =>
            keys.XmlRepository = new FileSystemXmlRepository(new DirectoryInfo(Path.Combine(options.Value.DataFolder, "keys")), logging));
        services.AddOptions<CookieAuthenticationOptions>(CookieAuthenticationDefaults.AuthenticationScheme).Configure<IOptions<CanopyServerOptions>>((cookie, options) =>
            cookie.ExpireTimeSpan = TimeSpan.FromHours(options.Value.SessionHours));

        services.AddAuthentication(Scheme)
            .AddPolicyScheme(Scheme, "cookie or API token", o => o.ForwardDefaultSelector = context =>
                ApiTokenAuthenticationHandler.HasBearer(context.Request) ? ApiTokenAuthenticationHandler.SchemeName : CookieAuthenticationDefaults.AuthenticationScheme)
            .AddScheme<AuthenticationSchemeOptions, ApiTokenAuthenticationHandler>(ApiTokenAuthenticationHandler.SchemeName, null)
            .AddCookie(CookieAuthenticationDefaults.AuthenticationScheme, o =>
            {
                // OWASP session management guidance (from memory): HttpOnly, SameSite, a bounded sliding lifetime.
                // Secure follows the request: the service listens on 127.0.0.1 over plain HTTP; put TLS in front for remote use.
                o.Cookie.Name = CookieName;
                o.Cookie.HttpOnly = true;
                o.Cookie.SameSite = SameSiteMode.Strict;
                o.Cookie.SecurePolicy = CookieSecurePolicy.SameAsRequest;
                o.SlidingExpiration = true;
                o.Events = new CookieAuthenticationEvents
                {
                    // An API answers 401/403; it never redirects to a sign-in page (RFC 9110 §15.5.2 asks for a challenge).
                    OnRedirectToLogin = context =>
                    {
                        context.Response.StatusCode = StatusCodes.Status401Unauthorized;
                        context.Response.Headers.WWWAuthenticate = $"Bearer realm=\"{ApiTokenAuthenticationHandler.Realm}\"";
                        return Task.CompletedTask;
                    },
                    OnRedirectToAccessDenied = context =>
                    {
                        context.Response.StatusCode = StatusCodes.Status403Forbidden;
                        return Task.CompletedTask;
                    },
                    OnValidatePrincipal = ValidateCookieAsync,
                };
            });

        services.AddAuthorizationBuilder()
            .SetFallbackPolicy(new AuthorizationPolicyBuilder(Scheme).RequireAuthenticatedUser().Build())
            .AddPolicy(AdminPolicy, p => p.AddAuthenticationSchemes(Scheme).RequireAuthenticatedUser().RequireRole(RoleNames.Admin));
        return services;
    }

    // Each request re-reads the account: a deleted user, or a changed password or role (new security stamp), ends the
    // cookie at once; the role in the principal is always the stored one.
    private static async Task ValidateCookieAsync(CookieValidatePrincipalContext context)
    {
        string? userId = context.Principal?.FindFirst(System.Security.Claims.ClaimTypes.NameIdentifier)?.Value;
        string? stamp = context.Principal?.FindFirst(CanopyClaims.Stamp)?.Value;
        ICanopyStore store = context.HttpContext.RequestServices.GetRequiredService<ICanopyStore>();
        UserRecord? user = userId is null ? null : await store.Users.FindAsync(userId, context.HttpContext.RequestAborted);
        if (user is null || user.SecurityStamp != stamp)
        {
            context.RejectPrincipal();
            await context.HttpContext.SignOutAsync(CookieAuthenticationDefaults.AuthenticationScheme);
            return;
        }

        context.ReplacePrincipal(CanopyClaims.For(user, CookieAuthenticationDefaults.AuthenticationScheme));
    }
}
