using CanopyAdvisor.Server.Accounts;
using CanopyAdvisor.Server.Contracts;
using CanopyAdvisor.Server.Forecasting;
using CanopyAdvisor.Storage;
using NodaTime;
using NodaTime.Text;

namespace CanopyAdvisor.Server.Jobs;

/// <summary>The nightly recompute: the site's bench forecast from the fire time, through the service's forecast runner,
/// stored under the hash of its inputs (so the API serves it from the store; a repeat with nothing changed is not
/// computed again).</summary>
internal sealed class NightlyForecastWork(ForecastRunner runner) : ISiteJobWork
{
    /// <summary>The user id the job's forecasts are stored under.</summary>
    public const string JobUserId = "job:" + JobKinds.NightlyForecast;

    /// <inheritdoc />
    public string Kind => JobKinds.NightlyForecast;

    /// <inheritdoc />
    public async Task<JobResult> RunAsync(SiteRecord site, Instant scheduledFor, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(site);
        var options = new ForecastOptions(OffsetDateTimePattern.ExtendedIso.Format(scheduledFor.WithOffset(Offset.Zero)));
        var caller = new Caller(JobUserId, site.OrganisationId, UserRole.Admin);
        (ForecastRecord record, bool fromStore) = await runner.GetOrRunAsync(site, options, caller, cancellationToken);
        return new JobResult(fromStore
            ? $"forecast {record.Id} was already stored for these inputs"
            : $"forecast {record.Id} computed and stored");
    }
}
