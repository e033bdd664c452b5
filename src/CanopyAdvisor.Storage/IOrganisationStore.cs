namespace CanopyAdvisor.Storage;

/// <summary>Organisations.</summary>
public interface IOrganisationStore
{
    /// <summary>The organisation with this id, or null.</summary>
    Task<OrganisationRecord?> GetAsync(string id, CancellationToken cancellationToken = default);

    /// <summary>How many organisations there are (0 on a new store).</summary>
    Task<int> CountAsync(CancellationToken cancellationToken = default);
}
