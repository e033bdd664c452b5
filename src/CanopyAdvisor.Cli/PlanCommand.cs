using System.CommandLine;
using System.Globalization;
using CanopyAdvisor.Core;
using CanopyAdvisor.Core.Advice;
using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Advice.Rotation;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Reports.Calendar;
using NodaTime;

namespace CanopyAdvisor.Cli;

/// <summary><c>canopy plan</c>: per bench, whether and how often to turn the pots to keep the lean within grade to the
/// sale, and the list of rotation tasks.</summary>
internal static class PlanCommand
{
    public static Command Create(TextWriter output, TextWriter error, bool interactive, IClock clock)
    {
        var inputs = new ForecastInputs();
        var margin = new Option<double>("--margin")
        {
            Description = "Keep the lean this many percent under the crop's grade limit (default 20, an estimate).",
            DefaultValueFactory = _ => ModelConstants.RotationGradeMargin * 100,
        };
        var json = new Option<bool>("--json") { Description = "Print JSON instead of a table." };
        var ics = new Option<string?>("--ics") { Description = "Also write the rotation calendar as iCalendar (RFC 5545) to this file." };
        var csv = new Option<string?>("--csv") { Description = "Also write the rotation calendar as CSV (RFC 4180) to this file." };
        var command = new Command("plan", "Per bench: no rotation, or 90°/180° turns every so often, the least labour that keeps the lean within grade to the sale; the rotation tasks scheduled on the site's crews.")
        {
            inputs.Site, inputs.Now, inputs.Weather, inputs.Temperatures, inputs.Crops, margin, json, ics, csv,
        };
        command.SetAction(parse =>
        {
            double marginPercent = parse.GetValue(margin);
            if (!(marginPercent >= 0 && marginPercent < 100))
            {
                throw new InvalidInputException("--margin", "must be at least 0 and below 100 (percent)");
            }

            ForecastInputs.Loaded loaded = inputs.Load(parse, clock, error);
            Instant start = loaded.Now;
            Site model = loaded.Site;
            if (RotationPlanning.LastSale(model) <= start + Duration.FromHours(1))
            {
                throw new InvalidInputException("lots", $"every lot is sold by {ForecastInputs.FormatLocal(RotationPlanning.LastSale(model), model.Zone)}; nothing to plan after {ForecastInputs.FormatLocal(start, model.Zone)}");
            }

            (Duration horizon, bool capped) = RotationPlanning.HorizonToSales(model, start, Duration.Zero);
            if (capped)
            {
                error.WriteLine($"note: sales after {ForecastInputs.FormatLocal(start + horizon, model.Zone)} are checked only to then (a forecast reaches 366 days at most)");
            }

            var request = new ForecastRequest(model, loaded.Crops, loaded.Outside, loaded.Temperature, start) { Horizon = horizon };
            var progress = new ProgressReporter(error, "planning", interactive);
            (RotationPlan plan, LabourSchedule schedule) = RotationPlanning.PlanAndSchedule(request, RotationPolicyOptions.Default with { Margin = marginPercent / 100 }, progress);
            if (parse.GetValue(ics) is string icsPath)
            {
                OutputFiles.WriteWhole(icsPath, RotationCalendarIcs.Write(model, schedule, clock.GetCurrentInstant()));
            }

            if (parse.GetValue(csv) is string csvPath)
            {
                OutputFiles.WriteWhole(csvPath, RotationCalendarCsv.Write(model, schedule));
            }

            JsonOutput.WriteReport(output, Build(model, plan, schedule, loaded), parse.GetValue(json), WriteText);
            return 0;
        });
        return command;
    }

    private static PlanReport Build(Site site, RotationPlan plan, LabourSchedule schedule, ForecastInputs.Loaded inputs)
    {
        string Local(Instant t) => ForecastInputs.FormatLocal(t, site.Zone);
        RotationTaskReport Task(PlannedRotation r) =>
            new(r.LotId, r.BenchId, r.Pots, R(r.Angle.Degrees, 0), Local(r.At), Local(r.Earliest), Local(r.Latest));
        var benches = plan.Benches.Select(b => new BenchPlanReport(
            b.BenchId,
            b.LotId,
            b.CropId,
            b.Pots,
            Local(b.SaleAt),
            Local(b.CheckedUntil),
            VerdictName(b.Verdict),
            b.Policy.ToString(),
            b.Policy.IsNone ? null : R(b.Policy.Angle.Degrees, 0),
            b.Policy.IsNone ? null : R(b.Policy.Interval.TotalHours, 2),
            b.RotationsToSale,
            R(b.LeanNow.Degrees, 2),
            R(b.PeakLeanWithPlan.Degrees, 2),
            R(b.PeakLeanWithoutPlan.Degrees, 2),
            b.PeakLeanWhenLate is { } late ? R(late.Degrees, 2) : null,
            R(b.TargetLean.Degrees, 2),
            R(b.GradeLimit.Degrees, 1),
            b.Rotations.IsEmpty ? null : Task(b.Rotations[0]),
            b.Remedy,
            [.. b.Candidates.Select(c => new RotationCandidateReport(
                c.Policy.ToString(),
                c.Policy.IsNone ? null : R(c.Policy.Angle.Degrees, 0),
                c.Policy.IsNone ? null : R(c.Policy.Interval.TotalHours, 2),
                c.Rotations,
                R(c.PeakLean.Degrees, 2),
                c.LatePeakLean is { } l ? R(l.Degrees, 2) : null,
                c.WindowFraction,
                c.Holds))]))
            .ToList();
        return new PlanReport(
            site.Id,
            site.Name,
            site.Zone.Id,
            Local(plan.Now),
            Local(plan.ForecastEnd),
            R(plan.Options.Margin * 100, 1),
            plan.Options.WindowFraction,
            DaylightSource.Describe(site, inputs.WeatherPath),
            ForecastInputs.DescribeTemperatures(site, inputs.TemperaturePath),
            benches,
            [.. plan.Tasks.Select(Task)],
            CalendarReport.From(site, schedule));
    }

    private static string VerdictName(RotationVerdict verdict) => verdict switch
    {
        RotationVerdict.NoRotationNeeded => "noRotationNeeded",
        RotationVerdict.Rotate => "rotate",
        _ => "rotationCannotHold",
    };

    private static void WriteText(TextWriter output, PlanReport r)
    {
        var c = CultureInfo.InvariantCulture;
        output.WriteLine($"{r.SiteName} ({r.SiteId}), {r.TimeZone}");
        output.WriteLine(string.Create(c, $"from {r.Now} to each lot's sale; keep the lean at least {r.MarginPercent:0.#} % under the grade limit; task windows ± {r.WindowFraction * 100:0.#} % of the interval"));
        output.WriteLine($"daylight: {r.Weather}; air: {r.Temperatures}");
        output.WriteLine();
        var table = new TextTable("bench", "crop", "verdict", "policy", ">turns", ">lean now", ">peak plan", ">peak none", ">target", ">limit", "first turn (window)");
        foreach (BenchPlanReport b in r.Benches)
        {
            table.Add(
                b.BenchId,
                b.Crop,
                b.Verdict switch { "noRotationNeeded" => "no rotation", "rotate" => "rotate", _ => "cannot hold" },
                b.Policy,
                b.RotationsToSale.ToString(c),
                string.Create(c, $"{b.LeanNowDeg:0.0}°"),
                string.Create(c, $"{b.PeakLeanWithPlanDeg:0.0}°"),
                string.Create(c, $"{b.PeakLeanWithoutPlanDeg:0.0}°"),
                string.Create(c, $"{b.TargetLeanDeg:0.0}°"),
                string.Create(c, $"{b.LeanGradeLimitDeg:0}°"),
                b.FirstRotation is { } f ? $"{f.At} ({f.Earliest} … {f.Latest})" : "-");
        }

        output.Write(table.ToString());
        output.WriteLine();
        bool lamps = false;
        foreach (BenchPlanReport b in r.Benches.Where(b => b.Remedy is not null))
        {
            output.WriteLine(string.Create(c, $"{b.BenchId}: {b.Remedy} (best peak {b.PeakLeanWithPlanDeg:0.0}° with {b.Policy}, target {b.TargetLeanDeg:0.0}°)"));
            lamps = true;
        }

        foreach (BenchPlanReport b in r.Benches.Where(b => b.CheckedUntil != b.SaleAt))
        {
            output.WriteLine($"{b.BenchId}: checked to {b.CheckedUntil} only (sale {b.SaleAt})");
        }

        if (lamps)
        {
            output.WriteLine("caution: adding side lamps is electrical work, often at height: have a licensed electrician do it to local codes, and");
            output.WriteLine("do not look into intense blue or UV-rich lamps at close range.");
            output.WriteLine();
        }

        CalendarReport cal = r.Calendar;
        if (r.Tasks.Count == 0)
        {
            output.WriteLine("rotation tasks: none");
        }
        else
        {
            output.WriteLine(string.Create(c, $"rotation calendar ({cal.Scheduled.Count} of {r.Tasks.Count} tasks placed on the crews, local time; turn clockwise seen from above):"));
            var tasks = new TextTable("date", "time", "crew", "bench", "lot", ">pots", ">turn", ">hours", "window");
            foreach (CalendarTaskReport t in cal.Scheduled)
            {
                tasks.Add(t.Date, $"{Clock(t.Start)}–{Clock(t.End)}", t.Crew, t.BenchId, t.LotId, t.Pots.ToString(c), string.Create(c, $"{t.AngleDeg:0}°"),
                    string.Create(c, $"{t.LabourHours:0.00}"), $"{t.WindowStart} … {t.WindowEnd}");
            }

            output.Write(tasks.ToString());
            foreach (UnscheduledTaskReport u in cal.Unscheduled)
            {
                string extra = u.ExtraLabour.Count == 0
                    ? "no extra labour within the window would fit it"
                    : "would fit with " + string.Join(" or ", u.ExtraLabour.Select(x => string.Create(c, $"{x.Hours:0.##} h more on {x.Date} ({x.Crew})")));
                output.WriteLine(string.Create(c, $"does not fit: {u.TaskId} ({u.BenchId}, {u.Pots} pots, window {u.WindowStart} … {u.WindowEnd}): {u.Reason}; {extra}"));
            }

            output.WriteLine();
            var weeks = new TextTable("week", "crew", ">hours", ">of", ">tasks");
            foreach (LabourWeekReport w in cal.Weeks.Where(w => w.Tasks > 0))
            {
                weeks.Add(w.Week, w.Crew, string.Create(c, $"{w.Hours:0.0}"), string.Create(c, $"{w.CapacityHours:0}"), w.Tasks.ToString(c));
            }

            output.WriteLine(string.Create(c, $"rotation labour: {cal.TotalHours:0.0} h in all, at most {cal.PeakDayHours:0.0} h on one day"));
            output.Write(weeks.ToString());
        }

        output.WriteLine();
        output.WriteLine("peak: largest bench-mean lean from now to the sale (a bench over the target now is graded from when the turns have");
        output.WriteLine("brought it back within); target: the grade limit less the margin; each plan was also checked with every turn made");
        output.WriteLine("late in its window, and with turns alternately early and late. Forecasts rest on crop parameters that are mostly");
        output.WriteLine("estimates: measure lean on a few benches to check them.");
    }

    private static double R(double value, int decimals) => Math.Round(value, decimals);

    // "2026-12-02T08:00+01:00" → "08:00".
    private static string Clock(string local) => local.Length >= 16 ? local[11..16] : local;
}
