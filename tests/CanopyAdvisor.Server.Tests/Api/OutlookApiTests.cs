using System.Net;
using CanopyAdvisor.Reports.Outlook;
using CanopyAdvisor.Server.Tests.Support;

namespace CanopyAdvisor.Server.Tests.Api;

/// <summary>The weekly outlook through the API: the page (HTML) and the CSV (RFC 4180) for every role, other
/// organisations' sites 404, bad options one ProblemDetails.</summary>
/// <remarks>Fast: the demo indoor room (no sky) over one day.</remarks>
public sealed class OutlookApiTests(CanopyFactory factory) : IClassFixture<CanopyFactory>
{
    private const string Query = "?now=2026-12-02T06%3A00%3A00-06%3A00&days=1";

    private async Task<(HttpClient Client, string SiteId)> AsAsync(string email)
    {
        HttpClient client = await factory.SignedInAsync(email);
        return (client, await SiteEditing.SiteIdAsync(client, "demo-indoor-farm"));
    }

    [Theory]
    // Every role reads the outlook (the server README's matrix).
    [InlineData(Demo.Manager)]
    [InlineData(Demo.Grower)]
    [InlineData(Demo.Designer)]
    [InlineData(Demo.Admin)]
    public async Task Every_role_gets_the_page_and_the_csv(string email)
    {
        (HttpClient client, string siteId) = await AsAsync(email);
        HttpResponseMessage page = await client.GetAsync($"/api/sites/{siteId}/outlook{Query}");
        Assert.Equal(HttpStatusCode.OK, page.StatusCode);
        Assert.Equal("text/html", page.Content.Headers.ContentType?.MediaType);
        string html = await page.Content.ReadAsStringAsync();
        // An HTML document (WHATWG HTML: the doctype first) naming every bench of the demo room (3 racks × 4 tiers).
        Assert.StartsWith("<!DOCTYPE html>", html.TrimStart(), StringComparison.OrdinalIgnoreCase);
        foreach (string rack in new[] { "a", "b", "c" })
        {
            for (int tier = 1; tier <= 4; tier++)
            {
                Assert.Contains($"rack-{rack}-tier-{tier}", html, StringComparison.Ordinal);
            }
        }

        HttpResponseMessage csv = await client.GetAsync($"/api/sites/{siteId}/outlook.csv{Query}");
        Assert.Equal(HttpStatusCode.OK, csv.StatusCode);
        // RFC 4180 §3: text/csv; §2: CRLF-ended records, a header first.
        Assert.Equal("text/csv", csv.Content.Headers.ContentType?.MediaType);
        string[] rows = (await csv.Content.ReadAsStringAsync()).Split("\r\n");
        Assert.Equal(string.Join(",", OutlookCsv.Header), rows[0]);
        Assert.Equal("", rows[^1]);
        Assert.Equal(12, rows.Length - 2);
    }

    [Fact]
    public async Task Another_organisations_site_is_404()
    {
        await factory.AddOtherOrganisationAsync();
        (_, string siteId) = await AsAsync(Demo.Grower);
        HttpClient other = await factory.SignedInAsync(CanopyFactory.OtherAdminEmail);
        await ProblemAssert.IsProblem(await other.GetAsync($"/api/sites/{siteId}/outlook"), HttpStatusCode.NotFound);
        await ProblemAssert.IsProblem(await other.GetAsync($"/api/sites/{siteId}/outlook.csv"), HttpStatusCode.NotFound);
    }

    [Theory]
    [InlineData("?days=0&now=2026-12-02T06%3A00%3A00", new[] { "days", "now" })] // 1–14 days; ISO 8601 with an offset
    [InlineData("?days=15", new[] { "days" })]
    public async Task Bad_options_are_400_with_every_problem(string query, string[] paths)
    {
        (HttpClient grower, string siteId) = await AsAsync(Demo.Grower);
        await ProblemAssert.IsInvalid(await grower.GetAsync($"/api/sites/{siteId}/outlook{query}"), paths);
        await ProblemAssert.IsInvalid(await grower.GetAsync($"/api/sites/{siteId}/outlook.csv{query}"), paths);
    }
}
