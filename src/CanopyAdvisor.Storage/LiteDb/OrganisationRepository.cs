namespace CanopyAdvisor.Storage.LiteDb;

/// <summary>Organisations in the LiteDB store.</summary>
internal sealed class OrganisationRepository(LiteDbCanopyStore store) : IOrganisationStore
{
    public Task<OrganisationRecord?> GetAsync(string id, CancellationToken cancellationToken = default) =>
        Task.FromResult(store.OrganisationCollection.FindById(id)?.ToRecord());

    public Task<int> CountAsync(CancellationToken cancellationToken = default) =>
        Task.FromResult(store.OrganisationCollection.Count());
}
