namespace CanopyAdvisor.Storage;

/// <summary>Sites.</summary>
public interface ISiteStore
{
    /// <summary>The organisation's sites, by site key.</summary>
    Task<IReadOnlyList<SiteRecord>> ListAsync(string organisationId, CancellationToken cancellationToken = default);

    /// <summary>Every site of every organisation (for the service's own work, such as building job schedules at start;
    /// never for answering a caller).</summary>
    Task<IReadOnlyList<SiteRecord>> ListAllAsync(CancellationToken cancellationToken = default);

    /// <summary>The site with this id in this organisation, or null (also for a site of another organisation).</summary>
    Task<SiteRecord?> GetAsync(string organisationId, string id, CancellationToken cancellationToken = default);

    /// <summary>Adds a site; <see cref="WriteOutcome.KeyTaken"/> when the organisation already has a site with this
    /// site key (or the id is taken).</summary>
    Task<WriteOutcome> AddAsync(SiteRecord site, CancellationToken cancellationToken = default);

    /// <summary>Replaces a site if its stored version is still <paramref name="expectedVersion"/>; the record passed
    /// carries the new version. <see cref="WriteOutcome.NotFound"/>, <see cref="WriteOutcome.VersionMismatch"/> or
    /// <see cref="WriteOutcome.KeyTaken"/> (another site of the organisation has the new site key) write nothing.</summary>
    Task<WriteOutcome> ReplaceAsync(SiteRecord site, int expectedVersion, CancellationToken cancellationToken = default);

    /// <summary>Deletes a site with its forecasts and job runs in one atomic write; false when there is no such site in the organisation.</summary>
    Task<bool> DeleteAsync(string organisationId, string id, CancellationToken cancellationToken = default);
}
