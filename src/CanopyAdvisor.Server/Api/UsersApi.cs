using System.Security.Claims;
using CanopyAdvisor.Server.Accounts;
using CanopyAdvisor.Server.Contracts;
using CanopyAdvisor.Server.Problems;
using CanopyAdvisor.Storage;
using Microsoft.AspNetCore.Http.HttpResults;
using NodaTime;

namespace CanopyAdvisor.Server.Api;

/// <summary>The organisation's users, for admins: list, add, read, change, remove.</summary>
internal static class UsersApi
{
    /// <summary>Maps <c>/api/users</c> (admin only).</summary>
    public static RouteGroupBuilder MapUsersApi(this IEndpointRouteBuilder routes)
    {
        RouteGroupBuilder group = routes.MapGroup("/api/users").WithTags("Users").RequireAuthorization(AuthenticationSetup.AdminPolicy);
        group.MapGet("/", List).WithSummary("List the organisation's users");
        group.MapPost("/", Create).WithSummary("Add a user").ProducesProblem(StatusCodes.Status400BadRequest);
        group.MapGet("/{id}", Get).WithSummary("Read a user");
        group.MapPut("/{id}", Update)
            .WithSummary("Change a user")
            .WithDescription("A new role or password ends the user's sign-in cookies. The last admin cannot be demoted.")
            .ProducesProblem(StatusCodes.Status400BadRequest);
        group.MapDelete("/{id}", Delete)
            .WithSummary("Remove a user")
            .WithDescription("Removes the account and its API tokens. The last admin cannot be removed.");
        return group;
    }

    private static async Task<Ok<List<UserView>>> List(ClaimsPrincipal principal, ICanopyStore store, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        return TypedResults.Ok((await store.Users.ListAsync(caller.OrganisationId, cancellationToken)).Select(UserView.Of).ToList());
    }

    private static async Task<Results<Ok<UserView>, ProblemHttpResult>> Get(string id, ClaimsPrincipal principal, ICanopyStore store, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        return await store.Users.GetAsync(caller.OrganisationId, id, cancellationToken) is { } user
            ? TypedResults.Ok(UserView.Of(user))
            : ApiProblems.NotFound("user");
    }

    private static async Task<Results<Created<UserView>, ProblemHttpResult>> Create(
        JsonBody<NewUserRequest> body, ClaimsPrincipal principal, ICanopyStore store, Passwords passwords, IClock clock, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        NewUserRequest request = body.Value;
        AccountRules.ThrowIfAny(AccountRules.CheckEmail(request.Email.Trim(), "email")
            .Concat(AccountRules.CheckName(request.DisplayName, "displayName"))
            .Concat(Passwords.Check(request.Password, "password")));
        var user = new UserRecord(
            ApiTokens.NewId("usr"), caller.OrganisationId, request.Email.Trim().ToLowerInvariant(), request.DisplayName.Trim(), request.Role,
            passwords.Hash(request.Password), AccountRules.NewSecurityStamp(), clock.GetCurrentInstant());
        return await store.Users.AddAsync(user, cancellationToken) == WriteOutcome.Written
            ? TypedResults.Created($"/api/users/{user.Id}", UserView.Of(user))
            : ApiProblems.Conflict("a user with this e-mail already exists");
    }

    private static async Task<Results<Ok<UserView>, ProblemHttpResult>> Update(
        string id, JsonBody<UserUpdateRequest> body, ClaimsPrincipal principal, ICanopyStore store, Passwords passwords, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        UserUpdateRequest request = body.Value;
        AccountRules.ThrowIfAny(AccountRules.CheckEmail(request.Email.Trim(), "email")
            .Concat(AccountRules.CheckName(request.DisplayName, "displayName"))
            .Concat(request.Password is null ? [] : Passwords.Check(request.Password, "password")));
        UserRecord? current = await store.Users.GetAsync(caller.OrganisationId, id, cancellationToken);
        if (current is null)
        {
            return ApiProblems.NotFound("user");
        }

        if (current.Role == UserRole.Admin && request.Role != UserRole.Admin && await AdminCount(store, caller.OrganisationId, cancellationToken) <= 1)
        {
            return ApiProblems.Conflict("this is the organisation's last admin; make another user admin first");
        }

        bool newStamp = request.Role != current.Role || request.Password is not null;
        UserRecord updated = current with
        {
            Email = request.Email.Trim().ToLowerInvariant(),
            DisplayName = request.DisplayName.Trim(),
            Role = request.Role,
            PasswordHash = request.Password is null ? current.PasswordHash : passwords.Hash(request.Password),
            SecurityStamp = newStamp ? AccountRules.NewSecurityStamp() : current.SecurityStamp,
        };
        return await store.Users.UpdateAsync(updated, cancellationToken) switch
        {
            WriteOutcome.Written => TypedResults.Ok(UserView.Of(updated)),
            WriteOutcome.KeyTaken => ApiProblems.Conflict("another user has this e-mail"),
            _ => ApiProblems.NotFound("user"),
        };
    }

    private static async Task<Results<NoContent, ProblemHttpResult>> Delete(string id, ClaimsPrincipal principal, ICanopyStore store, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        UserRecord? current = await store.Users.GetAsync(caller.OrganisationId, id, cancellationToken);
        if (current is null)
        {
            return ApiProblems.NotFound("user");
        }

        if (current.Role == UserRole.Admin && await AdminCount(store, caller.OrganisationId, cancellationToken) <= 1)
        {
            return ApiProblems.Conflict("this is the organisation's last admin; make another user admin first");
        }

        return await store.Users.DeleteAsync(caller.OrganisationId, id, cancellationToken) ? TypedResults.NoContent() : ApiProblems.NotFound("user");
    }

    private static async Task<int> AdminCount(ICanopyStore store, string organisationId, CancellationToken cancellationToken) =>
        (await store.Users.ListAsync(organisationId, cancellationToken)).Count(u => u.Role == UserRole.Admin);
}
