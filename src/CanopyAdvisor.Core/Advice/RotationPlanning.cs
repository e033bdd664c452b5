using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Advice.Rotation;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Core.Advice;

/// <summary>The rotation advice of a site to its lots' sales, as the plan and outlook commands and the service run it:
/// the horizon to the last sale (at most 366 days), the policy search (<see cref="RotationPolicyPlanner"/>) and the
/// turns scheduled on the site's crews (<see cref="RotationCalendar"/>).</summary>
public static class RotationPlanning
{
    /// <summary>The longest forecast a plan can be checked over, 366 days (<see cref="ForecastRequest.Horizon"/>).</summary>
    public static Duration LongestHorizon { get; } = Duration.FromDays(366);

    /// <summary>The start of the latest sale date of the site's lots, in the site's zone (a lot counts as sold from the
    /// start of its sale date).</summary>
    /// <exception cref="InvalidInputException">The site has no lots.</exception>
    public static Instant LastSale(Site site)
    {
        ArgumentNullException.ThrowIfNull(site);
        if (site.Lots.IsDefaultOrEmpty)
        {
            throw new InvalidInputException("lots", "the site has no crop lots to plan for; add a \"lots\" section");
        }

        return site.Lots.Max(l => l.SaleOn.AtStartOfDayInZone(site.Zone).ToInstant());
    }

    /// <summary>The horizon a plan from <paramref name="start"/> is checked over: to the last sale, at least
    /// <paramref name="atLeast"/>, at most <see cref="LongestHorizon"/>.</summary>
    /// <returns>The horizon, and whether it was cut to <see cref="LongestHorizon"/> (later sales are checked only to then).</returns>
    public static (Duration Horizon, bool Capped) HorizonToSales(Site site, Instant start, Duration atLeast)
    {
        Duration toSale = LastSale(site) - start;
        return toSale > LongestHorizon ? (LongestHorizon, true) : (toSale < atLeast ? atLeast : toSale, false);
    }

    /// <summary>Plans the rotations of every lot of a request and schedules the turns on the site's crews.</summary>
    /// <param name="request">The forecast request; its horizon must reach the sales (see <see cref="HorizonToSales"/>);
    /// the band is left out (the search runs many scenarios).</param>
    /// <param name="options">The policy search's options.</param>
    /// <param name="progress">Receives the fraction of lots planned.</param>
    /// <param name="cancellationToken">Stops the search between runs.</param>
    /// <returns>The plan and its labour schedule.</returns>
    /// <exception cref="InvalidInputException">The request, the options or the labour settings are not usable; every problem.</exception>
    public static (RotationPlan Plan, LabourSchedule Schedule) PlanAndSchedule(
        ForecastRequest request, RotationPolicyOptions options, IProgress<double>? progress = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(request);
        ForecastSession session = ForecastSession.Prepare(request with { IncludeUncertainty = false });
        RotationPlan plan = RotationPolicyPlanner.Plan(session, options, progress, cancellationToken);
        return (plan, RotationCalendar.Schedule(request.Site, plan, request.RotationsDone));
    }
}
