using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using CanopyAdvisor.Server.Tests.Support;

namespace CanopyAdvisor.Server.Tests.Api;

/// <summary>Observations and rotations done through the API: the role matrix, cross-organisation 404s, every validation
/// path as one ProblemDetails (RFC 9457) with nothing stored, and a rotation done feeding the forecast.</summary>
/// <remarks>The demo indoor farm (America/Chicago, UTC−6 in December per IANA tzdata): lot-rack-a-tier-1 on bench
/// rack-a-tier-1, planted 2026-11-26, measured 2026-12-01, sold 2026-12-05 (demo data); the test clock is
/// 2026-12-02T08:00Z.</remarks>
public sealed class GrowerRecordsApiTests(CanopyFactory factory) : IClassFixture<CanopyFactory>
{
    private const string GoodObservation = """{"benchId": "rack-a-tier-1", "at": "2026-11-30T10:00:00-06:00", "tiltDeg": 6.5, "azimuthDeg": 270, "heightMm": 28, "plants": 10}""";

    private const string GoodRotation = """{"lotId": "lot-rack-a-tier-1", "at": "2026-11-30T10:00:00-06:00", "angleDeg": 180}""";

    private async Task<(HttpClient Client, string SiteId)> AsAsync(string email)
    {
        HttpClient client = await factory.SignedInAsync(email);
        return (client, await SiteEditing.SiteIdAsync(client, "demo-indoor-farm"));
    }

    private async Task<int> StoredAsync(string siteId)
    {
        string org = (await factory.Store.Users.FindByEmailAsync(Demo.Grower))!.OrganisationId;
        return (await factory.Store.Observations.ListAsync(org, siteId)).Count + (await factory.Store.RotationsDone.ListAsync(org, siteId)).Count;
    }

    [Theory]
    // The permission matrix of the server README: growers and admins record growers' work; every role reads.
    [InlineData(Demo.Grower, true)]
    [InlineData(Demo.Admin, true)]
    [InlineData(Demo.Designer, false)]
    [InlineData(Demo.Manager, false)]
    public async Task Growers_and_admins_add_and_delete_every_role_reads(string email, bool writes)
    {
        (HttpClient client, string siteId) = await AsAsync(email);
        (HttpClient grower, _) = await AsAsync(Demo.Grower);
        foreach ((string path, string body) in new[] { ("observations", GoodObservation), ("rotations-done", GoodRotation) })
        {
            HttpResponseMessage added = await client.PostAsync($"/api/sites/{siteId}/{path}", SiteEditing.Json(body));
            Assert.Equal(HttpStatusCode.OK, (await client.GetAsync($"/api/sites/{siteId}/{path}")).StatusCode);
            if (writes)
            {
                Assert.Equal(HttpStatusCode.Created, added.StatusCode);
                JsonElement view = await added.Content.ReadFromJsonAsync<JsonElement>();
                string id = view.GetProperty("id").GetString()!;
                Assert.Equal($"/api/sites/{siteId}/{path}/{id}", added.Headers.Location?.OriginalString);
                // Stored in UTC, shown in the site's local time (Chicago CST, UTC−6).
                Assert.Equal("2026-11-30T10:00:00-06:00", view.GetProperty("at").GetString());
                List<JsonElement> list = (await client.GetFromJsonAsync<List<JsonElement>>($"/api/sites/{siteId}/{path}"))!;
                Assert.Contains(list, e => e.GetProperty("id").GetString() == id);
                Assert.Equal(HttpStatusCode.NoContent, (await client.DeleteAsync($"/api/sites/{siteId}/{path}/{id}")).StatusCode);
                await ProblemAssert.IsProblem(await client.DeleteAsync($"/api/sites/{siteId}/{path}/{id}"), HttpStatusCode.NotFound);
            }
            else
            {
                await ProblemAssert.IsProblem(added, HttpStatusCode.Forbidden);
                HttpResponseMessage byGrower = await grower.PostAsync($"/api/sites/{siteId}/{path}", SiteEditing.Json(body));
                string id = (await byGrower.Content.ReadFromJsonAsync<JsonElement>()).GetProperty("id").GetString()!;
                await ProblemAssert.IsProblem(await client.DeleteAsync($"/api/sites/{siteId}/{path}/{id}"), HttpStatusCode.Forbidden);
                Assert.Equal(HttpStatusCode.NoContent, (await grower.DeleteAsync($"/api/sites/{siteId}/{path}/{id}")).StatusCode);
            }
        }
    }

    [Fact]
    public async Task Another_organisations_ids_answer_404()
    {
        string otherSite = await factory.AddOtherOrganisationAsync();
        (HttpClient grower, string siteId) = await AsAsync(Demo.Grower);
        HttpClient other = await factory.SignedInAsync(CanopyFactory.OtherAdminEmail);
        string obsId = (await (await grower.PostAsync($"/api/sites/{siteId}/observations", SiteEditing.Json(GoodObservation))).Content.ReadFromJsonAsync<JsonElement>()).GetProperty("id").GetString()!;
        string rotId = (await (await grower.PostAsync($"/api/sites/{siteId}/rotations-done", SiteEditing.Json(GoodRotation))).Content.ReadFromJsonAsync<JsonElement>()).GetProperty("id").GetString()!;
        int before = await StoredAsync(siteId);

        foreach (string path in new[] { "observations", "rotations-done" })
        {
            await ProblemAssert.IsProblem(await other.GetAsync($"/api/sites/{siteId}/{path}"), HttpStatusCode.NotFound);
            string body = path == "observations" ? GoodObservation : GoodRotation;
            await ProblemAssert.IsProblem(await other.PostAsync($"/api/sites/{siteId}/{path}", SiteEditing.Json(body)), HttpStatusCode.NotFound);
            // The demo's record ids through the other organisation's own site: not found either.
            string id = path == "observations" ? obsId : rotId;
            await ProblemAssert.IsProblem(await other.DeleteAsync($"/api/sites/{otherSite}/{path}/{id}"), HttpStatusCode.NotFound);
            await ProblemAssert.IsProblem(await other.DeleteAsync($"/api/sites/{siteId}/{path}/{id}"), HttpStatusCode.NotFound);
        }

        Assert.Equal(before, await StoredAsync(siteId));
    }

    public static TheoryData<string, string, string[]> BadObservations => new()
    {
        // Every rule of the observations CSV (Files/Observations/LeanObservationReader): tilt from the vertical 0–90°,
        // a compass azimuth 0–360°, height > 0, plants ≥ 1, a time with a UTC offset (ISO 8601 / RFC 3339 §5.6).
        { "every field wrong at once", """{"benchId": "no-such-bench", "at": "2026-11-30T10:00:00", "tiltDeg": 95, "azimuthDeg": -1, "heightMm": 0, "plants": 0}""", ["benchId", "at", "tiltDeg", "azimuthDeg", "heightMm", "plants"] },
        { "before the lot was planted (2026-11-26) and tilt out of range", """{"benchId": "rack-a-tier-1", "at": "2026-11-20T10:00:00-06:00", "tiltDeg": 90.5, "azimuthDeg": 10}""", ["at", "tiltDeg"] },
        { "in the future (clock 2026-12-02T08:00Z)", """{"benchId": "rack-a-tier-1", "at": "2026-12-03T10:00:00-06:00", "tiltDeg": 5, "azimuthDeg": 10}""", ["at"] },
        { "NaN is not JSON (RFC 8259 §6)", """{"benchId": "rack-a-tier-1", "at": "2026-11-30T10:00:00-06:00", "tiltDeg": NaN, "azimuthDeg": 10}""", ["tiltDeg"] },
        { "NaN as a string is not a number", """{"benchId": "rack-a-tier-1", "at": "2026-11-30T10:00:00-06:00", "tiltDeg": "NaN", "azimuthDeg": 10}""", ["tiltDeg"] },
        { "unknown field", """{"benchId": "rack-a-tier-1", "at": "2026-11-30T10:00:00-06:00", "tiltDeg": 5, "azimuthDeg": 10, "leanDeg": 3}""", ["leanDeg"] },
        { "missing required field", """{"benchId": "rack-a-tier-1", "at": "2026-11-30T10:00:00-06:00", "tiltDeg": 5}""", ["body"] },
        { "malformed JSON", """{"benchId": "rack-a-tier-1", "at": """, ["body"] },
    };

    [Theory]
    [MemberData(nameof(BadObservations))]
    public async Task A_bad_observation_is_400_listing_every_problem_and_nothing_is_stored(string label, string body, string[] paths)
    {
        Assert.NotNull(label);
        (HttpClient grower, string siteId) = await AsAsync(Demo.Grower);
        int before = await StoredAsync(siteId);
        await ProblemAssert.IsInvalid(await grower.PostAsync($"/api/sites/{siteId}/observations", SiteEditing.Json(body)), paths.Where(p => p != "body").ToArray());
        Assert.Equal(before, await StoredAsync(siteId));
    }

    public static TheoryData<string, string, string[]> BadRotations => new()
    {
        // A lot's rotations in the site file (Core SiteValidator.CheckLot): within (−360°, 360°) and not 0, within the
        // lot's life; and, judged by the service clock, not in the future.
        { "angle 0, unknown lot, no offset", """{"lotId": "no-such-lot", "at": "2026-11-30T10:00", "angleDeg": 0}""", ["lotId", "at", "angleDeg"] },
        { "angle 360 (a full turn is no turn)", """{"lotId": "lot-rack-a-tier-1", "at": "2026-11-30T10:00:00-06:00", "angleDeg": 360}""", ["angleDeg"] },
        { "before planting (2026-11-26)", """{"lotId": "lot-rack-a-tier-1", "at": "2026-11-25T23:59:00-06:00", "angleDeg": 90}""", ["at"] },
        { "in the future", """{"benchId": "rack-a-tier-1", "at": "2026-12-02T03:00:00-06:00", "angleDeg": 90}""", ["at"] },
        { "unknown bench", """{"benchId": "rack-z", "at": "2026-11-30T10:00:00-06:00", "angleDeg": 90}""", ["benchId"] },
        { "lot and bench disagree", """{"lotId": "lot-rack-a-tier-1", "benchId": "rack-a-tier-2", "at": "2026-11-30T10:00:00-06:00", "angleDeg": 90}""", ["benchId"] },
        { "neither lot nor bench", """{"at": "2026-11-30T10:00:00-06:00", "angleDeg": 90}""", ["lotId"] },
        { "Infinity is not JSON (RFC 8259 §6)", """{"lotId": "lot-rack-a-tier-1", "at": "2026-11-30T10:00:00-06:00", "angleDeg": Infinity}""", ["angleDeg"] },
        { "unknown field", """{"lotId": "lot-rack-a-tier-1", "at": "2026-11-30T10:00:00-06:00", "angleDeg": 90, "crew": "day"}""", ["crew"] },
        { "malformed JSON", """[1, 2""", ["body"] },
    };

    [Theory]
    [MemberData(nameof(BadRotations))]
    public async Task A_bad_rotation_is_400_listing_every_problem_and_nothing_is_stored(string label, string body, string[] paths)
    {
        Assert.NotNull(label);
        (HttpClient grower, string siteId) = await AsAsync(Demo.Grower);
        int before = await StoredAsync(siteId);
        await ProblemAssert.IsInvalid(await grower.PostAsync($"/api/sites/{siteId}/rotations-done", SiteEditing.Json(body)), paths.Where(p => p != "body").ToArray());
        Assert.Equal(before, await StoredAsync(siteId));
    }

    [Fact]
    public async Task A_rotation_done_gives_a_new_forecast_hash_and_turns_the_lean()
    {
        // Fast: the indoor room, one day, no band. A start no other test of this class uses.
        const string options = """{"now": "2026-12-01T23:00:00-06:00", "days": 1, "includeBand": false}""";
        (HttpClient grower, string siteId) = await AsAsync(Demo.Grower);
        HttpResponseMessage first = await grower.PostAsync($"/api/sites/{siteId}/forecasts", SiteEditing.Json(options));
        JsonElement a = await first.Content.ReadFromJsonAsync<JsonElement>();
        Assert.True(first.IsSuccessStatusCode, a.GetRawText());

        HttpResponseMessage added = await grower.PostAsync($"/api/sites/{siteId}/rotations-done", SiteEditing.Json("""{"benchId": "rack-a-tier-1", "at": "2026-11-28T09:00:00-06:00", "angleDeg": 180}"""));
        Assert.Equal(HttpStatusCode.Created, added.StatusCode);
        HttpResponseMessage second = await grower.PostAsync($"/api/sites/{siteId}/forecasts", SiteEditing.Json(options));
        Assert.Equal(HttpStatusCode.Created, second.StatusCode);
        JsonElement b = await second.Content.ReadFromJsonAsync<JsonElement>();
        Assert.NotEqual(a.GetProperty("inputHash").GetString(), b.GetProperty("inputHash").GetString());

        JsonElement Bench(JsonElement f, string id) => f.GetProperty("benches").EnumerateArray().Single(x => x.GetProperty("benchId").GetString() == id);
        JsonElement before = Bench(a, "rack-a-tier-1");
        JsonElement after = Bench(b, "rack-a-tier-1");
        // Turning the pots changes this bench's lean now (the stems' history differs from the turn on) ...
        Assert.NotEqual(
            (before.GetProperty("leanDeg").GetDouble(), before.GetProperty("leanAzimuthDeg").GetDouble()),
            (after.GetProperty("leanDeg").GetDouble(), after.GetProperty("leanAzimuthDeg").GetDouble()));
        // ... and no other bench's.
        Assert.Equal(Bench(a, "rack-b-tier-1").GetRawText(), Bench(b, "rack-b-tier-1").GetRawText());

        // Deleting it brings back the first forecast (same inputs again), served from the store.
        string id = (await added.Content.ReadFromJsonAsync<JsonElement>()).GetProperty("id").GetString()!;
        Assert.Equal(HttpStatusCode.NoContent, (await grower.DeleteAsync($"/api/sites/{siteId}/rotations-done/{id}")).StatusCode);
        HttpResponseMessage third = await grower.PostAsync($"/api/sites/{siteId}/forecasts", SiteEditing.Json(options));
        Assert.Equal(HttpStatusCode.OK, third.StatusCode);
        Assert.Equal(a.GetProperty("id").GetString(), (await third.Content.ReadFromJsonAsync<JsonElement>()).GetProperty("id").GetString());
    }

    [Fact]
    public async Task A_rotation_done_today_after_the_lots_measurement_day_counts_in_todays_forecast()
    {
        // The demo lots were measured on 2026-12-01 (demo data); a turn ticked off at 01:00 on 12-02 (the test clock reads
        // 02:00 in Chicago) is judged against the forecast's start, not the measurement day, and turns the lean.
        const string options = """{"now": "2026-12-02T02:00:00-06:00", "days": 1, "includeBand": false}""";
        (HttpClient grower, string siteId) = await AsAsync(Demo.Grower);
        JsonElement a = await (await grower.PostAsync($"/api/sites/{siteId}/forecasts", SiteEditing.Json(options))).Content.ReadFromJsonAsync<JsonElement>();

        HttpResponseMessage added = await grower.PostAsync($"/api/sites/{siteId}/rotations-done", SiteEditing.Json("""{"benchId": "rack-a-tier-2", "at": "2026-12-02T01:00:00-06:00", "angleDeg": 180}"""));
        Assert.Equal(HttpStatusCode.Created, added.StatusCode);
        HttpResponseMessage second = await grower.PostAsync($"/api/sites/{siteId}/forecasts", SiteEditing.Json(options));
        JsonElement b = await second.Content.ReadFromJsonAsync<JsonElement>();
        Assert.True(second.StatusCode == HttpStatusCode.Created, b.GetRawText());

        JsonElement Bench(JsonElement f, string id) => f.GetProperty("benches").EnumerateArray().Single(x => x.GetProperty("benchId").GetString() == id);
        // A half turn flips the lean's direction (common practice): the lean at the horizon moves.
        Assert.NotEqual(
            Bench(a, "rack-a-tier-2").GetProperty("leanAtHorizonDeg").GetDouble(),
            Bench(b, "rack-a-tier-2").GetProperty("leanAtHorizonDeg").GetDouble());
    }
}
