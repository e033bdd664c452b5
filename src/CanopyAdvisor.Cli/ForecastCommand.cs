using System.CommandLine;
using System.Globalization;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Plants.Growth;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Crops;
using CanopyAdvisor.Files.Temperature;
using CanopyAdvisor.Reports;
using NodaTime;

namespace CanopyAdvisor.Cli;

/// <summary><c>canopy forecast</c>: which way and how fast each bench's plants will lean, and how much they will stretch.</summary>
internal static class ForecastCommand
{
    public static Command Create(TextWriter output, TextWriter error, bool interactive, IClock clock)
    {
        var inputs = new ForecastInputs();
        var days = new Option<double>("--days") { Description = "Horizon in days (default 7; up to a year).", DefaultValueFactory = _ => 7 };
        var noBand = new Option<bool>("--no-band") { Description = "Skip the uncertainty band (faster)." };
        var json = new Option<bool>("--json") { Description = "Print JSON instead of a table." };
        var map = new Option<string?>("--map") { Description = "Also write a floor map (SVG) of each plant's lean at the horizon with a lean arrow per bench." };
        var command = new Command("forecast", "Per bench: lean now and at the horizon, direction, rate, when it leaves grade, height at sale, and flags.")
        {
            inputs.Site, days, inputs.Now, inputs.Weather, inputs.Temperatures, inputs.Crops, noBand, json, map,
        };
        command.SetAction(parse =>
        {
            double dayCount = parse.GetValue(days);
            if (!(dayCount > 0 && dayCount <= 366))
            {
                throw new InvalidInputException("--days", "must be more than 0 and at most 366");
            }

            ForecastInputs.Loaded loaded = inputs.Load(parse, clock, error);
            Site model = loaded.Site;
            var request = new ForecastRequest(model, loaded.Crops, loaded.Outside, loaded.Temperature, loaded.Now)
            {
                Horizon = Duration.FromHours(dayCount * 24),
                IncludeUncertainty = !parse.GetValue(noBand),
            };
            var progress = new ProgressReporter(error, "forecasting", interactive);
            SiteForecast forecast = BenchForecaster.Run(request, progress);

            ForecastReport report = Build(model, forecast, loaded.WeatherPath, loaded.TemperaturePath);
            if (parse.GetValue(map) is string mapPath)
            {
                File.WriteAllText(mapPath, LeanMapSvg.Render(model, forecast, $"{model.Name}: lean forecast to {report.HorizonEnd}"));
                error.WriteLine($"map written to {mapPath}");
            }

            JsonOutput.WriteReport(output, report, parse.GetValue(json), WriteText);

            return 0;
        });
        return command;
    }

    private static ForecastReport Build(Site site, SiteForecast forecast, string? weatherPath, string? temperaturePath)
    {
        string Format(Instant t) => ForecastInputs.FormatLocal(t, site.Zone);
        var benches = forecast.Benches.Select(b => new BenchForecastReport(
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
            b.LeavesGradeAt is Instant at ? Format(at) : null,
            R(b.HeightNowMm, 1),
            R(b.HeightAtHorizonMm, 1),
            R(b.HeightAtSaleMm, 1),
            R(b.HeightGradeLimitMm, 0),
            R(b.MeanDliMolPerM2Day, 2),
            R(b.MeanPhytochromeState, 3),
            R(b.MeanDifKelvin, 2),
            b.Uncertainty is LeanUncertainty u
                ? new LeanBandReport(R(u.Low.Degrees, 2), R(u.High.Degrees, 2), [.. u.Drivers.Select(d => d.Key)])
                : null,
            [.. b.Flags.Select(f => new FlagReport(f.Kind == ForecastFlagKind.Leggy ? "leggy" : "leaning", f.Cause, R(f.Value, 2), R(f.Limit, 2), f.Unit))]))
            .ToList();
        return new ForecastReport(
            site.Id,
            site.Name,
            site.Zone.Id,
            Format(forecast.Now),
            Format(forecast.HorizonEnd),
            forecast.Step.TotalMinutes,
            DaylightSource.Describe(site, weatherPath),
            ForecastInputs.DescribeTemperatures(site, temperaturePath),
            forecast.MissingLightSteps,
            forecast.MissingTemperatureSteps,
            benches);
    }

    private static void WriteText(TextWriter output, ForecastReport r)
    {
        var c = CultureInfo.InvariantCulture;
        output.WriteLine($"{r.SiteName} ({r.SiteId}), {r.TimeZone}");
        output.WriteLine(string.Create(c, $"from {r.Now} to {r.HorizonEnd}, step {r.StepMinutes:0.#} min; daylight: {r.Weather}; air: {r.Temperatures}"));
        if (r.MissingLightSteps > 0 || r.MissingTemperatureSteps > 0)
        {
            output.WriteLine($"note: {r.MissingLightSteps} step(s) without outside light and {r.MissingTemperatureSteps} without air temperature in the logs (nothing invented for them)");
        }

        output.WriteLine();
        var table = new TextTable("bench", "crop", ">lean", "toward", ">rate/d", ">at end", ">band", ">limit", "leaves grade", ">height", ">at sale", ">spec");
        foreach (BenchForecastReport b in r.Benches)
        {
            string band = b.LeanAtHorizonBand is LeanBandReport lb ? string.Create(c, $"{lb.LowDeg:0.0}–{lb.HighDeg:0.0}°") : "-";
            table.Add(
                b.BenchId,
                b.Crop,
                string.Create(c, $"{b.LeanDeg:0.0}°"),
                b.LeanDeg < 0.05 ? "-" : string.Create(c, $"{b.LeanDirection,-3} {b.LeanAzimuthDeg,3:0}°"),
                string.Create(c, $"{b.LeanRateDegPerDay:+0.00;-0.00;0.00}°"),
                string.Create(c, $"{b.LeanAtHorizonDeg:0.0}°"),
                band,
                string.Create(c, $"{b.LeanGradeLimitDeg:0}°"),
                b.LeavesGradeAt ?? "-",
                string.Create(c, $"{b.HeightMm:0} mm"),
                string.Create(c, $"{b.HeightAtSaleMm:0} mm"),
                string.Create(c, $"{b.HeightGradeLimitMm:0} mm"));
        }

        output.Write(table.ToString());
        output.WriteLine();
        bool any = false;
        foreach (BenchForecastReport b in r.Benches)
        {
            foreach (FlagReport f in b.Flags)
            {
                if (!any)
                {
                    output.WriteLine("flags:");
                    any = true;
                }

                output.WriteLine(string.Create(c, $"  {b.BenchId,-14} {f.Kind,-8} {f.Cause}: {f.Value:0.##} {f.Unit} (limit {f.Limit:0.##} {f.Unit})"));
            }
        }

        if (!any)
        {
            output.WriteLine("flags: none");
        }

        output.WriteLine();
        output.WriteLine("lean: tilt of the stem's base-to-apex line from vertical, bench mean; toward: where the tops point;");
        output.WriteLine("band: lean at the end over the crop parameters' plausible ranges (see 'canopy crops show'); forecasts rest on");
        output.WriteLine("crop parameters that are mostly estimates: measure lean on a few benches to check them.");
    }

    private static double R(double value, int decimals) => Math.Round(value, decimals);
}
