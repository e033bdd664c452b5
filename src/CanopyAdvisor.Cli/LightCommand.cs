using System.CommandLine;
using System.Globalization;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Structures;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Reports;
using NodaTime;
using NodaTime.Text;

namespace CanopyAdvisor.Cli;

/// <summary><c>canopy light</c>: per bench and local day, PPFD, DLI, uniformity, light and blue vectors and R:FR.</summary>
internal static class LightCommand
{
    /// <summary>The longest period one run may cover, days.</summary>
    public const int MaximumDays = 366;

    public static Command Create(TextWriter output, TextWriter error, bool interactive, IClock clock)
    {
        var site = new Argument<string>("site") { Description = "Site file (JSON), or demo:NAME for a built-in demo site." };
        var from = new Option<string?>("--from") { Description = "First local date, ISO-8601 (e.g. 2027-03-15); default: today in the site's time zone." };
        var days = new Option<int>("--days") { Description = "Number of local days.", DefaultValueFactory = _ => 7 };
        var stepMinutes = new Option<double>("--step-minutes") { Description = "Time step in minutes.", DefaultValueFactory = _ => LightSimulation.DefaultStep.TotalMinutes };
        var weather = new Option<string?>("--weather") { Description = "Measured weather log (CSV: timestamp, ghiWm2 and/or parUmolM2S); default: clear sky × the site's daily clearness." };
        var json = new Option<bool>("--json") { Description = "Print JSON instead of a table." };
        var map = new Option<string?>("--map") { Description = "Also write a floor map (SVG) of DLI per sample cell with the light vector of each bench." };
        var command = new Command("light", "The light on each bench, day by day: PPFD, DLI, uniformity, light vector, blue vector, R:FR.")
        {
            site, from, days, stepMinutes, weather, json, map,
        };
        command.SetAction(parse =>
        {
            string? fromText = parse.GetValue(from);
            LocalDate? firstGiven = fromText is null ? null : TimeArguments.ParseDate(fromText, "--from");
            int dayCount = parse.GetValue(days);
            double minutes = parse.GetValue(stepMinutes);
            ValidateRange(dayCount, minutes);
            string? weatherPath = parse.GetValue(weather);

            // Read and check every input before any computing starts: nothing is computed from half-read data.
            Site model = SiteSource.Load(parse.GetValue(site)!);
            LocalDate first = firstGiven ?? clock.GetCurrentInstant().InZone(model.Zone).Date;
            IOutsideLightSource outside = DaylightSource.Create(model, weatherPath);

            var progress = new ProgressReporter(error, "computing light", interactive);
            IEnclosure enclosure = EnclosureBuilder.Build(model);
            CompiledLightField field = LightFieldCompiler.Compile(model, enclosure);
            LightPeriodSummary summary = LightSimulation.Run(
                field, outside, first, first.PlusDays(dayCount - 1), Duration.FromMinutes(minutes), progress);

            LightReport report = LightReportBuilder.Build(model, summary, dayCount, weatherPath);
            if (parse.GetValue(map) is string mapPath)
            {
                string title = $"{model.Name}: light {report.From}, {dayCount} day(s)";
                File.WriteAllText(mapPath, LightMapSvg.Render(model, summary, title));
                error.WriteLine($"map written to {mapPath}");
            }

            JsonOutput.WriteReport(output, report, parse.GetValue(json), WriteText);

            return 0;
        });
        return command;
    }

    private static void ValidateRange(int dayCount, double minutes)
    {
        var errors = new List<ValidationError>();
        if (dayCount < 1 || dayCount > MaximumDays)
        {
            errors.Add(new ValidationError("--days", $"must be within [1, {MaximumDays}]"));
        }

        if (!(minutes >= 1 && minutes <= 60 && 1440 % minutes == 0))
        {
            errors.Add(new ValidationError("--step-minutes", "must be a whole divisor of a day between 1 and 60 minutes (e.g. 5, 10, 15, 30, 60)"));
        }

        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }
    }

    private static void WriteText(TextWriter output, LightReport r)
    {
        var c = CultureInfo.InvariantCulture;
        output.WriteLine($"{r.SiteName} ({r.SiteId}), {r.TimeZone}");
        output.WriteLine(string.Create(c, $"{r.Days} day(s) from {r.From}, step {r.StepMinutes:0.#} min, daylight: {r.Weather}"));
        if (r.MissingSteps > 0)
        {
            output.WriteLine($"note: {r.MissingSteps} time step(s) had no outside light in the weather log and add nothing (no light is invented for gaps)");
        }

        output.WriteLine();
        var table = new TextTable("bench", "day", ">PPFD", ">DLI", ">unif.", ">light tilt", "light from", ">blue tilt", "blue from", ">R:FR");
        foreach (BenchLightReport bench in r.Benches)
        {
            foreach (BenchDayReport d in bench.Days)
            {
                table.Add(bench.BenchId, d.Date, N(d.Ppfd, 0), N(d.Dli, 2), N(d.Uniformity, 2), Deg(d.LightTiltDeg), Compass(d.LightTiltDeg, d.LightAzimuthDeg), Deg(d.BlueTiltDeg), Compass(d.BlueTiltDeg, d.BlueAzimuthDeg), N(d.Rfr, 2));
            }

            table.Add(bench.BenchId, "mean", N(bench.Ppfd, 0), N(bench.Dli, 2), N(bench.Uniformity, 2), Deg(bench.LightTiltDeg), Compass(bench.LightTiltDeg, bench.LightAzimuthDeg), Deg(bench.BlueTiltDeg), Compass(bench.BlueTiltDeg, bench.BlueAzimuthDeg), N(bench.Rfr, 2));
        }

        output.Write(table.ToString());
        output.WriteLine();
        output.WriteLine("PPFD: mean horizontal µmol m⁻² s⁻¹ over the day; DLI: mol m⁻² d⁻¹; unif.: lowest/mean point DLI;");
        output.WriteLine("tilt: angle of the mean light (or blue light) vector from the vertical; from: compass direction the light comes from.");
    }

    private static string N(double? value, int decimals) => value is double v ? TextTable.Number(v, decimals) : "-";

    private static string Deg(double value) => TextTable.Number(value, 1) + "°";

    // A near-vertical vector has no meaningful direction: show a dash rather than a compass point picked by noise.
    private static string Compass(double tiltDeg, double azimuthDeg) =>
        tiltDeg < 0.05 ? "-" : $"{Direction.CompassPoint(Angle.FromDegrees(azimuthDeg)),-3} {TextTable.Number(azimuthDeg, 0),3}°";
}
