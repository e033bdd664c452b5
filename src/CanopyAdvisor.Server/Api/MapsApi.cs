using System.Globalization;
using System.Security.Claims;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Files.Sites;
using CanopyAdvisor.Reports;
using CanopyAdvisor.Server.Accounts;
using CanopyAdvisor.Server.Contracts;
using CanopyAdvisor.Server.Forecasting;
using CanopyAdvisor.Server.Problems;
using CanopyAdvisor.Storage;
using Microsoft.AspNetCore.Http.HttpResults;

namespace CanopyAdvisor.Server.Api;

/// <summary>Pictures of a site for the pages: the lean floor map of its latest forecast (SVG).</summary>
internal static class MapsApi
{
    /// <summary>The media type of the maps.</summary>
    public const string SvgMediaType = "image/svg+xml";

    /// <summary>Maps <c>/api/sites/{siteId}/maps</c>.</summary>
    public static RouteGroupBuilder MapMapsApi(this IEndpointRouteBuilder routes)
    {
        RouteGroupBuilder group = routes.MapGroup("/api/sites/{siteId}/maps").WithTags("Maps");
        group.MapGet("/lean", Lean)
            .WithSummary("The lean floor map of the site's latest forecast (SVG)")
            .WithDescription("Each plant's lean at the horizon end as a share of its crop's grade limit, and one arrow per forecast bench (bench-mean lean at the horizon end). 404 when the site has no forecast yet.")
            .Produces<string>(StatusCodes.Status200OK, SvgMediaType)
            .ProducesProblem(StatusCodes.Status404NotFound);
        return group;
    }

    private static async Task<Results<ContentHttpResult, ProblemHttpResult>> Lean(
        string siteId, ClaimsPrincipal principal, ICanopyStore store, ForecastRunner runner, CancellationToken cancellationToken)
    {
        Caller caller = Caller.From(principal);
        if (await store.Sites.GetAsync(caller.OrganisationId, siteId, cancellationToken) is not { } site)
        {
            return ApiProblems.NotFound("site");
        }

        IReadOnlyList<ForecastRecord> forecasts = await store.Forecasts.ListAsync(caller.OrganisationId, siteId, cancellationToken);
        if (forecasts.Count == 0)
        {
            return TypedResults.Problem(ApiProblems.Create(StatusCodes.Status404NotFound, "No forecast yet", "run a forecast of this site first (POST /api/sites/{siteId}/forecasts)"));
        }

        ForecastRecord latest = forecasts.MaxBy(f => f.CreatedAt)!;
        ForecastView view = runner.Read(latest);
        Site model = new SiteFileReader(ServerBeamFactory.Instance).Parse(site.Json, "site", baseDirectory: null);
        string title = string.Create(CultureInfo.InvariantCulture, $"{model.Name}: lean at {view.HorizonEnd.LocalDateTime:yyyy'-'MM'-'dd HH':'mm}");
        return TypedResults.Text(LeanMap(model, view, title), SvgMediaType);
    }

    /// <summary>The lean map of a stored forecast drawn on the site as it is now: benches the forecast does not know (or
    /// whose sample grid changed since) keep their arrow but not their cells; benches without a forecast are outlines.</summary>
    public static string LeanMap(Site site, ForecastView forecast, string title)
    {
        ArgumentNullException.ThrowIfNull(site);
        ArgumentNullException.ThrowIfNull(forecast);
        var byBench = forecast.Benches.ToDictionary(b => b.BenchId, StringComparer.Ordinal);
        var benches = site.Benches.Select(bench =>
        {
            if (!byBench.TryGetValue(bench.Id, out BenchForecastView? f))
            {
                return null;
            }

            IReadOnlyList<double> points = f.PointLeansAtHorizonDeg ?? [];
            double[] cells = points.Count == bench.SamplesAlongLength * bench.SamplesAcrossWidth && f.LeanGradeLimitDeg > 0
                ? [.. points.Select(p => 100 * p / f.LeanGradeLimitDeg)]
                : [];
            return new FloorMapBench(cells, Angle.FromDegrees(f.LeanAtHorizonDeg), Angle.FromDegrees(f.LeanAtHorizonAzimuthDeg))
            {
                Tooltip = string.Create(CultureInfo.InvariantCulture, $"{bench.Id}: {f.LeanAtHorizonDeg:0.0}° toward {f.LeanAtHorizonAzimuthDeg:0}° at the horizon"),
            };
        }).ToList();
        int arrows = benches.Count(b => b is not null);
        return FloorMapSvg.Render(new FloorMap(
            site,
            title,
            benches,
            "lean at the horizon (% of the grade limit)",
            "lean of each plant at the end of the forecast, % of its crop's grade limit",
            "where the tops lean (bench mean); length ∝ lean",
            Low: 0,
            High: 100)
        {
            Description = string.Create(CultureInfo.InvariantCulture, $"Floor plan of {site.Name} with {site.Benches.Length} benches; {arrows} carry an arrow showing which way and how far their plants lean at the end of the forecast. The bench table beside the map gives the same figures in words."),
        });
    }
}
