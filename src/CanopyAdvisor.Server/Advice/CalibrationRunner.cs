using System.Collections.Immutable;
using System.Globalization;
using CanopyAdvisor.Core.Advice.Calibration;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Server.Contracts;
using CanopyAdvisor.Server.Forecasting;
using CanopyAdvisor.Storage;
using NodaTime;

namespace CanopyAdvisor.Server.Advice;

/// <summary>Fits a crop's lean parameters to a site's stored observations, as <c>canopy calibrate</c> does
/// (<see cref="CalibrationInputs"/> for the parameter names and the default "now", <see cref="CropCalibrator.Fit"/>
/// over the forecast request the forecasts use).</summary>
internal sealed class CalibrationRunner(ForecastRunner forecasts, ICanopyStore store)
{
    /// <summary>The most iterations a request may ask for.</summary>
    public const int MaxIterationsLimit = 100;

    /// <summary>The fit.</summary>
    /// <exception cref="InvalidInputException">Bad options, no observations, observations that do not fit the site; every problem.</exception>
    public async Task<CalibrationOutcome> FitAsync(SiteRecord site, CalibrationRequest options, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(site);
        ArgumentNullException.ThrowIfNull(options);
        var errors = new List<ValidationError>();
        ImmutableArray<string> keys = CalibrationOptions.Default.Parameters;
        if (options.Parameters is not null)
        {
            try
            {
                keys = CalibrationInputs.ParameterKeys(options.Parameters, "parameters");
            }
            catch (InvalidInputException e)
            {
                errors.AddRange(e.Errors);
            }
        }

        int iterations = options.MaxIterations ?? CalibrationOptions.Default.MaxIterations;
        if (iterations is < 1 or > MaxIterationsLimit)
        {
            errors.Add(new ValidationError("maxIterations", string.Create(CultureInfo.InvariantCulture, $"must be 1 to {MaxIterationsLimit}, got {iterations}")));
        }

        if (options.VariantId is string id && !CropValidator.IsValidId(id))
        {
            errors.Add(new ValidationError("variantId", $"'{id}' is not a crop id: use lower-case letters and digits joined by hyphens, e.g. petunia-site-a"));
        }

        Instant? now = null;
        if (options.Now is not null)
        {
            now = forecasts.StartOf(options.Now, errors);
        }

        IReadOnlyList<ObservationRecord> stored = await store.Observations.ListAsync(site.OrganisationId, site.Id, cancellationToken);
        if (stored.Count == 0)
        {
            errors.Add(new ValidationError("observations", "this site has no observations; record measured leans first (POST …/observations)"));
        }

        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        LoadedSite loaded = await forecasts.LoadAsync(site, cancellationToken);
        ImmutableArray<LeanObservation> measured = [.. stored.Select(o => new LeanObservation(
            o.BenchId, o.At, Angle.FromDegrees(o.TiltDeg), Angle.FromDegrees(o.AzimuthDeg), o.HeightMm, o.Plants) { Where = "observations/" + o.Id })];
        Instant start = now ?? CalibrationInputs.DefaultNow(loaded.Model, measured);
        ForecastRequest request = ForecastRunner.RequestFor(loaded, start);
        var calibration = CalibrationOptions.Default with { Parameters = keys, MaxIterations = iterations, VariantId = options.VariantId };
        CalibrationResult result = await Task.Run(
            () => CropCalibrator.Fit(request, options.Crop, measured, calibration, progress: null, cancellationToken), cancellationToken);
        Crop baseCrop = request.Crops[result.CropId];
        return new CalibrationOutcome(result, View(site.Id, loaded, result, start, measured.Length), baseCrop, Comment(loaded, result, measured.Length));
    }

    private static List<string> Comment(LoadedSite loaded, CalibrationResult result, int count)
    {
        var c = CultureInfo.InvariantCulture;
        string L(Instant t) => t.InZone(loaded.Model.Zone).ToOffsetDateTime().ToString("uuuu-MM-dd'T'HH:mmo<+HH:mm>", c);
        var lines = new List<string>
        {
            $"{result.Variant.Name}: '{result.CropId}' calibrated by the CanopyAdvisor service from {count} lean observations,",
            $"{L(result.FirstObservation)} to {L(result.LastObservation)} (site {loaded.Model.Id}).",
        };
        lines.AddRange(result.Estimates.Select(e => string.Create(c, $"{e.Symbol} ({e.Key}) = {e.Value:G4} ± {e.StandardError:G2} (was {e.PreviousValue:G4})")));
        lines.AddRange(result.Warnings.Select(w => "warning: " + w));
        return lines;
    }

    private static CalibrationView View(string siteId, LoadedSite loaded, CalibrationResult r, Instant now, int count)
    {
        OffsetDateTime L(Instant t) => t.InZone(loaded.Model.Zone).ToOffsetDateTime();
        return new CalibrationView(
            siteId,
            loaded.Model.Zone.Id,
            r.CropId,
            L(now),
            count,
            L(r.FirstObservation),
            L(r.LastObservation),
            r.Iterations,
            r.SimulatorRuns,
            r.Converged,
            R(r.InitialRmsMisfitDegrees, 3),
            R(r.RmsMisfitDegrees, 3),
            [.. r.Estimates.Select(e => new CalibrationEstimateView(
                e.Key, e.Symbol, S(e.Value), double.IsFinite(e.StandardError) ? S(e.StandardError) : null, e.PreviousValue, e.Minimum, e.Maximum, e.Unit, e.AtBound))],
            [.. r.Correlation.Select(row => (IReadOnlyList<double?>)[.. row.Select(x => double.IsFinite(x) ? R(x, 4) : (double?)null)])],
            r.Warnings,
            r.Identified,
            [.. r.Residuals.Select(x => new CalibrationResidualView(
                x.Where is { } w && w.StartsWith("observations/", StringComparison.Ordinal) ? w["observations/".Length..] : x.Where,
                x.BenchId, L(x.At), R(x.Observed.Tilt.Degrees, 2), R(x.Observed.Azimuth.Degrees, 1), R(x.Modelled.Tilt.Degrees, 2),
                R(x.Modelled.Azimuth.Degrees, 1), R(x.MisfitDegrees, 3), x.Weight, x.HeightMm))],
            r.Variant.Id,
            Saved: false);
    }

    private static double R(double value, int decimals) => double.IsFinite(value) ? Math.Round(value, decimals) : value;

    // Four significant digits, for estimates and standard errors of any magnitude (as the CLI).
    private static double S(double value) =>
        double.IsFinite(value) ? double.Parse(value.ToString("G4", CultureInfo.InvariantCulture), CultureInfo.InvariantCulture) : value;
}
