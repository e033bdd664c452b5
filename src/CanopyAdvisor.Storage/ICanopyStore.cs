namespace CanopyAdvisor.Storage;

/// <summary>The service's store: one repository per kind of document, and the writes that span kinds.</summary>
/// <remarks>
/// <para>The store keeps documents and their keys; it holds no domain rules (the service validates sites, checks roles
/// and computes forecasts before it writes). Every read and write of organisation data takes the organisation id, so
/// an id of another organisation is simply not found. A write that touches several documents is atomic.</para>
/// <para>Implementations: <c>LiteDbCanopyStore</c> (embedded, one process, the default); a PostgreSQL store can follow
/// behind this interface for several service nodes. Implementations are thread-safe and are used as singletons;
/// disposing closes the underlying database.</para>
/// </remarks>
public interface ICanopyStore : IDisposable
{
    /// <summary>Organisations.</summary>
    IOrganisationStore Organisations { get; }

    /// <summary>User accounts.</summary>
    IUserStore Users { get; }

    /// <summary>API tokens (hashes only).</summary>
    IApiTokenStore ApiTokens { get; }

    /// <summary>Sites (site file text with bookkeeping).</summary>
    ISiteStore Sites { get; }

    /// <summary>Forecasts kept by the hash of their inputs.</summary>
    IForecastStore Forecasts { get; }

    /// <summary>The history of scheduled job runs.</summary>
    IJobRunStore JobRuns { get; }

    /// <summary>Observations (measured leans) per site.</summary>
    IObservationStore Observations { get; }

    /// <summary>Rotations done per site.</summary>
    IRotationDoneStore RotationsDone { get; }

    /// <summary>The organisations' crop variants.</summary>
    ICropVariantStore CropVariants { get; }

    /// <summary>Adds an organisation with its first users and sites in one atomic write (used to seed the demo and to
    /// register an organisation).</summary>
    /// <param name="organisation">The organisation.</param>
    /// <param name="users">Its users (each of this organisation).</param>
    /// <param name="sites">Its sites (each of this organisation).</param>
    /// <param name="cancellationToken">Cancels before the write starts.</param>
    /// <returns><see cref="WriteOutcome.Written"/>, or <see cref="WriteOutcome.KeyTaken"/> when an id, e-mail or site
    /// key is taken (then nothing is written).</returns>
    Task<WriteOutcome> AddOrganisationAsync(
        OrganisationRecord organisation,
        IReadOnlyList<UserRecord> users,
        IReadOnlyList<SiteRecord> sites,
        CancellationToken cancellationToken = default);
}
