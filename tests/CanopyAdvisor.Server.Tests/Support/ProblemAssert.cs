using System.Net;
using System.Text.Json;

namespace CanopyAdvisor.Server.Tests.Support;

/// <summary>Checks that a response is a ProblemDetails document (RFC 9457): media type application/problem+json
/// (§3), a <c>status</c> member equal to the HTTP status (§3.1.2) and a <c>title</c> (§3.1.3).</summary>
public static class ProblemAssert
{
    public static async Task<JsonElement> IsProblem(HttpResponseMessage response, HttpStatusCode status)
    {
        string body = await response.Content.ReadAsStringAsync();
        Assert.True(status == response.StatusCode, $"expected {(int)status}, got {(int)response.StatusCode}: {body}");
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType?.MediaType);
        JsonElement problem = JsonDocument.Parse(body).RootElement.Clone();
        Assert.Equal((int)status, problem.GetProperty("status").GetInt32());
        Assert.False(string.IsNullOrEmpty(problem.GetProperty("title").GetString()));
        return problem;
    }

    /// <summary>The paths of the problem's <c>errors</c> list (this API's extension member, RFC 9457 §3.2).</summary>
    public static IReadOnlyList<string> ErrorPaths(JsonElement problem) =>
        problem.GetProperty("errors").EnumerateArray().Select(e => e.GetProperty("path").GetString()!).ToList();

    public static async Task<JsonElement> IsInvalid(HttpResponseMessage response, params string[] paths)
    {
        JsonElement problem = await IsProblem(response, HttpStatusCode.BadRequest);
        IReadOnlyList<string> found = ErrorPaths(problem);
        foreach (string path in paths)
        {
            Assert.True(found.Any(p => p.StartsWith(path, StringComparison.Ordinal)), $"no error at '{path}' in: {string.Join(", ", found)}");
        }

        return problem;
    }
}
