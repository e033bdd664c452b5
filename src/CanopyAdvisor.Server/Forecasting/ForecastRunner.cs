using System.Collections.Immutable;
using System.Globalization;
using System.Security.Cryptography;
using System.Text;
using System.Text.Json;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Plants.Growth;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Crops;
using CanopyAdvisor.Files.Sites;
using CanopyAdvisor.Server.Accounts;
using CanopyAdvisor.Server.Contracts;
using CanopyAdvisor.Storage;
using Microsoft.Extensions.Options;
using NodaTime;
using NodaTime.Text;

namespace CanopyAdvisor.Server.Forecasting;

/// <summary>Runs a site's bench forecast as the <c>canopy forecast</c> command does (clear sky × the site's clearness,
/// the site's temperature setpoints, <see cref="ForecastSession"/>), keyed by the hash of its inputs so a repeat is
/// served from the store.</summary>
/// <remarks>The inputs hashed: the stored site file text, the crop library version (<see cref="CropCatalogue.Version"/>),
/// the model build (the module version id of CanopyAdvisor.Core, which deterministic builds derive from its content),
/// the start instant, the horizon, whether the band is included, and the stored rotations done (applied to the lots).
/// Nothing else feeds the forecast.</remarks>
internal sealed class ForecastRunner(ICanopyStore store, CropCatalogue crops, IClock clock, IOptions<Microsoft.AspNetCore.Http.Json.JsonOptions> json)
{
    /// <summary>The default horizon, days.</summary>
    public const double DefaultDays = 7;

    private static readonly OffsetDateTimePattern NowPattern =
        OffsetDateTimePattern.CreateWithInvariantCulture("uuuu'-'MM'-'dd'T'HH':'mm':'ss;FFFFFFFFFo<G>");

    private static readonly string ModelBuild = typeof(BenchForecaster).Assembly.ManifestModule.ModuleVersionId.ToString("N");

    /// <summary>The forecast of a site for these options: the stored one when the inputs match one, else computed and stored.</summary>
    /// <returns>The stored record and whether it was already there.</returns>
    /// <exception cref="InvalidInputException">Bad options, or the site cannot be forecast (no lots, unknown crops); every problem.</exception>
    public async Task<(ForecastRecord Record, bool FromStore)> GetOrRunAsync(SiteRecord site, ForecastOptions options, Caller caller, CancellationToken cancellationToken)
    {
        var errors = new List<ValidationError>();
        Instant now = StartOf(options.Now, errors);

        double days = options.Days ?? DefaultDays;
        if (!(days > 0 && days <= 366))
        {
            errors.Add(new ValidationError("days", "must be more than 0 and at most 366"));
        }

        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        bool band = options.IncludeBand ?? true;
        LoadedSite loaded = await LoadAsync(site, cancellationToken);
        string hash = HashInputs(site.Json, loaded.CropsVersion, now, days, band, RotationsDoneText(loaded.Done));
        if (await store.Forecasts.FindByHashAsync(site.OrganisationId, site.Id, hash, cancellationToken) is { } stored)
        {
            return (stored, true);
        }

        Site model = loaded.Model;
        ForecastRequest request = RequestFor(loaded, now, days, band);

        // Validation inside Prepare throws InvalidInputException (unknown crops, lots on unknown benches): a 400, nothing stored.
        SiteForecast forecast = await Task.Run(() => ForecastSession.Prepare(request).Run(cancellationToken: cancellationToken), cancellationToken);
        string id = ApiTokens.NewId("fc");
        Instant createdAt = clock.GetCurrentInstant();
        ForecastView view = ToView(id, site, hash, createdAt, caller.UserId, model, forecast, band);
        var record = new ForecastRecord(id, site.OrganisationId, site.Id, site.Version, hash, createdAt, caller.UserId, JsonSerializer.Serialize(view, json.Value.SerializerOptions));
        ForecastRecord kept = await store.Forecasts.AddAsync(record, cancellationToken);
        return (kept, kept.Id != id);
    }

    /// <summary>The forecast request of a stored site as this service runs it (the organisation's crop variants, the
    /// rotations done), over <paramref name="days"/> from <paramref name="now"/>; for the scheduled jobs.</summary>
    /// <exception cref="InvalidInputException">The site cannot be forecast (no lots, unknown crops).</exception>
    public async Task<(Site Model, ForecastRequest Request)> BuildRequestAsync(SiteRecord site, Instant now, double days, bool band, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(site);
        LoadedSite loaded = await LoadAsync(site, cancellationToken);
        return (loaded.Model, RequestFor(loaded, now, days, band));
    }

    private static ForecastRequest RequestFor(LoadedSite loaded, Instant now, double days, bool band) =>
        RequestFor(loaded, now) with
        {
            Horizon = Duration.FromHours(days * 24),
            IncludeUncertainty = band,
        };

    /// <summary>The start of a forecast or plan: the ISO-8601 time given (with an offset), or the start of the current
    /// hour; a bad time adds an error at <c>now</c>.</summary>
    public Instant StartOf(string? text, List<ValidationError> errors)
    {
        ArgumentNullException.ThrowIfNull(errors);
        Instant now = clock.GetCurrentInstant();
        now = Instant.FromUnixTimeTicks(now.ToUnixTimeTicks() - (now.ToUnixTimeTicks() % NodaConstants.TicksPerHour));
        if (text is null)
        {
            return now;
        }

        ParseResult<OffsetDateTime> parsed = NowPattern.Parse(text);
        if (parsed.Success)
        {
            return parsed.Value.ToInstant();
        }

        errors.Add(new ValidationError("now", "must be an ISO-8601 date and time with an offset, e.g. 2026-12-02T09:00:00+01:00"));
        return now;
    }

    /// <summary>The stored site as the model, with its stored rotations done applied to the lots, and its organisation's
    /// crop library.</summary>
    /// <exception cref="InvalidInputException">The site has no lots, or a stored variant does not read.</exception>
    public async Task<LoadedSite> LoadAsync(SiteRecord site, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(site);
        IReadOnlyList<RotationDoneRecord> done = await store.RotationsDone.ListAsync(site.OrganisationId, site.Id, cancellationToken);
        Site model = new SiteFileReader(ServerBeamFactory.Instance).Parse(site.Json, "site", baseDirectory: null);
        if (model.Lots.IsDefaultOrEmpty)
        {
            throw new InvalidInputException("lots", "the site has no crop lots to forecast; add a \"lots\" section");
        }

        (CropLibrary library, string version) = crops.ForOrganisation(await store.CropVariants.ListAsync(site.OrganisationId, cancellationToken));
        return new LoadedSite(model, done, library, version);
    }

    /// <summary>The forecast request of a site from a start, as the <c>canopy forecast</c> command builds it: the library's
    /// crops of its lots, clear sky × the site's clearness, the site's temperature setpoints; default horizon, band on.</summary>
    public static ForecastRequest RequestFor(LoadedSite loaded, Instant now)
    {
        ArgumentNullException.ThrowIfNull(loaded);
        Site model = loaded.Model;
        var cropsById = new Dictionary<string, Crop>(StringComparer.Ordinal);
        foreach (Lot lot in model.Lots.IsDefault ? [] : model.Lots)
        {
            if (loaded.Crops.TryGet(lot.CropId, out Crop? crop))
            {
                cropsById[lot.CropId] = crop;
            }
        }

        return new ForecastRequest(
            model,
            cropsById,
            new ClearSkyOutsideLight(model.Location, model.Zone, model.Weather),
            new SetpointTemperature(model.Temperatures, model.Location, model.Zone),
            now)
        {
            RotationsDone = RotationsDoneBefore(model, loaded.Done, now),
        };
    }

    // Stored documents are read leniently: a forecast stored by an older build (with a member since dropped) still reads.
    private readonly JsonSerializerOptions _storedOptions = new(json.Value.SerializerOptions)
    {
        UnmappedMemberHandling = System.Text.Json.Serialization.JsonUnmappedMemberHandling.Skip,
    };

    /// <summary>The stored forecast document.</summary>
    public ForecastView Read(ForecastRecord record)
    {
        ArgumentNullException.ThrowIfNull(record);
        return JsonSerializer.Deserialize<ForecastView>(record.ResultJson, _storedOptions)
            ?? throw new InvalidOperationException($"Stored forecast {record.Id} is empty.");
    }

    /// <summary>The stored rotations done before <paramref name="now"/>, by lot, as the forecast takes them
    /// (<see cref="ForecastRequest.RotationsDone"/>: judged against the forecast start, so a turn ticked off today counts
    /// today); turns recorded for lots the site no longer has are left out.</summary>
    public static ImmutableDictionary<string, ImmutableArray<RotationRecord>> RotationsDoneBefore(
        Site model, IReadOnlyList<RotationDoneRecord> done, Instant now)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(done);
        var lots = (model.Lots.IsDefault ? [] : model.Lots).Select(l => l.Id).ToHashSet(StringComparer.Ordinal);
        return done
            .Where(r => r.At < now && lots.Contains(r.LotId))
            .GroupBy(r => r.LotId, StringComparer.Ordinal)
            .ToImmutableDictionary(
                g => g.Key,
                g => g.OrderBy(r => r.At).Select(r => new RotationRecord(r.At, Core.Geometry.Angle.FromDegrees(r.AngleDeg))).ToImmutableArray(),
                StringComparer.Ordinal);
    }

    /// <summary>The rotations done as hashed: one line per rotation (lot, instant, angle), in time order.</summary>
    public static string RotationsDoneText(IReadOnlyList<RotationDoneRecord> done)
    {
        ArgumentNullException.ThrowIfNull(done);
        var text = new StringBuilder();
        foreach (RotationDoneRecord r in done.OrderBy(r => r.At).ThenBy(r => r.LotId, StringComparer.Ordinal).ThenBy(r => r.AngleDeg))
        {
            text.Append(r.LotId).Append(' ').Append(InstantPattern.ExtendedIso.Format(r.At)).Append(' ')
                .Append(r.AngleDeg.ToString("R", CultureInfo.InvariantCulture)).Append('\n');
        }

        return text.ToString();
    }

    /// <summary>Lower-case hex SHA-256 of the forecast's inputs, each on its own labelled line.</summary>
    /// <param name="siteJson">The stored site file text.</param>
    /// <param name="cropLibraryVersion">The crop library version.</param>
    /// <param name="now">The start.</param>
    /// <param name="days">The horizon, days.</param>
    /// <param name="band">Whether the band is included.</param>
    /// <param name="rotationsDone">The stored rotations done (<see cref="RotationsDoneText"/>); empty adds nothing, so
    /// hashes of sites without any stay as they were.</param>
    public static string HashInputs(string siteJson, string cropLibraryVersion, Instant now, double days, bool band, string rotationsDone = "")
    {
        ArgumentNullException.ThrowIfNull(siteJson);
        var text = new StringBuilder();
        text.Append("canopy-forecast-inputs 1\n");
        text.Append("model ").Append(ModelBuild).Append('\n');
        text.Append("crops ").Append(cropLibraryVersion).Append('\n');
        text.Append("now ").Append(InstantPattern.ExtendedIso.Format(now)).Append('\n');
        text.Append("days ").Append(days.ToString("R", CultureInfo.InvariantCulture)).Append('\n');
        text.Append("band ").Append(band ? "yes" : "no").Append('\n');
        text.Append("site ").Append(siteJson.Length.ToString(CultureInfo.InvariantCulture)).Append('\n').Append(siteJson);
        if (!string.IsNullOrEmpty(rotationsDone))
        {
            text.Append("\nrotations-done ").Append(rotationsDone.Length.ToString(CultureInfo.InvariantCulture)).Append('\n').Append(rotationsDone);
        }
        return Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(text.ToString())));
    }

    private static ForecastView ToView(string id, SiteRecord site, string hash, Instant createdAt, string userId, Site model, SiteForecast forecast, bool band)
    {
        OffsetDateTime Local(Instant t) => t.InZone(model.Zone).ToOffsetDateTime();
        var benches = forecast.Benches.Select(b => new BenchForecastView(
            b.BenchId,
            b.LotId,
            b.CropId,
            R(b.LeanNow.Tilt.Degrees, 2),
            R(b.LeanNow.Azimuth.Degrees, 1),
            b.LeanNow.CompassPoint,
            R(b.WorstLeanNow.Tilt.Degrees, 2),
            R(b.LeanRateDegreesPerDay, 3),
            R(b.LeanAtHorizon.Tilt.Degrees, 2),
            R(b.LeanAtHorizon.Azimuth.Degrees, 1),
            R(b.LeanGradeLimit.Degrees, 1),
            b.LeavesGradeAt is Instant at ? Local(at) : null,
            R(b.HeightNowMm, 1),
            R(b.HeightAtHorizonMm, 1),
            R(b.HeightAtSaleMm, 1),
            R(b.HeightGradeLimitMm, 0),
            R(b.MeanDliMolPerM2Day, 2),
            R(b.MeanPhytochromeState, 3),
            R(b.MeanDifKelvin, 2),
            b.Uncertainty is LeanUncertainty u
                ? new LeanBandView(R(u.Low.Degrees, 2), R(u.High.Degrees, 2), [.. u.Drivers.Select(d => d.Key)])
                : null,
            [.. b.Flags.Select(f => new FlagView(f.Kind == ForecastFlagKind.Leggy ? "leggy" : "leaning", f.Cause, R(f.Value, 2), R(f.Limit, 2), f.Unit))],
            [.. b.LeanTrack.Where(s => s.At >= forecast.Now).Select(s => new LeanTrackPointView(Local(s.At), R(s.Tilt.Degrees, 2), R(s.Azimuth.Degrees, 1)))],
            [.. b.PointLeansAtHorizon.Select(l => R(l.Tilt.Degrees, 2))]))
            .ToList();
        string daylight = model.Structure is IndoorRoom
            ? "none (indoor room)"
            : string.Create(CultureInfo.InvariantCulture, $"clear sky (Ineichen–Perez, Linke turbidity {model.Weather.LinkeTurbidity}) × daily clearness {model.Weather.DailyClearness}");
        return new ForecastView(
            id, site.Id, site.Version, hash, createdAt, userId, model.Zone.Id, Local(forecast.Now), Local(forecast.HorizonEnd),
            forecast.Step.TotalMinutes, band, daylight, forecast.MissingLightSteps, forecast.MissingTemperatureSteps, benches);
    }

    private static double R(double value, int decimals) => Math.Round(value, decimals);
}
