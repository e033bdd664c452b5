using System.Security.Claims;
using CanopyAdvisor.Server.Accounts;
using CanopyAdvisor.Server.Contracts;
using CanopyAdvisor.Server.Forecasting;
using CanopyAdvisor.Server.Hosting;
using CanopyAdvisor.Server.Problems;
using CanopyAdvisor.Storage;
using Microsoft.AspNetCore.Http.HttpResults;

namespace CanopyAdvisor.Server.Api;

/// <summary>A site's bench forecasts: run (or serve the stored one with the same inputs), list, read.</summary>
internal static class ForecastsApi
{
    /// <summary>Maps <c>/api/sites/{siteId}/forecasts</c>.</summary>
    public static RouteGroupBuilder MapForecastsApi(this IEndpointRouteBuilder routes)
    {
        RouteGroupBuilder group = routes.MapGroup("/api/sites/{siteId}/forecasts").WithTags("Forecasts");
        group.MapPost("/", Run)
            .RequireRateLimiting(RateLimits.ForecastPolicy)
            .WithSummary("Forecast every bench's lean and stretch")
            .WithDescription("Runs the bench forecast (clear sky × the site's clearness, the site's temperature setpoints) and stores it under the hash of its inputs. 201 when computed; 200 with the stored forecast when the same inputs were forecast before.")
            .ProducesProblem(StatusCodes.Status400BadRequest);
        group.MapGet("/", List).WithSummary("List a site's stored forecasts");
        group.MapGet("/{forecastId}", Get).WithSummary("Read a stored forecast");
        return group;
    }

    private static async Task<Results<Created<ForecastView>, Ok<ForecastView>, ProblemHttpResult>> Run(
        string siteId, JsonBody<ForecastOptions> body, ClaimsPrincipal principal, ICanopyStore store, ForecastRunner runner, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        if (await store.Sites.GetAsync(caller.OrganisationId, siteId, cancellationToken) is not { } site)
        {
            return ApiProblems.NotFound("site");
        }

        (ForecastRecord record, bool fromStore) = await runner.GetOrRunAsync(site, body.Value, caller, cancellationToken);
        ForecastView view = runner.Read(record);
        return fromStore
            ? TypedResults.Ok(view)
            : TypedResults.Created($"/api/sites/{siteId}/forecasts/{record.Id}", view);
    }

    private static async Task<Results<Ok<List<ForecastSummary>>, ProblemHttpResult>> List(string siteId, ClaimsPrincipal principal, ICanopyStore store, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        if (await store.Sites.GetAsync(caller.OrganisationId, siteId, cancellationToken) is null)
        {
            return ApiProblems.NotFound("site");
        }

        IReadOnlyList<ForecastRecord> forecasts = await store.Forecasts.ListAsync(caller.OrganisationId, siteId, cancellationToken);
        return TypedResults.Ok(forecasts.Select(f => new ForecastSummary(f.Id, f.SiteVersion, f.InputHash, f.CreatedAt, f.CreatedBy)).ToList());
    }

    private static async Task<Results<Ok<ForecastView>, ProblemHttpResult>> Get(
        string siteId, string forecastId, ClaimsPrincipal principal, ICanopyStore store, ForecastRunner runner, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        return await store.Forecasts.GetAsync(caller.OrganisationId, siteId, forecastId, cancellationToken) is { } record
            ? TypedResults.Ok(runner.Read(record))
            : ApiProblems.NotFound("forecast");
    }
}
