using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Sites;
using NodaTime;

namespace CanopyAdvisor.Files.Tests.Sites;

/// <summary>How the site file's <c>lots</c> and <c>temperatures</c> map onto the Core records (Sites/README.md is the reference).</summary>
public class SiteFileLotsTests
{
    private static Site Read(string json) => new SiteFileReader(new TestBeams()).Parse(json, "test.json", null);

    private static InvalidInputException Reject(string json) =>
        Assert.Throws<InvalidInputException>(() => Read(json));

    [Fact]
    public void Lot_and_setpoints_map_onto_the_records()
    {
        Site site = Read(SiteJson.Glasshouse);

        Assert.Equal(new TemperatureSetpoints(20, 17, 3, 2), site.Temperatures);
        Assert.Equal(new EnergyTariff(0.2, "EUR"), site.Tariff);
        Lot lot = Assert.Single(site.Lots);
        Assert.Equal("lot-1", lot.Id);
        Assert.Equal("b1", lot.BenchId);
        Assert.Equal("petunia-compact", lot.CropId);
        Assert.Equal(new LocalDate(2026, 11, 20), lot.PlantedOn);
        Assert.Equal(new LocalDate(2027, 1, 15), lot.SaleOn);
        Assert.Equal(new LocalDate(2026, 12, 1), lot.MeasuredOn);
        Assert.Equal(60.0, lot.HeightMm);
        Assert.Equal(0.12, lot.SpacingM);
        Assert.Equal(800, lot.Pots);

        // 08:00 at UTC+01:00 is 07:00 UTC (ISO 8601 offsets); degrees in the file, radians inside (MODEL.md §0).
        RotationRecord rotation = Assert.Single(lot.Rotations);
        Assert.Equal(Instant.FromUtc(2026, 11, 28, 7, 0), rotation.At);
        Assert.Equal(Math.PI, rotation.Angle.Radians, 12);
    }

    [Theory]
    [InlineData("2026-11-28T07:00:00Z", 7, 0, "Z is UTC (ISO 8601)")]
    [InlineData("2026-11-28T08:00:00+01", 7, 0, "hours-only offset (ISO 8601 ±hh)")]
    [InlineData("2026-11-28T02:30:00.5-05:00", 7, 30, "fraction of a second and a negative offset (ISO 8601)")]
    public void Rotation_times_take_any_ISO_offset(string at, int utcHour, int utcMinute, string label)
    {
        Site site = Read(SiteJson.With(SiteJson.Glasshouse, ("lots[0].rotations[0].at", $"\"{at}\"")));

        Instant expected = Instant.FromUtc(2026, 11, 28, utcHour, utcMinute);
        Assert.True(Math.Abs((site.Lots[0].Rotations[0].At - expected).TotalSeconds) < 1, label);
    }

    [Fact]
    public void Sections_are_optional_with_documented_defaults()
    {
        // README: without temperatures, 20 °C day, 18 °C night, no drop; without lots, none; drop fields default to 0.
        Site bare = Read(SiteJson.With(SiteJson.Glasshouse, ("temperatures", SiteJson.Remove), ("tariff", SiteJson.Remove), ("lots", SiteJson.Remove)));
        Assert.Equal(TemperatureSetpoints.Default, bare.Temperatures);
        Assert.False(bare.Tariff.IsKnown); // no tariff given: cost unknown, not guessed
        Assert.Equal(new TemperatureSetpoints(20, 18, 0, 0), bare.Temperatures);
        Assert.Empty(bare.Lots);

        Site noDrop = Read(SiteJson.With(SiteJson.Glasshouse, ("temperatures", """{ "dayC": 22, "nightC": 20 }""")));
        Assert.Equal(new TemperatureSetpoints(22, 20, 0, 0), noDrop.Temperatures);

        Site noRotations = Read(SiteJson.With(SiteJson.Glasshouse, ("lots[0].rotations", SiteJson.Remove)));
        Assert.Empty(noRotations.Lots[0].Rotations);
    }

    [Fact]
    public void Pots_that_just_fit_are_accepted()
    {
        // 1312 × 0.12² = 18.89 m² ≤ 18 m² × 1.05 = 18.9 m² (README rule, common practice); 1313 pots would need 18.907 m².
        Assert.Equal(1312, Read(SiteJson.With(SiteJson.Glasshouse, ("lots[0].pots", "1312"))).Lots[0].Pots);
        InvalidInputException e = Reject(SiteJson.With(SiteJson.Glasshouse, ("lots[0].pots", "1313")));
        Assert.Contains(e.Errors, x => x.Path == "lots[0].pots");
    }

    [Fact]
    public void Rotation_on_the_evening_of_measuredOn_is_done_not_planned()
    {
        // README: rotations up to the end of measuredOn, local time (23:30 in Amsterdam on 2026-12-01).
        Site site = Read(SiteJson.With(SiteJson.Glasshouse, ("lots[0].rotations[0].at", "\"2026-12-01T23:30:00+01:00\"")));
        Assert.Single(site.Lots[0].Rotations);
    }

    [Fact]
    public void Every_lot_problem_is_reported_at_once()
    {
        string json = SiteJson.With(
            SiteJson.Glasshouse,
            ("lots[0].heightMm", "0"),
            ("lots[0].spacingM", "-1"),
            ("lots[0].saleOn", "\"2026-11-01\""),
            ("lots[0].rotations[0].angleDeg", "0"),
            ("temperatures.dayC", "50"));

        InvalidInputException e = Reject(json);

        Assert.Equal(
            ["lots[0].heightMm", "lots[0].rotations[0].angleDeg", "lots[0].saleOn", "lots[0].spacingM", "temperatures.dayC"],
            e.Errors.Select(x => x.Path).Order(StringComparer.Ordinal));
    }

    [Fact]
    public void Missing_date_gives_only_is_required_not_date_order_errors()
    {
        // README "Rules": a value that could not be read is reported once, not also by the checks that need it.
        InvalidInputException e = Reject(SiteJson.With(SiteJson.Glasshouse, ("lots[0].plantedOn", SiteJson.Remove)));

        ValidationError only = Assert.Single(e.Errors);
        Assert.Equal(new ValidationError("lots[0].plantedOn", "is required"), only);
    }

    [Fact]
    public void Unreadable_rotation_time_does_not_upset_the_order_check()
    {
        string json = SiteJson.With(
            SiteJson.Glasshouse,
            ("lots[0].rotations", """[ { "at": "2026-11-25T08:00:00+01:00", "angleDeg": 90 }, { "at": "soon", "angleDeg": 90 }, { "at": "2026-11-28T08:00:00+01:00", "angleDeg": 90 } ]"""));

        InvalidInputException e = Reject(json);

        ValidationError only = Assert.Single(e.Errors);
        Assert.Equal("lots[0].rotations[1].at", only.Path);
    }

    [Fact]
    public void Unknown_time_zone_still_reports_date_order()
    {
        // Date order does not need the zone; only the rotation window does (README "lots[]").
        InvalidInputException e = Reject(SiteJson.With(SiteJson.Glasshouse, ("timeZone", "\"Europe/Atlantis\""), ("lots[0].saleOn", "\"2026-11-01\"")));

        Assert.Equal(["lots[0].saleOn", "timeZone"], e.Errors.Select(x => x.Path).Order(StringComparer.Ordinal));
    }
}
