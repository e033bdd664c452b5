namespace CanopyAdvisor.Storage.LiteDb;

/// <summary>Observations in the LiteDB store.</summary>
internal sealed class ObservationRepository(LiteDbCanopyStore store) : IObservationStore
{
    public Task<IReadOnlyList<ObservationRecord>> ListAsync(string organisationId, string siteId, CancellationToken cancellationToken = default)
    {
        List<ObservationRecord> list = store.ObservationCollection.Find(o => o.SiteId == siteId)
            .Where(o => o.OrganisationId == organisationId)
            .Select(o => o.ToRecord())
            .OrderBy(o => o.At)
            .ThenBy(o => o.Id, StringComparer.Ordinal)
            .ToList();
        return Task.FromResult<IReadOnlyList<ObservationRecord>>(list);
    }

    public Task<WriteOutcome> AddAsync(IReadOnlyList<ObservationRecord> observations, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(observations);
        cancellationToken.ThrowIfCancellationRequested();
        return Task.FromResult(store.Write(() =>
        {
            store.ObservationCollection.InsertBulk(observations.Select(ObservationDocument.From));
            return WriteOutcome.Written;
        }));
    }

    public Task<bool> DeleteAsync(string organisationId, string siteId, string id, CancellationToken cancellationToken = default) =>
        Task.FromResult(store.Write(() =>
        {
            ObservationDocument? current = store.ObservationCollection.FindById(id);
            return current is not null && current.OrganisationId == organisationId && current.SiteId == siteId
                && store.ObservationCollection.Delete(id);
        }));
}
