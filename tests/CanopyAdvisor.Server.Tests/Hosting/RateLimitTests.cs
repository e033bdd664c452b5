using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using CanopyAdvisor.Server.Tests.Support;

namespace CanopyAdvisor.Server.Tests.Hosting;

/// <summary>A factory allowing 3 sign-in attempts per minute.</summary>
public sealed class TightSignInFactory() : CanopyFactory(new Dictionary<string, string?> { ["Canopy:SignInAttemptsPerMinute"] = "3" });

/// <summary>A factory allowing 40 requests per caller per minute.</summary>
public sealed class TightRequestsFactory() : CanopyFactory(new Dictionary<string, string?> { ["Canopy:RequestsPerMinute"] = "40" });

/// <summary>Sign-in attempts are limited per client: 429 Too Many Requests (RFC 6585 §4) with Retry-After (RFC 9110 §10.2.3), as a problem.</summary>
public sealed class SignInRateLimitTests(TightSignInFactory factory) : IClassFixture<TightSignInFactory>
{
    [Fact]
    public async Task Sign_in_attempts_beyond_the_limit_get_429()
    {
        HttpClient client = factory.CreateClient();
        var statuses = new List<HttpStatusCode>();
        for (int i = 0; i < 4; i++)
        {
            statuses.Add((await client.PostAsJsonAsync("/api/session", new { email = Demo.Grower, password = "guessing password " + i })).StatusCode);
        }

        // OWASP authentication guidance (from memory): limit password guessing per client.
        Assert.Equal([HttpStatusCode.Unauthorized, HttpStatusCode.Unauthorized, HttpStatusCode.Unauthorized], statuses.Take(3));
        HttpResponseMessage refused = await client.PostAsJsonAsync("/api/session", new { email = Demo.Grower, password = CanopyFactory.DemoPassword });
        JsonElement problem = await ProblemAssert.IsProblem(refused, HttpStatusCode.TooManyRequests);
        Assert.True(refused.Headers.RetryAfter?.Delta > TimeSpan.Zero);
        Assert.Contains("try again", problem.GetProperty("detail").GetString(), StringComparison.Ordinal);
    }

}

/// <summary>Requests are limited per caller; the refusal is 429, not the rate limiter's default 503.</summary>
public sealed class RequestRateLimitTests(TightRequestsFactory factory) : IClassFixture<TightRequestsFactory>
{
    [Fact]
    public async Task Requests_beyond_the_per_caller_limit_get_429_not_503()
    {
        HttpClient client = factory.CreateClient();
        HttpResponseMessage last = new(HttpStatusCode.OK);
        for (int i = 0; i < 60 && last.StatusCode != HttpStatusCode.TooManyRequests; i++)
        {
            last = await client.GetAsync("/health");
            Assert.NotEqual(HttpStatusCode.ServiceUnavailable, last.StatusCode);
        }

        await ProblemAssert.IsProblem(last, HttpStatusCode.TooManyRequests);
    }
}
