namespace CanopyAdvisor.Storage;

/// <summary>Forecasts, kept by the hash of their inputs.</summary>
public interface IForecastStore
{
    /// <summary>The forecast of this site with this input hash, or null.</summary>
    Task<ForecastRecord?> FindByHashAsync(string organisationId, string siteId, string inputHash, CancellationToken cancellationToken = default);

    /// <summary>The forecast with this id of this site and organisation, or null.</summary>
    Task<ForecastRecord?> GetAsync(string organisationId, string siteId, string id, CancellationToken cancellationToken = default);

    /// <summary>A site's forecasts, newest first.</summary>
    Task<IReadOnlyList<ForecastRecord>> ListAsync(string organisationId, string siteId, CancellationToken cancellationToken = default);

    /// <summary>Adds a forecast unless one with the same organisation, site and input hash exists; returns the stored
    /// one (the existing one when two identical requests raced).</summary>
    Task<ForecastRecord> AddAsync(ForecastRecord forecast, CancellationToken cancellationToken = default);
}
