namespace CanopyAdvisor.Storage.LiteDb;

/// <summary>Job runs in the LiteDB store.</summary>
internal sealed class JobRunRepository(LiteDbCanopyStore store) : IJobRunStore
{
    public Task AddAsync(JobRunRecord run, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(run);
        cancellationToken.ThrowIfCancellationRequested();
        store.Write(() =>
        {
            store.JobRunCollection.Insert(JobRunDocument.From(run));
            return WriteOutcome.Written;
        });
        return Task.CompletedTask;
    }

    public Task<IReadOnlyList<JobRunRecord>> ListAsync(string organisationId, string siteId, int limit, CancellationToken cancellationToken = default)
    {
        List<JobRunRecord> runs = store.JobRunCollection.Find(j => j.SiteId == siteId)
            .Where(j => j.OrganisationId == organisationId)
            .Select(j => j.ToRecord(withOutput: false))
            .OrderByDescending(j => j.ScheduledFor)
            .ThenByDescending(j => j.StartedAt)
            .Take(Math.Max(0, limit))
            .ToList();
        return Task.FromResult<IReadOnlyList<JobRunRecord>>(runs);
    }

    public Task<JobRunRecord?> LatestWithOutputAsync(string organisationId, string siteId, string kind, CancellationToken cancellationToken = default)
    {
        string key = Keys.Join(organisationId, siteId, kind);
        JobRunRecord? latest = store.JobRunCollection.Find(j => j.SiteKind == key)
            .Where(j => j.Output is not null)
            .OrderByDescending(j => j.ScheduledFor)
            .FirstOrDefault()?.ToRecord();
        return Task.FromResult(latest);
    }

    public Task<JobRunRecord?> LastAsync(string organisationId, string siteId, string kind, CancellationToken cancellationToken = default)
    {
        string key = Keys.Join(organisationId, siteId, kind);
        JobRunRecord? last = store.JobRunCollection.Find(j => j.SiteKind == key)
            .Select(j => j.ToRecord(withOutput: false))
            .OrderByDescending(j => j.ScheduledFor)
            .FirstOrDefault();
        return Task.FromResult(last);
    }
}
