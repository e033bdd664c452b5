using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using CanopyAdvisor.Files.Observations;
using CanopyAdvisor.Server.Tests.Support;

namespace CanopyAdvisor.Server.Tests.Api;

/// <summary>Calibration through the API from the stored observations: the fit recovers the values the demo observations
/// were made with, an identified variant is saved to the organisation's crops (and only there), unidentifiable data are
/// refused with 422 and nothing saved, roles and other organisations are kept out, bad options are one ProblemDetails.</summary>
/// <remarks>The demo observations (Files/Observations/Demo/glasshouse.csv, demo data): 20 mean leans of the petunia lot on
/// bench south-1, simulated with photoCoefficient M = 1.2 and proprioceptiveSensitivity γ = 1.1 plus Gaussian noise
/// (its header says so) — a parameter-recovery check.</remarks>
public sealed class CalibrationApiTests(CanopyFactory factory) : IClassFixture<CanopyFactory>
{
    private static readonly SemaphoreSlim Seeded = new(1, 1);

    private async Task<(HttpClient Client, string SiteId)> AsAsync(string email, string siteKey = "demo-glasshouse")
    {
        HttpClient client = await factory.SignedInAsync(email);
        return (client, await SiteEditing.SiteIdAsync(client, siteKey));
    }

    /// <summary>Records the demo observations once per class, through the API, as a grower would.</summary>
    private async Task<string> WithDemoObservationsAsync()
    {
        (HttpClient grower, string siteId) = await AsAsync(Demo.Grower);
        await Seeded.WaitAsync();
        try
        {
            List<JsonElement> stored = (await grower.GetFromJsonAsync<List<JsonElement>>($"/api/sites/{siteId}/observations"))!;
            if (stored.Count == 0)
            {
                foreach (var o in DemoObservations.Load("glasshouse"))
                {
                    var body = new
                    {
                        benchId = o.BenchId,
                        at = NodaTime.Text.InstantPattern.ExtendedIso.Format(o.At),
                        tiltDeg = o.Tilt.Degrees,
                        azimuthDeg = o.Azimuth.Degrees,
                        heightMm = o.HeightMm,
                        plants = o.PlantsMeasured,
                    };
                    Assert.Equal(HttpStatusCode.Created, (await grower.PostAsJsonAsync($"/api/sites/{siteId}/observations", body)).StatusCode);
                }
            }
        }
        finally
        {
            Seeded.Release();
        }

        return siteId;
    }

    private async Task<List<string>> CropIdsAsync(HttpClient client) =>
        [.. (await client.GetFromJsonAsync<List<JsonElement>>("/api/crops"))!.Select(c => c.GetProperty("id").GetString()!)];

    [Fact]
    public async Task The_fit_recovers_the_demo_values_and_saving_adds_the_variant_to_the_organisation_only()
    {
        string siteId = await WithDemoObservationsAsync();
        (HttpClient grower, _) = await AsAsync(Demo.Grower);
        HttpResponseMessage response = await grower.PostAsync($"/api/sites/{siteId}/calibration", SiteEditing.Json("""{"save": true, "variantId": "petunia-south-demo"}"""));
        JsonElement fit = await response.Content.ReadFromJsonAsync<JsonElement>();
        Assert.True(response.StatusCode == HttpStatusCode.Created, fit.GetRawText());
        Assert.Equal("/api/crops/petunia-south-demo", response.Headers.Location?.OriginalString);
        Assert.True(fit.GetProperty("identified").GetBoolean());
        Assert.True(fit.GetProperty("saved").GetBoolean());
        Assert.Equal("petunia", fit.GetProperty("cropId").GetString());
        Assert.Equal(20, fit.GetProperty("observations").GetInt32());
        Assert.Equal(20, fit.GetProperty("residuals").GetArrayLength());
        var estimates = fit.GetProperty("estimates").EnumerateArray().ToDictionary(e => e.GetProperty("key").GetString()!);
        // Recovery: each estimate within 3 standard errors of the value the demo data were simulated with.
        foreach ((string key, double truth) in new[] { ("photoCoefficient", 1.2), ("proprioceptiveSensitivity", 1.1) })
        {
            double value = estimates[key].GetProperty("value").GetDouble();
            double se = estimates[key].GetProperty("standardError").GetDouble();
            Assert.True(se > 0 && Math.Abs(value - truth) <= 3 * se, $"{key}: {value} ± {se}, simulated with {truth}");
        }

        // The fit improves on the library values (RMS misfit, degrees).
        Assert.True(fit.GetProperty("rmsMisfitDeg").GetDouble() < fit.GetProperty("initialRmsMisfitDeg").GetDouble());

        // The organisation's crops now list the variant, with the fitted value; the other organisation's do not.
        List<string> ids = await CropIdsAsync(grower);
        Assert.Contains("petunia-south-demo", ids);
        JsonElement variant = await grower.GetFromJsonAsync<JsonElement>("/api/crops/petunia-south-demo");
        Assert.Equal("petunia", variant.GetProperty("baseId").GetString());
        Assert.Equal(estimates["photoCoefficient"].GetProperty("value").GetDouble(), variant.GetProperty("parameters").GetProperty("photoCoefficient").GetProperty("value").GetDouble(), 3);
        await factory.AddOtherOrganisationAsync();
        HttpClient other = await factory.SignedInAsync(CanopyFactory.OtherAdminEmail);
        Assert.DoesNotContain("petunia-south-demo", await CropIdsAsync(other));
        await ProblemAssert.IsProblem(await other.GetAsync("/api/crops/petunia-south-demo"), HttpStatusCode.NotFound);

        // The same id again is a conflict; nothing more is stored.
        await ProblemAssert.IsProblem(
            await grower.PostAsync($"/api/sites/{siteId}/calibration", SiteEditing.Json("""{"save": true, "variantId": "petunia-south-demo"}""")), HttpStatusCode.Conflict);
        Assert.Equal(ids, await CropIdsAsync(grower));

        // A lot may name the variant: the forecast reads it from the organisation's crops.
        (System.Text.Json.Nodes.JsonObject siteFile, int version) = await SiteEditing.ReadAsync(grower, siteId);
        var lot = siteFile["lots"]!.AsArray().Single(l => l!["benchId"]!.GetValue<string>() == "south-1")!;
        lot["crop"] = "petunia-south-demo";
        Assert.Equal(HttpStatusCode.OK, (await SiteEditing.ReplaceAsync(grower, siteId, siteFile, version)).StatusCode);
        HttpResponseMessage forecast = await grower.PostAsync(
            $"/api/sites/{siteId}/forecasts", SiteEditing.Json("""{"now": "2026-12-02T09:00:00+01:00", "days": 1, "includeBand": false}"""));
        JsonElement forecastView = await forecast.Content.ReadFromJsonAsync<JsonElement>();
        Assert.True(forecast.StatusCode == HttpStatusCode.Created, forecastView.GetRawText());
        Assert.Equal("petunia-south-demo", forecastView.GetProperty("benches").EnumerateArray().Single(b => b.GetProperty("benchId").GetString() == "south-1").GetProperty("cropId").GetString());

        // Put the lot back on the library crop for the other tests of this class.
        (siteFile, version) = await SiteEditing.ReadAsync(grower, siteId);
        siteFile["lots"]!.AsArray().Single(l => l!["benchId"]!.GetValue<string>() == "south-1")!["crop"] = "petunia";
        Assert.Equal(HttpStatusCode.OK, (await SiteEditing.ReplaceAsync(grower, siteId, siteFile, version)).StatusCode);
    }

    [Theory]
    // The server README's matrix: every role may see a fit; growers and admins save variants.
    [InlineData(Demo.Manager, false, HttpStatusCode.OK)]
    [InlineData(Demo.Designer, true, HttpStatusCode.Forbidden)]
    [InlineData(Demo.Manager, true, HttpStatusCode.Forbidden)]
    [InlineData(Demo.Admin, true, HttpStatusCode.Created)]
    public async Task Roles(string email, bool save, HttpStatusCode expected)
    {
        string siteId = await WithDemoObservationsAsync();
        (HttpClient client, _) = await AsAsync(email);
        string variant = "petunia-by-" + email[..email.IndexOf('@', StringComparison.Ordinal)];
        HttpResponseMessage response = await client.PostAsync(
            $"/api/sites/{siteId}/calibration", SiteEditing.Json($$"""{"save": {{(save ? "true" : "false")}}, "variantId": "{{variant}}"}"""));
        if (expected == HttpStatusCode.Forbidden)
        {
            await ProblemAssert.IsProblem(response, expected);
            Assert.DoesNotContain(variant, await CropIdsAsync(client));
        }
        else
        {
            Assert.Equal(expected, response.StatusCode);
            Assert.Equal(save, (await CropIdsAsync(client)).Contains(variant));
        }
    }

    [Fact]
    public async Task Data_that_cannot_identify_the_parameters_are_refused_with_the_warnings_and_nothing_is_saved()
    {
        // One observation gives two lean components for two parameters: no residual degrees of freedom, so no standard
        // errors (least-squares covariance needs more data than parameters; e.g. Bates & Watts 1988, §2.3, from memory):
        // refused before fitting, 400 at "observations".
        (HttpClient grower, string siteId) = await AsAsync(Demo.Grower, "demo-indoor-farm");
        Assert.Equal(HttpStatusCode.Created, (await grower.PostAsync(
            $"/api/sites/{siteId}/observations",
            SiteEditing.Json("""{"benchId": "rack-a-tier-1", "at": "2026-11-30T10:00:00-06:00", "tiltDeg": 4, "azimuthDeg": 90, "plants": 10}"""))).StatusCode);
        List<string> before = await CropIdsAsync(grower);
        await ProblemAssert.IsInvalid(
            await grower.PostAsync($"/api/sites/{siteId}/calibration", SiteEditing.Json("""{"save": true, "variantId": "radish-one-look"}""")), "observations");
        Assert.Equal(before, await CropIdsAsync(grower));

        // Two on the same day: the fit runs, but one moment's lean cannot tell how strongly the crop bends from how fast
        // (M and γ correlate at about −1): 422 with the warnings, nothing saved.
        Assert.Equal(HttpStatusCode.Created, (await grower.PostAsync(
            $"/api/sites/{siteId}/observations",
            SiteEditing.Json("""{"benchId": "rack-a-tier-1", "at": "2026-11-30T14:00:00-06:00", "tiltDeg": 4.2, "azimuthDeg": 92, "plants": 10}"""))).StatusCode);
        HttpResponseMessage refused = await grower.PostAsync($"/api/sites/{siteId}/calibration", SiteEditing.Json("""{"save": true, "variantId": "radish-one-day"}"""));
        JsonElement problem = await ProblemAssert.IsProblem(refused, HttpStatusCode.UnprocessableEntity);
        Assert.Contains(problem.GetProperty("errors").EnumerateArray(), e => e.GetProperty("detail").GetString()!.Contains("cannot separate", StringComparison.Ordinal));
        Assert.Equal(before, await CropIdsAsync(grower));

        // Without "save" the fit is shown, marked not identified.
        JsonElement fit = await (await grower.PostAsync($"/api/sites/{siteId}/calibration", SiteEditing.Json("{}"))).Content.ReadFromJsonAsync<JsonElement>();
        Assert.False(fit.GetProperty("identified").GetBoolean(), fit.GetRawText());
        Assert.NotEmpty(fit.GetProperty("warnings").EnumerateArray());
    }

    [Fact]
    public async Task Another_organisations_site_is_404_and_a_site_without_observations_is_400()
    {
        string otherSite = await factory.AddOtherOrganisationAsync();
        (_, string siteId) = await AsAsync(Demo.Grower);
        HttpClient other = await factory.SignedInAsync(CanopyFactory.OtherAdminEmail);
        await ProblemAssert.IsProblem(await other.PostAsync($"/api/sites/{siteId}/calibration", SiteEditing.Json("{}")), HttpStatusCode.NotFound);
        await ProblemAssert.IsInvalid(await other.PostAsync($"/api/sites/{otherSite}/calibration", SiteEditing.Json("{}")), "observations");
    }

    [Fact]
    public async Task Bad_options_are_400_listing_every_problem()
    {
        (HttpClient grower, string siteId) = await AsAsync(Demo.Grower);
        // Parameter names of the calibrate command (M, gamma, B); 1–100 iterations; crop ids as crops/README.md; ISO 8601 with offset.
        await ProblemAssert.IsInvalid(
            await grower.PostAsync($"/api/sites/{siteId}/calibration", SiteEditing.Json("""{"parameters": ["M", "delta"], "maxIterations": 0, "variantId": "Bad_Id", "now": "2026-12-01T12:00"}""")),
            "parameters", "maxIterations", "variantId", "now");
        await ProblemAssert.IsInvalid(await grower.PostAsync($"/api/sites/{siteId}/calibration", SiteEditing.Json("""{"save": "yes"}""")), "save");
        await ProblemAssert.IsInvalid(await grower.PostAsync($"/api/sites/{siteId}/calibration", SiteEditing.Json("""{"params": ["M"]}""")), "params");
    }
}
