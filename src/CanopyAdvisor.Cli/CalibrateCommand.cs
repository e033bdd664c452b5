using System.Collections.Immutable;
using System.CommandLine;
using System.Globalization;
using CanopyAdvisor.Core.Advice.Calibration;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Plants.Growth;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Crops;
using CanopyAdvisor.Files.Observations;
using CanopyAdvisor.Files.Temperature;
using NodaTime;

namespace CanopyAdvisor.Cli;

/// <summary><c>canopy calibrate</c>: fits a crop's M, γ (and B) to measured lean and saves a site variant of the crop.</summary>
internal static class CalibrateCommand
{
    public static Command Create(TextWriter output, TextWriter error, bool interactive)
    {
        var site = new Argument<string>("site") { Description = "Site file (JSON) with lots, or demo:NAME for a built-in demo site." };
        var observations = new Option<string>("--observations")
        {
            Description = "Measured leans (CSV: benchId, at, tiltDeg, azimuthDeg, heightMm, plants), or demo:NAME for the demo observations.",
            Required = true,
        };
        var crop = new Option<string?>("--crop") { Description = "Crop id to calibrate (default: the one crop of the observed benches)." };
        var parameters = new Option<string>("--params") { Description = "Parameters to fit, comma-separated: M, gamma, B (default M,gamma).", DefaultValueFactory = _ => "M,gamma" };
        var now = new Option<string?>("--now") { Description = "Now, ISO-8601 with offset, at or after the last observation (default: the last observation, or noon of the observed lots' height measurement if later)." };
        var weather = new Option<string?>("--weather") { Description = "Measured weather log (CSV) instead of clear sky × the site's clearness." };
        var temperatures = new Option<string?>("--temperatures") { Description = "Measured air temperature log (CSV: timestamp, airC) instead of the site's setpoints." };
        var iterations = new Option<int>("--max-iterations") { Description = "Most iterations of the fit (default 25).", DefaultValueFactory = _ => CalibrationOptions.Default.MaxIterations };
        var outPath = new Option<string?>("--out")
        {
            Description = "Write the calibrated variant as a crop file: a FILE.toml (its name becomes the variant id) or an existing folder (file named after the variant).",
        };
        Option<string[]> crops = CropsCommand.CropFoldersOption();
        var json = new Option<bool>("--json") { Description = "Print JSON instead of text." };
        var command = new Command("calibrate", "Fit the crop's lean parameters (M, γ, B) to measured lean; print estimates ± standard errors, warnings and residuals; save a site variant.")
        {
            site, observations, crop, parameters, now, weather, temperatures, iterations, outPath, crops, json,
        };
        command.SetAction(parse =>
        {
            // Read and check every input before computing: nothing is computed from half-read data.
            ImmutableArray<string> keys = ParseParameters(parse.GetValue(parameters)!);
            Site model = SiteSource.Load(parse.GetValue(site)!);
            ImmutableArray<LeanObservation> measured = LoadObservations(parse.GetValue(observations)!);
            Instant start = parse.GetValue(now) is string nowText
                ? TimeArguments.ParseOffsetDateTime(nowText, "--now").ToInstant()
                : CalibrationInputs.DefaultNow(model, measured);

            string? outText = parse.GetValue(outPath);
            string? variantId = null;
            string? outFolder = null;
            if (outText is not null)
            {
                if (Directory.Exists(outText))
                {
                    outFolder = outText;
                }
                else
                {
                    if (!string.Equals(Path.GetExtension(outText), ".toml", StringComparison.Ordinal))
                    {
                        throw new InvalidInputException("--out", $"'{outText}' must be an existing folder or a file ending in .toml");
                    }

                    variantId = Path.GetFileNameWithoutExtension(outText);
                    if (!CropValidator.IsValidId(variantId))
                    {
                        throw new InvalidInputException("--out", $"the file name '{variantId}' is not a crop id: use lower-case letters and digits joined by hyphens, e.g. petunia-site-a.toml");
                    }

                    outFolder = Path.GetDirectoryName(Path.GetFullPath(outText))!;
                    if (!Directory.Exists(outFolder))
                    {
                        throw new InvalidInputException("--out", $"folder not found: {outFolder}");
                    }
                }
            }

            CropLibrary library = CropsCommand.Load(parse.GetValue(crops));
            var cropsById = new Dictionary<string, Crop>(StringComparer.Ordinal);
            foreach (Lot lot in model.Lots.IsDefault ? [] : model.Lots)
            {
                if (library.TryGet(lot.CropId, out Crop? c))
                {
                    cropsById[lot.CropId] = c;
                }
            }

            string? weatherPath = parse.GetValue(weather);
            IOutsideLightSource outside = DaylightSource.Create(model, weatherPath);
            string? temperaturePath = parse.GetValue(temperatures);
            ITemperatureSource temperature = Temperature(model, temperaturePath, error);
            var request = new ForecastRequest(model, cropsById, outside, temperature, start);
            var options = CalibrationOptions.Default with { Parameters = keys, MaxIterations = parse.GetValue(iterations), VariantId = variantId };
            var progress = new ProgressReporter(error, "calibrating", interactive);
            CalibrationResult result = CropCalibrator.Fit(request, parse.GetValue(crop), measured, options, progress);

            string? written = null;
            bool refused = outFolder is not null && !result.Identified;
            if (outFolder is not null && result.Identified)
            {
                Crop baseCrop = cropsById[result.CropId];
                written = CropVariantWriter.WriteToFolder(outFolder, result.Variant, baseCrop, Comment(model, result, measured.Length, parse.GetValue(observations)!.StartsWith(SiteSource.DemoPrefix, StringComparison.Ordinal)));
            }

            CalibrationReport report = Build(model, result, start, measured.Length, weatherPath, temperaturePath, written);
            JsonOutput.WriteReport(output, report, parse.GetValue(json), WriteText);
            if (refused)
            {
                error.WriteLine("error: the observations cannot identify the parameters (see the warnings); the variant was not saved.");
                return CanopyCommandLine.InvalidInputExitCode;
            }

            return 0;
        });
        return command;
    }

    private static ImmutableArray<string> ParseParameters(string text) =>
        CalibrationInputs.ParameterKeys(text.Split(',', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries), "--params");

    private static ImmutableArray<LeanObservation> LoadObservations(string argument)
    {
        if (argument.StartsWith(SiteSource.DemoPrefix, StringComparison.Ordinal))
        {
            string name = argument[SiteSource.DemoPrefix.Length..];
            return DemoObservations.Names.Contains(name)
                ? DemoObservations.Load(name)
                : throw new InvalidInputException("--observations", $"unknown demo observations '{name}'; known: {string.Join(", ", DemoObservations.Names)}");
        }

        return File.Exists(argument)
            ? LeanObservationReader.ReadFile(argument)
            : throw new InvalidInputException("--observations", $"file not found: {argument}");
    }

    private static ITemperatureSource Temperature(Site model, string? path, TextWriter error)
    {
        if (path is null)
        {
            return new SetpointTemperature(model.Temperatures, model.Location, model.Zone);
        }

        TemperatureLog log = TemperatureLogReader.ReadFile(path);
        foreach (TemperatureSpike spike in log.Spikes)
        {
            error.WriteLine(string.Create(CultureInfo.InvariantCulture, $"warning: {spike.Where}: {spike.AirC} °C is a spike (neighbours {spike.PreviousAirC} and {spike.NextAirC} °C); left out, not replaced"));
        }

        return new MeasuredTemperature(log.Records, model.Location, model.Zone);
    }

    private static List<string> Comment(Site site, CalibrationResult result, int count, bool demo)
    {
        var c = CultureInfo.InvariantCulture;
        string Format(Instant t) => ForecastInputs.FormatLocal(t, site.Zone);
        var lines = new List<string>
        {
            $"{result.Variant.Name}: '{result.CropId}' calibrated by canopy calibrate from {count} lean observations,",
            $"{Format(result.FirstObservation)} to {Format(result.LastObservation)} (site {site.Id}).",
        };
        lines.AddRange(result.Estimates.Select(e => string.Create(c, $"{e.Symbol} ({e.Key}) = {e.Value:G4} ± {e.StandardError:G2} (was {e.PreviousValue:G4})")));
        lines.AddRange(result.Warnings.Select(w => "warning: " + w));
        if (demo)
        {
            lines.Insert(0, "DEMO DATA: calibrated from invented demo observations.");
        }

        return lines;
    }

    private static CalibrationReport Build(
        Site site, CalibrationResult r, Instant now, int count, string? weatherPath, string? temperaturePath, string? written)
    {
        string Format(Instant t) => ForecastInputs.FormatLocal(t, site.Zone);
        return new CalibrationReport(
            site.Id,
            site.Name,
            site.Zone.Id,
            r.CropId,
            Format(now),
            count,
            Format(r.FirstObservation),
            Format(r.LastObservation),
            DaylightSource.Describe(site, weatherPath),
            temperaturePath is null
                ? string.Create(CultureInfo.InvariantCulture, $"setpoints {site.Temperatures.DayC}/{site.Temperatures.NightC} °C day/night")
                : $"measured log {Path.GetFileName(temperaturePath)}",
            r.Iterations,
            r.SimulatorRuns,
            r.Converged,
            R(r.InitialRmsMisfitDegrees, 3),
            R(r.RmsMisfitDegrees, 3),
            [.. r.Estimates.Select(e => new CalibrationEstimateReport(e.Key, e.Symbol, S(e.Value), S(e.StandardError), e.PreviousValue, e.Minimum, e.Maximum, e.Unit, e.AtBound))],
            [.. r.Correlation.Select(row => (IReadOnlyList<double>)[.. row.Select(x => R(x, 4))])],
            r.Warnings,
            r.Identified,
            [.. r.Residuals.Select(x => new CalibrationResidualReport(
                x.Where,
                x.BenchId,
                Format(x.At),
                R(x.Observed.Tilt.Degrees, 2),
                R(x.Observed.Azimuth.Degrees, 1),
                R(x.Modelled.Tilt.Degrees, 2),
                R(x.Modelled.Azimuth.Degrees, 1),
                R(x.EastResidual, 5),
                R(x.NorthResidual, 5),
                R(x.MisfitDegrees, 3),
                x.Weight,
                x.HeightMm))],
            r.Variant.Id,
            written);
    }

    private static void WriteText(TextWriter output, CalibrationReport r)
    {
        var c = CultureInfo.InvariantCulture;
        output.WriteLine($"{r.SiteName} ({r.SiteId}), {r.TimeZone}");
        output.WriteLine($"crop {r.Crop}: {r.Observations} observations from {r.FirstObservation} to {r.LastObservation}; now {r.Now}");
        output.WriteLine($"daylight: {r.Weather}; air: {r.Temperatures}");
        output.WriteLine(string.Create(c, $"fit: {r.Iterations} iterations, {r.SimulatorRuns} simulator runs, {(r.Converged ? "converged" : "NOT converged")}; RMS misfit {r.InitialRmsMisfitDeg:0.00}° before, {r.RmsMisfitDeg:0.00}° after"));
        output.WriteLine();
        var table = new TextTable("", "parameter", ">estimate", ">± SE", ">range", ">was", "unit");
        foreach (CalibrationEstimateReport e in r.Estimates)
        {
            table.Add(
                e.Symbol,
                e.Key,
                string.Create(c, $"{e.Value:G4}{(e.AtBound ? " (at bound)" : string.Empty)}"),
                double.IsFinite(e.StandardError) ? string.Create(c, $"{e.StandardError:G2}") : "undetermined",
                string.Create(c, $"{e.Minimum:G4}–{e.Maximum:G4}"),
                string.Create(c, $"{e.PreviousValue:G4}"),
                e.Unit);
        }

        output.Write(table.ToString());
        for (int a = 0; a < r.Estimates.Count; a++)
        {
            for (int b = a + 1; b < r.Estimates.Count; b++)
            {
                output.WriteLine(string.Create(c, $"correlation {r.Estimates[a].Symbol}–{r.Estimates[b].Symbol}: {r.Correlation[a][b]:0.00}"));
            }
        }

        output.WriteLine();
        if (r.Warnings.Count == 0)
        {
            output.WriteLine("warnings: none");
        }
        else
        {
            output.WriteLine("warnings:");
            foreach (string w in r.Warnings)
            {
                output.WriteLine($"  - {w}");
            }
        }

        output.WriteLine();
        var residuals = new TextTable("where", "bench", "at", ">observed", ">modelled", ">misfit", ">plants", ">height");
        foreach (CalibrationResidualReport x in r.Residuals)
        {
            residuals.Add(
                x.Where ?? "-",
                x.BenchId,
                x.At,
                string.Create(c, $"{x.ObservedTiltDeg:0.00}° {x.ObservedAzimuthDeg,5:0.0}°"),
                string.Create(c, $"{x.ModelledTiltDeg:0.00}° {x.ModelledAzimuthDeg,5:0.0}°"),
                string.Create(c, $"{x.MisfitDeg:0.00}°"),
                string.Create(c, $"{x.Plants:0}"),
                x.HeightMm is double h ? string.Create(c, $"{h:0} mm") : "-");
        }

        output.Write(residuals.ToString());
        output.WriteLine();
        output.WriteLine(r.VariantWrittenTo is string path
            ? $"variant '{r.VariantId}' written to {path}; use it with --crops {Path.GetDirectoryName(Path.GetFullPath(path))} and \"crop\": \"{r.VariantId}\" in the site's lots"
            : r.Identified
                ? $"variant '{r.VariantId}' not written: give --out FILE.toml or --out FOLDER to save it"
                : $"variant '{r.VariantId}' not saved: the observations cannot identify the parameters (see the warnings)");
        output.WriteLine("lean: tilt and compass direction of the bench-mean lean; misfit: length of the lean-vector difference as an angle;");
        output.WriteLine("standard errors reflect the scatter of the measurements under the model, not errors of the model itself.");
    }

    private static double R(double value, int decimals) => double.IsFinite(value) ? Math.Round(value, decimals) : value;

    // Four significant digits, for estimates and standard errors of any magnitude.
    private static double S(double value) =>
        double.IsFinite(value) ? double.Parse(value.ToString("G4", CultureInfo.InvariantCulture), CultureInfo.InvariantCulture) : value;
}
