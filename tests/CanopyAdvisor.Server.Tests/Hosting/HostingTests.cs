using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using CanopyAdvisor.Server.Tests.Support;
using CanopyAdvisor.Storage;
using CanopyAdvisor.Storage.LiteDb;

namespace CanopyAdvisor.Server.Tests.Hosting;

/// <summary>Start-up: the store file, demo seeding, health, the OpenAPI description.</summary>
public sealed class HostingTests(CanopyFactory factory) : IClassFixture<CanopyFactory>
{
    // Every endpoint of this part, as (method, OpenAPI path).
    public static TheoryData<string, string> Endpoints => new()
    {
        { "post", "/api/session" }, { "delete", "/api/session" }, { "get", "/api/me" },
        { "post", "/api/tokens" }, { "get", "/api/tokens" }, { "delete", "/api/tokens/{id}" },
        { "get", "/api/users" }, { "post", "/api/users" }, { "get", "/api/users/{id}" }, { "put", "/api/users/{id}" }, { "delete", "/api/users/{id}" },
        { "get", "/api/sites" }, { "post", "/api/sites" }, { "get", "/api/sites/{siteId}" }, { "put", "/api/sites/{siteId}" }, { "delete", "/api/sites/{siteId}" },
        { "post", "/api/sites/{siteId}/forecasts" }, { "get", "/api/sites/{siteId}/forecasts" }, { "get", "/api/sites/{siteId}/forecasts/{forecastId}" },
        { "get", "/api/crops" }, { "get", "/api/crops/{cropId}" },
    };

    [Theory]
    [MemberData(nameof(Endpoints))]
    public async Task The_OpenAPI_document_lists_every_endpoint(string method, string path)
    {
        // Served without sign-in at /openapi/v1.json (OpenAPI 3.x document).
        JsonElement document = await factory.CreateClient().GetFromJsonAsync<JsonElement>("/openapi/v1.json");
        Assert.StartsWith("3.", document.GetProperty("openapi").GetString(), StringComparison.Ordinal);
        Assert.True(document.GetProperty("paths").GetProperty(path).TryGetProperty(method, out JsonElement operation), $"{method} {path}");
        Assert.False(string.IsNullOrEmpty(operation.GetProperty("summary").GetString()));
    }

    [Fact]
    public async Task NodaTime_values_are_described_as_strings()
    {
        JsonElement schemas = (await factory.CreateClient().GetFromJsonAsync<JsonElement>("/openapi/v1.json")).GetProperty("components").GetProperty("schemas");
        // OpenAPI 3.1 §4.8.24.2 data types: "date-time" as defined by RFC 3339 §5.6, which is how Instant and OffsetDateTime are sent.
        foreach (string name in new[] { "Instant", "OffsetDateTime" })
        {
            Assert.Equal("string", schemas.GetProperty(name).GetProperty("type").GetString());
            Assert.Equal("date-time", schemas.GetProperty(name).GetProperty("format").GetString());
        }
    }

    [Fact]
    public async Task The_OpenAPI_document_names_both_ways_to_sign_in()
    {
        JsonElement schemes = (await factory.CreateClient().GetFromJsonAsync<JsonElement>("/openapi/v1.json")).GetProperty("components").GetProperty("securitySchemes");
        // OpenAPI 3.1 §4.8.27: an "http" scheme with "bearer" (RFC 6750), and an "apiKey" in a cookie.
        Assert.Equal("bearer", schemes.GetProperty("apiToken").GetProperty("scheme").GetString());
        Assert.Equal("cookie", schemes.GetProperty("session").GetProperty("in").GetString());
        Assert.Equal("canopy.session", schemes.GetProperty("session").GetProperty("name").GetString());
    }

    [Fact]
    public async Task Health_answers_without_sign_in()
    {
        HttpResponseMessage response = await factory.CreateClient().GetAsync("/health");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("Healthy", await response.Content.ReadAsStringAsync());
    }

    [Fact]
    public async Task A_new_store_is_seeded_with_the_demo_organisation()
    {
        UserRecord admin = (await factory.Store.Users.FindByEmailAsync(Demo.Admin))!;
        Assert.True((await factory.Store.Organisations.GetAsync(admin.OrganisationId))!.DemoData);
        Assert.Equal(
            [UserRole.Admin, UserRole.LightingDesigner, UserRole.Grower, UserRole.Manager],
            (await factory.Store.Users.ListAsync(admin.OrganisationId)).Where(u => u.Email.EndsWith("@demo.invalid", StringComparison.Ordinal)).Take(4).Select(u => u.Role));
        Assert.Equal(["demo-glasshouse", "demo-indoor-farm"], (await factory.Store.Sites.ListAsync(admin.OrganisationId)).Select(s => s.SiteKey));
        Assert.True(File.Exists(Path.Combine(factory.DataFolder, "canopy.db")));
    }
}

/// <summary>A factory with seeding turned off.</summary>
public sealed class NoSeedFactory() : CanopyFactory(new Dictionary<string, string?> { ["Canopy:SeedDemo"] = "false" });

/// <summary>Seeding off: an empty store stays empty and the demo sign-in does not work.</summary>
public sealed class NoSeedTests(NoSeedFactory factory) : IClassFixture<NoSeedFactory>
{
    [Fact]
    public async Task Nothing_is_seeded()
    {
        HttpResponseMessage response = await factory.CreateClient().PostAsJsonAsync("/api/session", new { email = Demo.Admin, password = CanopyFactory.DemoPassword });
        await ProblemAssert.IsProblem(response, HttpStatusCode.Unauthorized);
        Assert.Equal(0, await factory.Store.Organisations.CountAsync());
    }
}

/// <summary>Stopping the service closes the store: its file then opens again with every acknowledged write.</summary>
public sealed class ShutdownTests
{
    [Fact]
    public async Task Disposing_the_host_closes_the_store_and_keeps_acknowledged_writes()
    {
        string folder;
        string siteId;
        ICanopyStore hostStore;
        using (var factory = new KeepFolderFactory())
        {
            folder = factory.DataFolder;
            hostStore = factory.Store;
            HttpClient grower = await factory.SignedInAsync(Demo.Grower);
            siteId = await SiteEditing.SiteIdAsync(grower, "demo-indoor-farm");
            (System.Text.Json.Nodes.JsonObject site, int version) = await SiteEditing.ReadAsync(grower, siteId);
            site["lots"]![0]!["heightMm"] = 41;
            Assert.Equal(HttpStatusCode.OK, (await SiteEditing.ReplaceAsync(grower, siteId, site, version)).StatusCode);
        }

        // The host's store is closed once the factory is disposed.
        Exception closed = await Record.ExceptionAsync(() => hostStore.Organisations.CountAsync());
        Assert.IsType<ObjectDisposedException>(closed, exactMatch: false);
        try
        {
            // The host closes the store within its stop (StoreStartup.StopAsync), which disposing the factory awaits;
            // only then may the file be opened again (direct mode does not stop a second instance from opening it; two open instances corrupt it).
            using var store = new LiteDbCanopyStore(Path.Combine(folder, "canopy.db"));
            UserRecord grower = (await store.Users.FindByEmailAsync(Demo.Grower))!;
            SiteRecord stored = (await store.Sites.GetAsync(grower.OrganisationId, siteId))!;
            Assert.Equal(2, stored.Version);
            Assert.Contains("\"heightMm\":41", stored.Json, StringComparison.Ordinal);
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    private sealed class KeepFolderFactory : CanopyFactory
    {
        // Keep the folder for the check after disposal.
        protected override bool DeleteFolderOnDispose => false;
    }
}
