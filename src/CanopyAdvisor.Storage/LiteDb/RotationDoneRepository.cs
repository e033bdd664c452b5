namespace CanopyAdvisor.Storage.LiteDb;

/// <summary>Rotations done in the LiteDB store.</summary>
internal sealed class RotationDoneRepository(LiteDbCanopyStore store) : IRotationDoneStore
{
    public Task<IReadOnlyList<RotationDoneRecord>> ListAsync(string organisationId, string siteId, CancellationToken cancellationToken = default)
    {
        List<RotationDoneRecord> list = store.RotationDoneCollection.Find(r => r.SiteId == siteId)
            .Where(r => r.OrganisationId == organisationId)
            .Select(r => r.ToRecord())
            .OrderBy(r => r.At)
            .ThenBy(r => r.Id, StringComparer.Ordinal)
            .ToList();
        return Task.FromResult<IReadOnlyList<RotationDoneRecord>>(list);
    }

    public Task<WriteOutcome> AddAsync(IReadOnlyList<RotationDoneRecord> rotations, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(rotations);
        cancellationToken.ThrowIfCancellationRequested();
        return Task.FromResult(store.Write(() =>
        {
            store.RotationDoneCollection.InsertBulk(rotations.Select(RotationDoneDocument.From));
            return WriteOutcome.Written;
        }));
    }

    public Task<bool> DeleteAsync(string organisationId, string siteId, string id, CancellationToken cancellationToken = default) =>
        Task.FromResult(store.Write(() =>
        {
            RotationDoneDocument? current = store.RotationDoneCollection.FindById(id);
            return current is not null && current.OrganisationId == organisationId && current.SiteId == siteId
                && store.RotationDoneCollection.Delete(id);
        }));
}
