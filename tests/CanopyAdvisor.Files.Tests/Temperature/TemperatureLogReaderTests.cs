using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Plants.Growth;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Temperature;
using NodaTime;

namespace CanopyAdvisor.Files.Tests.Temperature;

// Small invented logs (demo data). Expected values follow from the format described on TemperatureLogReader and
// ISO 8601 (a timestamp with offset +01:00 is one hour ahead of UTC); the spike rule (8 K from both neighbours within
// 30 min) and the range −40…60 °C are this project's choices, documented on the reader.
public class TemperatureLogReaderTests
{
    [Fact]
    public void ReadsRows_BlanksAsMissing()
    {
        const string csv = """
            # house 3, invented demo data
            Timestamp,airC,rhPercent
            2026-03-01T12:00:00+01:00,18.5,60

            2026-03-01T12:10:00+01:00,,61
            2026-03-01T12:20Z,19.25,62
            """;
        TemperatureLog log = TemperatureLogReader.Parse(csv, "house.csv");
        Assert.Equal(
            [
                new TemperatureRecord(Instant.FromUtc(2026, 3, 1, 11, 0), 18.5),
                new TemperatureRecord(Instant.FromUtc(2026, 3, 1, 11, 10), null),
                new TemperatureRecord(Instant.FromUtc(2026, 3, 1, 12, 20), 19.25),
            ],
            log.Records.ToArray());
        Assert.Empty(log.Spikes);
    }

    [Fact]
    public void ReportsEveryBadRow_WithFileLineAndColumn()
    {
        const string csv = """
            timestamp,airC
            2026-03-01T12:00:00+01:00,18
            2026-03-01T12:10:00+01:00,warm
            2026-03-01T12:20:00+01:00,65
            2026-03-01T12:30:00+01:00,-41
            2026-03-01T12:30:00+01:00,18
            2026-03-01T12:40:00,18
            2026-03-01T12:50:00+01:00,18,1
            2026-03-01T13:00:00+01:00,NaN
            2026-03-01T12:55:00+01:00,18
            """;
        var ex = Assert.Throws<InvalidInputException>(() => TemperatureLogReader.Parse(csv, "house.csv"));
        Assert.Equal(
            [
                "house.csv:3: airC: not a number",
                "house.csv:4: airC: 65 °C is outside the physical range -40…60 °C",
                "house.csv:5: airC: -41 °C is outside the physical range -40…60 °C",
                "house.csv:6: timestamp: not after the previous row (line 5)",
                "house.csv:7: timestamp: not an ISO-8601 date-time with UTC offset (e.g. 2026-03-01T12:00:00+01:00)",
                "house.csv:8: expected 2 fields, found 3",
                "house.csv:9: airC: not a number",
                "house.csv:10: timestamp: not after the previous row (line 9)",
            ],
            ex.Errors.Select(e => e.ToString()));
    }

    [Theory]
    [InlineData("", "house.csv: empty: expected a header row with timestamp and airC")]
    [InlineData("timestamp,airC\n", "house.csv: no data rows")]
    [InlineData("time,airC\n2026-03-01T12:00Z,18\n", "house.csv:1: header: missing column timestamp")]
    [InlineData("timestamp,airC,AIRC\n", "house.csv:1: header: column AIRC appears twice")]
    public void RejectsBadFiles(string csv, string expected)
    {
        var ex = Assert.Throws<InvalidInputException>(() => TemperatureLogReader.Parse(csv, "house.csv"));
        Assert.Equal(expected, ex.Errors[0].ToString());
    }

    [Fact]
    public void Spikes_AreWarnings_AndBecomeMissingReadings()
    {
        // Line 4 jumps +12 K and back within 10 min: a spike. Line 8 drops −9 K and back: a spike.
        // Line 10 (+9 K) stays up (a step, not a spike); line 13 (38.0) differs from both by ≥ 10 K but its next neighbour is 40 min away.
        const string csv = """
            timestamp,airC
            2026-03-01T12:00:00+01:00,18.0
            2026-03-01T12:10:00+01:00,18.2
            2026-03-01T12:20:00+01:00,30.2
            2026-03-01T12:30:00+01:00,18.4
            2026-03-01T12:40:00+01:00,18.4
            2026-03-01T12:50:00+01:00,18.6
            2026-03-01T13:00:00+01:00,9.5
            2026-03-01T13:10:00+01:00,18.6
            2026-03-01T13:20:00+01:00,27.6
            2026-03-01T13:30:00+01:00,27.6
            2026-03-01T13:40:00+01:00,27.8
            2026-03-01T13:50:00+01:00,38.0
            2026-03-01T14:30:00+01:00,18.0
            """;
        TemperatureLog log = TemperatureLogReader.Parse(csv, "house.csv");
        Assert.Equal(
            [
                "house.csv:4: airC: spike 30.2 °C between 18.2 and 18.4 °C, treated as missing",
                "house.csv:8: airC: spike 9.5 °C between 18.6 and 18.6 °C, treated as missing",
            ],
            log.Spikes.Select(s => s.ToString()));
        Assert.Null(log.Records[2].AirC);
        Assert.Null(log.Records[6].AirC);
        Assert.Equal(27.6, log.Records[8].AirC);
        Assert.Equal(38.0, log.Records[11].AirC);
        Assert.Equal(13, log.Records.Length);

        // The spike is a missing reading: the temperature source bridges 12:10–12:30 (20 min ≤ 1 h) by interpolation,
        // so at 12:20 it gives (18.2 + 18.4)/2 = 18.3 °C, not the spike's 30.2.
        var source = new MeasuredTemperature(
            log.Records, new GeoLocation(Angle.FromDegrees(51.97), Angle.FromDegrees(5.67), 10), DateTimeZone.Utc);
        Assert.Equal(18.3, source.AirTemperatureC(Instant.FromUtc(2026, 3, 1, 11, 20)), 9);
    }

    [Fact]
    public void GapsInTheFile_StayGaps()
    {
        // Two hours without readings: the temperature source reports the gap and returns NaN inside it.
        const string csv = """
            timestamp,airC
            2026-03-01T10:00:00+01:00,17
            2026-03-01T10:30:00+01:00,17.5
            2026-03-01T12:30:00+01:00,19
            2026-03-01T13:00:00+01:00,19.5
            """;
        TemperatureLog log = TemperatureLogReader.Parse(csv, "house.csv");
        var source = new MeasuredTemperature(
            log.Records, new GeoLocation(Angle.FromDegrees(51.97), Angle.FromDegrees(5.67), 10), DateTimeZone.Utc);
        Assert.Equal([new TemperatureGap(Instant.FromUtc(2026, 3, 1, 9, 30), Instant.FromUtc(2026, 3, 1, 11, 30))], source.Gaps.ToArray());
        Assert.True(double.IsNaN(source.AirTemperatureC(Instant.FromUtc(2026, 3, 1, 10, 30))));
        Assert.Empty(log.Spikes);
    }

    [Fact]
    public void ReadsAFile_NamingItByFileName()
    {
        string path = Path.Combine(Path.GetTempPath(), $"temperature-{Guid.NewGuid():N}.csv");
        File.WriteAllText(path, "timestamp,airC\n2026-03-01T12:00:00+01:00,x\n");
        try
        {
            var ex = Assert.Throws<InvalidInputException>(() => TemperatureLogReader.ReadFile(path));
            Assert.Equal($"{Path.GetFileName(path)}:2: airC: not a number", ex.Errors.Single().ToString());
        }
        finally
        {
            File.Delete(path);
        }
    }
}
