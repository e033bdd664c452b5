using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Server.Contracts;
using CanopyAdvisor.Server.Forecasting;
using CanopyAdvisor.Server.Problems;
using Microsoft.AspNetCore.Http.HttpResults;

namespace CanopyAdvisor.Server.Api;

/// <summary>The built-in crop library (the organisation's own variants come with a later part).</summary>
internal static class CropsApi
{
    /// <summary>Maps <c>/api/crops</c>.</summary>
    public static RouteGroupBuilder MapCropsApi(this IEndpointRouteBuilder routes)
    {
        RouteGroupBuilder group = routes.MapGroup("/api/crops").WithTags("Crops");
        group.MapGet("/", List).WithSummary("List the crop library");
        group.MapGet("/{cropId}", Get).WithSummary("Read a crop with every parameter's unit, range and provenance");
        return group;
    }

    private static Ok<List<CropSummary>> List(CropCatalogue crops) =>
        TypedResults.Ok(crops.Views.Select(c => new CropSummary(c.Id, c.Name, c.Group, c.BaseId)).ToList());

    private static Results<Ok<CropView>, ProblemHttpResult> Get(string cropId, CropCatalogue crops) =>
        crops.Library.TryGet(cropId, out Crop? crop)
            ? TypedResults.Ok(CropCatalogue.ToView(crop))
            : TypedResults.Problem(ApiProblems.Create(StatusCodes.Status404NotFound, "Not found", $"no crop '{cropId}' in the library"));
}
