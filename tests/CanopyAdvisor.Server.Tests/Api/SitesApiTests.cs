using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using System.Text.Json.Nodes;
using CanopyAdvisor.Files.Sites;
using CanopyAdvisor.Server.Tests.Support;

namespace CanopyAdvisor.Server.Tests.Api;

/// <summary>Sites: read, create, replace, delete, with the role matrix per site section and organisation scoping.</summary>
public sealed class SitesApiTests(CanopyFactory factory) : IClassFixture<CanopyFactory>
{
    private const string Indoor = "demo-indoor-farm";

    // One edit per site section; the roles that may make it (server README's matrix).
    public static TheoryData<string, string, bool> RoleEdits => new()
    {
        { Demo.Grower, "lots", true },
        { Demo.Grower, "temperatures", true },
        { Demo.Grower, "lampRows", false },
        { Demo.Grower, "location", false },
        { Demo.Designer, "lampRows", true },
        { Demo.Designer, "lots", false },
        { Demo.Designer, "temperatures", false },
        { Demo.Manager, "lots", false },
        { Demo.Manager, "lampRows", false },
        { Demo.Admin, "location", true },
        { Demo.Admin, "lots", true },
        { Demo.Admin, "lampRows", true },
    };

    private static void Edit(JsonObject site, string section)
    {
        switch (section)
        {
            case "lots":
                site["lots"]![0]!["heightMm"] = site["lots"]![0]!["heightMm"]!.GetValue<double>() + 1;
                break;
            case "temperatures":
                site["temperatures"]!["dayC"] = site["temperatures"]!["dayC"]!.GetValue<double>() == 21 ? 22 : 21;
                break;
            case "lampRows":
                site["lampRows"]![0]!["dimming"] = site["lampRows"]![0]!["dimming"]!.GetValue<double>() == 1 ? 0.9 : 1.0;
                break;
            case "location":
                site["location"]!["elevationM"] = site["location"]!["elevationM"]!.GetValue<double>() + 1;
                break;
        }
    }

    [Theory]
    [MemberData(nameof(RoleEdits))]
    public async Task Each_role_changes_only_its_own_sections(string email, string section, bool allowed)
    {
        HttpClient client = await factory.SignedInAsync(email);
        string siteId = await SiteEditing.SiteIdAsync(client, Indoor);
        (JsonObject site, int version) = await SiteEditing.ReadAsync(client, siteId);
        Edit(site, section);
        HttpResponseMessage response = await SiteEditing.ReplaceAsync(client, siteId, site, version);
        (JsonObject after, int versionAfter) = await SiteEditing.ReadAsync(client, siteId);
        if (allowed)
        {
            Assert.Equal(HttpStatusCode.OK, response.StatusCode);
            Assert.Equal(version + 1, versionAfter);
            Assert.True(JsonNode.DeepEquals(site[section], after[section]));
            // RFC 9110 §8.8.3: the ETag of the new representation.
            Assert.Equal($"\"{versionAfter}\"", response.Headers.ETag?.Tag);
        }
        else
        {
            JsonElement problem = await ProblemAssert.IsProblem(response, HttpStatusCode.Forbidden);
            if (email != Demo.Manager)
            {
                Assert.Equal([section], ProblemAssert.ErrorPaths(problem));
            }

            Assert.Equal(version, versionAfter);
        }
    }

    [Fact]
    public async Task A_forbidden_section_refuses_the_whole_write_and_names_only_that_section()
    {
        HttpClient grower = await factory.SignedInAsync(Demo.Grower);
        string siteId = await SiteEditing.SiteIdAsync(grower, Indoor);
        (JsonObject site, int version) = await SiteEditing.ReadAsync(grower, siteId);
        Edit(site, "lots");
        Edit(site, "location");
        Edit(site, "lampRows");
        JsonElement problem = await ProblemAssert.IsProblem(await SiteEditing.ReplaceAsync(grower, siteId, site), HttpStatusCode.Forbidden);
        Assert.Equal(["lampRows", "location"], ProblemAssert.ErrorPaths(problem));
        Assert.Equal(version, (await SiteEditing.ReadAsync(grower, siteId)).Version);
    }

    [Fact]
    public async Task A_stale_If_Match_is_412_and_nothing_changes()
    {
        HttpClient admin = await factory.SignedInAsync(Demo.Admin);
        string siteId = await SiteEditing.SiteIdAsync(admin, Indoor);
        (JsonObject site, int version) = await SiteEditing.ReadAsync(admin, siteId);
        Edit(site, "location");
        // RFC 9110 §13.1.1: If-Match with no current ETag → 412 Precondition Failed.
        await ProblemAssert.IsProblem(await SiteEditing.ReplaceAsync(admin, siteId, site, version - 1 + 100), HttpStatusCode.PreconditionFailed);
        Assert.Equal(version, (await SiteEditing.ReadAsync(admin, siteId)).Version);
    }

    [Fact]
    public async Task Reading_gives_the_site_file_and_its_version_as_ETag()
    {
        HttpClient manager = await factory.SignedInAsync(Demo.Manager);
        string siteId = await SiteEditing.SiteIdAsync(manager, "demo-glasshouse");
        HttpResponseMessage response = await manager.GetAsync($"/api/sites/{siteId}");
        JsonObject body = (await response.Content.ReadFromJsonAsync<JsonObject>())!;
        Assert.Equal($"\"{body["summary"]!["version"]}\"", response.Headers.ETag?.Tag);
        // The stored file reads back as the same site through the one site reader.
        CanopyAdvisor.Core.Sites.Site read = new SiteFileReader(StandardBeamFactory.Instance).Parse(body["site"]!.ToJsonString(), "got", null);
        Assert.Equal("demo-glasshouse", read.Id);
    }

    [Fact]
    public async Task Only_admins_create_and_delete_sites_and_a_taken_site_key_is_409()
    {
        JsonObject copy = JsonNode.Parse(DemoSites.ReadText("indoor-farm"))!.AsObject();
        copy["id"] = "second-room";
        copy["name"] = "Second room (test)";
        foreach (string email in new[] { Demo.Grower, Demo.Designer, Demo.Manager })
        {
            HttpClient other = await factory.SignedInAsync(email);
            await ProblemAssert.IsProblem(await other.PostAsync("/api/sites", SiteEditing.Json(copy.ToJsonString())), HttpStatusCode.Forbidden);
        }

        HttpClient admin = await factory.SignedInAsync(Demo.Admin);
        HttpResponseMessage created = await admin.PostAsync("/api/sites", SiteEditing.Json(copy.ToJsonString()));
        Assert.Equal(HttpStatusCode.Created, created.StatusCode);
        string id = (await created.Content.ReadFromJsonAsync<JsonElement>()).GetProperty("id").GetString()!;
        Assert.Equal($"/api/sites/{id}", created.Headers.Location?.OriginalString);

        await ProblemAssert.IsProblem(await admin.PostAsync("/api/sites", SiteEditing.Json(copy.ToJsonString())), HttpStatusCode.Conflict);

        HttpClient grower = await factory.SignedInAsync(Demo.Grower);
        await ProblemAssert.IsProblem(await grower.DeleteAsync($"/api/sites/{id}"), HttpStatusCode.Forbidden);
        Assert.Equal(HttpStatusCode.NoContent, (await admin.DeleteAsync($"/api/sites/{id}")).StatusCode);
        await ProblemAssert.IsProblem(await admin.GetAsync($"/api/sites/{id}"), HttpStatusCode.NotFound);
    }

    [Fact]
    public async Task Another_organisations_site_is_404_for_every_method()
    {
        string otherSite = await factory.AddOtherOrganisationAsync();
        HttpClient admin = await factory.SignedInAsync(Demo.Admin);
        string body = DemoSites.ReadText("indoor-farm");
        await ProblemAssert.IsProblem(await admin.GetAsync($"/api/sites/{otherSite}"), HttpStatusCode.NotFound);
        await ProblemAssert.IsProblem(await admin.PutAsync($"/api/sites/{otherSite}", SiteEditing.Json(body)), HttpStatusCode.NotFound);
        await ProblemAssert.IsProblem(await admin.DeleteAsync($"/api/sites/{otherSite}"), HttpStatusCode.NotFound);
        await ProblemAssert.IsProblem(await admin.PostAsync($"/api/sites/{otherSite}/forecasts", SiteEditing.Json("{}")), HttpStatusCode.NotFound);
        await ProblemAssert.IsProblem(await admin.GetAsync($"/api/sites/{otherSite}/forecasts"), HttpStatusCode.NotFound);
        // The same answer as for an id that exists nowhere (no hint that the other organisation's site exists).
        JsonElement missing = await ProblemAssert.IsProblem(await admin.GetAsync("/api/sites/site_nowhere"), HttpStatusCode.NotFound);
        JsonElement other = await ProblemAssert.IsProblem(await admin.GetAsync($"/api/sites/{otherSite}"), HttpStatusCode.NotFound);
        Assert.Equal(missing.GetProperty("detail").GetString(), other.GetProperty("detail").GetString());
        Assert.DoesNotContain(otherSite, await admin.GetStringAsync("/api/sites"), StringComparison.Ordinal);
        Assert.Equal(1, (await factory.Store.Sites.GetAsync("org_other", otherSite))!.Version);
    }

    [Fact]
    public async Task An_invalid_site_is_400_with_every_problem_and_nothing_is_stored()
    {
        HttpClient admin = await factory.SignedInAsync(Demo.Admin);
        string siteId = await SiteEditing.SiteIdAsync(admin, Indoor);
        (JsonObject site, int version) = await SiteEditing.ReadAsync(admin, siteId);
        site["timeZone"] = "Mars/Olympus_Mons";
        site["benches"]![0]!["footprint"]!["widthM"] = -1;
        site["location"]!["latitudeDeg"] = 123;
        site["colour"] = "green";
        HttpResponseMessage response = await SiteEditing.ReplaceAsync(admin, siteId, site);
        // The site file reader's paths (Files/Sites/README.md): every problem, each with its path.
        await ProblemAssert.IsInvalid(response, "timeZone", "benches[0].footprint.widthM", "location.latitudeDeg", "colour");
        Assert.Equal(version, (await SiteEditing.ReadAsync(admin, siteId)).Version);
    }

    [Fact]
    public async Task A_site_naming_an_IES_file_on_the_servers_disk_is_refused()
    {
        HttpClient designer = await factory.SignedInAsync(Demo.Designer);
        string siteId = await SiteEditing.SiteIdAsync(designer, Indoor);
        (JsonObject site, int version) = await SiteEditing.ReadAsync(designer, siteId);
        string typeName = site["lampTypes"]!.AsObject().First().Key;
        site["lampTypes"]![typeName]!["beam"] = new JsonObject { ["kind"] = "ies", ["file"] = "/etc/passwd", ["values"] = "photon" };
        // OWASP path traversal guidance (from memory): never open a server path that a client names.
        await ProblemAssert.IsInvalid(await SiteEditing.ReplaceAsync(designer, siteId, site), $"lampTypes.{typeName}.beam");
        Assert.Equal(version, (await SiteEditing.ReadAsync(designer, siteId)).Version);
    }

    [Fact]
    public async Task Numbers_written_another_way_are_not_a_change()
    {
        HttpClient grower = await factory.SignedInAsync(Demo.Grower);
        string siteId = await SiteEditing.SiteIdAsync(grower, Indoor);
        (JsonObject site, int version) = await SiteEditing.ReadAsync(grower, siteId);
        Edit(site, "lots");
        // RFC 8259 §6 numbers: 190.0, 190 and 1.9e2 are one value; a client that writes them differently (JavaScript
        // prints 190.0 as 190) has not changed the location section, which a grower may not change.
        double elevation = site["location"]!["elevationM"]!.GetValue<double>();
        string text = site.ToJsonString().Replace(
            $"\"elevationM\":{site["location"]!["elevationM"]!.ToJsonString()}",
            $"\"elevationM\":{elevation:0.###}e0",
            StringComparison.Ordinal);
        Assert.Contains("e0", text, StringComparison.Ordinal);
        using var request = new HttpRequestMessage(HttpMethod.Put, $"/api/sites/{siteId}") { Content = SiteEditing.Json(text) };
        HttpResponseMessage response = await grower.SendAsync(request);
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal(version + 1, (await SiteEditing.ReadAsync(grower, siteId)).Version);
    }
}
