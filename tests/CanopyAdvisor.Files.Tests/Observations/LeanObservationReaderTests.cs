using CanopyAdvisor.Core.Advice.Calibration;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Observations;
using NodaTime;

namespace CanopyAdvisor.Files.Tests.Observations;

/// <summary>The observations CSV (format in <see cref="LeanObservationReader"/>): rows read, every bad field reported with
/// file, line and column, nothing half-read. Expected instants are ISO-8601 offset arithmetic (ISO 8601-1:2019, 4.3.13).</summary>
public class LeanObservationReaderTests
{
    [Fact]
    public void Reads_rows_in_any_column_order_with_optional_height_and_plants()
    {
        const string csv = """
            # measured on the south benches
            tiltDeg,benchId,azimuthDeg,at,plants,heightMm,note
            12.5,south-1,95,2026-11-20T10:00:00+01:00,8,62,first look
            3,south-2,270.5,2026-11-20T09:00Z,,,

            0,south-1,0,2026-11-21T10:30+01:00,1,,
            """;

        var rows = LeanObservationReader.Parse(csv, "lean.csv");

        Assert.Equal(3, rows.Length);
        LeanObservation a = rows[0];
        Assert.Equal("south-1", a.BenchId);
        Assert.Equal(Instant.FromUtc(2026, 11, 20, 9, 0), a.At); // 10:00 at +01:00 is 09:00 UTC
        Assert.Equal(12.5, a.Tilt.Degrees, 1e-12);
        Assert.Equal(95, a.Azimuth.Degrees, 1e-12);
        Assert.Equal(62, a.HeightMm);
        Assert.Equal(8, a.PlantsMeasured);
        Assert.Equal("lean.csv:3", a.Where);
        Assert.Null(rows[1].HeightMm);
        Assert.Equal(1, rows[1].PlantsMeasured);
        Assert.Equal(Instant.FromUtc(2026, 11, 21, 9, 30), rows[2].At);
        Assert.Equal("lean.csv:6", rows[2].Where);
    }

    [Fact]
    public void Reports_every_bad_field_with_file_line_and_column()
    {
        const string csv = """
            benchId,at,tiltDeg,azimuthDeg,heightMm,plants
            south-1,2026-11-20T10:00:00+01:00,12,95,,3
            ,2026-11-20T10:00:00,nan,400,-3,0
            south-1,yesterday,95,x,abc,2.5
            south-1,2026-11-20T10:00:00+01:00,12
            """;

        var ex = Assert.Throws<InvalidInputException>(() => LeanObservationReader.Parse(csv, "lean.csv"));

        Assert.Equal(
            [
                "lean.csv:3: benchId: missing",
                "lean.csv:3: at: not an ISO-8601 date-time with UTC offset (e.g. 2026-11-20T10:00:00+01:00)",
                "lean.csv:3: tiltDeg: not a number",
                "lean.csv:3: azimuthDeg: 400 is outside 0 to 360",
                "lean.csv:3: heightMm: -3 must be more than 0",
                "lean.csv:3: plants: '0' must be a whole number of at least 1",
                "lean.csv:4: at: not an ISO-8601 date-time with UTC offset (e.g. 2026-11-20T10:00:00+01:00)",
                "lean.csv:4: tiltDeg: 95 is outside 0 to 90",
                "lean.csv:4: azimuthDeg: not a number",
                "lean.csv:4: heightMm: not a number",
                "lean.csv:4: plants: '2.5' must be a whole number of at least 1",
                "lean.csv:5: expected 6 fields, found 3",
            ],
            ex.Errors.Select(e => e.ToString()));
    }

    [Theory]
    [InlineData("", "lean.csv: empty: expected a header row with benchId, at, tiltDeg, azimuthDeg (and optionally heightMm, plants)")]
    [InlineData("benchId,at,tiltDeg\n", "lean.csv:1: header: missing column azimuthDeg")]
    [InlineData("benchId,at,tiltDeg,azimuthDeg,at\n", "lean.csv:1: header: column at appears twice")]
    [InlineData("benchId,at,tiltDeg,azimuthDeg\n# nothing yet\n", "lean.csv: no observations")]
    public void Rejects_bad_files(string csv, string expected)
    {
        var ex = Assert.Throws<InvalidInputException>(() => LeanObservationReader.Parse(csv, "lean.csv"));
        Assert.Equal(expected, ex.Errors[0].ToString());
    }
}
