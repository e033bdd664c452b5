using CanopyAdvisor.Storage;
using Microsoft.Extensions.Options;

namespace CanopyAdvisor.Server.Hosting;

/// <summary>Opens the store on the start-up thread before the server takes requests (so LiteDB's mapper and indexes are
/// set up once, on one thread), seeds the demo when asked, and prints where the service listens and how to sign in;
/// on shutdown (Ctrl-C), after the server has stopped taking requests, closes the store.</summary>
/// <remarks>Hosted services stop in reverse order of start, and the web server starts last, so it has stopped (and let
/// running requests finish) before <see cref="StopAsync"/> runs. Closing here, not only when the container is disposed,
/// makes the close happen within the host's stop, which callers (and the tests) await.</remarks>
internal sealed partial class StoreStartup(
    ICanopyStore store,
    DemoSeeder seeder,
    IOptions<CanopyServerOptions> options,
    IHostApplicationLifetime lifetime,
    Microsoft.AspNetCore.Hosting.Server.IServer server,
    ILogger<StoreStartup> logger) : IHostedService
{
    public async Task StartAsync(CancellationToken cancellationToken)
    {
        CanopyServerOptions settings = options.Value;
        bool seeded = settings.SeedDemo && await seeder.SeedIfEmptyAsync(settings.DemoPassword, cancellationToken);
        if (seeded)
        {
            LogSeeded(logger, settings.StorePath);
        }

        bool demoPresent = settings.SeedDemo && await store.Users.FindByEmailAsync(DemoSeeder.Users[0].Email, cancellationToken) is not null;
        lifetime.ApplicationStarted.Register(() =>
        {
            var addresses = server.Features.Get<Microsoft.AspNetCore.Hosting.Server.Features.IServerAddressesFeature>()?.Addresses ?? [];
            Console.WriteLine($"CanopyAdvisor is listening on {string.Join(", ", addresses.DefaultIfEmpty("(test host)"))}");
            Console.WriteLine($"  data folder: {settings.DataFolder}");
            Console.WriteLine("  API description: /openapi/v1.json   health: /health   stop: Ctrl-C");
            if (demoPresent)
            {
                Console.WriteLine($"  demo sign-in (demo data): {string.Join(", ", DemoSeeder.Users.Select(u => u.Email))}, password '{settings.DemoPassword}'");
            }
        });
    }

    public Task StopAsync(CancellationToken cancellationToken)
    {
        store.Dispose();
        LogClosed(logger, options.Value.StorePath);
        return Task.CompletedTask;
    }

    [LoggerMessage(Level = LogLevel.Information, Message = "Closed the store {Path}")]
    private static partial void LogClosed(ILogger logger, string path);

    [LoggerMessage(Level = LogLevel.Information, Message = "Seeded the demo organisation (demo data) into {Path}")]
    private static partial void LogSeeded(ILogger logger, string path);
}
