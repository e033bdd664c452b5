using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using System.Text.Json.Nodes;
using CanopyAdvisor.Files.SideLamps;
using CanopyAdvisor.Server.Tests.Support;

namespace CanopyAdvisor.Server.Tests.Api;

/// <summary>Side-lamp proposals through the API: lighting designers and admins only, other organisations' sites 404,
/// a bad brief is one ProblemDetails (RFC 9457) listing every problem, and a proposal carries its safety cautions.</summary>
/// <remarks>The demo glasshouse with a cut-down demo brief (one rail, at most one lamp, one search start) over one day, to
/// keep the test short.</remarks>
public sealed class LampsApiTests(CanopyFactory factory) : IClassFixture<CanopyFactory>
{
    private const string Query = "?now=2026-12-02T09%3A00%3A00%2B01%3A00&days=1";

    private static JsonObject Brief(double riskFraction = 0.3)
    {
        JsonObject brief = JsonNode.Parse(DemoSideLampBriefs.ReadText("glasshouse"))!.AsObject();
        brief["rails"]!.AsArray().RemoveAt(1);
        brief["maxLamps"] = 1;
        brief["starts"] = 1;
        brief["riskFraction"] = riskFraction;
        return brief;
    }

    private async Task<(HttpClient Client, string SiteId)> AsAsync(string email)
    {
        HttpClient client = await factory.SignedInAsync(email);
        return (client, await SiteEditing.SiteIdAsync(client, "demo-glasshouse"));
    }

    [Fact]
    public async Task A_designer_gets_a_lamp_for_the_bench_at_risk_with_the_cautions()
    {
        (HttpClient designer, string siteId) = await AsAsync(Demo.Designer);
        HttpResponseMessage response = await designer.PostAsync($"/api/sites/{siteId}/lamps{Query}", SiteEditing.Json(Brief().ToJsonString()));
        JsonElement view = await response.Content.ReadFromJsonAsync<JsonElement>();
        Assert.True(response.StatusCode == HttpStatusCode.OK, view.GetRawText());
        // north-4 (tagetes) leans about 8° against a 15° grade limit, over 0.3 of it (canopy lamps on the same demo).
        Assert.Contains("north-4", view.GetProperty("benchesAtRisk").EnumerateArray().Select(b => b.GetString()));
        JsonElement lamp = Assert.Single(view.GetProperty("lamps").EnumerateArray());
        Assert.Equal("east-wall-north", lamp.GetProperty("rail").GetString());
        JsonElement bench = view.GetProperty("benches").EnumerateArray().Single(b => b.GetProperty("benchId").GetString() == "north-4");
        // The lamp is placed to cut the lateral blue light on the bench at risk.
        Assert.True(bench.GetProperty("after").GetProperty("lateralBlue").GetDouble() < bench.GetProperty("before").GetProperty("lateralBlue").GetDouble());
        // COMMON.md: electrical work and work at height defer to local codes and licensed practice.
        string cautions = string.Join(" ", view.GetProperty("cautions").EnumerateArray().Select(c => c.GetString()));
        Assert.Contains("licensed electrician", cautions, StringComparison.Ordinal);
        Assert.Contains("height", cautions, StringComparison.Ordinal);
    }

    [Theory]
    // The server README's matrix: lamps are the lighting designers' (and admins') sections.
    [InlineData(Demo.Admin, HttpStatusCode.OK)]
    [InlineData(Demo.Grower, HttpStatusCode.Forbidden)]
    [InlineData(Demo.Manager, HttpStatusCode.Forbidden)]
    public async Task Only_designers_and_admins_may_ask(string email, HttpStatusCode expected)
    {
        (HttpClient client, string siteId) = await AsAsync(email);
        // No bench leans 0.95 of its grade limit: nothing at risk, so the answer comes without a search.
        HttpResponseMessage response = await client.PostAsync($"/api/sites/{siteId}/lamps{Query}", SiteEditing.Json(Brief(0.95).ToJsonString()));
        if (expected == HttpStatusCode.OK)
        {
            JsonElement view = await response.Content.ReadFromJsonAsync<JsonElement>();
            Assert.True(response.StatusCode == HttpStatusCode.OK, view.GetRawText());
            Assert.Empty(view.GetProperty("lamps").EnumerateArray());
        }
        else
        {
            await ProblemAssert.IsProblem(response, expected);
        }
    }

    [Fact]
    public async Task Another_organisations_site_is_404()
    {
        await factory.AddOtherOrganisationAsync();
        (_, string siteId) = await AsAsync(Demo.Designer);
        HttpClient other = await factory.SignedInAsync(CanopyFactory.OtherAdminEmail);
        await ProblemAssert.IsProblem(await other.PostAsync($"/api/sites/{siteId}/lamps{Query}", SiteEditing.Json(Brief().ToJsonString())), HttpStatusCode.NotFound);
    }

    public static TheoryData<string, string, string, string[]> BadBriefs()
    {
        JsonObject unknown = Brief();
        unknown["lampCount"] = 2;
        unknown["lampTypes"] = new JsonArray("no-such-type");
        JsonObject ranges = Brief();
        ranges["maxLamps"] = -1;
        ranges["uniformityFloor"] = 1.5;
        return new()
        {
            // The brief reader's rules (Files/SideLamps/SideLampBriefReader): unknown properties, lamp types the site lacks, ranges.
            { "every problem of the brief's shape at once", Query, unknown.ToJsonString(), ["lampCount", "lampTypes[0]"] },
            { "every range problem at once (checked when the shape is right)", Query, ranges.ToJsonString(), ["maxLamps", "uniformityFloor"] },
            { "malformed JSON", Query, """{"rails": [""", [] },
            { "days out of 1–60 (as canopy lamps)", "?days=0", Brief().ToJsonString(), ["days"] },
            { "start without an offset (ISO 8601)", "?now=2026-12-02T09%3A00%3A00", Brief().ToJsonString(), ["now"] },
            { "no brief", Query, "", ["body"] },
        };
    }

    [Theory]
    [MemberData(nameof(BadBriefs))]
    public async Task A_bad_brief_is_400_listing_every_problem(string label, string query, string body, string[] paths)
    {
        Assert.NotNull(label);
        (HttpClient designer, string siteId) = await AsAsync(Demo.Designer);
        await ProblemAssert.IsInvalid(await designer.PostAsync($"/api/sites/{siteId}/lamps{query}", SiteEditing.Json(body)), paths);
    }
}
