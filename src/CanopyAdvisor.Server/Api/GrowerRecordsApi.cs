using System.Security.Claims;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Files.Sites;
using CanopyAdvisor.Server.Accounts;
using CanopyAdvisor.Server.Advice;
using CanopyAdvisor.Server.Contracts;
using CanopyAdvisor.Server.Forecasting;
using CanopyAdvisor.Server.Problems;
using CanopyAdvisor.Storage;
using Microsoft.AspNetCore.Http.HttpResults;
using NodaTime;

namespace CanopyAdvisor.Server.Api;

/// <summary>The growers' records of a site: observations (measured leans, for calibration) and rotations done (which
/// feed the forecasts). Every role reads; growers and admins add and delete.</summary>
internal static class GrowerRecordsApi
{
    /// <summary>Maps <c>/api/sites/{siteId}/observations</c> and <c>/api/sites/{siteId}/rotations-done</c>.</summary>
    public static IEndpointRouteBuilder MapGrowerRecordsApi(this IEndpointRouteBuilder routes)
    {
        RouteGroupBuilder observations = routes.MapGroup("/api/sites/{siteId}/observations").WithTags("Observations");
        observations.MapGet("/", ListObservations).WithSummary("List a site's observations, in time order");
        observations.MapPost("/", AddObservation)
            .WithSummary("Record an observation (growers, admins)")
            .WithDescription("The measured mean lean of sample plants on a bench. Every problem is listed with its path; nothing is stored when there is one.")
            .ProducesProblem(StatusCodes.Status400BadRequest);
        observations.MapDelete("/{observationId}", DeleteObservation).WithSummary("Delete an observation (growers, admins)");

        RouteGroupBuilder rotations = routes.MapGroup("/api/sites/{siteId}/rotations-done").WithTags("Rotations done");
        rotations.MapGet("/", ListRotations).WithSummary("List a site's rotations done, in time order");
        rotations.MapPost("/", AddRotation)
            .WithSummary("Record a rotation done (growers, admins)")
            .WithDescription("Pots of a lot turned by an angle at a time; the next forecast applies it (a new input hash). Every problem is listed with its path; nothing is stored when there is one.")
            .ProducesProblem(StatusCodes.Status400BadRequest);
        rotations.MapDelete("/{rotationId}", DeleteRotation).WithSummary("Delete a rotation done (growers, admins)");
        return routes;
    }

    private static async Task<Results<Ok<List<ObservationView>>, ProblemHttpResult>> ListObservations(string siteId, ClaimsPrincipal principal, ICanopyStore store, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        if (await store.Sites.GetAsync(caller.OrganisationId, siteId, cancellationToken) is not { } site)
        {
            return ApiProblems.NotFound("site");
        }

        DateTimeZone zone = ZoneOf(site);
        IReadOnlyList<ObservationRecord> list = await store.Observations.ListAsync(caller.OrganisationId, siteId, cancellationToken);
        return TypedResults.Ok(list.Select(o => View(o, zone)).ToList());
    }

    private static async Task<Results<Created<ObservationView>, ProblemHttpResult>> AddObservation(
        string siteId, JsonBody<NewObservationRequest> body, ClaimsPrincipal principal, ICanopyStore store, IClock clock, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        if (await store.Sites.GetAsync(caller.OrganisationId, siteId, cancellationToken) is not { } site)
        {
            return ApiProblems.NotFound("site");
        }

        if (!AdvicePermissions.MayRecordGrowerWork(caller.Role))
        {
            return ApiProblems.Forbidden("only growers and admins record observations");
        }

        Site model = Parse(site);
        ObservationRecord record = GrowerRecordRules.Observation(body.Value, model, site, clock.GetCurrentInstant(), ApiTokens.NewId("obs"), caller.UserId);
        if (await store.Observations.AddAsync([record], cancellationToken) != WriteOutcome.Written)
        {
            return ApiProblems.Conflict("the observation id is taken; send it again");
        }

        return TypedResults.Created($"/api/sites/{siteId}/observations/{record.Id}", View(record, model.Zone));
    }

    private static async Task<Results<NoContent, ProblemHttpResult>> DeleteObservation(string siteId, string observationId, ClaimsPrincipal principal, ICanopyStore store, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        if (await store.Sites.GetAsync(caller.OrganisationId, siteId, cancellationToken) is null)
        {
            return ApiProblems.NotFound("site");
        }

        if (!AdvicePermissions.MayRecordGrowerWork(caller.Role))
        {
            return ApiProblems.Forbidden("only growers and admins delete observations");
        }

        return await store.Observations.DeleteAsync(caller.OrganisationId, siteId, observationId, cancellationToken)
            ? TypedResults.NoContent()
            : ApiProblems.NotFound("observation");
    }

    private static async Task<Results<Ok<List<RotationDoneView>>, ProblemHttpResult>> ListRotations(string siteId, ClaimsPrincipal principal, ICanopyStore store, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        if (await store.Sites.GetAsync(caller.OrganisationId, siteId, cancellationToken) is not { } site)
        {
            return ApiProblems.NotFound("site");
        }

        DateTimeZone zone = ZoneOf(site);
        IReadOnlyList<RotationDoneRecord> list = await store.RotationsDone.ListAsync(caller.OrganisationId, siteId, cancellationToken);
        return TypedResults.Ok(list.Select(r => View(r, zone)).ToList());
    }

    private static async Task<Results<Created<RotationDoneView>, ProblemHttpResult>> AddRotation(
        string siteId, JsonBody<NewRotationDoneRequest> body, ClaimsPrincipal principal, ICanopyStore store, IClock clock, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        if (await store.Sites.GetAsync(caller.OrganisationId, siteId, cancellationToken) is not { } site)
        {
            return ApiProblems.NotFound("site");
        }

        if (!AdvicePermissions.MayRecordGrowerWork(caller.Role))
        {
            return ApiProblems.Forbidden("only growers and admins record rotations done");
        }

        Site model = Parse(site);
        RotationDoneRecord record = GrowerRecordRules.Rotation(body.Value, model, site, clock.GetCurrentInstant(), ApiTokens.NewId("rot"), caller.UserId);
        if (await store.RotationsDone.AddAsync([record], cancellationToken) != WriteOutcome.Written)
        {
            return ApiProblems.Conflict("the rotation id is taken; send it again");
        }

        return TypedResults.Created($"/api/sites/{siteId}/rotations-done/{record.Id}", View(record, model.Zone));
    }

    private static async Task<Results<NoContent, ProblemHttpResult>> DeleteRotation(string siteId, string rotationId, ClaimsPrincipal principal, ICanopyStore store, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        if (await store.Sites.GetAsync(caller.OrganisationId, siteId, cancellationToken) is null)
        {
            return ApiProblems.NotFound("site");
        }

        if (!AdvicePermissions.MayRecordGrowerWork(caller.Role))
        {
            return ApiProblems.Forbidden("only growers and admins delete rotations done");
        }

        return await store.RotationsDone.DeleteAsync(caller.OrganisationId, siteId, rotationId, cancellationToken)
            ? TypedResults.NoContent()
            : ApiProblems.NotFound("rotation done");
    }

    private static Site Parse(SiteRecord site) => new SiteFileReader(ServerBeamFactory.Instance).Parse(site.Json, "site", baseDirectory: null);

    private static DateTimeZone ZoneOf(SiteRecord site) => Parse(site).Zone;

    private static ObservationView View(ObservationRecord o, DateTimeZone zone) =>
        new(o.Id, o.BenchId, o.At.InZone(zone).ToOffsetDateTime(), o.TiltDeg, o.AzimuthDeg, o.HeightMm, o.Plants, o.CreatedAt, o.CreatedBy);

    private static RotationDoneView View(RotationDoneRecord r, DateTimeZone zone) =>
        new(r.Id, r.LotId, r.BenchId, r.At.InZone(zone).ToOffsetDateTime(), r.AngleDeg, r.CreatedAt, r.CreatedBy);
}
