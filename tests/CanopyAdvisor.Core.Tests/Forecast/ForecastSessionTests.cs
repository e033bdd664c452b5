using System.Collections.Immutable;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using NodaTime;
using static CanopyAdvisor.Core.Tests.Forecast.ForecastTestKit;

namespace CanopyAdvisor.Core.Tests.Forecast;

/// <summary>A prepared forecast run again under scenarios: planned rotations, other crop parameters, the lean track.</summary>
public class ForecastSessionTests
{
    private static readonly Site SouthBench =
        Site(OpaqueNorthGlasshouse, [Bench("south", 3, 1, 2, 1.5, 3, 3)], [], Lot("south", WinterNow));

    private static ForecastSession Session(Site site, Func<ForecastRequest, ForecastRequest>? change = null)
    {
        ForecastRequest request = Request(site) with { IncludeUncertainty = false };
        return ForecastSession.Prepare(change is null ? request : change(request));
    }

    [Fact]
    public void A_lot_run_as_requested_equals_the_site_run()
    {
        // The same stems, light and steps: the single-lot path must give the site run's numbers exactly.
        ForecastSession session = Session(SouthBench);
        BenchForecast site = Assert.Single(session.Run().Benches);
        BenchForecast lot = session.RunLot("lot-south", LotScenario.AsRequested);

        Assert.Equal(site.LeanAtHorizon, lot.LeanAtHorizon);
        Assert.Equal(site.LeanRateDegreesPerDay, lot.LeanRateDegreesPerDay);
        Assert.Equal(site.LeanTrack.Length, lot.LeanTrack.Length);
        for (int i = 0; i < site.LeanTrack.Length; i++)
        {
            Assert.Equal(site.LeanTrack[i].At, lot.LeanTrack[i].At);
            Assert.Equal(site.LeanTrack[i].Tilt.Radians, lot.LeanTrack[i].Tilt.Radians);
        }
    }

    [Fact]
    public void The_lean_track_is_hourly_from_the_spin_up_to_the_horizon_and_ends_at_the_lean_at_the_horizon()
    {
        ForecastSession session = Session(SouthBench);
        BenchForecast forecast = Assert.Single(session.Run().Benches);
        ImmutableArray<LeanSample> track = forecast.LeanTrack;

        // 14-day spin-up + 7-day horizon, one sample per hour (on the first coarser spin-up edge after each hour before
        // now, on the hour after now) and the end.
        Duration spinUpStep = BenchForecaster.SpinUpStep(session.Step);
        Assert.InRange(track.Length, (21 * 24) - 1, (21 * 24) + 2);
        Assert.Equal(WinterNow - Duration.FromDays(14), track[0].At);
        Assert.Equal(session.End, track[^1].At);
        Assert.Contains(track, s => s.At == WinterNow);
        for (int i = 1; i < track.Length; i++)
        {
            Duration gap = track[i].At - track[i - 1].At;
            if (track[i - 1].At >= WinterNow)
            {
                Assert.Equal(Duration.FromHours(1), gap);
            }
            else
            {
                Assert.InRange(gap, spinUpStep, Duration.FromHours(1) + spinUpStep);
            }
        }

        // Both are the bench-mean lean averaged over the last nutation period before the end.
        Assert.Equal(forecast.LeanAtHorizon.Tilt.Degrees, track[^1].Tilt.Degrees, 1e-9);
        Assert.Equal(0, track[0].Tilt.Degrees, 1e-12); // stems start upright
    }

    [Fact]
    public void Planned_half_turns_hold_the_lean_below_the_unturned_lean()
    {
        // MODEL.md §4 rotation check (first-order limit): a lean flipped by 180° every T peaks at A_R·tanh(T/2τ),
        // below the unrotated steady lean A_R. Here: 180° every 24 h over the 7-day horizon, peak over its last 3 days
        // (after the lean carried from before now has been turned away).
        ForecastSession session = Session(SouthBench);
        BenchForecast none = session.RunLot("lot-south", new LotScenario { PlannedRotations = [] });
        ImmutableArray<RotationRecord> daily =
            [.. Enumerable.Range(1, 6).Select(d => new RotationRecord(WinterNow + Duration.FromDays(d), Angle.FromDegrees(180)))];
        BenchForecast turned = session.RunLot("lot-south", new LotScenario { PlannedRotations = daily });

        double PeakAfterNow(BenchForecast f) => f.LeanTrack.Where(s => s.At > WinterNow + Duration.FromDays(4)).Max(s => s.Tilt.Degrees);
        Assert.True(PeakAfterNow(turned) < 0.8 * PeakAfterNow(none), $"turned {PeakAfterNow(turned):0.00}° vs none {PeakAfterNow(none):0.00}°");
        Assert.Equal(none.LeanNow, turned.LeanNow); // nothing changes before the first planned turn
    }

    [Fact]
    public void Planned_rotations_in_the_request_reach_the_site_run()
    {
        ImmutableArray<RotationRecord> daily =
            [.. Enumerable.Range(1, 6).Select(d => new RotationRecord(WinterNow + Duration.FromDays(d), Angle.FromDegrees(180)))];
        ForecastSession planned = Session(SouthBench, r => r with { PlannedRotations = ImmutableDictionary<string, ImmutableArray<RotationRecord>>.Empty.Add("lot-south", daily) });
        ForecastSession session = Session(SouthBench);

        Assert.Equal(
            session.RunLot("lot-south", new LotScenario { PlannedRotations = daily }).LeanAtHorizon,
            Assert.Single(planned.Run().Benches).LeanAtHorizon);
    }

    [Fact]
    public void A_crop_less_sensitive_to_blue_light_in_a_scenario_leans_less()
    {
        // AC-model steady state (Bastien et al. 2015): tan A_R = M sin A_P / (1 + M cos A_P) grows with the
        // photograviceptive ratio M, so a smaller photo coefficient gives a smaller lean toward a one-sided light.
        ForecastSession session = Session(SouthBench);
        BenchForecast own = session.RunLot("lot-south", LotScenario.AsRequested);
        var stiffer = TestCrop with
        {
            PhotoCoefficient = TestCrop.PhotoCoefficient with { Value = TestCrop.PhotoCoefficient.Minimum },
        };
        BenchForecast stiff = session.RunLot("lot-south", new LotScenario { Crop = stiffer });

        Assert.True(stiff.LeanAtHorizon.Tilt < own.LeanAtHorizon.Tilt, $"{stiff.LeanAtHorizon.Tilt.Degrees:0.00}° vs {own.LeanAtHorizon.Tilt.Degrees:0.00}°");
    }

    public static TheoryData<string, int, double, string, string> BadPlans => new()
    {
        // label, hours after now (−: before now), angle, path, message start
        { "a planned turn before now is a rotation done, not planned", -2, 180, "plannedRotations.lot-south[0].at", "" },
        { "a planned turn after the horizon cannot be simulated", (8 * 24), 180, "plannedRotations.lot-south[0].at", "" },
        { "a zero turn is no rotation", 5, 0, "plannedRotations.lot-south[0].angleDeg", "must be within (−360, 360) and not 0" },
        { "a full turn is no rotation", 5, 360, "plannedRotations.lot-south[0].angleDeg", "must be within (−360, 360) and not 0" },
    };

    [Theory]
    [MemberData(nameof(BadPlans))]
    public void Bad_planned_rotations_are_rejected_with_their_path(string label, int hours, double angleDeg, string path, string message)
    {
        ImmutableArray<RotationRecord> plan = [new RotationRecord(WinterNow + Duration.FromHours(hours), Angle.FromDegrees(angleDeg))];
        var error = Assert.Throws<InvalidInputException>(() => Session(
            SouthBench, r => r with { PlannedRotations = ImmutableDictionary<string, ImmutableArray<RotationRecord>>.Empty.Add("lot-south", plan) }));

        Assert.Contains(error.Errors, e => e.Path == path && e.Message.StartsWith(message, StringComparison.Ordinal));
        Assert.False(string.IsNullOrEmpty(label));
    }

    [Fact]
    public void Planned_rotations_of_an_unknown_lot_are_rejected()
    {
        ImmutableArray<RotationRecord> plan = [new RotationRecord(WinterNow + Duration.FromHours(5), Angle.FromDegrees(90))];
        var error = Assert.Throws<InvalidInputException>(() => Session(
            SouthBench, r => r with { PlannedRotations = ImmutableDictionary<string, ImmutableArray<RotationRecord>>.Empty.Add("lot-nowhere", plan) }));

        Assert.Contains(error.Errors, e => e.Path == "plannedRotations.lot-nowhere" && e.Message == "no lot 'lot-nowhere' on the site");
    }

    [Fact]
    public void A_scenario_for_an_unknown_lot_or_with_a_bad_crop_is_rejected()
    {
        ForecastSession session = Session(SouthBench);
        Assert.Throws<InvalidInputException>(() => session.RunLot("lot-nowhere", LotScenario.AsRequested));
        var broken = TestCrop with { BalanceNumber = TestCrop.BalanceNumber with { Value = double.NaN } };
        var error = Assert.Throws<InvalidInputException>(() => session.RunLot("lot-south", new LotScenario { Crop = broken }));
        Assert.Contains(error.Errors, e => e.Path.StartsWith("crop.", StringComparison.Ordinal));
    }

    [Fact]
    public void A_turn_recorded_today_after_the_measurement_day_counts()
    {
        // The lot was measured at WinterNow's date; a half turn done two hours before now, recorded outside the site,
        // flips the lean toward the bright side round (common practice: turning straightens a leaning bench).
        ImmutableArray<RotationRecord> done = [new RotationRecord(WinterNow - Duration.FromHours(2), Angle.FromDegrees(180))];
        BenchForecast none = Assert.Single(Session(SouthBench).Run().Benches);
        BenchForecast turned = Assert.Single(Session(SouthBench, r => r with
        {
            RotationsDone = ImmutableDictionary<string, ImmutableArray<RotationRecord>>.Empty.Add("lot-south", done),
        }).Run().Benches);

        Assert.True(BearingDifferenceDeg(none.LeanNow.Azimuth, turned.LeanNow.Azimuth) > 90,
            $"{none.LeanNow.Azimuth.Degrees:0}° vs {turned.LeanNow.Azimuth.Degrees:0}°");
    }

    [Theory]
    [InlineData("a turn recorded in the future is not done yet", 2, 180, "rotationsDone.lot-south[0].at")]
    [InlineData("a turn before planting (the lot was planted 30 days before now)", -31 * 24, 180, "rotationsDone.lot-south[0].at")]
    [InlineData("a zero turn is no rotation", -2, 0, "rotationsDone.lot-south[0].angleDeg")]
    public void Bad_recorded_turns_are_rejected_with_their_path(string label, int hours, double angleDeg, string path)
    {
        ImmutableArray<RotationRecord> done = [new RotationRecord(WinterNow + Duration.FromHours(hours), Angle.FromDegrees(angleDeg))];
        var error = Assert.Throws<InvalidInputException>(() => Session(SouthBench, r => r with
        {
            RotationsDone = ImmutableDictionary<string, ImmutableArray<RotationRecord>>.Empty.Add("lot-south", done),
        }));
        Assert.True(error.Errors.Any(e => e.Path == path), $"{label}: {string.Join("; ", error.Errors)}");
    }
}
