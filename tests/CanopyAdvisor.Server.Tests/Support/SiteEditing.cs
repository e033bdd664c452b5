using System.Net.Http.Json;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace CanopyAdvisor.Server.Tests.Support;

/// <summary>Reads a stored site and sends an edited copy back, as a client would.</summary>
public static class SiteEditing
{
    public static async Task<string> SiteIdAsync(HttpClient client, string siteKey)
    {
        List<JsonElement> sites = (await client.GetFromJsonAsync<List<JsonElement>>("/api/sites"))!;
        return sites.Single(s => s.GetProperty("siteKey").GetString() == siteKey).GetProperty("id").GetString()!;
    }

    /// <summary>The site file and its version.</summary>
    public static async Task<(JsonObject Site, int Version)> ReadAsync(HttpClient client, string siteId)
    {
        JsonObject body = (await client.GetFromJsonAsync<JsonObject>($"/api/sites/{siteId}"))!;
        return ((JsonObject)body["site"]!.DeepClone(), body["summary"]!["version"]!.GetValue<int>());
    }

    public static StringContent Json(string text) => new(text, Encoding.UTF8, "application/json");

    /// <summary>PUT of an edited site with If-Match of the version read.</summary>
    public static async Task<HttpResponseMessage> ReplaceAsync(HttpClient client, string siteId, JsonObject site, int? ifMatch = null)
    {
        using var request = new HttpRequestMessage(HttpMethod.Put, $"/api/sites/{siteId}") { Content = Json(site.ToJsonString()) };
        if (ifMatch is int v)
        {
            request.Headers.TryAddWithoutValidation("If-Match", $"\"{v}\"");
        }

        return await client.SendAsync(request);
    }
}
