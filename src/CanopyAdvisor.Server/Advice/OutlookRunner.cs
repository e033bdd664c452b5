using System.Globalization;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Reports.Outlook;
using CanopyAdvisor.Server.Forecasting;
using CanopyAdvisor.Storage;
using NodaTime;

namespace CanopyAdvisor.Server.Advice;

/// <summary>A stored site's weekly outlook, computed as <c>canopy outlook</c> does (<see cref="OutlookComputation"/>)
/// from the stored site with its rotations done and its organisation's crops.</summary>
/// <remarks>The page and the CSV are often asked for one after the other, so the last <see cref="CacheSize"/> reports
/// are kept in memory under the hash of their inputs. No earlier week is compared (the service keeps no outlook
/// snapshots yet).</remarks>
internal sealed class OutlookRunner(ForecastRunner forecasts)
{
    /// <summary>How many reports are kept in memory.</summary>
    public const int CacheSize = 16;

    private readonly Lock _gate = new();
    private readonly Dictionary<string, OutlookReport> _cache = new(StringComparer.Ordinal);
    private readonly Queue<string> _order = new();

    /// <summary>The outlook of a site from <paramref name="now"/> (default the start of the current hour) for
    /// <paramref name="days"/> days (default 7, at most 14).</summary>
    /// <exception cref="InvalidInputException">Bad options, or the site cannot be forecast; every problem.</exception>
    public async Task<OutlookReport> OutlookAsync(SiteRecord site, string? now, double? days, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(site);
        var errors = new List<ValidationError>();
        Instant start = forecasts.StartOf(now, errors);
        double dayCount = days ?? 7;
        if (!(dayCount >= 1 && dayCount <= 14))
        {
            errors.Add(new ValidationError("days", string.Create(CultureInfo.InvariantCulture, $"must be at least 1 and at most 14, got {dayCount}")));
        }

        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        LoadedSite loaded = await forecasts.LoadAsync(site, cancellationToken);
        string key = ForecastRunner.HashInputs(site.Json, loaded.CropsVersion, start, dayCount, band: true, "outlook\n" + ForecastRunner.RotationsDoneText(loaded.Done));
        lock (_gate)
        {
            if (_cache.TryGetValue(key, out OutlookReport? kept))
            {
                return kept;
            }
        }

        Site model = loaded.Model;
        ForecastRequest request = ForecastRunner.RequestFor(loaded, start) with { Horizon = Duration.FromHours(dayCount * 24) };
        string daylight = model.Structure is IndoorRoom
            ? "none (indoor room)"
            : string.Create(CultureInfo.InvariantCulture, $"clear sky (Ineichen–Perez, Linke turbidity {model.Weather.LinkeTurbidity}) × daily clearness {model.Weather.DailyClearness}");
        List<string> notes =
        [
            string.Create(CultureInfo.InvariantCulture, $"Daylight: {daylight}; air: setpoints {model.Temperatures.DayC}/{model.Temperatures.NightC} °C day/night."),
        ];
        if (loaded.Done.Count > 0)
        {
            notes.Add(string.Create(CultureInfo.InvariantCulture, $"Rotations done: {loaded.Done.Count} recorded turns are in the forecast."));
        }

        (OutlookReport report, _) = await Task.Run(
            () => OutlookComputation.Compute(request, notes, previous: null, progress: default, cancellationToken), cancellationToken);
        lock (_gate)
        {
            if (_cache.TryAdd(key, report))
            {
                _order.Enqueue(key);
                if (_order.Count > CacheSize)
                {
                    _cache.Remove(_order.Dequeue());
                }
            }
        }

        return report;
    }
}
