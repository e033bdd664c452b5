using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Sites;
using CanopyAdvisor.Server.Forecasting;
using CanopyAdvisor.Storage;
using Microsoft.Extensions.Options;
using NodaTime;
using Quartz;

namespace CanopyAdvisor.Server.Jobs;

/// <summary>Keeps Quartz's triggers in step with the stored sites and catches up on jobs missed while the service was
/// down.</summary>
/// <remarks>
/// <para>Quartz's in-memory store forgets its triggers when the process ends, so the triggers are derived from the stored
/// sites: all of them at start, and an organisation's again whenever one of its sites is created, replaced or deleted
/// (<see cref="RefreshOrganisationAsync"/>). Jobs are grouped by organisation id and named <c>{siteId}/{kind}</c>.</para>
/// <para><b>Misfire policy.</b> A fire time missed while the service was down runs once on start: for each site and
/// job, the last fire time after the later of the last recorded run and the site's creation, and not after now (the
/// service's clock), runs once; earlier missed fire times are not replayed (each job's latest run stands for them).
/// While the service runs, a fire Quartz could not start on time fires once as soon as it can
/// (<see cref="CronTriggerMisfireInstruction.FireAndProceed"/>). The catch-up runs in the background after start, so the
/// service answers at once.</para>
/// </remarks>
internal sealed partial class SiteJobScheduler(
    ICanopyStore store,
    ISchedulerFactory schedulers,
    SiteJobRunner runner,
    IClock clock,
    IOptions<JobOptions> options,
    ILogger<SiteJobScheduler> logger) : IHostedService, IDisposable
{
    private readonly CancellationTokenSource _stopping = new();
    private readonly SemaphoreSlim _rebuilding = new(1, 1);
    private Task _catchUp = Task.CompletedTask;

    /// <summary>The catch-up started at start (complete when there was nothing to do); tests await it.</summary>
    public Task CatchUp => _catchUp;

    /// <inheritdoc />
    public async Task StartAsync(CancellationToken cancellationToken)
    {
        if (!options.Value.Enabled)
        {
            return;
        }

        IReadOnlyList<SiteRecord> sites = await store.Sites.ListAllAsync(cancellationToken);
        foreach (string organisationId in sites.Select(s => s.OrganisationId).Distinct(StringComparer.Ordinal))
        {
            await ScheduleAsync(organisationId, sites.Where(s => s.OrganisationId == organisationId).ToList(), cancellationToken);
        }

        _catchUp = Task.Run(
            async () =>
            {
                int runs = await CatchUpAsync(sites, _stopping.Token);
                LogCatchUpDone(logger, runs);
            },
            CancellationToken.None);
    }

    /// <summary>Runs, once each, the site jobs whose last fire time by now was missed (what start does in the background).</summary>
    /// <returns>The runs made.</returns>
    public async Task<int> CatchUpNowAsync(CancellationToken cancellationToken)
    {
        IReadOnlyList<SiteRecord> sites = await store.Sites.ListAllAsync(cancellationToken);
        return await CatchUpAsync(sites, cancellationToken);
    }

    /// <inheritdoc />
    public async Task StopAsync(CancellationToken cancellationToken)
    {
        await _stopping.CancelAsync();
        try
        {
            await _catchUp.WaitAsync(cancellationToken);
        }
        catch (OperationCanceledException)
        {
            // Stopping: a catch-up cut short runs again on the next start (nothing was recorded for it).
        }

    }

    /// <inheritdoc />
    public void Dispose()
    {
        _stopping.Dispose();
        _rebuilding.Dispose();
    }

    /// <summary>Rebuilds the triggers of an organisation's sites from the store (after a site is created, replaced or
    /// deleted).</summary>
    public async Task RefreshOrganisationAsync(string organisationId, CancellationToken cancellationToken)
    {
        if (!options.Value.Enabled)
        {
            return;
        }

        // One rebuild at a time, reading the sites inside it, so two site writes at once cannot interleave or apply an
        // older list after a newer one.
        await _rebuilding.WaitAsync(cancellationToken);
        try
        {
            IReadOnlyList<SiteRecord> sites = await store.Sites.ListAsync(organisationId, cancellationToken);
            await RebuildAsync(organisationId, sites, cancellationToken);
        }
        finally
        {
            _rebuilding.Release();
        }
    }

    private async Task ScheduleAsync(string organisationId, IReadOnlyList<SiteRecord> sites, CancellationToken cancellationToken)
    {
        await _rebuilding.WaitAsync(cancellationToken);
        try
        {
            await RebuildAsync(organisationId, sites, cancellationToken);
        }
        finally
        {
            _rebuilding.Release();
        }
    }

    private async Task RebuildAsync(string organisationId, IReadOnlyList<SiteRecord> sites, CancellationToken cancellationToken)
    {
        IScheduler scheduler = await schedulers.GetScheduler(cancellationToken);
        await scheduler.DeleteJobs(GroupMatcher<JobKey>.GroupEquals(organisationId), cancellationToken);
        DateTimeOffset now = clock.GetCurrentInstant().ToDateTimeOffset();
        foreach (SiteRecord site in sites)
        {
            if (PlansOf(site) is not { } plans)
            {
                continue;
            }

            foreach (SiteJobPlan plan in plans)
            {
                IJobDetail job = JobBuilder.Create<SiteQuartzJob>()
                    .WithIdentity($"{site.Id}/{plan.Kind}", organisationId)
                    .UsingJobData(SiteQuartzJob.OrganisationKey, organisationId)
                    .UsingJobData(SiteQuartzJob.SiteKey, site.Id)
                    .UsingJobData(SiteQuartzJob.KindKey, plan.Kind)
                    .Build();
                ITrigger trigger = SiteJobPlanner.Trigger(plan, new TriggerKey($"{site.Id}/{plan.Kind}", organisationId), now);
                await scheduler.ScheduleJob(job, trigger, cancellationToken: cancellationToken);
            }
        }
    }

    private async Task<int> CatchUpAsync(IReadOnlyList<SiteRecord> sites, CancellationToken cancellationToken)
    {
        int runs = 0;
        Instant now = clock.GetCurrentInstant();
        foreach (SiteRecord site in sites)
        {
            if (PlansOf(site) is not { } plans)
            {
                continue;
            }

            foreach (SiteJobPlan plan in plans)
            {
                if (await MissedAsync(site, plan, now, cancellationToken) is Instant missed)
                {
                    LogCatchUp(logger, plan.Kind, site.Id, missed);
                    runs += await runner.RunAsync(site.OrganisationId, site.Id, plan.Kind, missed, caughtUp: true, cancellationToken) is null ? 0 : 1;
                }
            }
        }

        return runs;
    }

    /// <summary>The fire time of this site's job missed while the service was down (the last one due by now and after
    /// the later of the last recorded run and the site's creation), or null.</summary>
    internal async Task<Instant?> MissedAsync(SiteRecord site, SiteJobPlan plan, Instant now, CancellationToken cancellationToken)
    {
        JobRunRecord? last = await store.JobRuns.LastAsync(site.OrganisationId, site.Id, plan.Kind, cancellationToken);
        Instant since = last is not null && last.ScheduledFor > site.CreatedAt ? last.ScheduledFor : site.CreatedAt;
        return SiteJobPlanner.LastFireBetween(plan, since, now);
    }

    private List<SiteJobPlan>? PlansOf(SiteRecord site)
    {
        try
        {
            Site model = new SiteFileReader(ServerBeamFactory.Instance).Parse(site.Json, "site", baseDirectory: null);
            return SiteJobPlanner.For(model).Where(p => runner.Handles(p.Kind)).ToList();
        }
        catch (InvalidInputException e)
        {
            // Stored sites were checked when written; one that no longer reads (a rule tightened since) gets no jobs.
            LogUnreadable(logger, site.Id, e.Message);
            return null;
        }
    }

    [LoggerMessage(Level = LogLevel.Information, Message = "Catching up job {Kind} of site {SiteId}, missed at {Missed}")]
    private static partial void LogCatchUp(ILogger logger, string kind, string siteId, Instant missed);

    [LoggerMessage(Level = LogLevel.Information, Message = "Job catch-up on start done: {Runs} missed run(s) made")]
    private static partial void LogCatchUpDone(ILogger logger, int runs);

    [LoggerMessage(Level = LogLevel.Warning, Message = "Site {SiteId} does not read ({Problem}); it has no scheduled jobs")]
    private static partial void LogUnreadable(ILogger logger, string siteId, string problem);
}
