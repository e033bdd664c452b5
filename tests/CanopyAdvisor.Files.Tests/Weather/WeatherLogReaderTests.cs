using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Weather;
using NodaTime;

namespace CanopyAdvisor.Files.Tests.Weather;

// Small invented logs (demo data). Expected values follow from the format described on WeatherLogReader
// and ISO 8601 (a timestamp with offset +01:00 is one hour ahead of UTC).
public class WeatherLogReaderTests
{
    [Fact]
    public void ReadsBothColumnsWithBlanks()
    {
        const string csv = """
            timestamp,ghiWm2,parUmolM2S
            2026-03-01T12:00:00+01:00,412.5,
            2026-03-01T12:10:00+01:00,,890
            2026-03-01T12:20:00+01:00,430,900.5
            2026-03-01T12:30:00+01:00,,
            """;
        var records = WeatherLogReader.Parse(csv, "weather.csv");
        Assert.Equal(
            [
                new WeatherRecord(Instant.FromUtc(2026, 3, 1, 11, 0), 412.5, null),
                new WeatherRecord(Instant.FromUtc(2026, 3, 1, 11, 10), null, 890),
                new WeatherRecord(Instant.FromUtc(2026, 3, 1, 11, 20), 430, 900.5),
                new WeatherRecord(Instant.FromUtc(2026, 3, 1, 11, 30), null, null),
            ],
            records.ToArray());
    }

    [Fact]
    public void AcceptsOneValueColumn_AnyOrder_ExtraColumns_Comments_AndZulu()
    {
        const string csv = """
            # outside logger, invented demo data
            airTempC,parUmolM2S,Timestamp

            5.1,100,2026-03-01T07:00Z
            5.3,150.25,2026-03-01T07:15:30.5+00:00
            """;
        var records = WeatherLogReader.Parse(csv, "par.csv");
        Assert.Equal(2, records.Length);
        Assert.Equal(Instant.FromUtc(2026, 3, 1, 7, 0), records[0].Time);
        Assert.Equal(Instant.FromUtc(2026, 3, 1, 7, 15, 30).PlusTicks(5_000_000), records[1].Time);
        Assert.Equal(150.25, records[1].GlobalHorizontalPpfd);
        Assert.Null(records[1].GlobalHorizontalWm2);
    }

    [Fact]
    public void ReportsEveryBadRow_WithFileLineAndColumn()
    {
        const string csv = """
            timestamp,ghiWm2,parUmolM2S
            2026-03-01T12:00:00+01:00,400,
            2026-03-01T12:10:00+01:00,abc,
            2026-03-01T12:20:00,400,
            2026-03-01T12:30:00+01:00,-3,
            2026-03-01T12:30:00+01:00,400,
            2026-03-01T12:50:00+01:00,400,x1
            2026-03-01T13:00:00+01:00,400
            2026-03-01T13:10:00+01:00,NaN,
            """;
        var ex = Assert.Throws<InvalidInputException>(() => WeatherLogReader.Parse(csv, "weather.csv"));
        Assert.Equal(
            [
                "weather.csv:3: ghiWm2: not a number",
                "weather.csv:4: timestamp: not an ISO-8601 date-time with UTC offset (e.g. 2026-03-01T12:00:00+01:00)",
                "weather.csv:5: ghiWm2: must be ≥ 0",
                "weather.csv:6: timestamp: not after the previous row (line 5)",
                "weather.csv:7: parUmolM2S: not a number",
                "weather.csv:8: expected 3 fields, found 2",
                "weather.csv:9: ghiWm2: not a finite number",
            ],
            ex.Errors.Select(e => e.ToString()));
    }

    [Fact]
    public void DecreasingTimestamps_AreErrors()
    {
        const string csv = """
            timestamp,ghiWm2
            2026-03-01T12:00:00+01:00,400
            2026-03-01T11:50:00+01:00,380
            """;
        var ex = Assert.Throws<InvalidInputException>(() => WeatherLogReader.Parse(csv, "w.csv"));
        Assert.Equal("w.csv:3: timestamp: not after the previous row (line 2)", Assert.Single(ex.Errors).ToString());
    }

    // The same instant written with different offsets is not increasing (12:00+01:00 = 11:00Z).
    [Fact]
    public void OffsetsAreCompared_AsInstants()
    {
        const string csv = """
            timestamp,ghiWm2
            2026-03-01T12:00:00+01:00,400
            2026-03-01T11:00:00Z,380
            """;
        Assert.Throws<InvalidInputException>(() => WeatherLogReader.Parse(csv, "w.csv"));
    }

    [Theory]
    [InlineData("time,ghiWm2", "w.csv:1: header: missing column timestamp")]
    [InlineData("timestamp,ghi", "w.csv:1: header: missing column ghiWm2 or parUmolM2S (at least one is required)")]
    [InlineData("timestamp,ghiWm2,GHIWM2", "w.csv:1: header: column GHIWM2 appears twice")]
    public void BadHeader_IsReported(string header, string expected)
    {
        var ex = Assert.Throws<InvalidInputException>(() => WeatherLogReader.Parse(header + "\n2026-03-01T12:00:00+01:00,1,2\n", "w.csv"));
        Assert.Equal(expected, Assert.Single(ex.Errors).ToString());
    }

    [Theory]
    [InlineData("", "w.csv: empty: expected a header row with timestamp and ghiWm2 and/or parUmolM2S")]
    [InlineData("timestamp,ghiWm2\n", "w.csv: no data rows")]
    public void EmptyInput_IsReported(string csv, string expected)
    {
        var ex = Assert.Throws<InvalidInputException>(() => WeatherLogReader.Parse(csv, "w.csv"));
        Assert.Equal(expected, Assert.Single(ex.Errors).ToString());
    }

    [Fact]
    public void ReadFile_NamesTheFile()
    {
        string path = Path.Combine(Path.GetTempPath(), $"canopy-weather-{Guid.NewGuid():N}.csv");
        File.WriteAllText(path, "\uFEFFtimestamp,parUmolM2S\n2026-03-01T12:00:00+01:00,oops\n");
        try
        {
            var ex = Assert.Throws<InvalidInputException>(() => WeatherLogReader.ReadFile(path));
            Assert.Equal($"{Path.GetFileName(path)}:2: parUmolM2S: not a number", Assert.Single(ex.Errors).ToString());
        }
        finally
        {
            File.Delete(path);
        }
    }

    // End to end: a read log feeds the measured light source (PAR used as is).
    [Fact]
    public void ReadLog_FeedsMeasuredLight()
    {
        const string csv = """
            timestamp,parUmolM2S
            2026-06-21T12:00:00+02:00,1000
            2026-06-21T13:00:00+02:00,1400
            """;
        var site = new CanopyAdvisor.Core.Sites.GeoLocation(
            CanopyAdvisor.Core.Geometry.Angle.FromDegrees(51.97), CanopyAdvisor.Core.Geometry.Angle.FromDegrees(5.67), 10);
        var light = new MeasuredOutsideLight(WeatherLogReader.Parse(csv, "w.csv"), site);
        Assert.Equal(1200, light.At(Instant.FromUtc(2026, 6, 21, 10, 30)).GlobalHorizontalPpfd, 9);
    }
}
