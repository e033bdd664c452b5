using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using System.Xml.Linq;
using CanopyAdvisor.Server.Tests.Support;

namespace CanopyAdvisor.Server.Tests.Api;

/// <summary>The lean map of a site's latest forecast, and the forecast members the pages draw from (lean track, point leans).</summary>
/// <remarks>Kept fast: the indoor demo room (no sky), a 1-day horizon, no band.</remarks>
public sealed class MapsApiTests(CanopyFactory factory) : IClassFixture<CanopyFactory>
{
    private const string Options = """{"now": "2026-12-02T09:00:00-06:00", "days": 1, "includeBand": false}""";
    private static readonly XNamespace Svg = "http://www.w3.org/2000/svg";

    [Fact]
    public async Task The_lean_map_has_one_arrow_per_forecast_bench()
    {
        HttpClient grower = await factory.SignedInAsync(Demo.Grower);
        string siteId = await SiteEditing.SiteIdAsync(grower, "demo-indoor-farm");
        JsonElement forecast = await (await grower.PostAsync($"/api/sites/{siteId}/forecasts", SiteEditing.Json(Options))).Content.ReadFromJsonAsync<JsonElement>();

        HttpResponseMessage response = await grower.GetAsync($"/api/sites/{siteId}/maps/lean");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        // The SVG media type is image/svg+xml (W3C SVG 1.1 §1.2); an SVG document is well-formed XML (XML 1.0), which XDocument.Parse enforces.
        Assert.Equal("image/svg+xml", response.Content.Headers.ContentType?.MediaType);
        XDocument map = XDocument.Parse(await response.Content.ReadAsStringAsync());
        Assert.Equal(Svg + "svg", map.Root!.Name);
        string[] arrows = [.. map.Descendants(Svg + "g").Where(g => (string?)g.Attribute("class") == "arrow").Select(g => (string)g.Attribute("data-bench")!).Order(StringComparer.Ordinal)];
        string[] benches = [.. forecast.GetProperty("benches").EnumerateArray().Select(b => b.GetProperty("benchId").GetString()!).Order(StringComparer.Ordinal)];
        // The indoor demo has one lot per tier: 3 racks × 4 tiers (Files/Sites/DemoSites.cs, demo data).
        Assert.Equal(12, benches.Length);
        Assert.Equal(benches, arrows);
    }

    [Fact]
    public async Task A_forecast_keeps_the_hourly_lean_track_and_each_plants_lean_at_the_horizon()
    {
        HttpClient grower = await factory.SignedInAsync(Demo.Grower);
        string siteId = await SiteEditing.SiteIdAsync(grower, "demo-indoor-farm");
        JsonElement forecast = await (await grower.PostAsync($"/api/sites/{siteId}/forecasts", SiteEditing.Json(Options))).Content.ReadFromJsonAsync<JsonElement>();
        foreach (JsonElement bench in forecast.GetProperty("benches").EnumerateArray())
        {
            // Hourly samples from now to the horizon end inclusive: 24 h → 25 samples (BenchForecast.LeanTrack: on the hours after now, and on the end).
            JsonElement[] track = [.. bench.GetProperty("leanTrack").EnumerateArray()];
            Assert.Equal(25, track.Length);
            Assert.Equal(forecast.GetProperty("now").GetString(), track[0].GetProperty("at").GetString());
            Assert.Equal(forecast.GetProperty("horizonEnd").GetString(), track[^1].GetProperty("at").GetString());

            // The bench lean is the tilt of the mean of the plants' lean vectors: by the triangle inequality its length
            // is at most the longest one, so the bench lean is no more than the worst plant's (to the 0.01° rounding).
            double[] points = [.. bench.GetProperty("pointLeansAtHorizonDeg").EnumerateArray().Select(p => p.GetDouble())];
            Assert.NotEmpty(points);
            Assert.True(bench.GetProperty("leanAtHorizonDeg").GetDouble() <= points.Max() + 0.011, bench.GetProperty("benchId").GetString());
        }
    }

    [Fact]
    public async Task A_site_without_a_forecast_and_another_organisations_site_answer_404()
    {
        HttpClient grower = await factory.SignedInAsync(Demo.Grower);
        string glasshouse = await SiteEditing.SiteIdAsync(grower, "demo-glasshouse");
        JsonElement none = await ProblemAssert.IsProblem(await grower.GetAsync($"/api/sites/{glasshouse}/maps/lean"), HttpStatusCode.NotFound);
        Assert.Equal("No forecast yet", none.GetProperty("title").GetString());

        string other = await factory.AddOtherOrganisationAsync();
        await ProblemAssert.IsProblem(await grower.GetAsync($"/api/sites/{other}/maps/lean"), HttpStatusCode.NotFound);
        Assert.Equal(HttpStatusCode.Unauthorized, (await factory.CreateClient().GetAsync($"/api/sites/{glasshouse}/maps/lean")).StatusCode);
    }

    [Fact]
    public async Task The_OpenAPI_document_lists_the_map()
    {
        JsonElement document = await factory.CreateClient().GetFromJsonAsync<JsonElement>("/openapi/v1.json");
        Assert.True(document.GetProperty("paths").GetProperty("/api/sites/{siteId}/maps/lean").TryGetProperty("get", out _));
    }
}
