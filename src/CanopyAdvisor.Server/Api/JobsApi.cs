using System.Security.Claims;
using System.Text.Json;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Files.Sites;
using CanopyAdvisor.Server.Accounts;
using CanopyAdvisor.Server.Contracts;
using CanopyAdvisor.Server.Forecasting;
using CanopyAdvisor.Server.Jobs;
using CanopyAdvisor.Server.Problems;
using CanopyAdvisor.Storage;
using Microsoft.AspNetCore.Http.HttpResults;
using NodaTime;

namespace CanopyAdvisor.Server.Api;

/// <summary>A site's scheduled jobs: the schedule, the run history and the latest outputs.</summary>
internal static class JobsApi
{
    /// <summary>Runs listed at most.</summary>
    public const int RunsListed = 200;

    /// <summary>Maps <c>/api/sites/{siteId}/jobs</c>.</summary>
    public static RouteGroupBuilder MapJobsApi(this IEndpointRouteBuilder routes)
    {
        RouteGroupBuilder group = routes.MapGroup("/api/sites/{siteId}/jobs").WithTags("Jobs");
        group.MapGet("/", List)
            .WithSummary("A site's scheduled jobs and their run history")
            .WithDescription("The nightly forecast, weekly outlook and day's task list, each as a cron expression in the site's time zone with its next fire time, and the latest 200 runs (newest first).");
        group.MapGet("/task-list/latest", LatestTaskList)
            .WithSummary("The latest stored rotation task list")
            .WithDescription("The tasks of the day of the latest task-list run that stored one: date, time zone and each task (bench, lot, crew, turn, pots, start, end, labour).");
        group.MapGet("/weekly-outlook/latest", LatestOutlookPage)
            .WithSummary("The latest stored weekly outlook page")
            .WithDescription("The printable page (HTML) of the latest weekly-outlook run that stored one.")
            .Produces<string>(StatusCodes.Status200OK, "text/html");
        group.MapGet("/weekly-outlook/latest.csv", LatestOutlookCsv)
            .WithSummary("The latest stored weekly outlook as CSV")
            .Produces<string>(StatusCodes.Status200OK, "text/csv");
        return group;
    }

    private static Task<Results<ContentHttpResult, ProblemHttpResult>> LatestOutlookPage(
        string siteId, ClaimsPrincipal principal, ICanopyStore store, CancellationToken cancellationToken) =>
        LatestOutlookAsync(siteId, principal, store, o => TypedResults.Text(o.Page, "text/html; charset=utf-8"), cancellationToken);

    private static Task<Results<ContentHttpResult, ProblemHttpResult>> LatestOutlookCsv(
        string siteId, ClaimsPrincipal principal, ICanopyStore store, CancellationToken cancellationToken) =>
        LatestOutlookAsync(siteId, principal, store, o => TypedResults.Text(o.Csv, "text/csv; charset=utf-8"), cancellationToken);

    private static async Task<Results<ContentHttpResult, ProblemHttpResult>> LatestOutlookAsync(
        string siteId, ClaimsPrincipal principal, ICanopyStore store, Func<StoredOutlook, ContentHttpResult> answer, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        if (await store.Sites.GetAsync(caller.OrganisationId, siteId, cancellationToken) is null)
        {
            return ApiProblems.NotFound("site");
        }

        return await store.JobRuns.LatestWithOutputAsync(caller.OrganisationId, siteId, JobKinds.WeeklyOutlook, cancellationToken) is { Output: { } output }
            ? answer(WeeklyOutlookWork.Read(output))
            : ApiProblems.NotFound("weekly outlook");
    }

    private static async Task<Results<Ok<SiteJobsView>, ProblemHttpResult>> List(
        string siteId, ClaimsPrincipal principal, ICanopyStore store, SiteJobRunner runner, IClock clock, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        if (await store.Sites.GetAsync(caller.OrganisationId, siteId, cancellationToken) is not { } site)
        {
            return ApiProblems.NotFound("site");
        }

        Site model = new SiteFileReader(ServerBeamFactory.Instance).Parse(site.Json, "site", baseDirectory: null);
        Instant now = clock.GetCurrentInstant();
        OffsetDateTime Local(Instant t) => t.InZone(model.Zone).ToOffsetDateTime();
        var schedule = SiteJobPlanner.For(model).Where(p => runner.Handles(p.Kind))
            .Select(p => new JobScheduleView(p.Kind, p.Cron, model.Zone.Id, SiteJobPlanner.NextFireAfter(p, now) is Instant next ? Local(next) : null))
            .ToList();
        IReadOnlyList<JobRunRecord> runs = await store.JobRuns.ListAsync(caller.OrganisationId, siteId, RunsListed, cancellationToken);
        return TypedResults.Ok(new SiteJobsView(
            schedule,
            runs.Select(r => new JobRunView(r.Id, r.Kind, Local(r.ScheduledFor), Local(r.StartedAt), Local(r.FinishedAt), r.Outcome, r.Message, r.CaughtUp)).ToList()));
    }

    private static async Task<Results<Ok<JsonElement>, ProblemHttpResult>> LatestTaskList(
        string siteId, ClaimsPrincipal principal, ICanopyStore store, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        if (await store.Sites.GetAsync(caller.OrganisationId, siteId, cancellationToken) is null)
        {
            return ApiProblems.NotFound("site");
        }

        if (await store.JobRuns.LatestWithOutputAsync(caller.OrganisationId, siteId, JobKinds.TaskList, cancellationToken) is not { Output: { } output })
        {
            return ApiProblems.NotFound("task list");
        }

        using JsonDocument document = JsonDocument.Parse(output);
        return TypedResults.Ok(document.RootElement.Clone());
    }
}
