using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using CanopyAdvisor.Server.Tests.Support;

namespace CanopyAdvisor.Server.Tests.Api;

/// <summary>Organisation users, for admins only; scoped to the caller's organisation.</summary>
public sealed class UsersApiTests(CanopyFactory factory) : IClassFixture<CanopyFactory>
{
    [Theory]
    // RFC 9110 §15.5.4: 403 when the caller is known but not allowed.
    [InlineData(Demo.Grower)]
    [InlineData(Demo.Designer)]
    [InlineData(Demo.Manager)]
    public async Task Only_admins_manage_users(string email)
    {
        HttpClient client = await factory.SignedInAsync(email);
        await ProblemAssert.IsProblem(await client.GetAsync("/api/users"), HttpStatusCode.Forbidden);
        HttpResponseMessage create = await client.PostAsJsonAsync("/api/users", new { email = "x@demo.invalid", displayName = "X", role = "admin", password = "twelve chars!" });
        await ProblemAssert.IsProblem(create, HttpStatusCode.Forbidden);
        Assert.Null(await factory.Store.Users.FindByEmailAsync("x@demo.invalid"));
    }

    [Fact]
    public async Task An_admin_lists_adds_reads_changes_and_removes_users()
    {
        HttpClient admin = await factory.SignedInAsync(Demo.Admin);
        List<JsonElement> users = (await admin.GetFromJsonAsync<List<JsonElement>>("/api/users"))!;
        Assert.Equal(
            ["admin", "lightingDesigner", "grower", "manager"],
            users.Where(u => u.GetProperty("email").GetString()!.EndsWith("@demo.invalid", StringComparison.Ordinal) && !u.GetProperty("email").GetString()!.StartsWith("new", StringComparison.Ordinal))
                .Select(u => u.GetProperty("role").GetString()!).Take(4));
        Assert.DoesNotContain("passwordHash", JsonSerializer.Serialize(users), StringComparison.OrdinalIgnoreCase);

        HttpResponseMessage created = await admin.PostAsJsonAsync("/api/users", new { email = "New.Grower@demo.invalid", displayName = "New grower", role = "grower", password = "another long password" });
        Assert.Equal(HttpStatusCode.Created, created.StatusCode);
        JsonElement user = await created.Content.ReadFromJsonAsync<JsonElement>();
        string id = user.GetProperty("id").GetString()!;
        Assert.Equal("new.grower@demo.invalid", user.GetProperty("email").GetString());
        Assert.Equal("grower", (await admin.GetFromJsonAsync<JsonElement>($"/api/users/{id}")).GetProperty("role").GetString());

        HttpResponseMessage changed = await admin.PutAsJsonAsync($"/api/users/{id}", new { email = "new.grower@demo.invalid", displayName = "Head grower", role = "manager" });
        Assert.Equal("Head grower", (await changed.Content.ReadFromJsonAsync<JsonElement>()).GetProperty("displayName").GetString());

        Assert.Equal(HttpStatusCode.NoContent, (await admin.DeleteAsync($"/api/users/{id}")).StatusCode);
        await ProblemAssert.IsProblem(await admin.GetAsync($"/api/users/{id}"), HttpStatusCode.NotFound);
    }

    [Fact]
    public async Task A_duplicate_email_is_409_and_nothing_is_stored()
    {
        HttpClient admin = await factory.SignedInAsync(Demo.Admin);
        int before = (await factory.Store.Users.ListAsync((await factory.Store.Users.FindByEmailAsync(Demo.Admin))!.OrganisationId)).Count;
        // RFC 9110 §15.5.10: 409 when the request conflicts with the current state (the e-mail is taken, in any case).
        HttpResponseMessage response = await admin.PostAsJsonAsync("/api/users", new { email = "GROWER@demo.invalid", displayName = "Copy", role = "grower", password = "a long password!" });
        await ProblemAssert.IsProblem(response, HttpStatusCode.Conflict);
        Assert.Equal(before, (await factory.Store.Users.ListAsync((await factory.Store.Users.FindByEmailAsync(Demo.Admin))!.OrganisationId)).Count);
    }

    [Fact]
    public async Task The_last_admin_can_be_neither_demoted_nor_removed()
    {
        HttpClient admin = await factory.SignedInAsync(Demo.Admin);
        string id = (await factory.Store.Users.FindByEmailAsync(Demo.Admin))!.Id;
        await ProblemAssert.IsProblem(await admin.DeleteAsync($"/api/users/{id}"), HttpStatusCode.Conflict);
        await ProblemAssert.IsProblem(await admin.PutAsJsonAsync($"/api/users/{id}", new { email = Demo.Admin, displayName = "Demo admin", role = "grower" }), HttpStatusCode.Conflict);
        Assert.Equal(CanopyAdvisor.Storage.UserRole.Admin, (await factory.Store.Users.FindAsync(id))!.Role);
    }

    [Fact]
    public async Task Another_organisations_user_is_404()
    {
        await factory.AddOtherOrganisationAsync();
        HttpClient admin = await factory.SignedInAsync(Demo.Admin);
        await ProblemAssert.IsProblem(await admin.GetAsync("/api/users/usr_other"), HttpStatusCode.NotFound);
        await ProblemAssert.IsProblem(await admin.PutAsJsonAsync("/api/users/usr_other", new { email = "x@other.invalid", displayName = "X", role = "grower" }), HttpStatusCode.NotFound);
        await ProblemAssert.IsProblem(await admin.DeleteAsync("/api/users/usr_other"), HttpStatusCode.NotFound);
        Assert.NotNull(await factory.Store.Users.FindAsync("usr_other"));
        Assert.DoesNotContain("other.invalid", await admin.GetStringAsync("/api/users"), StringComparison.Ordinal);
    }

    [Theory]
    // Every problem at once. Password length 12 to 128 (OWASP ASVS 4.0 V2.1.1/V2.1.2, from memory); e-mail needs one '@'.
    [InlineData("""{"email":"no-at-sign","displayName":" ","role":"grower","password":"short"}""", new[] { "email", "displayName", "password" })]
    [InlineData("""{"email":"a@b","displayName":"A","role":"gardener","password":"long enough pass"}""", new[] { "role" })]
    [InlineData("""{"email":"a@b","displayName":"A","role":2,"password":"long enough pass"}""", new[] { "role" })]
    [InlineData("""{"email":"a@b","displayName":"A","role":"grower"}""", new[] { "body" })]
    [InlineData("""{"email":"a@b","displayName":"A","role":"grower","password":"long enough pass","isAdmin":true}""", new[] { "isAdmin" })]
    public async Task Bad_user_bodies_are_400_with_every_problem_and_nothing_stored(string json, string[] paths)
    {
        HttpClient admin = await factory.SignedInAsync(Demo.Admin);
        HttpResponseMessage response = await admin.PostAsync("/api/users", new StringContent(json, System.Text.Encoding.UTF8, "application/json"));
        await ProblemAssert.IsInvalid(response, paths);
        Assert.Null(await factory.Store.Users.FindByEmailAsync("a@b"));
        Assert.Null(await factory.Store.Users.FindByEmailAsync("no-at-sign"));
    }
}
