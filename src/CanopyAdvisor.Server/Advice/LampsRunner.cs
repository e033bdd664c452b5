using System.Globalization;
using CanopyAdvisor.Core.Advice.SideLamps;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.SideLamps;
using CanopyAdvisor.Server.Contracts;
using CanopyAdvisor.Server.Forecasting;
using CanopyAdvisor.Storage;
using NodaTime;

namespace CanopyAdvisor.Server.Advice;

/// <summary>Proposes side lamps for a stored site from a brief, as <c>canopy lamps</c> does: the brief read by
/// <see cref="SideLampBriefReader"/> against the site's own lamp types, then <see cref="SideLampPlanner.Plan"/> over the
/// forecast request the forecasts use (without the band).</summary>
internal sealed class LampsRunner(ForecastRunner forecasts)
{
    /// <summary>The default period, days (as the CLI).</summary>
    public const double DefaultDays = 7;

    /// <summary>The longest period, days (as the CLI).</summary>
    public const double MaxDays = 60;

    /// <summary>The proposal for a brief.</summary>
    /// <exception cref="InvalidInputException">Bad options or brief; every problem.</exception>
    public async Task<LampsView> ProposeAsync(SiteRecord site, string briefJson, string? now, double? days, int? seed, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(site);
        var errors = new List<ValidationError>();
        Instant start = forecasts.StartOf(now, errors);
        double dayCount = days ?? DefaultDays;
        if (!(dayCount >= 1 && dayCount <= MaxDays))
        {
            errors.Add(new ValidationError("days", string.Create(CultureInfo.InvariantCulture, $"must be at least 1 and at most {MaxDays}, got {dayCount}")));
        }

        if (briefJson.Length == 0)
        {
            errors.Add(new ValidationError("body", "a side-lamp brief (JSON) is required"));
        }

        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        LoadedSite loaded = await forecasts.LoadAsync(site, cancellationToken);
        Site model = loaded.Model;
        var reader = new SideLampBriefReader(SiteLampTypes.Read(site.Json, baseDirectory: null, ServerBeamFactory.Instance));
        SideLampBrief brief = reader.Parse(briefJson, "brief", model);
        if (seed is int s)
        {
            brief = brief with { Seed = s };
        }

        ForecastRequest request = ForecastRunner.RequestFor(loaded, start) with
        {
            Horizon = Duration.FromHours(dayCount * 24),
            IncludeUncertainty = false,
        };
        SideLampPlan plan = await Task.Run(() => SideLampPlanner.Plan(brief, request, progress: null, cancellationToken), cancellationToken);
        return View(site.Id, model, brief, plan);
    }

    private static LampsView View(string siteId, Site site, SideLampBrief brief, SideLampPlan plan)
    {
        OffsetDateTime L(Instant t) => t.InZone(site.Zone).ToOffsetDateTime();
        LampsBenchStateView State(BenchForecast f, BenchLightFigures light) => new(
            R(f.LeanNow.Tilt.Degrees, 2), R(f.LeanAtHorizon.Tilt.Degrees, 2), R(f.LeanAtHorizon.Azimuth.Degrees, 1), R(f.LeanRateDegreesPerDay, 3),
            R(light.MeanPpfd, 1), R(light.PeakPpfd, 1), R(light.Dli, 2), light.Uniformity is double u ? R(u, 3) : null, R(light.LateralBlue, 3));
        SideLampEnergy e = plan.Energy;
        return new LampsView(
            siteId,
            site.Zone.Id,
            L(plan.ForecastBefore.Now),
            L(plan.ForecastBefore.HorizonEnd),
            plan.FirstDay,
            plan.LastDay,
            brief.Seed,
            plan.BenchesAtRisk,
            [.. plan.Lamps.Select(p => new ProposedLampView(
                p.Lamp.Id, p.RailId, p.LampType, R(p.DistanceAlongRailM, 2), R(p.Lamp.Position.X, 2), R(p.Lamp.Position.Y, 2), R(p.Lamp.Position.Z, 2),
                R(p.Lamp.Aim.Yaw.Normalized().Degrees, 1), R(p.Lamp.Aim.Tilt.Degrees, 1), R(p.Lamp.Dimming, 3), R(p.Lamp.Watts * p.Lamp.Dimming, 1)))],
            [.. plan.Benches.Select(b => new LampsBenchView(
                b.BenchId, b.CropId, b.AtRisk, State(b.ForecastBefore, b.LightBefore), State(b.ForecastAfter, b.LightAfter), b.PpfdCeiling, Name(b.Ceiling), Name(b.Uniformity)))],
            new LampsEnergyView(R(e.AddedWatts, 1), R(e.OnHoursPerWeek, 2), R(e.KilowattHoursPerWeek, 2), e.CostPerWeek is double c ? R(c, 2) : null, e.Currency),
            plan.LateralBlueRemaining,
            plan.Notes,
            plan.Cautions);
    }

    private static string Name(LimitCheck check) => check switch
    {
        LimitCheck.Met => "met",
        LimitCheck.Unmet => "unmet",
        LimitCheck.UnmetBefore => "unmetBefore",
        _ => "notSet",
    };

    private static double R(double value, int decimals) => Math.Round(value, decimals);
}
