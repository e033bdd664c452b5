using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using System.Text.Json.Nodes;
using CanopyAdvisor.Server.Tests.Support;

namespace CanopyAdvisor.Server.Tests.Api;

/// <summary>Forecasts through the API: computed once per set of inputs, then served from the store.</summary>
/// <remarks>Kept fast: the indoor demo room (no sky), a 1-day horizon, no band.</remarks>
public sealed class ForecastsApiTests(CanopyFactory factory) : IClassFixture<CanopyFactory>
{
    private const string Options = """{"now": "2026-12-02T09:00:00-06:00", "days": 1, "includeBand": false}""";

    [Fact]
    public async Task A_repeat_with_the_same_inputs_is_served_from_the_store()
    {
        HttpClient manager = await factory.SignedInAsync(Demo.Manager);
        string siteId = await SiteEditing.SiteIdAsync(manager, "demo-indoor-farm");

        // A start no other test of this class uses, so the first request computes whatever ran before.
        string options = Options.Replace("09:00", "07:00", StringComparison.Ordinal);
        HttpResponseMessage first = await manager.PostAsync($"/api/sites/{siteId}/forecasts", SiteEditing.Json(options));
        Assert.Equal(HttpStatusCode.Created, first.StatusCode);
        JsonElement computed = await first.Content.ReadFromJsonAsync<JsonElement>();
        string id = computed.GetProperty("id").GetString()!;
        Assert.Equal($"/api/sites/{siteId}/forecasts/{id}", first.Headers.Location?.OriginalString);
        // The indoor demo has one lot per tier: 3 racks × 4 tiers (Files/Sites/DemoSites.cs).
        Assert.Equal(12, computed.GetProperty("benches").GetArrayLength());
        // Local times in the site's zone: Chicago is UTC−6 in December (IANA tzdata, America/Chicago CST).
        Assert.Equal("2026-12-02T07:00:00-06:00", computed.GetProperty("now").GetString());
        Assert.Equal("2026-12-03T07:00:00-06:00", computed.GetProperty("horizonEnd").GetString());

        HttpResponseMessage second = await manager.PostAsync($"/api/sites/{siteId}/forecasts", SiteEditing.Json(options));
        Assert.Equal(HttpStatusCode.OK, second.StatusCode);
        JsonElement served = await second.Content.ReadFromJsonAsync<JsonElement>();
        Assert.Equal(id, served.GetProperty("id").GetString());
        Assert.Equal(computed.GetProperty("inputHash").GetString(), served.GetProperty("inputHash").GetString());
        Assert.Equal(computed.GetRawText(), served.GetRawText());

        List<JsonElement> list = (await manager.GetFromJsonAsync<List<JsonElement>>($"/api/sites/{siteId}/forecasts"))!;
        Assert.Single(list, f => f.GetProperty("id").GetString() == id);
        Assert.Equal(computed.GetRawText(), (await manager.GetFromJsonAsync<JsonElement>($"/api/sites/{siteId}/forecasts/{id}")).GetRawText());
    }

    [Fact]
    public async Task Changed_inputs_give_a_new_forecast()
    {
        HttpClient grower = await factory.SignedInAsync(Demo.Grower);
        string siteId = await SiteEditing.SiteIdAsync(grower, "demo-indoor-farm");
        JsonElement a = await (await grower.PostAsync($"/api/sites/{siteId}/forecasts", SiteEditing.Json(Options))).Content.ReadFromJsonAsync<JsonElement>();

        // Another start (one hour later) is another input.
        HttpResponseMessage later = await grower.PostAsync($"/api/sites/{siteId}/forecasts", SiteEditing.Json(Options.Replace("09:00", "10:00", StringComparison.Ordinal)));
        Assert.Equal(HttpStatusCode.Created, later.StatusCode);

        // A changed site (a grower edits a lot) is another input too.
        (JsonObject site, int version) = await SiteEditing.ReadAsync(grower, siteId);
        site["lots"]![0]!["heightMm"] = site["lots"]![0]!["heightMm"]!.GetValue<double>() + 2;
        Assert.Equal(HttpStatusCode.OK, (await SiteEditing.ReplaceAsync(grower, siteId, site, version)).StatusCode);
        HttpResponseMessage afterEdit = await grower.PostAsync($"/api/sites/{siteId}/forecasts", SiteEditing.Json(Options));
        Assert.Equal(HttpStatusCode.Created, afterEdit.StatusCode);
        JsonElement b = await afterEdit.Content.ReadFromJsonAsync<JsonElement>();
        Assert.NotEqual(a.GetProperty("inputHash").GetString(), b.GetProperty("inputHash").GetString());
        Assert.Equal(version + 1, b.GetProperty("siteVersion").GetInt32());
    }

    [Fact]
    public async Task Bad_options_are_400_with_every_problem_and_nothing_is_stored()
    {
        HttpClient grower = await factory.SignedInAsync(Demo.Grower);
        string siteId = await SiteEditing.SiteIdAsync(grower, "demo-glasshouse");
        // ISO 8601 needs an offset here (a local time alone is ambiguous across a DST change); horizon (0, 366] days.
        HttpResponseMessage response = await grower.PostAsync($"/api/sites/{siteId}/forecasts", SiteEditing.Json("""{"now": "2026-12-02T09:00:00", "days": 0}"""));
        await ProblemAssert.IsInvalid(response, "now", "days");
        await ProblemAssert.IsInvalid(await grower.PostAsync($"/api/sites/{siteId}/forecasts", SiteEditing.Json("""{"days": Infinity}""")), "days");
        await ProblemAssert.IsInvalid(await grower.PostAsync($"/api/sites/{siteId}/forecasts", SiteEditing.Json("""{"days": 1, "band": false}""")), "band");
        Assert.Empty(await factory.Store.Forecasts.ListAsync((await factory.Store.Sites.ListAsync((await factory.Store.Users.FindByEmailAsync(Demo.Grower))!.OrganisationId)).Single(s => s.Id == siteId).OrganisationId, siteId));
    }

    [Fact]
    public async Task A_site_without_lots_cannot_be_forecast()
    {
        HttpClient admin = await factory.SignedInAsync(Demo.Admin);
        JsonObject bare = JsonNode.Parse(CanopyAdvisor.Files.Sites.DemoSites.ReadText("indoor-farm"))!.AsObject();
        bare.Remove("lots");
        bare["id"] = "bare-room";
        HttpResponseMessage created = await admin.PostAsync("/api/sites", SiteEditing.Json(bare.ToJsonString()));
        string siteId = (await created.Content.ReadFromJsonAsync<JsonElement>()).GetProperty("id").GetString()!;
        await ProblemAssert.IsInvalid(await admin.PostAsync($"/api/sites/{siteId}/forecasts", SiteEditing.Json(Options)), "lots");
        // The options body may be left out altogether (every member has a default): the same answer, not "body required".
        await ProblemAssert.IsInvalid(await admin.PostAsync($"/api/sites/{siteId}/forecasts", null), "lots");
    }

    [Fact]
    public async Task Without_a_start_the_forecast_starts_at_the_top_of_the_current_hour()
    {
        HttpClient manager = await factory.SignedInAsync(Demo.Manager);
        string siteId = await SiteEditing.SiteIdAsync(manager, "demo-indoor-farm");
        // The test clock reads 2026-12-02T08:00Z, which is 02:00 in Chicago (UTC−6).
        HttpResponseMessage response = await manager.PostAsync($"/api/sites/{siteId}/forecasts", SiteEditing.Json("""{"days": 0.25, "includeBand": false}"""));
        JsonElement forecast = await response.Content.ReadFromJsonAsync<JsonElement>();
        Assert.Equal("2026-12-02T02:00:00-06:00", forecast.GetProperty("now").GetString());
        Assert.Equal("2026-12-02T08:00:00-06:00", forecast.GetProperty("horizonEnd").GetString());
    }

    [Theory]
    // Forecasting changes no site data, so every role may run one (server README, permission matrix).
    [InlineData(Demo.Admin)]
    [InlineData(Demo.Grower)]
    [InlineData(Demo.Designer)]
    [InlineData(Demo.Manager)]
    public async Task Every_role_may_run_a_forecast(string email)
    {
        HttpClient client = await factory.SignedInAsync(email);
        string siteId = await SiteEditing.SiteIdAsync(client, "demo-indoor-farm");
        HttpResponseMessage response = await client.PostAsync($"/api/sites/{siteId}/forecasts", SiteEditing.Json(Options.Replace("09:00", "05:00", StringComparison.Ordinal)));
        Assert.Contains(response.StatusCode, new[] { HttpStatusCode.Created, HttpStatusCode.OK });
        Assert.Equal(12, (await response.Content.ReadFromJsonAsync<JsonElement>()).GetProperty("benches").GetArrayLength());
    }
}
