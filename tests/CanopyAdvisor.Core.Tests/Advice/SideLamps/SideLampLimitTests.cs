using CanopyAdvisor.Core.Advice.SideLamps;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Advice.SideLamps;

/// <summary>PPFD ceilings, the uniformity floor, energy and cost, and briefs that are rejected.</summary>
public class SideLampLimitTests
{
    private static double PeakWithoutAddedLamps()
    {
        SideLampPlan plan = SideLampPlanner.Plan(SideLampScene.Brief(maxLamps: 0), SideLampScene.Request(SideLampScene.Site()));
        return plan.Benches[0].LightBefore.PeakPpfd;
    }

    [Fact]
    public void A_binding_PPFD_ceiling_is_honoured_and_stops_full_cancellation()
    {
        // The cancelling lamp alone adds ≈ δ₀·Φ₂/(4π·5)·(1/√5) ≈ 5.1 µmol m⁻² s⁻¹ of horizontal PPFD (inverse-square and
        // cosine laws); a ceiling 2 above the existing peak leaves room for only part of it.
        double peak = PeakWithoutAddedLamps();
        SideLampBrief brief = SideLampScene.Brief() with { DefaultPpfdCeiling = peak + 2 };
        SideLampPlan plan = SideLampPlanner.Plan(brief, SideLampScene.Request(SideLampScene.Site()));

        SideLampBenchOutcome bench = Assert.Single(plan.Benches);
        Assert.Equal(LimitCheck.Met, bench.Ceiling);
        Assert.True(bench.LightAfter.PeakPpfd <= (peak + 2) * (1 + 1e-6), $"peak {bench.LightAfter.PeakPpfd} over {peak + 2}");
        Assert.True(plan.LateralBlueRemaining > 0.05, "the ceiling must stop the lamp short of cancelling");
        Assert.True(plan.LateralBlueRemaining < 1, "the lamp still helps within the ceiling");
    }

    [Fact]
    public void A_ceiling_already_passed_is_reported_as_unmet_before_and_not_made_worse()
    {
        double peak = PeakWithoutAddedLamps();
        SideLampBrief brief = SideLampScene.Brief() with { PpfdCeilingByCrop = ImmutableDictionary<string, double>.Empty.Add("test-crop", peak / 2) };
        SideLampPlan plan = SideLampPlanner.Plan(brief, SideLampScene.Request(SideLampScene.Site()));

        SideLampBenchOutcome bench = Assert.Single(plan.Benches);
        Assert.Equal(peak / 2, bench.PpfdCeiling);
        Assert.Equal(LimitCheck.UnmetBefore, bench.Ceiling);
        Assert.True(bench.LightAfter.PeakPpfd <= peak * (1 + 1e-6));
        Assert.Contains(plan.Notes, n => n.Contains("already above the ceiling", StringComparison.Ordinal));
    }

    [Fact]
    public void The_uniformity_floor_binds_the_plan()
    {
        // A 4 m × 1 m bench (8 × 2 points) under a uniform overhead grid, pushed north by a lamp low on the south side, with
        // a short rail near its north-east corner: a lamp there cancels some lateral light but brightens that corner.
        // Uniformity is min/avg DLI with the common-practice floor of 0.7 by default; a floor of 1 forbids any loss of it.
        Bench bench = Forecast.ForecastTestKit.Bench("b", 3, 4.5, 4, 1, 8, 2) with { Footprint = new Footprint(3, 4.5, Angle.RightAngle, 4, 1) };
        var south = new Lamp("south", new Vector3(5, 0.3, 1.0), LampAim.Down, IsotropicDistribution.Instance, 3000, Forecast.ForecastTestKit.White, 1, 150, LampSchedule.AlwaysOn);
        Site site = Forecast.ForecastTestKit.Site(
            Forecast.ForecastTestKit.Room, [bench], [south, .. Forecast.ForecastTestKit.UniformLampGrid()],
            Forecast.ForecastTestKit.Lot("b", Forecast.ForecastTestKit.WinterNow, heightMm: 80, pots: 40));
        SideLampPlan Run(double floor) => SideLampPlanner.Plan(
            new SideLampBrief([new MountingRail("north", new Vector3(6.5, 6.2, 1.2), new Vector3(7.5, 6.2, 1.2))], [SideLampScene.LambertianType], 1, LampSchedule.AlwaysOn)
            {
                BenchIds = ["b"],
                UniformityFloor = floor,
                EnergyWeightPerKilowatt = 0,
                Starts = 2,
            },
            SideLampScene.Request(site));

        SideLampBenchOutcome free = Assert.Single(Run(0).Benches);
        Assert.True(free.LightAfter.Uniformity < free.LightBefore.Uniformity - 1e-3, "without a floor the lamp costs some uniformity");

        SideLampPlan bound = Run(1);
        SideLampBenchOutcome held = Assert.Single(bound.Benches);
        Assert.True(held.LightAfter.Uniformity >= held.LightBefore.Uniformity - 1e-4, $"{held.LightAfter.Uniformity} < {held.LightBefore.Uniformity}");
        Assert.Equal(held.LightAfter.Uniformity < held.LightBefore.Uniformity - 1e-6 ? LimitCheck.Unmet : LimitCheck.UnmetBefore, held.Uniformity);
        Assert.Contains(bound.Notes, n => n.Contains("uniformity", StringComparison.Ordinal));
        Assert.True(bound.Objective <= bound.ObjectiveWithoutLamps);
    }

    [Theory]
    // kWh = W × h / 1000 (SI: 1 kWh = 3.6 MJ = 1000 W for 1 h); cost = kWh × price per kWh.
    [InlineData(200, 168, 0.21, 33.6, 7.056)]
    [InlineData(1500, 112, 0.30, 168.0, 50.4)]
    [InlineData(0, 168, 0.21, 0, 0)]
    public void Energy_is_watts_times_hours_over_a_thousand_and_cost_is_energy_times_price(
        double watts, double hours, double price, double kWh, double cost)
    {
        SideLampEnergy energy = SideLampEnergy.From(watts, hours, new EnergyTariff(price, "EUR"));
        Assert.Equal(kWh, energy.KilowattHoursPerWeek, 9);
        Assert.Equal(cost, energy.CostPerWeek!.Value, 9);
        Assert.Equal("EUR", energy.Currency);

        SideLampEnergy unknown = SideLampEnergy.From(watts, hours, EnergyTariff.Unknown);
        Assert.Equal(kWh, unknown.KilowattHoursPerWeek, 9);
        Assert.Null(unknown.CostPerWeek);
        Assert.Null(unknown.Currency);
    }

    [Fact]
    public void The_plan_costs_its_lamps_over_the_schedules_hours()
    {
        // A 06:00–22:00 photoperiod is 16 h a day, 112 h a week (no daylight-saving change in the test week of
        // December); energy = watts × dimming × 112 h / 1000, cost at 0.25 GBP/kWh.
        Site site = SideLampScene.Site() with { Tariff = new EnergyTariff(0.25, "GBP") };
        SideLampBrief brief = SideLampScene.Brief() with { Schedule = new LampSchedule(new LocalTime(6, 0), new LocalTime(22, 0), null) };
        SideLampPlan plan = SideLampPlanner.Plan(brief, SideLampScene.Request(site));

        ProposedSideLamp lamp = Assert.Single(plan.Lamps);
        Assert.Equal(112, plan.Energy.OnHoursPerWeek, 9);
        double kWh = SideLampScene.AddedWatts * lamp.Lamp.Dimming * 112 / 1000;
        Assert.Equal(kWh, plan.Energy.KilowattHoursPerWeek, 9);
        Assert.Equal(kWh * 0.25, plan.Energy.CostPerWeek!.Value, 9);
        Assert.Equal("GBP", plan.Energy.Currency);
    }

    [Fact]
    public void Bad_briefs_are_rejected_with_every_problem_named_by_its_path()
    {
        SideLampBrief brief = new(
            [new MountingRail("out", new Vector3(12, 5, 2), new Vector3(14, 5, 2)), new MountingRail("out", new Vector3(5, 5, 0.85), new Vector3(5, 5, 0.85))],
            [SideLampScene.IsotropicType with { PpfMicromolesPerSecond = -1 }],
            40,
            LampSchedule.AlwaysOn)
        {
            BenchIds = ["nowhere"],
            UniformityFloor = 1.5,
            MinTilt = Angle.FromDegrees(100),
            MaxTilt = Angle.FromDegrees(50),
            Starts = 0,
        };

        var ex = Assert.Throws<InvalidInputException>(() => SideLampPlanner.Plan(brief, SideLampScene.Request(SideLampScene.Site())));
        string[] paths = [.. ex.Errors.Select(e => e.Path)];
        Assert.Contains("rails[0]", paths);
        Assert.Contains("rails[1].id", paths);
        Assert.Contains("rails[1]", paths);
        Assert.Contains("lampTypes[0].ppfUmolPerS", paths);
        Assert.Contains("maxLamps", paths);
        Assert.Contains("benches[0]", paths);
        Assert.Contains("uniformityFloor", paths);
        Assert.Contains("tiltDeg.max", paths);
        Assert.Contains("starts", paths);
        Assert.Contains(ex.Errors, e => e.Path == "rails[0]" && e.Message.Contains("outside the structure", StringComparison.Ordinal));
        Assert.Contains(ex.Errors, e => e.Path == "rails[1]" && e.Message.Contains("inside the canopy", StringComparison.Ordinal));
    }

    [Fact]
    public void A_rail_through_the_lots_plants_is_rejected_even_above_the_site_files_canopy()
    {
        // The site file's canopy on the test bench is 0.1 m (top at 0.9 m); the lot measures 300 mm (top at 1.1 m), and the
        // forecast grows the canopy from the lot. A rail at 1.0 m across the bench runs through the plants.
        Site site = Forecast.ForecastTestKit.Site(
            Forecast.ForecastTestKit.Room, [Forecast.ForecastTestKit.Bench("b", 4.5, 4.5, 1, 1, 1, 1)], [],
            Forecast.ForecastTestKit.Lot("b", Forecast.ForecastTestKit.WinterNow, heightMm: 300, pots: 20));
        SideLampBrief brief = SideLampScene.Brief() with { Rails = [new MountingRail("low", new Vector3(4, 5, 1.0), new Vector3(6, 5, 1.0))] };

        ValidationError error = Assert.Single(SideLampPlanner.Validate(brief, site));
        Assert.Equal("rails[0]", error.Path);
        Assert.Contains("inside the canopy of bench 'b'", error.Message, StringComparison.Ordinal);
        Assert.DoesNotContain(SideLampPlanner.Validate(brief, site with { Lots = [] }), e => e.Path == "rails[0]");
    }
}
