using System.Security.Claims;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Files.Crops;
using CanopyAdvisor.Server.Accounts;
using CanopyAdvisor.Server.Contracts;
using CanopyAdvisor.Server.Forecasting;
using CanopyAdvisor.Server.Problems;
using CanopyAdvisor.Storage;
using Microsoft.AspNetCore.Http.HttpResults;

namespace CanopyAdvisor.Server.Api;

/// <summary>The crop library: the built-in crops plus the caller's organisation's own variants (saved by calibration).</summary>
internal static class CropsApi
{
    /// <summary>Maps <c>/api/crops</c>.</summary>
    public static RouteGroupBuilder MapCropsApi(this IEndpointRouteBuilder routes)
    {
        RouteGroupBuilder group = routes.MapGroup("/api/crops").WithTags("Crops");
        group.MapGet("/", List).WithSummary("List the crop library and the organisation's variants");
        group.MapGet("/{cropId}", Get).WithSummary("Read a crop with every parameter's unit, range and provenance");
        return group;
    }

    private static async Task<Ok<List<CropSummary>>> List(ClaimsPrincipal principal, ICanopyStore store, CropCatalogue crops, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        IReadOnlyList<CropVariantRecord> own = await store.CropVariants.ListAsync(caller.OrganisationId, cancellationToken);
        (CropLibrary library, _) = crops.ForOrganisation(own);
        var ownIds = own.Select(v => v.CropId).ToHashSet(StringComparer.Ordinal);
        return TypedResults.Ok(library.All
            .Select(c => new CropSummary(c.Id, c.Name, CropCatalogue.GroupName(c.Group), c.BaseId, ownIds.Contains(c.Id) ? CropSummary.OrganisationSource : CropSummary.LibrarySource))
            .ToList());
    }

    private static async Task<Results<Ok<CropView>, ProblemHttpResult>> Get(string cropId, ClaimsPrincipal principal, ICanopyStore store, CropCatalogue crops, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        (CropLibrary library, _) = crops.ForOrganisation(await store.CropVariants.ListAsync(caller.OrganisationId, cancellationToken));
        return library.TryGet(cropId, out Crop? crop)
            ? TypedResults.Ok(CropCatalogue.ToView(crop))
            : TypedResults.Problem(ApiProblems.Create(StatusCodes.Status404NotFound, "Not found", $"no crop '{cropId}' in the library or your organisation's variants"));
    }
}
