namespace CanopyAdvisor.Storage;

/// <summary>Rotations done on a site's lots.</summary>
public interface IRotationDoneStore
{
    /// <summary>A site's rotations done, in time order (then by id).</summary>
    Task<IReadOnlyList<RotationDoneRecord>> ListAsync(string organisationId, string siteId, CancellationToken cancellationToken = default);

    /// <summary>Adds rotations done in one atomic write (all or none).</summary>
    /// <returns><see cref="WriteOutcome.Written"/>, or <see cref="WriteOutcome.KeyTaken"/> when an id is taken (then nothing is written).</returns>
    Task<WriteOutcome> AddAsync(IReadOnlyList<RotationDoneRecord> rotations, CancellationToken cancellationToken = default);

    /// <summary>Deletes one rotation done of this organisation and site; false when there is none.</summary>
    Task<bool> DeleteAsync(string organisationId, string siteId, string id, CancellationToken cancellationToken = default);
}
