using System.Globalization;
using System.Text.Json;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Reports.Outlook;
using CanopyAdvisor.Server.Forecasting;
using CanopyAdvisor.Storage;
using NodaTime;

namespace CanopyAdvisor.Server.Jobs;

/// <summary>The weekly outlook: the week from the fire time, made as <c>canopy outlook</c> makes it
/// (<see cref="WeeklyOutlook"/>), compared with the snapshot of the site's previous stored outlook; the page, CSV,
/// snapshot and rotation calendar are kept with the run.</summary>
internal sealed class WeeklyOutlookWork(ForecastRunner runner, ICanopyStore store, IClock clock) : ISiteJobWork
{
    /// <inheritdoc />
    public string Kind => JobKinds.WeeklyOutlook;

    /// <inheritdoc />
    public async Task<JobResult> RunAsync(SiteRecord site, Instant scheduledFor, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(site);
        (Site model, ForecastRequest request) = await runner.BuildRequestAsync(site, scheduledFor, 7, band: true, cancellationToken);
        JobRunRecord? previous = await store.JobRuns.LatestWithOutputAsync(site.OrganisationId, site.Id, Kind, cancellationToken);
        string? previousSnapshot = previous?.Output is { } output ? Read(output).Snapshot : null;
        PreviousOutlook earlier = PreviousOutlook.Resolve(previousSnapshot, "the previous stored outlook", model.Id, scheduledFor);
        string daylight = model.Structure is IndoorRoom
            ? "Daylight: none (indoor room)"
            : string.Create(CultureInfo.InvariantCulture, $"Daylight: clear sky (Ineichen–Perez, Linke turbidity {model.Weather.LinkeTurbidity}) × daily clearness {model.Weather.DailyClearness}");
        WeeklyOutlookFiles files = await Task.Run(
            () => WeeklyOutlook.Build(request, earlier, [daylight + "; air: the site's temperature setpoints."], clock.GetCurrentInstant(), cancellationToken: cancellationToken),
            cancellationToken);
        var stored = new StoredOutlook(files.Page, files.Csv, files.Snapshot, files.Calendar);
        return new JobResult(
            string.Create(CultureInfo.InvariantCulture, $"outlook of {files.Report.Benches.Length} bench(es) stored{(earlier.Snapshot is null ? "" : ", compared with the previous one")}"),
            JsonSerializer.Serialize(stored, StoredOutlook.JsonOptions));
    }

    /// <summary>A stored outlook output.</summary>
    public static StoredOutlook Read(string output) =>
        JsonSerializer.Deserialize<StoredOutlook>(output, StoredOutlook.JsonOptions) ?? throw new InvalidOperationException("A stored outlook is empty.");
}
