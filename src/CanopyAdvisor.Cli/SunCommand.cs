using System.CommandLine;
using System.Globalization;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Validation;
using NodaTime;
using NodaTime.Text;

namespace CanopyAdvisor.Cli;

/// <summary><c>canopy sun</c>: the sun's position at an instant (NREL SPA) and that day's sunrise, transit and sunset.</summary>
internal static class SunCommand
{
    private static readonly OffsetDateTimePattern Printed = OffsetDateTimePattern.CreateWithInvariantCulture("uuuu'-'MM'-'dd'T'HH':'mm':'sso<+HH:mm>");

    public static Command Create(TextWriter output)
    {
        var lat = new Option<double>("--lat") { Description = "Latitude in degrees, north positive.", Required = true };
        var lon = new Option<double>("--lon") { Description = "Longitude in degrees, east positive.", Required = true };
        var elevation = new Option<double>("--elevation-m") { Description = "Elevation above sea level in metres.", DefaultValueFactory = _ => 0 };
        var time = new Option<string>("--time") { Description = "Instant, ISO-8601 with offset, e.g. 2027-06-21T12:00:00+02:00.", Required = true };
        var zone = new Option<string?>("--time-zone") { Description = "IANA time zone for sunrise/transit/sunset (default: the offset of --time)." };
        var json = new Option<bool>("--json") { Description = "Print JSON instead of text." };
        var command = new Command("sun", "Sun zenith and azimuth at an instant, and that day's sunrise, transit and sunset.")
        {
            lat, lon, elevation, time, zone, json,
        };
        command.SetAction(parse =>
        {
            OffsetDateTime at = TimeArguments.ParseOffsetDateTime(parse.GetValue(time)!, "--time");
            DateTimeZone dayZone = parse.GetValue(zone) is string id ? TimeArguments.ParseZone(id, "--time-zone") : DateTimeZone.ForOffset(at.Offset);
            GeoLocation location = Location(parse.GetValue(lat), parse.GetValue(lon), parse.GetValue(elevation));
            SunReport report = Compute(location, at.ToInstant(), dayZone);
            JsonOutput.WriteReport(output, report, parse.GetValue(json), WriteText);

            return 0;
        });
        return command;
    }

    internal static SunReport Compute(GeoLocation location, Instant instant, DateTimeZone zone)
    {
        SolarPositionResult position = SolarPosition.Calculate(new SolarPositionInput(instant, location));
        LocalDate day = instant.InZone(zone).Date;
        SunTimes times = SolarPosition.CalculateSunTimes(new SunTimesInput(day, zone, location));
        return new SunReport(
            location.Latitude.Degrees,
            location.Longitude.Degrees,
            location.ElevationM,
            Format(instant, zone),
            Round(position.Zenith.Degrees),
            Round(position.Azimuth.Degrees),
            Round(position.Elevation.Degrees),
            times.Kind switch
            {
                SunDayKind.PolarDay => "polar day: the sun does not set",
                SunDayKind.PolarNight => "polar night: the sun does not rise",
                _ => "the sun rises and sets",
            },
            times.Sunrise is ZonedDateTime rise ? Format(rise.ToInstant(), zone) : null,
            Format(times.Transit.ToInstant(), zone),
            times.Sunset is ZonedDateTime set ? Format(set.ToInstant(), zone) : null);
    }

    private static GeoLocation Location(double latDeg, double lonDeg, double elevationM)
    {
        var errors = new List<ValidationError>();
        if (!(latDeg >= -90 && latDeg <= 90))
        {
            errors.Add(new ValidationError("--lat", "must be within [-90, 90] degrees"));
        }

        if (!(lonDeg >= -180 && lonDeg <= 180))
        {
            errors.Add(new ValidationError("--lon", "must be within [-180, 180] degrees"));
        }

        if (!(elevationM >= -500 && elevationM <= 9000))
        {
            errors.Add(new ValidationError("--elevation-m", "must be within [-500, 9000] metres"));
        }

        return errors.Count > 0
            ? throw new InvalidInputException(errors)
            : new GeoLocation(Angle.FromDegrees(latDeg), Angle.FromDegrees(lonDeg), elevationM);
    }

    private static double Round(double value) => Math.Round(value, 6);

    // Printed to the nearest second (not truncated), so a transit at 11:46:04.96 reads 11:46:05 as in the SPA report.
    private static string Format(Instant instant, DateTimeZone zone)
    {
        long ticks = instant.ToUnixTimeTicks();
        long rounded = (long)Math.Round(ticks / (double)NodaConstants.TicksPerSecond, MidpointRounding.AwayFromZero) * NodaConstants.TicksPerSecond;
        return Printed.Format(Instant.FromUnixTimeTicks(rounded).InZone(zone).ToOffsetDateTime());
    }

    private static void WriteText(TextWriter output, SunReport r)
    {
        var c = CultureInfo.InvariantCulture;
        output.WriteLine(string.Create(c, $"at        {r.Time}  ({r.LatitudeDeg:0.####}°, {r.LongitudeDeg:0.####}°, {r.ElevationM:0.#} m)"));
        output.WriteLine(string.Create(c, $"zenith    {r.ZenithDeg,10:0.0000}°   (elevation {r.ElevationAngleDeg:0.0000}°)"));
        output.WriteLine(string.Create(c, $"azimuth   {r.AzimuthDeg,10:0.0000}°   ({Direction.CompassPoint(Angle.FromDegrees(r.AzimuthDeg))}, clockwise from north)"));
        output.WriteLine($"day       {r.Day}");
        output.WriteLine($"sunrise   {r.Sunrise ?? "-"}");
        output.WriteLine($"transit   {r.Transit}");
        output.WriteLine($"sunset    {r.Sunset ?? "-"}");
    }
}
