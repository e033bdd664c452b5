namespace CanopyAdvisor.Storage;

/// <summary>The history of scheduled job runs, per site.</summary>
public interface IJobRunStore
{
    /// <summary>Adds a finished run.</summary>
    Task AddAsync(JobRunRecord run, CancellationToken cancellationToken = default);

    /// <summary>A site's runs, newest scheduled time first, at most <paramref name="limit"/>, without their outputs.</summary>
    Task<IReadOnlyList<JobRunRecord>> ListAsync(string organisationId, string siteId, int limit, CancellationToken cancellationToken = default);

    /// <summary>The newest run (by scheduled time) of this kind for this site that stored an output, or null.</summary>
    Task<JobRunRecord?> LatestWithOutputAsync(string organisationId, string siteId, string kind, CancellationToken cancellationToken = default);

    /// <summary>The run of this kind for this site with the latest scheduled time, or null when it never ran.</summary>
    Task<JobRunRecord?> LastAsync(string organisationId, string siteId, string kind, CancellationToken cancellationToken = default);
}
