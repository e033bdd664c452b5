using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using NodaTime;
using static CanopyAdvisor.Core.Tests.Forecast.ForecastTestKit;

namespace CanopyAdvisor.Core.Tests.Forecast;

/// <summary>Bad input is reported all at once with paths in the site file's names (ARCHITECTURE.md, conventions).</summary>
public class BenchForecasterValidationTests
{
    [Fact]
    public void Unknown_crop_and_a_sold_lot_are_both_reported()
    {
        LocalDate today = WinterNow.InZone(London).Date;
        Lot sold = Lot("b", WinterNow) with { PlantedOn = today.PlusDays(-60), SaleOn = today.PlusDays(-1), MeasuredOn = today.PlusDays(-2) };
        Site site = Site(
            OpaqueNorthGlasshouse,
            [Bench("a", 3, 1, 2, 1.5, 4, 4), Bench("b", 3, 9, 2, 1.5, 4, 4)],
            [],
            Lot("a", WinterNow, cropId: "x"),
            sold);

        var error = Assert.Throws<InvalidInputException>(() => BenchForecaster.Run(Request(site)));

        Assert.Contains(error.Errors, e => e.Path == "lots[0].crop" && e.Message == "unknown crop 'x'");
        Assert.Contains(error.Errors, e => e.Path == "lots[1].saleOn" && e.Message.Contains("before today", StringComparison.Ordinal));
    }

    [Theory]
    [InlineData(0.5, "horizon")] // less than an hour
    [InlineData(400 * 24, "horizon")] // more than 366 days
    public void A_horizon_out_of_range_is_reported(double hours, string path)
    {
        Site site = Site(OpaqueNorthGlasshouse, [Bench("a", 3, 1, 2, 1.5, 4, 4)], [], Lot("a", WinterNow));
        var error = Assert.Throws<InvalidInputException>(
            () => BenchForecaster.Run(Request(site) with { Horizon = Duration.FromMinutes(hours * 60) }));
        Assert.Contains(error.Errors, e => e.Path == path);
    }

    [Fact]
    public void An_unsupported_uncertainty_key_is_reported()
    {
        Site site = Site(OpaqueNorthGlasshouse, [Bench("a", 3, 1, 2, 1.5, 4, 4)], [], Lot("a", WinterNow));
        var error = Assert.Throws<InvalidInputException>(
            () => BenchForecaster.Run(Request(site) with { UncertaintyKeys = ["baseTemperatureC"] }));
        Assert.Contains(error.Errors, e => e.Path == "uncertaintyKeys[0]");
    }

    [Theory]
    [InlineData(2.0, 12)] // a tenth of 2 h is 12 min, a divisor of an hour
    [InlineData(1.5, 6)] // 9 min rounds down to 6
    [InlineData(4.0, 15)] // 24 min is capped at 15
    [InlineData(0.1, 0.6)] // 0.6 min: the floor is 1 min
    public void The_default_step_is_a_tenth_of_the_nutation_period_rounded_to_a_divisor_of_an_hour(double periodHours, double expectedMinutes)
    {
        Crop crop = TestCrop with { NutationPeriodHours = TestCrop.NutationPeriodHours with { Value = periodHours } };
        Assert.Equal(Math.Max(1, expectedMinutes), BenchForecaster.DefaultStep([crop]).TotalMinutes);
    }

    [Fact]
    public void A_site_without_lots_gives_an_empty_forecast()
    {
        Site site = Site(OpaqueNorthGlasshouse, [Bench("a", 3, 1, 2, 1.5, 4, 4)], []);
        SiteForecast forecast = BenchForecaster.Run(Request(site));
        Assert.Empty(forecast.Benches);
        Assert.Equal(WinterNow + Duration.FromDays(7), forecast.HorizonEnd);
    }

    [Fact]
    public void Gaps_in_the_outside_light_are_counted_not_invented()
    {
        // Missing data are reported, never filled in (ARCHITECTURE.md: bad input never half-computes silently): a log
        // gap of exactly one day at 10-minute steps is 144 steps; the lamps in the room keep the plants lit.
        Site site = Site(Room, [Bench("b", 3.5, 3.5, 3, 3, 3, 3)], UniformLampGrid(), Lot("b", WinterNow));
        var gap = new CanopyAdvisor.Core.Tests.Light.GappyOutsideLight(WinterNow + Duration.FromDays(1), WinterNow + Duration.FromDays(2));
        SiteForecast forecast = BenchForecaster.Run(
            Request(site, gap, new ConstantTemperature(20)) with { Step = Duration.FromMinutes(10), IncludeUncertainty = false });
        Assert.Equal(144, forecast.MissingLightSteps);
        Assert.Equal(0, forecast.MissingTemperatureSteps);
        Assert.True(Assert.Single(forecast.Benches).MeanDliMolPerM2Day > 0);
    }
}
