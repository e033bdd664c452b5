using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Sites;

/// <summary>
/// SiteValidator's lot and setpoint rules on records built in code (the rules of the site file reference,
/// src/CanopyAdvisor.Files/Sites/README.md, "lots[]" and "temperatures"). Expected figures are worked by hand beside each case.
/// </summary>
public class SiteValidatorLotTests
{
    private static readonly DateTimeZone Amsterdam = DateTimeZoneProviders.Tzdb["Europe/Amsterdam"];

    /// <summary>One bench 20 m × 1.8 m = 36 m².</summary>
    private static readonly Bench[] Benches = [new Bench("b1", new Footprint(2, 2, Angle.Zero, 20, 1.8), 0.75, new Canopy(0.3, 0.05, 6), 10, 3)];

    private static Lot GoodLot() => new(
        "lot-1",
        "b1",
        "petunia",
        new LocalDate(2026, 11, 20),
        new LocalDate(2027, 1, 15),
        60,
        new LocalDate(2026, 12, 1),
        0.15,
        1500,
        [new RotationRecord(Instant.FromUtc(2026, 11, 28, 7, 0), Angle.FromDegrees(180))]);

    private static List<ValidationError> Check(Lot lot) => SiteValidator.CheckLot(lot, "lots[0]", Benches, Amsterdam).ToList();

    [Fact]
    public void A_sound_lot_has_no_errors() => Assert.Empty(Check(GoodLot()));

    public static TheoryData<string, Lot, string, string> BadLots() => new()
    {
        { "unknown bench (README rule)", GoodLot() with { BenchId = "b2" }, "lots[0].benchId", "unknown bench 'b2' (benches: b1)" },
        { "variant id with capitals (README: [a-z0-9-/])", GoodLot() with { CropId = "Petunia/Compact" }, "lots[0].crop", "must be a crop id" },
        { "empty id", GoodLot() with { Id = " " }, "lots[0].id", "must not be empty" },
        { "sale before planting", GoodLot() with { SaleOn = new LocalDate(2026, 11, 19) }, "lots[0].saleOn", "must be after plantedOn (2026-11-20), got 2026-11-19" },
        { "measured after sale", GoodLot() with { MeasuredOn = new LocalDate(2027, 1, 16) }, "lots[0].measuredOn", "got 2027-01-16" },
        { "height NaN", GoodLot() with { HeightMm = double.NaN }, "lots[0].heightMm", "must be within (0, 3000) mm" },
        { "spacing negative", GoodLot() with { SpacingM = -0.1 }, "lots[0].spacingM", "must be within (0, 5) m, got -0.1" },
        { "pots negative", GoodLot() with { Pots = -3 }, "lots[0].pots", "must be ≥ 1, got -3" },
        // 1700 × 0.15² = 38.25 m² > 36 × 1.05 = 37.8 m²; at most floor(37.8 / 0.0225) = 1680 pots (README, common practice).
        { "1700 pots at 0.15 m on 36 m²", GoodLot() with { Pots = 1700 }, "lots[0].pots", "1700 pots at 0.15 m spacing need 38.25 m², more than bench 'b1' holds (36 m² × 1.05 = 37.8 m², at most 1680 pots)" },
        {
            "rotations out of order", GoodLot() with { Rotations = [new(Instant.FromUtc(2026, 11, 28, 7, 0), Angle.FromDegrees(90)), new(Instant.FromUtc(2026, 11, 27, 7, 0), Angle.FromDegrees(90))] },
            "lots[0].rotations[1].at", "must not be before rotations[0] (2026-11-27T07:00:00Z is before 2026-11-28T07:00:00Z)"
        },
        // Midnight starting 20 November in Amsterdam is 23:00 UTC on the 19th (UTC+1 in winter, IANA tz database).
        { "rotation one minute before planting, local time", GoodLot() with { Rotations = [new(Instant.FromUtc(2026, 11, 19, 22, 59), Angle.FromDegrees(90))] }, "lots[0].rotations[0].at", "is before the lot was planted (2026-11-20)" },
        // The end of 1 December in Amsterdam is 23:00 UTC on the 1st.
        { "rotation just after the end of measuredOn, local time", GoodLot() with { Rotations = [new(Instant.FromUtc(2026, 12, 1, 23, 0), Angle.FromDegrees(90))] }, "lots[0].rotations[0].at", "is after measuredOn (2026-12-01)" },
        { "rotation by −360°", GoodLot() with { Rotations = [new(Instant.FromUtc(2026, 11, 28, 7, 0), Angle.FromDegrees(-360))] }, "lots[0].rotations[0].angleDeg", "must be within (−360, 360) and not 0, got -360" },
        { "rotation by 0°", GoodLot() with { Rotations = [new(Instant.FromUtc(2026, 11, 28, 7, 0), Angle.Zero)] }, "lots[0].rotations[0].angleDeg", "not 0, got 0" },
    };

    [Theory]
    [MemberData(nameof(BadLots))]
    public void Bad_lot_is_reported_at_the_exact_path(string label, Lot lot, string path, string message)
    {
        List<ValidationError> errors = Check(lot);
        Assert.True(
            errors.Any(e => e.Path == path && e.Message.Contains(message, StringComparison.Ordinal)),
            $"{label}: expected '{path}: …{message}…' among:\n{string.Join('\n', errors)}");
    }

    [Theory]
    [InlineData(2026, 11, 19, 23, 0, "first local minute of plantedOn (23:00 UTC the day before, UTC+1)")]
    [InlineData(2026, 12, 1, 22, 59, "last local minute of measuredOn (22:59 UTC, UTC+1)")]
    public void Rotations_on_the_edge_days_are_accepted(int y, int m, int d, int h, int min, string label)
    {
        Lot lot = GoodLot() with { Rotations = [new(Instant.FromUtc(y, m, d, h, min), Angle.FromDegrees(-90))] };
        Assert.True(Check(lot).Count == 0, label);
    }

    [Fact]
    public void Lot_with_default_rotations_array_does_not_crash() =>
        Assert.Empty(Check(GoodLot() with { Rotations = default }));

    [Fact]
    public void Pots_exactly_at_the_limit_fit()
    {
        // 1680 × 0.15² = 37.8 m² = 36 m² × 1.05 exactly (README rule, common practice): allowed despite rounding; 1681 is not.
        Assert.Empty(Check(GoodLot() with { Pots = 1680 }));
        Assert.Contains(Check(GoodLot() with { Pots = 1681 }), e => e.Path == "lots[0].pots");
    }

    public static TheoryData<string, TemperatureSetpoints, string, string> BadSetpoints() => new()
    {
        { "day above 45 °C", new(46, 18, 0, 0), "temperatures.dayC", "must be within [-10, 45], got 46" },
        { "night below −10 °C", new(20, -10.5, 0, 0), "temperatures.nightC", "must be within [-10, 45], got -10.5" },
        { "night 10.5 °C above day", new(10, 20.5, 0, 0), "temperatures.nightC", "must be at most 10 °C above dayC = 10 °C, got 20.5 °C" },
        { "drop negative", new(20, 18, -0.5, 1), "temperatures.preDawnDropC", "must be within [0, 15]" },
        { "drop above 15 °C", new(20, 18, 15.5, 1), "temperatures.preDawnDropC", "must be within [0, 15], got 15.5" },
        { "drop hours above 12", new(20, 18, 3, 12.5), "temperatures.preDawnDropHours", "must be within [0, 12], got 12.5" },
        { "day NaN", new(double.NaN, 18, 0, 0), "temperatures.dayC", "must be within [-10, 45]" },
    };

    [Theory]
    [MemberData(nameof(BadSetpoints))]
    public void Bad_setpoints_are_reported_at_the_exact_path(string label, TemperatureSetpoints setpoints, string path, string message)
    {
        var errors = SiteValidator.CheckTemperatures(setpoints, "temperatures").ToList();
        Assert.True(
            errors.Any(e => e.Path == path && e.Message.Contains(message, StringComparison.Ordinal)),
            $"{label}: expected '{path}: …{message}…' among:\n{string.Join('\n', errors)}");
    }

    [Theory]
    [InlineData(20, 18, 0, 0, "the default (TemperatureSetpoints.Default)")]
    [InlineData(20, 17, 3, 2, "a 3 °C drop for 2 h, within the 2.8–8.3 °C, 2–3 h practice (common practice)")]
    [InlineData(18, 28, 15, 12, "negative DIF at the 10 °C limit, drop at its limits")]
    public void Sound_setpoints_pass(double day, double night, double drop, double hours, string label) =>
        Assert.True(!SiteValidator.CheckTemperatures(new(day, night, drop, hours), "temperatures").Any(), label);

    [Fact]
    public void Site_level_rules_duplicate_ids_and_one_lot_per_bench()
    {
        Lot second = GoodLot() with { Pots = 10 };
        var errors = SiteValidator.CheckOneLotPerBench([GoodLot(), second], SiteValidator.LotPath).ToList();
        Assert.Equal([new ValidationError("lots[1].benchId", "bench 'b1' already holds lot 'lot-1' (lots[0]); at most one lot per bench")], errors);
    }
}
