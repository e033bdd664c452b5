using NodaTime;
using Quartz;

namespace CanopyAdvisor.Server.Jobs;

/// <summary>The Quartz job of every site job: reads the organisation, site and kind from its data and runs it through
/// <see cref="SiteJobRunner"/> for the trigger's scheduled fire time.</summary>
[DisallowConcurrentExecution]
internal sealed class SiteQuartzJob(SiteJobRunner runner) : IJob
{
    /// <summary>Data key: the organisation id.</summary>
    public const string OrganisationKey = "organisationId";

    /// <summary>Data key: the site id.</summary>
    public const string SiteKey = "siteId";

    /// <summary>Data key: the job kind.</summary>
    public const string KindKey = "kind";

    /// <inheritdoc />
    public async ValueTask Execute(IJobExecutionContext context, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(context);
        JobDataMap data = context.MergedJobDataMap;
        DateTimeOffset due = context.ScheduledFireTimeUtc ?? context.FireTimeUtc;
        await runner.RunAsync(
            data.GetString(OrganisationKey)!,
            data.GetString(SiteKey)!,
            data.GetString(KindKey)!,
            Instant.FromDateTimeOffset(due),
            caughtUp: false,
            cancellationToken);
    }
}
