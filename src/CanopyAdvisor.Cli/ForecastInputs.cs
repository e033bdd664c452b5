using System.CommandLine;
using System.Globalization;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Plants.Growth;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Crops;
using CanopyAdvisor.Files.Temperature;
using NodaTime;
using NodaTime.Text;

namespace CanopyAdvisor.Cli;

/// <summary>The arguments every forecasting command shares (site, <c>--now</c>, <c>--weather</c>, <c>--temperatures</c>,
/// <c>--crops</c>) and how they are read into the forecast's inputs.</summary>
internal sealed class ForecastInputs
{
    private static readonly OffsetDateTimePattern Printed = OffsetDateTimePattern.CreateWithInvariantCulture("uuuu'-'MM'-'dd'T'HH':'mmo<+HH:mm>");

    public Argument<string> Site { get; } = new("site") { Description = "Site file (JSON) with lots, or demo:NAME for a built-in demo site." };

    public Option<string?> Now { get; } = new("--now") { Description = "Forecast start, ISO-8601 with offset (default: the current time)." };

    public Option<string?> Weather { get; } = new("--weather") { Description = "Measured weather log (CSV) instead of clear sky × the site's clearness." };

    public Option<string?> Temperatures { get; } = new("--temperatures") { Description = "Measured air temperature log (CSV: timestamp, airC) instead of the site's setpoints." };

    public Option<string[]> Crops { get; } = CropsCommand.CropFoldersOption();

    /// <summary>What the arguments resolve to.</summary>
    internal sealed record Loaded(
        Site Site,
        Dictionary<string, Crop> Crops,
        IOutsideLightSource Outside,
        ITemperatureSource Temperature,
        Instant Now,
        string? WeatherPath,
        string? TemperaturePath);

    /// <summary>Reads and checks every input before anything is computed: nothing is computed from half-read data.</summary>
    public Loaded Load(ParseResult parse, IClock clock, TextWriter error)
    {
        Instant start = parse.GetValue(Now) is string nowText
            ? TimeArguments.ParseOffsetDateTime(nowText, "--now").ToInstant()
            : clock.GetCurrentInstant();
        Site model = SiteSource.Load(parse.GetValue(Site)!);
        if (model.Lots.IsDefaultOrEmpty)
        {
            throw new InvalidInputException("lots", "the site has no crop lots to forecast; add a \"lots\" section (see the site file README)");
        }

        CropLibrary library = CropsCommand.Load(parse.GetValue(Crops));
        var cropsById = new Dictionary<string, Crop>(StringComparer.Ordinal);
        foreach (Lot lot in model.Lots)
        {
            if (library.TryGet(lot.CropId, out Crop? crop))
            {
                cropsById[lot.CropId] = crop;
            }
        }

        string? weatherPath = parse.GetValue(Weather);
        IOutsideLightSource outside = DaylightSource.Create(model, weatherPath);
        string? temperaturePath = parse.GetValue(Temperatures);
        ITemperatureSource temperature;
        if (temperaturePath is null)
        {
            temperature = new SetpointTemperature(model.Temperatures, model.Location, model.Zone);
        }
        else
        {
            TemperatureLog log = TemperatureLogReader.ReadFile(temperaturePath);
            foreach (TemperatureSpike spike in log.Spikes)
            {
                error.WriteLine(string.Create(CultureInfo.InvariantCulture, $"warning: {spike.Where}: {spike.AirC} °C is a spike (neighbours {spike.PreviousAirC} and {spike.NextAirC} °C); left out, not replaced"));
            }

            temperature = new MeasuredTemperature(log.Records, model.Location, model.Zone);
        }

        return new Loaded(model, cropsById, outside, temperature, start, weatherPath, temperaturePath);
    }

    /// <summary>An instant as the site's local time with its offset, to the minute (e.g. <c>2026-12-02T08:00+01:00</c>).</summary>
    public static string FormatLocal(Instant instant, DateTimeZone zone) => Printed.Format(instant.InZone(zone).ToOffsetDateTime());

    /// <summary>One line saying where the air temperatures came from, for reports.</summary>
    public static string DescribeTemperatures(Site site, string? temperaturePath) =>
        temperaturePath is null
            ? string.Create(CultureInfo.InvariantCulture, $"setpoints {site.Temperatures.DayC}/{site.Temperatures.NightC} °C day/night, pre-dawn drop {site.Temperatures.PreDawnDropC} °C for {site.Temperatures.PreDawnDropHours} h")
            : $"measured log {Path.GetFileName(temperaturePath)}";
}
