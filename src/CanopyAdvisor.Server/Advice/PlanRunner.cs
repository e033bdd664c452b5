using System.Globalization;
using CanopyAdvisor.Core;
using CanopyAdvisor.Core.Advice;
using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Advice.Rotation;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Server.Contracts;
using CanopyAdvisor.Server.Forecasting;
using CanopyAdvisor.Storage;
using NodaTime;
using NodaTime.Text;

namespace CanopyAdvisor.Server.Advice;

/// <summary>Plans a stored site's rotations to its lots' sales and schedules the turns on its crews, as <c>canopy plan</c>
/// does (<see cref="RotationPlanning"/>), from the stored site with its rotations done.</summary>
/// <remarks>A plan takes seconds, and the plan, its calendar and its CSV are often asked for one after another, so the
/// last <see cref="CacheSize"/> plans are kept in memory under the hash of their inputs (the stored site file text, the
/// crop library and model build, the rotations done, the start and the margin: <see cref="ForecastRunner.HashInputs"/>);
/// a changed input is a new key.</remarks>
internal sealed class PlanRunner(ForecastRunner forecasts)
{
    /// <summary>How many plans are kept in memory.</summary>
    public const int CacheSize = 32;

    private readonly Lock _gate = new();
    private readonly Dictionary<string, PlannedSite> _cache = new(StringComparer.Ordinal);
    private readonly Queue<string> _order = new();

    /// <summary>The plan of a site for these options.</summary>
    /// <exception cref="InvalidInputException">Bad options, nothing left to plan, or the site cannot be forecast; every problem.</exception>
    public async Task<PlannedSite> PlanAsync(SiteRecord site, PlanOptions options, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(site);
        ArgumentNullException.ThrowIfNull(options);
        var errors = new List<ValidationError>();
        Instant now = forecasts.StartOf(options.Now, errors);
        double marginPercent = options.MarginPercent ?? ModelConstants.RotationGradeMargin * 100;
        if (!(marginPercent >= 0 && marginPercent < 100))
        {
            errors.Add(new ValidationError("marginPercent", string.Create(CultureInfo.InvariantCulture, $"must be at least 0 and below 100 (percent), got {marginPercent}")));
        }

        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        LoadedSite loaded = await forecasts.LoadAsync(site, cancellationToken);
        string key = ForecastRunner.HashInputs(
            site.Json, loaded.CropsVersion, now, marginPercent, band: false, "plan\n" + ForecastRunner.RotationsDoneText(loaded.Done));
        lock (_gate)
        {
            if (_cache.TryGetValue(key, out PlannedSite? kept))
            {
                return kept;
            }
        }

        Site model = loaded.Model;
        Instant lastSale = RotationPlanning.LastSale(model);
        if (lastSale <= now + Duration.FromHours(1))
        {
            throw new InvalidInputException("now", $"every lot is sold by {Local(lastSale, model)}; nothing to plan after {Local(now, model)}");
        }

        (Duration horizon, _) = RotationPlanning.HorizonToSales(model, now, Duration.Zero);
        ForecastRequest request = ForecastRunner.RequestFor(loaded, now) with { Horizon = horizon };
        RotationPolicyOptions policy = RotationPolicyOptions.Default with { Margin = marginPercent / 100 };
        (RotationPlan plan, LabourSchedule schedule) = await Task.Run(
            () => RotationPlanning.PlanAndSchedule(request, policy, progress: null, cancellationToken), cancellationToken);
        var planned = new PlannedSite(model, plan, schedule, loaded.Done.Count);
        lock (_gate)
        {
            if (_cache.TryAdd(key, planned))
            {
                _order.Enqueue(key);
                if (_order.Count > CacheSize)
                {
                    _cache.Remove(_order.Dequeue());
                }
            }
        }

        return planned;
    }

    private static string Local(Instant t, Site model) => OffsetDateTimePattern.ExtendedIso.Format(t.InZone(model.Zone).ToOffsetDateTime());
}
