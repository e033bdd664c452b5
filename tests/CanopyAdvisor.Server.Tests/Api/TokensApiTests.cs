using System.Net;
using System.Net.Http.Headers;
using System.Net.Http.Json;
using System.Text.Json;
using CanopyAdvisor.Server.Tests.Support;
using NodaTime;

namespace CanopyAdvisor.Server.Tests.Api;

/// <summary>API tokens: shown once, stored hashed, usable as RFC 6750 bearer tokens, revocable, expiring.</summary>
public sealed class TokensApiTests(CanopyFactory factory) : IClassFixture<CanopyFactory>
{
    private async Task<(string Token, string Id)> IssueAsync(HttpClient client, string name, int days = 30)
    {
        HttpResponseMessage response = await client.PostAsJsonAsync("/api/tokens", new { name, expiresInDays = days });
        Assert.Equal(HttpStatusCode.Created, response.StatusCode);
        JsonElement body = await response.Content.ReadFromJsonAsync<JsonElement>();
        string id = body.GetProperty("details").GetProperty("id").GetString()!;
        // RFC 9110 §15.3.2: 201 with a Location of the new resource.
        Assert.Equal($"/api/tokens/{id}", response.Headers.Location?.OriginalString);
        return (body.GetProperty("token").GetString()!, id);
    }

    private HttpClient Bearer(string token)
    {
        HttpClient client = factory.CreateClient();
        client.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", token);
        return client;
    }

    [Fact]
    public async Task A_token_is_shown_once_stored_as_its_hash_and_works_as_a_bearer_token()
    {
        HttpClient designer = await factory.SignedInAsync(Demo.Designer);
        (string token, string id) = await IssueAsync(designer, "nightly export");

        // 256 random bits in base64url are 43 characters (RFC 4648 §5), after the 4-character prefix.
        Assert.Equal(4 + 43, token.Length);
        string stored = (await factory.Store.ApiTokens.FindByHashAsync(CanopyAdvisor.Server.Accounts.ApiTokens.Hash(token)))!.TokenHash;
        Assert.Equal(64, stored.Length);
        Assert.DoesNotContain(token, await File.ReadAllTextAsync(Path.Combine(factory.DataFolder, "canopy.db")).ContinueWith(t => t.IsFaulted ? "" : t.Result));

        string list = await designer.GetStringAsync("/api/tokens");
        Assert.Contains(id, list, StringComparison.Ordinal);
        Assert.DoesNotContain(token, list, StringComparison.Ordinal);

        JsonElement me = await Bearer(token).GetFromJsonAsync<JsonElement>("/api/me");
        Assert.Equal("lightingDesigner", me.GetProperty("user").GetProperty("role").GetString());
    }

    [Fact]
    public async Task A_revoked_token_is_refused_with_invalid_token()
    {
        HttpClient grower = await factory.SignedInAsync(Demo.Grower);
        (string token, string id) = await IssueAsync(grower, "to revoke");
        Assert.Equal(HttpStatusCode.OK, (await Bearer(token).GetAsync("/api/sites")).StatusCode);

        Assert.Equal(HttpStatusCode.NoContent, (await grower.DeleteAsync($"/api/tokens/{id}")).StatusCode);
        HttpResponseMessage refused = await Bearer(token).GetAsync("/api/sites");
        JsonElement problem = await ProblemAssert.IsProblem(refused, HttpStatusCode.Unauthorized);
        // RFC 6750 §3.1: a refused token is answered with error="invalid_token".
        Assert.Contains("error=\"invalid_token\"", refused.Headers.WwwAuthenticate.ToString(), StringComparison.Ordinal);
        Assert.Equal("the token has been revoked", problem.GetProperty("detail").GetString());
        JsonElement listed = (await grower.GetFromJsonAsync<JsonElement>("/api/tokens")).EnumerateArray().Single(t => t.GetProperty("id").GetString() == id);
        Assert.Equal("revoked", listed.GetProperty("state").GetString());
    }

    [Fact]
    public async Task An_expired_token_is_refused()
    {
        HttpClient manager = await factory.SignedInAsync(Demo.Manager);
        (string token, _) = await IssueAsync(manager, "short", days: 1);
        Assert.Equal(HttpStatusCode.OK, (await Bearer(token).GetAsync("/api/sites")).StatusCode);
        factory.Clock.Advance(Duration.FromDays(1) + Duration.FromSeconds(1));
        try
        {
            HttpResponseMessage refused = await Bearer(token).GetAsync("/api/sites");
            JsonElement problem = await ProblemAssert.IsProblem(refused, HttpStatusCode.Unauthorized);
            Assert.Equal("the token has expired", problem.GetProperty("detail").GetString());
        }
        finally
        {
            factory.Clock.Advance(-(Duration.FromDays(1) + Duration.FromSeconds(1)));
        }
    }

    [Theory]
    [InlineData("cat_AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA")]
    [InlineData("not-even-our-format")]
    [InlineData("")]
    public async Task Unknown_tokens_are_refused(string token)
    {
        HttpClient client = factory.CreateClient();
        client.DefaultRequestHeaders.TryAddWithoutValidation("Authorization", "Bearer " + token);
        HttpResponseMessage refused = await client.GetAsync("/api/sites");
        await ProblemAssert.IsProblem(refused, HttpStatusCode.Unauthorized);
        Assert.Contains("invalid_token", refused.Headers.WwwAuthenticate.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task Another_users_token_cannot_be_revoked_and_answers_404()
    {
        HttpClient grower = await factory.SignedInAsync(Demo.Grower);
        HttpClient admin = await factory.SignedInAsync(Demo.Admin);
        (string token, string id) = await IssueAsync(grower, "mine");
        await ProblemAssert.IsProblem(await admin.DeleteAsync($"/api/tokens/{id}"), HttpStatusCode.NotFound);
        Assert.Equal(HttpStatusCode.OK, (await Bearer(token).GetAsync("/api/me")).StatusCode);
    }

    [Fact]
    public async Task Deleting_a_user_ends_their_tokens()
    {
        HttpClient admin = await factory.SignedInAsync(Demo.Admin);
        HttpResponseMessage created = await admin.PostAsJsonAsync("/api/users", new { email = "leaver@demo.invalid", displayName = "Leaver", role = "grower", password = "leaver password 1" });
        string userId = (await created.Content.ReadFromJsonAsync<JsonElement>()).GetProperty("id").GetString()!;
        (string token, _) = await IssueAsync(await factory.SignedInAsync("leaver@demo.invalid", "leaver password 1"), "script");
        Assert.Equal(HttpStatusCode.NoContent, (await admin.DeleteAsync($"/api/users/{userId}")).StatusCode);
        await ProblemAssert.IsProblem(await Bearer(token).GetAsync("/api/me"), HttpStatusCode.Unauthorized);
    }

    [Theory]
    // Every problem of the body at once (ARCHITECTURE: the API lists every error).
    [InlineData("""{"name":"","expiresInDays":0}""", new[] { "name", "expiresInDays" })]
    [InlineData("""{"name":"x","expiresInDays":367}""", new[] { "expiresInDays" })]
    [InlineData("""{"expiresInDays":5}""", new[] { "body" })]
    public async Task Bad_token_requests_are_400_with_every_problem(string json, string[] paths)
    {
        HttpClient grower = await factory.SignedInAsync(Demo.Grower);
        int before = (await grower.GetFromJsonAsync<JsonElement>("/api/tokens")).GetArrayLength();
        HttpResponseMessage response = await grower.PostAsync("/api/tokens", new StringContent(json, System.Text.Encoding.UTF8, "application/json"));
        await ProblemAssert.IsInvalid(response, paths);
        Assert.Equal(before, (await grower.GetFromJsonAsync<JsonElement>("/api/tokens")).GetArrayLength());
    }
}
