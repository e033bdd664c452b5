namespace CanopyAdvisor.Storage;

/// <summary>Observations (measured leans) of a site.</summary>
public interface IObservationStore
{
    /// <summary>A site's observations, in time order (then by id).</summary>
    Task<IReadOnlyList<ObservationRecord>> ListAsync(string organisationId, string siteId, CancellationToken cancellationToken = default);

    /// <summary>Adds observations in one atomic write (all or none).</summary>
    /// <returns><see cref="WriteOutcome.Written"/>, or <see cref="WriteOutcome.KeyTaken"/> when an id is taken (then nothing is written).</returns>
    Task<WriteOutcome> AddAsync(IReadOnlyList<ObservationRecord> observations, CancellationToken cancellationToken = default);

    /// <summary>Deletes one observation of this organisation and site; false when there is none.</summary>
    Task<bool> DeleteAsync(string organisationId, string siteId, string id, CancellationToken cancellationToken = default);
}
