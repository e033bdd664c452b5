using System.Security.Claims;
using CanopyAdvisor.Server.Accounts;
using CanopyAdvisor.Server.Contracts;
using CanopyAdvisor.Server.Hosting;
using CanopyAdvisor.Server.Problems;
using CanopyAdvisor.Storage;
using Microsoft.AspNetCore.Authentication;
using Microsoft.AspNetCore.Authentication.Cookies;
using Microsoft.AspNetCore.Http.HttpResults;

namespace CanopyAdvisor.Server.Api;

/// <summary>Sign-in and sign-out with a cookie, and who the caller is.</summary>
internal static class SessionApi
{
    /// <summary>Maps <c>/api/session</c> and <c>/api/me</c>.</summary>
    public static RouteGroupBuilder MapSessionApi(this IEndpointRouteBuilder routes)
    {
        RouteGroupBuilder group = routes.MapGroup("/api").WithTags("Session");
        group.MapPost("/session", SignIn)
            .AllowAnonymous()
            .RequireRateLimiting(RateLimits.SignInPolicy)
            .WithSummary("Sign in")
            .WithDescription("Checks the e-mail and password and sets the sign-in cookie (HttpOnly, SameSite=Strict). A wrong e-mail and a wrong password get the same answer.")
            .ProducesProblem(StatusCodes.Status400BadRequest);
        group.MapDelete("/session", SignOut)
            .AllowAnonymous()
            .WithSummary("Sign out")
            .WithDescription("Clears the sign-in cookie.");
        group.MapGet("/me", Me)
            .WithSummary("The signed-in user")
            .WithDescription("The caller's account, organisation and the site sections the role may change.");
        return group;
    }

    private static async Task<Results<Ok<UserView>, ProblemHttpResult>> SignIn(
        JsonBody<SignInRequest> body, HttpContext context, ICanopyStore store, Passwords passwords, CancellationToken cancellationToken)
    {
        SignInRequest request = body.Value;
        UserRecord? user = await store.Users.FindByEmailAsync(request.Email.Trim(), cancellationToken);
        if (!passwords.Verify(user, request.Password))
        {
            return TypedResults.Problem(ApiProblems.Create(StatusCodes.Status401Unauthorized, "Sign-in failed", "the e-mail or the password is wrong"));
        }

        await context.SignInAsync(CookieAuthenticationDefaults.AuthenticationScheme, CanopyClaims.For(user!, CookieAuthenticationDefaults.AuthenticationScheme));
        return TypedResults.Ok(UserView.Of(user!));
    }

    private static async Task<NoContent> SignOut(HttpContext context, CancellationToken cancellationToken)
    {
        await context.SignOutAsync(CookieAuthenticationDefaults.AuthenticationScheme);
        return TypedResults.NoContent();
    }

    private static async Task<Results<Ok<CurrentUserView>, ProblemHttpResult>> Me(ClaimsPrincipal principal, ICanopyStore store, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        UserRecord? user = await store.Users.GetAsync(caller.OrganisationId, caller.UserId, cancellationToken);
        OrganisationRecord? organisation = await store.Organisations.GetAsync(caller.OrganisationId, cancellationToken);
        if (user is null || organisation is null)
        {
            return ApiProblems.NotFound("user");
        }

        return TypedResults.Ok(new CurrentUserView(UserView.Of(user), organisation.Name, organisation.DemoData, SitePermissions.Describe(user.Role)));
    }
}
