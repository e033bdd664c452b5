namespace CanopyAdvisor.Storage.LiteDb;

/// <summary>Forecasts in the LiteDB store.</summary>
internal sealed class ForecastRepository(LiteDbCanopyStore store) : IForecastStore
{
    public Task<ForecastRecord?> FindByHashAsync(string organisationId, string siteId, string inputHash, CancellationToken cancellationToken = default)
    {
        string key = Keys.Join(organisationId, siteId, inputHash);
        return Task.FromResult(store.ForecastCollection.FindOne(f => f.InputKey == key)?.ToRecord());
    }

    public Task<ForecastRecord?> GetAsync(string organisationId, string siteId, string id, CancellationToken cancellationToken = default)
    {
        ForecastDocument? forecast = store.ForecastCollection.FindById(id);
        return Task.FromResult(forecast is not null && forecast.OrganisationId == organisationId && forecast.SiteId == siteId
            ? forecast.ToRecord()
            : null);
    }

    public Task<IReadOnlyList<ForecastRecord>> ListAsync(string organisationId, string siteId, CancellationToken cancellationToken = default)
    {
        List<ForecastRecord> forecasts = store.ForecastCollection.Find(f => f.SiteId == siteId)
            .Where(f => f.OrganisationId == organisationId)
            .Select(f => f.ToRecord())
            .OrderByDescending(f => f.CreatedAt)
            .ToList();
        return Task.FromResult<IReadOnlyList<ForecastRecord>>(forecasts);
    }

    public Task<ForecastRecord> AddAsync(ForecastRecord forecast, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(forecast);
        string key = Keys.Join(forecast.OrganisationId, forecast.SiteId, forecast.InputHash);
        return Task.FromResult(store.Write(() =>
        {
            ForecastDocument? existing = store.ForecastCollection.FindOne(f => f.InputKey == key);
            if (existing is not null)
            {
                return existing.ToRecord();
            }

            store.ForecastCollection.Insert(ForecastDocument.From(forecast));
            return forecast;
        }));
    }
}
