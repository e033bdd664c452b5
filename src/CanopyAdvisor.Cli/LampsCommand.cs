using System.CommandLine;
using System.Globalization;
using CanopyAdvisor.Core.Advice.SideLamps;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.SideLamps;
using CanopyAdvisor.Files.Sites;
using CanopyAdvisor.Reports;
using NodaTime;
using NodaTime.Text;

namespace CanopyAdvisor.Cli;

/// <summary><c>canopy lamps</c>: side lamps on the designer's rails that straighten the benches at risk, with before/after.</summary>
internal static class LampsCommand
{
    public static Command Create(TextWriter output, TextWriter error, bool interactive, IClock clock)
    {
        var inputs = new ForecastInputs();
        var brief = new Option<string>("--brief") { Description = "Side-lamp brief (JSON: rails, lamp types, limits), or demo:NAME for a built-in demo brief.", Required = true };
        var days = new Option<double>("--days") { Description = "Forecast horizon and planning period in days (default 7; up to 60).", DefaultValueFactory = _ => 7 };
        var seed = new Option<int?>("--seed") { Description = "Seed of the search's random starts (default: the brief's)." };
        var json = new Option<bool>("--json") { Description = "Print JSON instead of a table." };
        var map = new Option<string?>("--map") { Description = "Also write light maps (SVG): this file with the proposed lamps, and NAME-before.svg without them." };
        var command = new Command("lamps", "Propose side lamps (rail position, aim, dimming) that balance the blue light on the benches at risk; before/after lean, PPFD, DLI, uniformity, energy and cost.")
        {
            inputs.Site, brief, inputs.Now, days, seed, inputs.Weather, inputs.Temperatures, inputs.Crops, json, map,
        };
        command.SetAction(parse =>
        {
            double dayCount = parse.GetValue(days);
            if (!(dayCount >= 1 && dayCount <= 60))
            {
                throw new InvalidInputException("--days", "must be at least 1 and at most 60");
            }

            // Read and check every input before computing: nothing is computed from half-read data.
            ForecastInputs.Loaded loaded = inputs.Load(parse, clock, error);
            Site model = loaded.Site;
            SideLampBrief plan = LoadBrief(parse.GetValue(brief)!, parse.GetValue(inputs.Site)!, model);
            if (parse.GetValue(seed) is int s)
            {
                plan = plan with { Seed = s };
            }

            string? weatherPath = loaded.WeatherPath;
            var request = new ForecastRequest(model, loaded.Crops, loaded.Outside, loaded.Temperature, loaded.Now)
            {
                Horizon = Duration.FromHours(dayCount * 24),
                IncludeUncertainty = false,
            };

            var progress = new ProgressReporter(error, "planning side lamps", interactive);
            SideLampPlan result = SideLampPlanner.Plan(plan, request, progress);
            LampsReport report = Build(model, plan, result, weatherPath);
            if (parse.GetValue(map) is string mapPath)
            {
                string beforePath = Path.Combine(Path.GetDirectoryName(mapPath) ?? string.Empty, Path.GetFileNameWithoutExtension(mapPath) + "-before" + Path.GetExtension(mapPath));
                File.WriteAllText(mapPath, LightMapSvg.Render(result.ProposedSite, result.LightAfter, $"{model.Name}: light with the proposed side lamps, {report.FirstDay} to {report.LastDay}"));
                File.WriteAllText(beforePath, LightMapSvg.Render(model, result.LightBefore, $"{model.Name}: light as it is, {report.FirstDay} to {report.LastDay}"));
                error.WriteLine($"maps written to {mapPath} and {beforePath}");
            }

            JsonOutput.WriteReport(output, report, parse.GetValue(json), WriteText);
            return 0;
        });
        return command;
    }

    /// <summary>Reads the brief against the site, naming lamp types from the site file's own <c>lampTypes</c>.</summary>
    private static SideLampBrief LoadBrief(string argument, string siteArgument, Site site)
    {
        (string siteJson, string? siteFolder) = siteArgument.StartsWith(SiteSource.DemoPrefix, StringComparison.Ordinal)
            ? (DemoSites.ReadText(siteArgument[SiteSource.DemoPrefix.Length..]), null)
            : (File.ReadAllText(siteArgument), Path.GetDirectoryName(Path.GetFullPath(siteArgument)));
        var reader = new SideLampBriefReader(SiteLampTypes.Read(siteJson, siteFolder, StandardBeamFactory.Instance));
        if (argument.StartsWith(SiteSource.DemoPrefix, StringComparison.Ordinal))
        {
            string name = argument[SiteSource.DemoPrefix.Length..];
            if (!DemoSideLampBriefs.Names.Contains(name))
            {
                throw new InvalidInputException("--brief", $"unknown demo brief '{name}'; known: {string.Join(", ", DemoSideLampBriefs.Names)}");
            }

            return reader.Parse(DemoSideLampBriefs.ReadText(name), $"demo brief {name}", site);
        }

        if (!File.Exists(argument))
        {
            throw new InvalidInputException("--brief", $"file not found: {argument}");
        }

        return reader.Read(argument, site);
    }

    private static LampsReport Build(Site site, SideLampBrief brief, SideLampPlan plan, string? weatherPath)
    {
        string Format(Instant t) => ForecastInputs.FormatLocal(t, site.Zone);
        LampsBenchStateReport State(BenchForecast f, BenchLightFigures light) => new(
            R(f.LeanNow.Tilt.Degrees, 2),
            R(f.LeanAtHorizon.Tilt.Degrees, 2),
            R(f.LeanAtHorizon.Azimuth.Degrees, 1),
            f.LeanAtHorizon.CompassPoint,
            R(f.LeanRateDegreesPerDay, 3),
            f.LeavesGradeAt is Instant at ? Format(at) : null,
            R(light.MeanPpfd, 1),
            R(light.PeakPpfd, 1),
            R(light.Dli, 2),
            light.Uniformity is double u ? R(u, 3) : null,
            R(light.LateralBlue, 3));
        var lamps = plan.Lamps.Select(p => new ProposedLampReport(
            p.Lamp.Id,
            p.RailId,
            p.LampType,
            R(p.PositionFraction, 4),
            R(p.DistanceAlongRailM, 2),
            R(p.Lamp.Position.X, 2),
            R(p.Lamp.Position.Y, 2),
            R(p.Lamp.Position.Z, 2),
            R(p.Lamp.Aim.Yaw.Normalized().Degrees, 1),
            R(p.Lamp.Aim.Tilt.Degrees, 1),
            R(p.Lamp.Dimming, 3),
            R(p.Lamp.Watts * p.Lamp.Dimming, 1))).ToList();
        var benches = plan.Benches.Select(b => new LampsBenchReport(
            b.BenchId,
            b.CropId,
            b.AtRisk,
            State(b.ForecastBefore, b.LightBefore),
            State(b.ForecastAfter, b.LightAfter),
            b.PpfdCeiling,
            Name(b.Ceiling),
            Name(b.Uniformity))).ToList();
        SideLampEnergy e = plan.Energy;
        return new LampsReport(
            site.Id,
            site.Name,
            site.Zone.Id,
            Format(plan.ForecastBefore.Now),
            Format(plan.ForecastBefore.HorizonEnd),
            LocalDatePattern.Iso.Format(plan.FirstDay),
            LocalDatePattern.Iso.Format(plan.LastDay),
            DaylightSource.Describe(site, weatherPath),
            brief.Seed,
            plan.BenchesAtRisk,
            lamps,
            benches,
            new LampsEnergyReport(R(e.AddedWatts, 1), R(e.OnHoursPerWeek, 2), R(e.KilowattHoursPerWeek, 2), e.CostPerWeek is double c ? R(c, 2) : null, e.Currency),
            plan.LateralBlueRemaining,
            plan.Notes,
            plan.Cautions);
    }

    private static void WriteText(TextWriter output, LampsReport r)
    {
        var c = CultureInfo.InvariantCulture;
        output.WriteLine($"{r.SiteName} ({r.SiteId}), {r.TimeZone}");
        output.WriteLine(string.Create(c, $"forecast from {r.Now} to {r.HorizonEnd}; light over {r.FirstDay} to {r.LastDay}; daylight: {r.Weather}; seed {r.Seed}"));
        output.WriteLine($"benches at risk: {(r.BenchesAtRisk.Count == 0 ? "none" : string.Join(", ", r.BenchesAtRisk))}");
        output.WriteLine();

        if (r.Lamps.Count > 0)
        {
            output.WriteLine("proposed lamps:");
            var lamps = new TextTable("lamp", "type", "rail", ">along", ">x", ">y", ">z", ">yaw", ">tilt", ">dimming", ">power");
            foreach (ProposedLampReport l in r.Lamps)
            {
                lamps.Add(
                    l.Id, l.LampType, l.Rail, TextTable.Number(l.AlongRailM, 2) + " m", TextTable.Number(l.XM, 2), TextTable.Number(l.YM, 2), TextTable.Number(l.ZM, 2),
                    TextTable.Number(l.YawDeg, 0) + "°", TextTable.Number(l.TiltDeg, 0) + "°", TextTable.Number(l.Dimming * 100, 0) + " %", TextTable.Number(l.Watts, 0) + " W");
            }

            output.Write(lamps.ToString());
            output.WriteLine("(along: metres from the rail's start; yaw: compass direction the lamp faces; tilt: from straight down, 90° = horizontal)");
            output.WriteLine();
        }
        else
        {
            output.WriteLine("proposed lamps: none");
            output.WriteLine();
        }

        var table = new TextTable("bench", "crop", "risk", ">lean now", ">lean at end", ">rate/d", ">PPFD", ">peak", ">DLI", ">unif.", ">lateral blue", "ceiling", "floor");
        foreach (LampsBenchReport b in r.Benches)
        {
            table.Add(
                b.BenchId,
                b.Crop,
                b.AtRisk ? "yes" : "-",
                TextTable.Number(b.Before.LeanNowDeg, 1) + "°",
                Pair(b.Before.LeanAtHorizonDeg, b.After.LeanAtHorizonDeg, "0.0", "°"),
                Pair(b.Before.LeanRateDegPerDay, b.After.LeanRateDegPerDay, "+0.00;-0.00;0.00", "°"),
                Pair(b.Before.PpfdMean, b.After.PpfdMean, "0", string.Empty),
                Pair(b.Before.PpfdPeak, b.After.PpfdPeak, "0", string.Empty),
                Pair(b.Before.Dli, b.After.Dli, "0.00", string.Empty),
                Pair(b.Before.Uniformity ?? double.NaN, b.After.Uniformity ?? double.NaN, "0.00", string.Empty),
                Pair(b.Before.LateralBlue, b.After.LateralBlue, "0.00", string.Empty),
                b.PpfdCeiling is double ceiling ? string.Create(c, $"{ceiling:0} {b.Ceiling}") : "-",
                b.UniformityFloor);
        }

        output.Write(table.ToString());
        output.WriteLine("before → after. lean: bench mean, degrees from vertical (now: as it is); PPFD: mean horizontal µmol m⁻² s⁻¹ over the period; peak: highest");
        output.WriteLine("at any sample point and step; DLI: mol m⁻² d⁻¹; unif.: min/avg point DLI; lateral blue: horizontal blue light vector, µmol m⁻² s⁻¹.");
        output.WriteLine();

        LampsEnergyReport e = r.Energy;
        string cost = e.CostPerWeek is double perWeek ? string.Create(c, $"{perWeek:0.00} {e.Currency} per week") : "cost unknown (the site has no tariff)";
        output.WriteLine(string.Create(c, $"energy: {e.AddedWatts:0} W while on × {e.OnHoursPerWeek:0.#} h/week = {e.KWhPerWeek:0.0} kWh per week; {cost}"));
        output.WriteLine();
        foreach (string note in r.Notes)
        {
            output.WriteLine($"note: {note}");
        }

        output.WriteLine();
        output.WriteLine("cautions:");
        foreach (string caution in r.Cautions)
        {
            output.WriteLine($"  - {caution}");
        }
    }

    private static string Pair(double before, double after, string format, string unit) =>
        double.IsNaN(before) && double.IsNaN(after)
            ? "-"
            : string.Create(CultureInfo.InvariantCulture, $"{before.ToString(format, CultureInfo.InvariantCulture)}{unit} → {after.ToString(format, CultureInfo.InvariantCulture)}{unit}");

    private static string Name(LimitCheck check) => check switch
    {
        LimitCheck.Met => "met",
        LimitCheck.Unmet => "unmet",
        LimitCheck.UnmetBefore => "unmetBefore",
        _ => "notSet",
    };

    private static double R(double value, int decimals) => Math.Round(value, decimals);
}
