using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using CanopyAdvisor.Files.Crops;
using CanopyAdvisor.Server.Tests.Support;

namespace CanopyAdvisor.Server.Tests.Api;

/// <summary>The crop library through the API.</summary>
public sealed class CropsApiTests(CanopyFactory factory) : IClassFixture<CanopyFactory>
{
    [Fact]
    public async Task The_list_is_the_built_in_library()
    {
        HttpClient grower = await factory.SignedInAsync(Demo.Grower);
        List<JsonElement> crops = (await grower.GetFromJsonAsync<List<JsonElement>>("/api/crops"))!;
        Assert.Equal(CropLibrary.BuiltInIds.Order(StringComparer.Ordinal), crops.Select(c => c.GetProperty("id").GetString()!));
    }

    [Fact]
    public async Task A_crop_carries_every_parameter_with_unit_range_and_provenance()
    {
        HttpClient designer = await factory.SignedInAsync(Demo.Designer);
        string id = CropLibrary.BuiltInIds[0];
        JsonElement crop = await designer.GetFromJsonAsync<JsonElement>($"/api/crops/{id}");
        JsonElement parameters = crop.GetProperty("parameters");
        Assert.Equal(CanopyAdvisor.Core.Plants.CropConversions.ParameterKeys.Order(StringComparer.Ordinal), parameters.EnumerateObject().Select(p => p.Name));
        foreach (JsonProperty p in parameters.EnumerateObject())
        {
            double value = p.Value.GetProperty("value").GetDouble();
            Assert.InRange(value, p.Value.GetProperty("minimum").GetDouble(), p.Value.GetProperty("maximum").GetDouble());
            Assert.False(string.IsNullOrEmpty(p.Value.GetProperty("provenance").GetString()));
        }
    }

    [Fact]
    public async Task An_unknown_crop_is_404()
    {
        HttpClient grower = await factory.SignedInAsync(Demo.Grower);
        await ProblemAssert.IsProblem(await grower.GetAsync("/api/crops/triffid"), HttpStatusCode.NotFound);
    }
}
