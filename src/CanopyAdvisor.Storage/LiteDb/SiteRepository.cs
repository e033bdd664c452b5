namespace CanopyAdvisor.Storage.LiteDb;

/// <summary>Sites in the LiteDB store.</summary>
internal sealed class SiteRepository(LiteDbCanopyStore store) : ISiteStore
{
    public Task<IReadOnlyList<SiteRecord>> ListAsync(string organisationId, CancellationToken cancellationToken = default)
    {
        List<SiteRecord> sites = store.SiteCollection.Find(s => s.OrganisationId == organisationId)
            .Select(s => s.ToRecord())
            .OrderBy(s => s.SiteKey, StringComparer.Ordinal)
            .ToList();
        return Task.FromResult<IReadOnlyList<SiteRecord>>(sites);
    }

    public Task<IReadOnlyList<SiteRecord>> ListAllAsync(CancellationToken cancellationToken = default)
    {
        List<SiteRecord> sites = store.SiteCollection.FindAll()
            .Select(s => s.ToRecord())
            .OrderBy(s => s.OrganisationId, StringComparer.Ordinal)
            .ThenBy(s => s.SiteKey, StringComparer.Ordinal)
            .ToList();
        return Task.FromResult<IReadOnlyList<SiteRecord>>(sites);
    }

    public Task<SiteRecord?> GetAsync(string organisationId, string id, CancellationToken cancellationToken = default)
    {
        SiteDocument? site = store.SiteCollection.FindById(id);
        return Task.FromResult(site is not null && site.OrganisationId == organisationId ? site.ToRecord() : null);
    }

    public Task<WriteOutcome> AddAsync(SiteRecord site, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(site);
        return Task.FromResult(store.Write(() =>
        {
            store.SiteCollection.Insert(SiteDocument.From(site));
            return WriteOutcome.Written;
        }));
    }

    public Task<WriteOutcome> ReplaceAsync(SiteRecord site, int expectedVersion, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(site);
        return Task.FromResult(store.Write(() =>
        {
            SiteDocument? current = store.SiteCollection.FindById(site.Id);
            if (current is null || current.OrganisationId != site.OrganisationId)
            {
                return WriteOutcome.NotFound;
            }

            if (current.Version != expectedVersion)
            {
                return WriteOutcome.VersionMismatch;
            }

            store.SiteCollection.Update(SiteDocument.From(site));
            return WriteOutcome.Written;
        }));
    }

    public Task<bool> DeleteAsync(string organisationId, string id, CancellationToken cancellationToken = default) =>
        Task.FromResult(store.Write(() =>
        {
            SiteDocument? current = store.SiteCollection.FindById(id);
            if (current is null || current.OrganisationId != organisationId)
            {
                return false;
            }

            store.ForecastCollection.DeleteMany(f => f.SiteId == id);
            store.JobRunCollection.DeleteMany(j => j.SiteId == id);
            store.ObservationCollection.DeleteMany(o => o.SiteId == id);
            store.RotationDoneCollection.DeleteMany(r => r.SiteId == id);
            store.SiteCollection.Delete(id);
            return true;
        }));
}
