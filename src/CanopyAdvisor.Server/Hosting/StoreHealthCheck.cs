using CanopyAdvisor.Storage;
using Microsoft.Extensions.Diagnostics.HealthChecks;

namespace CanopyAdvisor.Server.Hosting;

/// <summary>Healthy when the store answers a read.</summary>
internal sealed class StoreHealthCheck(ICanopyStore store) : IHealthCheck
{
    public async Task<HealthCheckResult> CheckHealthAsync(HealthCheckContext context, CancellationToken cancellationToken = default)
    {
        try
        {
            await store.Organisations.CountAsync(cancellationToken);
            return HealthCheckResult.Healthy("the store answers");
        }
        catch (Exception e) when (e is IOException or LiteDB.LiteException or ObjectDisposedException)
        {
            return HealthCheckResult.Unhealthy("the store does not answer", e);
        }
    }
}
