using System.Net;
using System.Net.Http.Json;
using System.Text;
using System.Text.Json;
using CanopyAdvisor.Files.Sites;
using CanopyAdvisor.Server.Tests.Support;

namespace CanopyAdvisor.Server.Tests.Api;

/// <summary>Each class of bad input gets the right 4xx as a ProblemDetails, never a 500, and nothing is stored.</summary>
public sealed class BadInputTests(CanopyFactory factory) : IClassFixture<CanopyFactory>
{
    // Bodies sent to POST /api/sites (admin): none of them may store a site.
    public static TheoryData<string, string, string> BadSites => new()
    {
        // RFC 8259 §2: a JSON text is a serialised value; a cut-off object is not one. The reader names line and byte.
        { "malformed JSON", """{"formatVersion": 1, "id": """, "body:1" },
        // RFC 8259 §6: "Numeric values that cannot be represented ... (such as Infinity and NaN) are not permitted."
        { "NaN literal", DemoWith("\"elevationM\": 190.0", "\"elevationM\": NaN"), "body:" },
        { "Infinity literal", DemoWith("\"elevationM\": 190.0", "\"elevationM\": Infinity"), "body:" },
        // A number too large for a double (IEEE 754 binary64 max ≈ 1.8e308) must not turn into infinity.
        { "overflowing number", DemoWith("\"elevationM\": 190.0", "\"elevationM\": 1e999"), "location.elevationM" },
        { "wrong type", DemoWith("\"elevationM\": 190.0", "\"elevationM\": \"high\""), "location.elevationM" },
        { "unknown field", DemoWith("\"elevationM\": 190.0", "\"elevationM\": 190.0, \"altitudeFt\": 623"), "location.altitudeFt" },
        // IANA time zone database: there is no zone "America/Springfield".
        { "unknown time zone", DemoWith("\"America/Chicago\"", "\"America/Springfield\""), "timeZone" },
        { "not an object", "[1, 2, 3]", "" },
        { "JSON null", "null", "" },
        // System.Text.Json reads at most 64 levels by default (JsonReaderOptions.MaxDepth): a nesting bomb is refused, not a stack overflow.
        { "nesting 10,000 deep", new string('[', 10_000) + new string(']', 10_000), "body:" },
        { "duplicate property", DemoWith("\"elevationM\": 190.0", "\"elevationM\": 190.0, \"elevationM\": 191.0"), "" },
    };

    private static string DemoWith(string find, string replace)
    {
        string text = DemoSites.ReadText("indoor-farm").Replace("\"demo-indoor-farm\"", "\"bad-input-room\"", StringComparison.Ordinal);
        Assert.Contains(find, text, StringComparison.Ordinal);
        return text.Replace(find, replace, StringComparison.Ordinal);
    }

    private async Task<int> SiteCountAsync(HttpClient admin) => (await admin.GetFromJsonAsync<List<JsonElement>>("/api/sites"))!.Count;

    [Theory]
    [MemberData(nameof(BadSites))]
    public async Task Bad_site_bodies_are_400_and_store_nothing(string label, string body, string path)
    {
        HttpClient admin = await factory.SignedInAsync(Demo.Admin);
        int before = await SiteCountAsync(admin);
        HttpResponseMessage response = await admin.PostAsync("/api/sites", SiteEditing.Json(body));
        JsonElement problem = await ProblemAssert.IsInvalid(response, path);
        Assert.False(string.IsNullOrEmpty(problem.GetProperty("detail").GetString()), label);
        Assert.Equal(before, await SiteCountAsync(admin));
    }

    [Fact]
    public async Task A_body_over_the_limit_is_413_whether_or_not_its_length_is_announced()
    {
        HttpClient admin = await factory.SignedInAsync(Demo.Admin);
        int before = await SiteCountAsync(admin);
        // The test factory sets a 256 KiB limit; the demo site is about 14 kB, so pad it with spaces (valid JSON).
        string huge = DemoWith("\"America/Chicago\"", "\"America/Chicago\"" + new string(' ', 300_000));
        // RFC 9110 §15.5.14: 413 Content Too Large.
        await ProblemAssert.IsProblem(await admin.PostAsync("/api/sites", SiteEditing.Json(huge)), HttpStatusCode.RequestEntityTooLarge);

        var streamed = new StreamContent(new MemoryStream(Encoding.UTF8.GetBytes(huge)));
        streamed.Headers.ContentType = new System.Net.Http.Headers.MediaTypeHeaderValue("application/json");
        using var request = new HttpRequestMessage(HttpMethod.Post, "/api/sites") { Content = streamed };
        request.Headers.TransferEncodingChunked = true;
        await ProblemAssert.IsProblem(await admin.SendAsync(request), HttpStatusCode.RequestEntityTooLarge);
        Assert.Equal(before, await SiteCountAsync(admin));

        // The same limit for every JSON body, here a token request padded with spaces.
        string paddedToken = "{\"name\": \"x\"" + new string(' ', 300_000) + "}";
        await ProblemAssert.IsProblem(await admin.PostAsync("/api/tokens", SiteEditing.Json(paddedToken)), HttpStatusCode.RequestEntityTooLarge);
        Assert.Empty(await admin.GetFromJsonAsync<List<JsonElement>>("/api/tokens") ?? []);
    }

    [Theory]
    // RFC 9110 §15.5.16: 415 for a body in a media type the resource does not take.
    [InlineData("text/plain")]
    [InlineData("application/x-www-form-urlencoded")]
    [InlineData("application/json; charset=latin1")]
    public async Task A_body_that_is_not_JSON_is_415(string mediaType)
    {
        HttpClient admin = await factory.SignedInAsync(Demo.Admin);
        var content = new StringContent(DemoWith("\"America/Chicago\"", "\"America/Chicago\""));
        content.Headers.ContentType = System.Net.Http.Headers.MediaTypeHeaderValue.Parse(mediaType);
        await ProblemAssert.IsProblem(await admin.PostAsync("/api/sites", content), HttpStatusCode.UnsupportedMediaType);
        var token = new StringContent("""{"name":"x"}""");
        token.Headers.ContentType = System.Net.Http.Headers.MediaTypeHeaderValue.Parse(mediaType);
        await ProblemAssert.IsProblem(await admin.PostAsync("/api/tokens", token), HttpStatusCode.UnsupportedMediaType);
    }

    [Fact]
    public async Task Bytes_that_are_not_UTF8_are_400()
    {
        HttpClient admin = await factory.SignedInAsync(Demo.Admin);
        // RFC 8259 §8.1: JSON exchanged between systems must be UTF-8; 0xFF never occurs in UTF-8 (RFC 3629 §1).
        var content = new ByteArrayContent([(byte)'{', (byte)'"', 0xFF, (byte)'"', (byte)':', (byte)'1', (byte)'}']);
        content.Headers.ContentType = new System.Net.Http.Headers.MediaTypeHeaderValue("application/json");
        await ProblemAssert.IsInvalid(await admin.PostAsync("/api/tokens", content), "body");
    }

    public static TheoryData<string, string, string> BadTypedBodies => new()
    {
        { "malformed", """{"name": "x",""", "body" },
        { "number for a string", """{"name": 5}""", "name" },
        { "string for a number", """{"name": "x", "expiresInDays": "30"}""", "expiresInDays" },
        { "fraction for an integer", """{"name": "x", "expiresInDays": 1.5}""", "expiresInDays" },
        { "NaN", """{"name": "x", "expiresInDays": NaN}""", "expiresInDays" },
        { "unknown field", """{"name": "x", "scope": "all"}""", "scope" },
        { "null for a required string", """{"name": null}""", "name" },
        { "missing required", """{}""", "body" },
        // RFC 8259 §4: names within an object SHOULD be unique; the service refuses repeats rather than pick one.
        { "repeated property", """{"name": "x", "expiresInDays": 1, "expiresInDays": 366}""", "expiresInDays" },
        { "empty body", "", "body" },
        { "array", "[]", "body" },
    };

    [Theory]
    [MemberData(nameof(BadTypedBodies))]
    public async Task Bad_typed_bodies_are_400_with_the_field_and_store_nothing(string label, string body, string path)
    {
        HttpClient manager = await factory.SignedInAsync(Demo.Manager);
        int before = (await manager.GetFromJsonAsync<List<JsonElement>>("/api/tokens"))!.Count;
        JsonElement problem = await ProblemAssert.IsInvalid(await manager.PostAsync("/api/tokens", SiteEditing.Json(body)), path);
        Assert.DoesNotContain("System.", problem.GetProperty("detail").GetString(), StringComparison.Ordinal);
        Assert.Equal(before, (await manager.GetFromJsonAsync<List<JsonElement>>("/api/tokens"))!.Count);
        _ = label;
    }

    [Theory]
    // RFC 9110 §15.5.5 / §15.5.6: unknown paths are 404, a known path with the wrong method 405, both as problems.
    [InlineData("GET", "/api/nothing-here", HttpStatusCode.NotFound)]
    [InlineData("PATCH", "/api/sites", HttpStatusCode.MethodNotAllowed)]
    public async Task Unknown_routes_and_methods_are_problems(string method, string path, HttpStatusCode status)
    {
        HttpClient admin = await factory.SignedInAsync(Demo.Admin);
        await ProblemAssert.IsProblem(await admin.SendAsync(new HttpRequestMessage(new HttpMethod(method), path)), status);
    }
}
