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

/// <summary>What every command that forecasts lots reads before computing: the site with its lots, their crops, the
/// daylight and the air temperature (shared by <c>canopy forecast</c> and <c>canopy plan</c>).</summary>
/// <param name="Site">The site, with at least one lot.</param>
/// <param name="Crops">The lots' crops found in the library, by id (a missing one is reported by the forecast at its lot).</param>
/// <param name="OutsideLight">Clear sky × the site's clearness, or the measured weather log.</param>
/// <param name="Temperature">The site's setpoints, or the measured temperature log.</param>
/// <param name="Weather">How the daylight is described in reports.</param>
/// <param name="Temperatures">How the air temperature is described in reports.</param>
internal sealed record ForecastInputs(
    Site Site,
    IReadOnlyDictionary<string, Crop> Crops,
    IOutsideLightSource OutsideLight,
    ITemperatureSource Temperature,
    string Weather,
    string Temperatures)
{
    private static readonly OffsetDateTimePattern Printed = OffsetDateTimePattern.CreateWithInvariantCulture("uuuu'-'MM'-'dd'T'HH':'mmo<+HH:mm>");

    /// <summary>An instant as local time in a zone with its offset, to the minute, e.g. 2026-12-02T08:00+01:00.</summary>
    public static string FormatLocal(Instant instant, DateTimeZone zone) => Printed.Format(instant.InZone(zone).ToOffsetDateTime());

    /// <summary>The site argument.</summary>
    public static Argument<string> SiteArgument() =>
        new("site") { Description = "Site file (JSON) with lots, or demo:NAME for a built-in demo site." };

    /// <summary>The <c>--now</c> option.</summary>
    public static Option<string?> NowOption(string what) =>
        new("--now") { Description = $"{what}, ISO-8601 with offset (default: the current time)." };

    /// <summary>The <c>--weather</c> option.</summary>
    public static Option<string?> WeatherOption() =>
        new("--weather") { Description = "Measured weather log (CSV) instead of clear sky × the site's clearness." };

    /// <summary>The <c>--temperatures</c> option.</summary>
    public static Option<string?> TemperaturesOption() =>
        new("--temperatures") { Description = "Measured air temperature log (CSV: timestamp, airC) instead of the site's setpoints." };

    /// <summary>The start: <c>--now</c> if given, else the clock.</summary>
    public static Instant Start(string? nowText, IClock clock) =>
        nowText is null ? clock.GetCurrentInstant() : TimeArguments.ParseOffsetDateTime(nowText, "--now").ToInstant();

    /// <summary>Reads and checks every input before anything is computed (nothing is computed from half-read data);
    /// spikes left out of a temperature log are reported on <paramref name="error"/>.</summary>
    /// <exception cref="InvalidInputException">The site has no lots, or a file is not usable.</exception>
    public static ForecastInputs Load(string site, string[]? cropFolders, string? weatherPath, string? temperaturePath, TextWriter error)
    {
        Site model = SiteSource.Load(site);
        if (model.Lots.IsDefaultOrEmpty)
        {
            throw new InvalidInputException("lots", "the site has no crop lots to forecast; add a \"lots\" section (see the site file README)");
        }

        CropLibrary library = CropsCommand.Load(cropFolders);
        var cropsById = new Dictionary<string, Crop>(StringComparer.Ordinal);
        foreach (Lot lot in model.Lots)
        {
            if (library.TryGet(lot.CropId, out Crop? crop))
            {
                cropsById[lot.CropId] = crop;
            }
        }

        IOutsideLightSource outside = DaylightSource.Create(model, weatherPath);
        ITemperatureSource temperature;
        string temperatures;
        if (temperaturePath is null)
        {
            temperature = new SetpointTemperature(model.Temperatures, model.Location, model.Zone);
            temperatures = string.Create(CultureInfo.InvariantCulture, $"setpoints {model.Temperatures.DayC}/{model.Temperatures.NightC} °C day/night, pre-dawn drop {model.Temperatures.PreDawnDropC} °C for {model.Temperatures.PreDawnDropHours} h");
        }
        else
        {
            TemperatureLog log = TemperatureLogReader.ReadFile(temperaturePath);
            foreach (TemperatureSpike spike in log.Spikes)
            {
                error.WriteLine(string.Create(CultureInfo.InvariantCulture, $"warning: {spike.Where}: {spike.AirC} °C is a spike (neighbours {spike.PreviousAirC} and {spike.NextAirC} °C); left out, not replaced"));
            }

            temperature = new MeasuredTemperature(log.Records, model.Location, model.Zone);
            temperatures = $"measured log {Path.GetFileName(temperaturePath)}";
        }

        return new ForecastInputs(model, cropsById, outside, temperature, DaylightSource.Describe(model, weatherPath), temperatures);
    }
}
