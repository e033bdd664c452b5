using System.Security.Claims;
using CanopyAdvisor.Server.Accounts;
using CanopyAdvisor.Server.Contracts;
using CanopyAdvisor.Server.Problems;
using CanopyAdvisor.Storage;
using Microsoft.AspNetCore.Http.HttpResults;
using NodaTime;

namespace CanopyAdvisor.Server.Api;

/// <summary>The caller's own API tokens: issue (shown once), list, revoke.</summary>
internal static class TokensApi
{
    /// <summary>Maps <c>/api/tokens</c>.</summary>
    public static RouteGroupBuilder MapTokensApi(this IEndpointRouteBuilder routes)
    {
        RouteGroupBuilder group = routes.MapGroup("/api/tokens").WithTags("API tokens");
        group.MapPost("/", Create)
            .WithSummary("Issue an API token")
            .WithDescription("Returns the token text once; only its SHA-256 is stored. Send it as 'Authorization: Bearer <token>' (RFC 6750).")
            .ProducesProblem(StatusCodes.Status400BadRequest);
        group.MapGet("/", List).WithSummary("List your API tokens").WithDescription("Active, expired and revoked; never the token text.");
        group.MapDelete("/{id}", Revoke).WithSummary("Revoke an API token").WithDescription("The token stops working at once; it stays listed as revoked.");
        return group;
    }

    private static async Task<Created<NewTokenView>> Create(
        JsonBody<NewTokenRequest> body, ClaimsPrincipal principal, ICanopyStore store, IClock clock, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        NewTokenRequest request = body.Value;
        var errors = AccountRules.CheckName(request.Name, "name").ToList();
        if (request.ExpiresInDays is < 1 or > 366)
        {
            errors.Add(new("expiresInDays", "must be 1 to 366"));
        }

        AccountRules.ThrowIfAny(errors);
        string token = ApiTokens.NewToken();
        Instant now = clock.GetCurrentInstant();
        var record = new ApiTokenRecord(ApiTokens.NewId("tok"), caller.OrganisationId, caller.UserId, request.Name.Trim(), ApiTokens.Hash(token), now, now + Duration.FromDays(request.ExpiresInDays), null);
        if (await store.ApiTokens.AddAsync(record, cancellationToken) != WriteOutcome.Written)
        {
            throw new InvalidOperationException("A new random token id or hash collided with a stored one.");
        }

        return TypedResults.Created($"/api/tokens/{record.Id}", new NewTokenView(token, TokenView.Of(record, now)));
    }

    private static async Task<Ok<List<TokenView>>> List(ClaimsPrincipal principal, ICanopyStore store, IClock clock, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        Instant now = clock.GetCurrentInstant();
        IReadOnlyList<ApiTokenRecord> tokens = await store.ApiTokens.ListForUserAsync(caller.OrganisationId, caller.UserId, cancellationToken);
        return TypedResults.Ok(tokens.Select(t => TokenView.Of(t, now)).ToList());
    }

    private static async Task<Results<NoContent, ProblemHttpResult>> Revoke(string id, ClaimsPrincipal principal, ICanopyStore store, IClock clock, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        return await store.ApiTokens.RevokeAsync(caller.OrganisationId, caller.UserId, id, clock.GetCurrentInstant(), cancellationToken)
            ? TypedResults.NoContent()
            : ApiProblems.NotFound("API token of yours");
    }
}
