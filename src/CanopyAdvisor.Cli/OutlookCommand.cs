using System.CommandLine;
using System.Collections.Immutable;
using CanopyAdvisor.Core;
using CanopyAdvisor.Core.Advice;
using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Advice.Rotation;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Reports.Calendar;
using CanopyAdvisor.Reports.Outlook;
using NodaTime;

namespace CanopyAdvisor.Cli;

/// <summary><c>canopy outlook</c>: the weekly lean outlook of a site as a printable page, a CSV and <c>outlook.json</c>.</summary>
internal static class OutlookCommand
{
    /// <summary>The page's file name in the output folder.</summary>
    public const string PageFile = "outlook.html";

    /// <summary>The CSV's file name in the output folder.</summary>
    public const string CsvFile = "outlook.csv";

    /// <summary>The gist's file name in the output folder (read back next week for the change).</summary>
    public const string SnapshotFile = "outlook.json";

    /// <summary>The rotation calendar's file name in the output folder (iCalendar, RFC 5545).</summary>
    public const string CalendarFile = "rotations.ics";

    public static Command Create(TextWriter output, TextWriter error, bool interactive, IClock clock)
    {
        var inputs = new ForecastInputs();
        var outFolder = new Option<string?>("--out") { Description = "Folder to write outlook.html, outlook.csv, outlook.json and rotations.ics into (created if needed)." };
        var previous = new Option<string?>("--previous") { Description = "An earlier outlook.json to compare with (default: the one already in the --out folder, if any)." };
        var command = new Command("outlook", "The week's lean outlook of a site: floor map, benches ranked by risk, lean and DLI charts, change against last week; as a printable page, CSV and JSON.")
        {
            inputs.Site, outFolder, inputs.Now, inputs.Weather, inputs.Temperatures, inputs.Crops, previous,
        };
        command.SetAction(parse =>
        {
            string folder = parse.GetValue(outFolder) is string o && o.Length > 0
                ? o
                : throw new InvalidInputException("--out", "is required: the folder to write outlook.html, outlook.csv, outlook.json and rotations.ics into");
            if (File.Exists(folder))
            {
                throw new InvalidInputException("--out", $"'{folder}' is a file, not a folder");
            }

            string? previousPath = parse.GetValue(previous);
            if (previousPath is not null && !File.Exists(previousPath))
            {
                throw new InvalidInputException("--previous", $"file not found: {previousPath}");
            }

            ForecastInputs.Loaded loaded = inputs.Load(parse, clock, error);
            Site site = loaded.Site;

            // Read last week's gist before anything is written over it.
            string earlierPath = previousPath ?? Path.Combine(folder, SnapshotFile);
            string? earlierText = File.Exists(earlierPath) ? File.ReadAllText(earlierPath) : null;
            PreviousOutlook earlier = PreviousOutlook.Resolve(earlierText, earlierPath, site.Id, loaded.Now);
            if (earlier.Note is string note && earlierText is not null)
            {
                error.WriteLine((earlier.IsWarning ? "warning: " : "note: ") + note);
            }

            var request = new ForecastRequest(site, loaded.Crops, loaded.Outside, loaded.Temperature, loaded.Now);
            var notes = new List<string>
            {
                $"Daylight: {DaylightSource.Describe(site, loaded.WeatherPath)}; air: {ForecastInputs.DescribeTemperatures(site, loaded.TemperaturePath)}.",
            };
            if (earlier.Note is string remark)
            {
                notes.Add(char.ToUpperInvariant(remark[0]) + remark[1..] + ".");
            }

            (OutlookReport report, LabourSchedule schedule) = OutlookComputation.Compute(
                request,
                notes,
                earlier.Snapshot,
                (new ProgressReporter(error, "forecasting", interactive), new ProgressReporter(error, "daily light", interactive), new ProgressReporter(error, "rotation plan", interactive)));

            Directory.CreateDirectory(folder);
            string[] written = OutputFiles.WriteAll(folder, new Dictionary<string, string>(StringComparer.Ordinal)
            {
                [PageFile] = OutlookPage.Render(report),
                [CsvFile] = OutlookCsv.Write(report),
                [SnapshotFile] = OutlookSnapshotJson.Write(OutlookSnapshot.From(report)),
                [CalendarFile] = RotationCalendarIcs.Write(site, schedule, clock.GetCurrentInstant()),
            });
            foreach (string path in written)
            {
                output.WriteLine(path);
            }

            return 0;
        });
        return command;
    }
}
