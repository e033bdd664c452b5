using System.Net.Http.Json;
using CanopyAdvisor.Server.Accounts;
using CanopyAdvisor.Storage;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Extensions.Configuration;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.DependencyInjection.Extensions;
using NodaTime;

namespace CanopyAdvisor.Server.Tests.Support;

/// <summary>The service in the framework's test host, with its own temporary data folder (one per test class, so no
/// test depends on another class's data), a test clock, and generous rate limits unless a class asks otherwise.</summary>
public class CanopyFactory : WebApplicationFactory<Program>
{
    /// <summary>The demo users' password (the service's default, demo data).</summary>
    public const string DemoPassword = "canopy-demo-2026";

    /// <summary>The second organisation's admin, made by <see cref="AddOtherOrganisationAsync"/>.</summary>
    public const string OtherAdminEmail = "admin@other.invalid";

    private readonly Dictionary<string, string?> _settings;

    public CanopyFactory()
        : this(new Dictionary<string, string?>())
    {
    }

    protected CanopyFactory(Dictionary<string, string?> settings)
    {
        DataFolder = Directory.CreateTempSubdirectory("canopy-server-").FullName;
        _settings = new Dictionary<string, string?>
        {
            ["Canopy:DataFolder"] = DataFolder,
            ["Canopy:SignInAttemptsPerMinute"] = "100000",
            ["Canopy:RequestsPerMinute"] = "100000",
            ["Canopy:MaxRequestBodyBytes"] = "262144",
        };
        foreach ((string key, string? value) in settings)
        {
            _settings[key] = value;
        }
    }

    public string DataFolder { get; }

    // 2026-12-02 08:00 UTC: inside the demo season (lots measured on 2026-12-01).
    public TestClock Clock { get; } = new(Instant.FromUtc(2026, 12, 2, 8, 0));

    public ICanopyStore Store => Services.GetRequiredService<ICanopyStore>();

    protected override void ConfigureWebHost(IWebHostBuilder builder)
    {
        builder.UseEnvironment("Testing");
        builder.ConfigureAppConfiguration((_, configuration) => configuration.AddInMemoryCollection(_settings));
        builder.ConfigureServices(services => services.Replace(ServiceDescriptor.Singleton<IClock>(Clock)));
    }

    /// <summary>A client signed in (cookie) as this user.</summary>
    public async Task<HttpClient> SignedInAsync(string email, string password = DemoPassword)
    {
        HttpClient client = CreateClient();
        HttpResponseMessage response = await client.PostAsJsonAsync("/api/session", new { email, password });
        Assert.Equal(System.Net.HttpStatusCode.OK, response.StatusCode);
        return client;
    }

    /// <summary>A second organisation with one admin and one site (a copy of the demo indoor farm), for cross-organisation
    /// checks; returns its site id. Idempotent.</summary>
    public async Task<string> AddOtherOrganisationAsync()
    {
        if (await Store.Users.FindByEmailAsync(OtherAdminEmail) is { } existing)
        {
            return (await Store.Sites.ListAsync(existing.OrganisationId))[0].Id;
        }

        var passwords = Services.GetRequiredService<Passwords>();
        Instant now = Clock.GetCurrentInstant();
        var user = new UserRecord("usr_other", "org_other", OtherAdminEmail, "Other admin", UserRole.Admin, passwords.Hash(DemoPassword), "stamp", now);
        var site = new SiteRecord("site_other", "org_other", "demo-indoor-farm", "Other farm", CanopyAdvisor.Files.Sites.DemoSites.ReadText("indoor-farm"), 1, now, now, user.Id);
        Assert.Equal(WriteOutcome.Written, await Store.AddOrganisationAsync(new OrganisationRecord("org_other", "Other nursery (test)", false, now), [user], [site]));
        return site.Id;
    }

    /// <summary>Whether disposing deletes the data folder (a test that reopens the file afterwards keeps it).</summary>
    protected virtual bool DeleteFolderOnDispose => true;

    protected override void Dispose(bool disposing)
    {
        base.Dispose(disposing);
        if (disposing && DeleteFolderOnDispose)
        {
            try
            {
                Directory.Delete(DataFolder, recursive: true);
            }
            catch (IOException)
            {
                // A file still held by a finishing request; the temp folder is cleaned by the system.
            }
        }
    }
}
