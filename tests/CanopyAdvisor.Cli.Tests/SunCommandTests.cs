using System.Text.Json;

namespace CanopyAdvisor.Cli.Tests;

/// <summary><c>canopy sun</c>: the command prints what the SPA computes, and rejects bad input with the option named.</summary>
public class SunCommandTests
{
    // Sun position checks against PyEphem 4.1.4 (Debian python3-ephem) are in Core.Tests/Sky; here the values are
    // checked against the MODEL.md §1.1 worked example's sunrise/transit/sunset (Reda & Andreas 2004, NREL/TP-560-34302),
    // which do not depend on pressure and temperature. The CLI uses the corrected local-day method, so sunset may differ
    // from the report's by up to 2 minutes (the report's A.2 gives the previous day's sunset west of Greenwich).
    [Fact]
    public void Json_output_gives_the_worked_example_day()
    {
        var (code, output, error) = CliRunner.Run("sun", "--lat", "39.742476", "--lon", "-105.1786", "--elevation-m", "1830.14", "--time", "2003-10-17T12:30:30-07:00", "--json");
        Assert.True(code == 0, error);
        using JsonDocument doc = JsonDocument.Parse(output);
        JsonElement root = doc.RootElement;
        Assert.Equal("2003-10-17T06:12:43-07:00", root.GetProperty("sunrise").GetString());
        Assert.Equal("2003-10-17T11:46:05-07:00", root.GetProperty("transit").GetString());
        Assert.StartsWith("2003-10-17T17:", root.GetProperty("sunset").GetString(), StringComparison.Ordinal);

        // Zenith at standard refraction (1010 mbar, 10 °C) differs from the report's 820 mbar/11 °C case by the
        // refraction difference only, a few thousandths of a degree at 50° zenith (Bennett 1982 refraction formula).
        Assert.Equal(50.1116, root.GetProperty("zenithDeg").GetDouble(), 0.01);
        Assert.Equal(194.3402, root.GetProperty("azimuthDeg").GetDouble(), 0.001);
    }

    [Fact]
    public void Polar_night_has_no_sunrise()
    {
        // Tromsø-like latitude 69.65° N in late December: polar night (any almanac; common knowledge).
        var (code, output, _) = CliRunner.Run("sun", "--lat", "69.65", "--lon", "18.96", "--time", "2026-12-21T12:00:00+01:00", "--json");
        Assert.Equal(0, code);
        using JsonDocument doc = JsonDocument.Parse(output);
        Assert.Equal(JsonValueKind.Null, doc.RootElement.GetProperty("sunrise").ValueKind);
        Assert.Contains("polar night", doc.RootElement.GetProperty("day").GetString(), StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("--lat", "91", "--lat: must be within [-90, 90] degrees")]
    [InlineData("--lon", "-181", "--lon: must be within [-180, 180] degrees")]
    [InlineData("--time", "2027-06-21 12:00", "--time: '2027-06-21 12:00' is not an ISO-8601 date and time with an offset")]
    [InlineData("--time-zone", "Europe/Atlantis", "--time-zone: unknown IANA time zone 'Europe/Atlantis'")]
    public void Bad_input_names_the_option(string option, string value, string expected)
    {
        var args = new Dictionary<string, string>
        {
            ["--lat"] = "52", ["--lon"] = "5", ["--time"] = "2027-06-21T12:00:00+02:00",
        };
        args[option] = value;
        var (code, _, error) = CliRunner.Run(["sun", .. args.SelectMany(kv => new[] { kv.Key, kv.Value })]);
        Assert.Equal(CanopyCommandLine.InvalidInputExitCode, code);
        Assert.Contains(expected, error, StringComparison.Ordinal);
    }

    [Fact]
    public void Text_output_names_the_compass_point()
    {
        var (code, output, _) = CliRunner.Run("sun", "--lat", "52", "--lon", "5", "--time", "2027-06-21T09:00:00+02:00");
        Assert.Equal(0, code);
        Assert.Contains("azimuth", output, StringComparison.Ordinal);
        Assert.Contains("(E,", output, StringComparison.Ordinal); // morning sun in June at 52° N stands in the east (~95°)
    }
}
