using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using CanopyAdvisor.Server.Tests.Support;

namespace CanopyAdvisor.Server.Tests.Api;

/// <summary>Sign-in with a cookie, sign-out, and the current user.</summary>
public sealed class SessionApiTests(CanopyFactory factory) : IClassFixture<CanopyFactory>
{
    [Theory]
    // RFC 9110 §15.5.2: 401 when credentials are missing or wrong. OWASP authentication guidance (from memory): the same
    // answer for an unknown account and a wrong password, so sign-in does not reveal which e-mails exist.
    [InlineData(Demo.Grower, "wrong password here")]
    [InlineData("nobody@demo.invalid", CanopyFactory.DemoPassword)]
    public async Task A_wrong_password_and_an_unknown_email_get_the_same_401(string email, string password)
    {
        HttpClient client = factory.CreateClient();
        HttpResponseMessage response = await client.PostAsJsonAsync("/api/session", new { email, password });
        JsonElement problem = await ProblemAssert.IsProblem(response, HttpStatusCode.Unauthorized);
        Assert.Equal("the e-mail or the password is wrong", problem.GetProperty("detail").GetString());
        Assert.False(response.Headers.Contains("Set-Cookie"));
    }

    [Fact]
    public async Task Signing_in_sets_an_HttpOnly_SameSite_cookie_and_signing_out_ends_it()
    {
        HttpClient client = factory.CreateClient();
        HttpResponseMessage response = await client.PostAsJsonAsync("/api/session", new { email = "GROWER@demo.invalid", password = CanopyFactory.DemoPassword });
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        // RFC 6265 §4.1.2.6 HttpOnly; SameSite=Strict (RFC 6265bis draft; OWASP session guidance, from memory).
        string cookie = Assert.Single(response.Headers.GetValues("Set-Cookie"));
        Assert.Contains("httponly", cookie, StringComparison.OrdinalIgnoreCase);
        Assert.Contains("samesite=strict", cookie, StringComparison.OrdinalIgnoreCase);

        JsonElement me = await client.GetFromJsonAsync<JsonElement>("/api/me");
        Assert.Equal("grower", me.GetProperty("user").GetProperty("role").GetString());
        Assert.True(me.GetProperty("demoData").GetBoolean());
        Assert.Equal("labour, lots, temperatures", me.GetProperty("siteSectionsYouMayChange").GetString());

        Assert.Equal(HttpStatusCode.NoContent, (await client.DeleteAsync("/api/session")).StatusCode);
        await ProblemAssert.IsProblem(await client.GetAsync("/api/me"), HttpStatusCode.Unauthorized);
    }

    [Theory]
    [InlineData("/api/me")]
    [InlineData("/api/sites")]
    [InlineData("/api/tokens")]
    [InlineData("/api/users")]
    [InlineData("/api/crops")]
    [InlineData("/api/sites/any/forecasts")]
    public async Task Every_api_endpoint_needs_a_sign_in(string path)
    {
        HttpResponseMessage response = await factory.CreateClient().GetAsync(path);
        await ProblemAssert.IsProblem(response, HttpStatusCode.Unauthorized);
        // RFC 9110 §11.6.1: a 401 carries a WWW-Authenticate challenge; RFC 6750 §3 names the Bearer scheme and realm,
        // with no error code when the request had no credentials (§3.1).
        string challenge = response.Headers.WwwAuthenticate.ToString();
        Assert.StartsWith("Bearer realm=", challenge, StringComparison.Ordinal);
        Assert.DoesNotContain("error=", challenge, StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_role_change_ends_the_users_cookie_at_once()
    {
        HttpClient admin = await factory.SignedInAsync(Demo.Admin);
        HttpResponseMessage created = await admin.PostAsJsonAsync("/api/users", new { email = "temp.grower@demo.invalid", displayName = "Temp", role = "grower", password = "a long enough password" });
        Assert.Equal(HttpStatusCode.Created, created.StatusCode);
        string id = (await created.Content.ReadFromJsonAsync<JsonElement>()).GetProperty("id").GetString()!;
        HttpClient user = await factory.SignedInAsync("temp.grower@demo.invalid", "a long enough password");
        Assert.Equal(HttpStatusCode.OK, (await user.GetAsync("/api/me")).StatusCode);

        HttpResponseMessage changed = await admin.PutAsJsonAsync($"/api/users/{id}", new { email = "temp.grower@demo.invalid", displayName = "Temp", role = "manager" });
        Assert.Equal(HttpStatusCode.OK, changed.StatusCode);
        // OWASP session guidance (from memory): a privilege change invalidates existing sessions.
        await ProblemAssert.IsProblem(await user.GetAsync("/api/me"), HttpStatusCode.Unauthorized);
        HttpClient again = await factory.SignedInAsync("temp.grower@demo.invalid", "a long enough password");
        Assert.Equal("manager", (await again.GetFromJsonAsync<JsonElement>("/api/me")).GetProperty("user").GetProperty("role").GetString());
    }

    [Fact]
    public async Task Removing_a_user_ends_their_cookie_at_once()
    {
        HttpClient admin = await factory.SignedInAsync(Demo.Admin);
        HttpResponseMessage created = await admin.PostAsJsonAsync("/api/users", new { email = "removed@demo.invalid", displayName = "Removed", role = "lightingDesigner", password = "removed password 1" });
        string id = (await created.Content.ReadFromJsonAsync<JsonElement>()).GetProperty("id").GetString()!;
        HttpClient user = await factory.SignedInAsync("removed@demo.invalid", "removed password 1");
        Assert.Equal(HttpStatusCode.OK, (await user.GetAsync("/api/sites")).StatusCode);
        Assert.Equal(HttpStatusCode.NoContent, (await admin.DeleteAsync($"/api/users/{id}")).StatusCode);
        await ProblemAssert.IsProblem(await user.GetAsync("/api/sites"), HttpStatusCode.Unauthorized);
    }
}
