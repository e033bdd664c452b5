using System.Collections.Concurrent;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Server.Accounts;
using CanopyAdvisor.Storage;
using NodaTime;

namespace CanopyAdvisor.Server.Jobs;

/// <summary>Runs one job for one site and fire time and records the run in the job history; used by the Quartz job and
/// by the catch-up on start alike.</summary>
/// <remarks>A fire time is run at most once: runs of one site and kind take turns, and a fire time not later than the
/// last recorded one is not run again (so a catch-up and a trigger that meet do not both run).</remarks>
internal sealed partial class SiteJobRunner(ICanopyStore store, IEnumerable<ISiteJobWork> works, IClock clock, ILogger<SiteJobRunner> logger)
{
    private readonly Dictionary<string, ISiteJobWork> _works = works.ToDictionary(w => w.Kind, StringComparer.Ordinal);
    private readonly ConcurrentDictionary<string, SemaphoreSlim> _turns = new(StringComparer.Ordinal);

    /// <summary>Whether this kind of job has work registered.</summary>
    public bool Handles(string kind) => _works.ContainsKey(kind);

    /// <summary>Runs the job unless this fire time (or a later one) was already run or the site is gone.</summary>
    /// <returns>The recorded run, or null when nothing ran.</returns>
    public async Task<JobRunRecord?> RunAsync(string organisationId, string siteId, string kind, Instant scheduledFor, bool caughtUp, CancellationToken cancellationToken)
    {
        if (!_works.TryGetValue(kind, out ISiteJobWork? work))
        {
            throw new ArgumentException($"No job of kind '{kind}'.", nameof(kind));
        }

        SemaphoreSlim turn = _turns.GetOrAdd(organisationId + "/" + siteId + "/" + kind, _ => new SemaphoreSlim(1, 1));
        await turn.WaitAsync(cancellationToken);
        try
        {
            if (await store.JobRuns.LastAsync(organisationId, siteId, kind, cancellationToken) is { } last && last.ScheduledFor >= scheduledFor)
            {
                return null;
            }

            if (await store.Sites.GetAsync(organisationId, siteId, cancellationToken) is not { } site)
            {
                return null;
            }

            Instant started = clock.GetCurrentInstant();
            string outcome = JobKinds.Succeeded;
            string message;
            string? output = null;
            try
            {
                JobResult result = await work.RunAsync(site, scheduledFor, cancellationToken);
                message = result.Message;
                output = result.Output;
            }
            catch (InvalidInputException e)
            {
                outcome = JobKinds.Failed;
                message = string.Join("; ", e.Errors.Select(x => $"{x.Path}: {x.Message}"));
            }
            catch (Exception e) when (e is not OperationCanceledException)
            {
                outcome = JobKinds.Failed;
                message = "the job stopped with an error: " + e.Message;
                LogFailed(logger, e, kind, siteId);
            }

            var run = new JobRunRecord(ApiTokens.NewId("job"), organisationId, siteId, kind, scheduledFor, started, clock.GetCurrentInstant(), outcome, message, caughtUp, output);
            await store.JobRuns.AddAsync(run, CancellationToken.None);
            return run;
        }
        finally
        {
            turn.Release();
        }
    }

    [LoggerMessage(Level = LogLevel.Error, Message = "Job {Kind} of site {SiteId} failed")]
    private static partial void LogFailed(ILogger logger, Exception exception, string kind, string siteId);
}
