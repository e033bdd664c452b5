using System.Security.Claims;
using System.Text;
using CanopyAdvisor.Reports.Calendar;
using CanopyAdvisor.Server.Accounts;
using CanopyAdvisor.Server.Advice;
using CanopyAdvisor.Server.Contracts;
using CanopyAdvisor.Server.Hosting;
using CanopyAdvisor.Server.Problems;
using CanopyAdvisor.Storage;
using Microsoft.AspNetCore.Http.HttpResults;
using NodaTime;

namespace CanopyAdvisor.Server.Api;

/// <summary>The advice of a site: the rotation plan with its labour calendar (JSON, iCalendar, CSV). Long computations
/// (seconds): they share the forecast's concurrency limit and stop when the client goes away.</summary>
internal static class AdviceApi
{
    /// <summary>The iCalendar media type (RFC 5545 §8.1).</summary>
    public const string CalendarMediaType = "text/calendar; charset=utf-8";

    /// <summary>The CSV media type with its header parameter (RFC 4180 §3).</summary>
    public const string CsvMediaType = "text/csv; charset=utf-8; header=present";

    /// <summary>Maps <c>/api/sites/{siteId}/plan</c> and its calendar exports.</summary>
    public static IEndpointRouteBuilder MapAdviceApi(this IEndpointRouteBuilder routes)
    {
        RouteGroupBuilder group = routes.MapGroup("/api/sites/{siteId}").WithTags("Advice");
        group.MapPost("/plan", Plan)
            .RequireRateLimiting(RateLimits.ForecastPolicy)
            .WithSummary("Plan the pot rotations to each lot's sale and schedule them on the crews")
            .WithDescription("Per bench: no rotation, or 90°/180° turns every so often, the least labour that keeps the lean within grade (less a margin) to the sale; the turns placed on the site's crews within their windows. Starts from the stored rotations done. Body optional: {\"now\", \"marginPercent\"}.")
            .ProducesProblem(StatusCodes.Status400BadRequest);
        group.MapGet("/plan/calendar.ics", CalendarIcs)
            .RequireRateLimiting(RateLimits.ForecastPolicy)
            .WithSummary("The rotation calendar as iCalendar (RFC 5545), one event per scheduled turn, UIDs stable across exports")
            .WithDescription("Query: now (ISO-8601 with offset; default the start of the current hour), marginPercent (default 20).")
            .Produces<string>(StatusCodes.Status200OK, "text/calendar");
        group.MapGet("/plan/calendar.csv", CalendarCsv)
            .RequireRateLimiting(RateLimits.ForecastPolicy)
            .WithSummary("The rotation calendar as CSV (RFC 4180), one row per scheduled turn")
            .WithDescription("Query: now (ISO-8601 with offset; default the start of the current hour), marginPercent (default 20).")
            .Produces<string>(StatusCodes.Status200OK, "text/csv");
        group.MapPost("/lamps", Lamps)
            .RequireRateLimiting(RateLimits.ForecastPolicy)
            .Accepts<System.Text.Json.Nodes.JsonObject>("application/json")
            .WithSummary("Propose side lamps from a brief (lighting designers, admins)")
            .WithDescription("The body is a side-lamp brief (the brief file format: rails, lamp types named from the site's lampTypes, limits). Query: now, days (1–60, default 7), seed. Answers the proposed lamps with before/after lean, PPFD, DLI, uniformity, energy and cost, and the safety cautions; nothing is stored.")
            .ProducesProblem(StatusCodes.Status400BadRequest)
            .ProducesProblem(StatusCodes.Status403Forbidden);
        group.MapPost("/calibration", Calibrate)
            .RequireRateLimiting(RateLimits.ForecastPolicy)
            .WithSummary("Fit a crop's lean parameters (M, γ, B) to the site's stored observations")
            .WithDescription("Answers estimates ± standard errors, their correlation, warnings, residuals and whether the data identify the parameters. With \"save\": true (growers, admins) an identified variant is saved to the organisation's crops (201, then listed by GET /api/crops); data that cannot identify the parameters answer 422 with the warnings and nothing is saved.")
            .ProducesProblem(StatusCodes.Status400BadRequest)
            .ProducesProblem(StatusCodes.Status409Conflict)
            .ProducesProblem(StatusCodes.Status422UnprocessableEntity);
        group.MapGet("/outlook", OutlookPageAsync)
            .RequireRateLimiting(RateLimits.ForecastPolicy)
            .WithSummary("The week's outlook as a printable page (HTML)")
            .WithDescription("Floor map, benches ranked by risk, lean and DLI charts, each bench's rotation advice. Query: now (ISO-8601 with offset; default the start of the current hour), days (1–14, default 7).")
            .Produces<string>(StatusCodes.Status200OK, "text/html");
        group.MapGet("/outlook.csv", OutlookCsvAsync)
            .RequireRateLimiting(RateLimits.ForecastPolicy)
            .WithSummary("The week's outlook as CSV (RFC 4180), one row per bench")
            .Produces<string>(StatusCodes.Status200OK, "text/csv");
        return routes;
    }

    private static Task<Results<ContentHttpResult, ProblemHttpResult>> OutlookPageAsync(
        string siteId, string? now, double? days, ClaimsPrincipal principal, ICanopyStore store, OutlookRunner outlook, CancellationToken cancellationToken) =>
        Outlook(siteId, now, days, principal, store, outlook, r => TypedResults.Text(Reports.Outlook.OutlookPage.Render(r), "text/html; charset=utf-8", Encoding.UTF8), null, cancellationToken);

    private static Task<Results<ContentHttpResult, ProblemHttpResult>> OutlookCsvAsync(
        string siteId, string? now, double? days, ClaimsPrincipal principal, ICanopyStore store, OutlookRunner outlook, HttpContext context, CancellationToken cancellationToken) =>
        Outlook(siteId, now, days, principal, store, outlook, r => TypedResults.Text(Reports.Outlook.OutlookCsv.Write(r), CsvMediaType, Encoding.UTF8), context, cancellationToken);

    private static async Task<Results<ContentHttpResult, ProblemHttpResult>> Outlook(
        string siteId, string? now, double? days, ClaimsPrincipal principal, ICanopyStore store, OutlookRunner outlook,
        Func<Reports.Outlook.OutlookReport, ContentHttpResult> write, HttpContext? download, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        if (await store.Sites.GetAsync(caller.OrganisationId, siteId, cancellationToken) is not { } site)
        {
            return ApiProblems.NotFound("site");
        }

        Reports.Outlook.OutlookReport report = await outlook.OutlookAsync(site, now, days, cancellationToken);
        if (download is not null)
        {
            download.Response.Headers.ContentDisposition = $"attachment; filename=\"{site.SiteKey}-outlook.csv\"";
        }

        return write(report);
    }

    private static async Task<Results<Ok<CalibrationView>, Created<CalibrationView>, ProblemHttpResult>> Calibrate(
        string siteId, JsonBody<CalibrationRequest> body, ClaimsPrincipal principal, ICanopyStore store, CalibrationRunner calibration, IClock clock, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        if (await store.Sites.GetAsync(caller.OrganisationId, siteId, cancellationToken) is not { } site)
        {
            return ApiProblems.NotFound("site");
        }

        bool save = body.Value.Save ?? false;
        if (save && !AdvicePermissions.MaySaveVariants(caller.Role))
        {
            return ApiProblems.Forbidden("only growers and admins save crop variants; ask without \"save\" to see the fit");
        }

        CalibrationOutcome outcome = await calibration.FitAsync(site, body.Value, cancellationToken);
        if (!save)
        {
            return TypedResults.Ok(outcome.View);
        }

        if (!outcome.Result.Identified)
        {
            return TypedResults.Problem(ApiProblems.Create(
                StatusCodes.Status422UnprocessableEntity,
                "The observations cannot identify the parameters",
                "the variant was not saved; see the warnings (more observations, over a longer time or of benches lit differently, help)",
                outcome.Result.Warnings.Select(w => new ProblemError("observations", w))));
        }

        Core.Plants.Crop variant = outcome.Result.Variant;
        if (outcome.BaseCrop.Id == variant.Id || Files.Crops.CropLibrary.BuiltInIds.Contains(variant.Id, StringComparer.Ordinal))
        {
            return ApiProblems.Conflict($"'{variant.Id}' is a crop of the built-in library; give another variantId");
        }

        string toml = Files.Crops.CropVariantWriter.Write(variant, outcome.BaseCrop, outcome.CommentLines);
        var record = new CropVariantRecord(caller.OrganisationId, variant.Id, outcome.BaseCrop.Id, variant.Name, toml, site.Id, clock.GetCurrentInstant(), caller.UserId);
        if (await store.CropVariants.AddAsync(record, cancellationToken) != WriteOutcome.Written)
        {
            return ApiProblems.Conflict($"your organisation already has a crop variant '{variant.Id}'; give another variantId");
        }

        return TypedResults.Created($"/api/crops/{variant.Id}", outcome.View with { Saved = true });
    }

    private static async Task<Results<Ok<LampsView>, ProblemHttpResult>> Lamps(
        string siteId, string? now, double? days, int? seed, ClaimsPrincipal principal, HttpContext context, ICanopyStore store, LampsRunner lamps, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        if (await store.Sites.GetAsync(caller.OrganisationId, siteId, cancellationToken) is not { } site)
        {
            return ApiProblems.NotFound("site");
        }

        if (!AdvicePermissions.MayProposeLamps(caller.Role))
        {
            return ApiProblems.Forbidden("only lighting designers and admins ask for side-lamp proposals");
        }

        string brief = await RequestBody.ReadJsonTextAsync(context);
        return TypedResults.Ok(await lamps.ProposeAsync(site, brief, now, days, seed, cancellationToken));
    }

    private static async Task<Results<Ok<PlanView>, ProblemHttpResult>> Plan(
        string siteId, JsonBody<PlanOptions> body, ClaimsPrincipal principal, ICanopyStore store, PlanRunner planner, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        if (await store.Sites.GetAsync(caller.OrganisationId, siteId, cancellationToken) is not { } site)
        {
            return ApiProblems.NotFound("site");
        }

        PlannedSite planned = await planner.PlanAsync(site, body.Value, cancellationToken);
        return TypedResults.Ok(PlanViews.From(site.Id, planned));
    }

    private static Task<Results<ContentHttpResult, ProblemHttpResult>> CalendarIcs(
        string siteId, string? now, double? marginPercent, ClaimsPrincipal principal, ICanopyStore store, PlanRunner planner, IClock clock, HttpContext context, CancellationToken cancellationToken) =>
        Calendar(siteId, new PlanOptions(now, marginPercent), principal, store, planner, context, "rotations.ics", CalendarMediaType, planned =>
            // SEQUENCE (§3.8.7.4): whole hours from the Unix epoch to the plan's start, so a later plan carries a higher
            // revision and calendar programs take its times; the same plan exported twice keeps it.
            RotationCalendarIcs.Write(planned.Model, planned.Schedule, clock.GetCurrentInstant(), (int)Math.Max(0, (planned.Plan.Now - Instant.FromUnixTimeTicks(0)).TotalHours)),
            cancellationToken);

    private static Task<Results<ContentHttpResult, ProblemHttpResult>> CalendarCsv(
        string siteId, string? now, double? marginPercent, ClaimsPrincipal principal, ICanopyStore store, PlanRunner planner, HttpContext context, CancellationToken cancellationToken) =>
        Calendar(siteId, new PlanOptions(now, marginPercent), principal, store, planner, context, "rotations.csv", CsvMediaType, planned =>
            RotationCalendarCsv.Write(planned.Model, planned.Schedule), cancellationToken);

    private static async Task<Results<ContentHttpResult, ProblemHttpResult>> Calendar(
        string siteId, PlanOptions options, ClaimsPrincipal principal, ICanopyStore store, PlanRunner planner, HttpContext context,
        string fileName, string mediaType, Func<PlannedSite, string> write, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        if (await store.Sites.GetAsync(caller.OrganisationId, siteId, cancellationToken) is not { } site)
        {
            return ApiProblems.NotFound("site");
        }

        PlannedSite planned = await planner.PlanAsync(site, options, cancellationToken);
        context.Response.Headers.ContentDisposition = $"attachment; filename=\"{planned.Model.Id}-{fileName}\"";
        return TypedResults.Text(write(planned), mediaType, Encoding.UTF8);
    }
}
