using System.Net;
using CanopyAdvisor.Server.Tests.Support;

namespace CanopyAdvisor.Server.Tests.Hosting;

/// <summary>The pages are served without sign-in (they hold no data), every page address loads the app, and the API's
/// own addresses keep their ProblemDetails answers.</summary>
public sealed class WebPagesTests(CanopyFactory factory) : IClassFixture<CanopyFactory>
{
    [Theory]
    [InlineData("/")]
    [InlineData("/sign-in")]
    [InlineData("/sites")]
    [InlineData("/sites/site_x")]
    [InlineData("/sites/site_x/benches/b1")]
    [InlineData("/outlook")]
    public async Task Every_page_address_loads_the_app(string path)
    {
        HttpResponseMessage response = await factory.CreateClient().GetAsync(path);
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("text/html", response.Content.Headers.ContentType?.MediaType);
        Assert.Contains("<script src=\"/app.js\"", await response.Content.ReadAsStringAsync(), StringComparison.Ordinal);
        // A content security policy (W3C CSP Level 3) keeps the pages to this service's own scripts.
        Assert.Contains("script-src 'self'", response.Headers.GetValues("Content-Security-Policy").Single(), StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("/app.js", "text/javascript")]
    [InlineData("/app.css", "text/css")]
    public async Task Scripts_and_styles_are_served_with_their_media_types(string path, string mediaType)
    {
        // Media types as registered: text/javascript (RFC 9239), text/css (RFC 2318).
        HttpResponseMessage response = await factory.CreateClient().GetAsync(path);
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal(mediaType, response.Content.Headers.ContentType?.MediaType);
    }

    [Fact]
    public async Task An_unknown_api_address_is_still_a_404_problem()
    {
        // Signed in (an anonymous caller is asked to sign in first, RFC 6750 §3), the page fallback does not answer it.
        HttpClient grower = await factory.SignedInAsync(Demo.Grower);
        await ProblemAssert.IsProblem(await grower.GetAsync("/api/no-such-thing"), HttpStatusCode.NotFound);
    }
}
