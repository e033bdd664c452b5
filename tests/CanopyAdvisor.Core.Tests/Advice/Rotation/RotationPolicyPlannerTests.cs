using System.Collections.Immutable;
using CanopyAdvisor.Core.Advice.Rotation;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using NodaTime;
using Xunit.Abstractions;
using static CanopyAdvisor.Core.Tests.Advice.Rotation.RotationTestScene;

namespace CanopyAdvisor.Core.Tests.Advice.Rotation;

/// <summary>The rotation policy search on a scene with steady one-sided light (<see cref="RotationTestScene"/>).</summary>
public class RotationPolicyPlannerTests(ITestOutputHelper output)
{
    private static readonly Angle HalfTurn = Angle.FromDegrees(180);

    /// <summary>Options whose target, (1 − margin) × the crop's 15° limit, is <paramref name="ratio"/> × A_R.</summary>
    private static RotationPolicyOptions TargetAt(double ratio, Angle steady, params Angle[] angles) => RotationPolicyOptions.Default with
    {
        Angles = angles.Length == 0 ? [HalfTurn] : [.. angles],
        Margin = 1 - (ratio * steady.Degrees / SteadyCrop.LeanGradeLimitDeg.Value),
    };

    [Theory]
    [InlineData(0.6)]
    [InlineData(0.7)]
    [InlineData(0.8)]
    public void The_chosen_half_turn_interval_matches_the_first_order_limit(double ratio)
    {
        // MODEL.md §4 rotation check: a first-order lean relaxing toward A_R with time constant τ, flipped by 180° every T,
        // peaks at A_R·tanh(T/2τ) (periodic steady state; derivation in StemRotationTests), so the longest T that keeps
        // the peak at or below a target r·A_R is T* = 2τ·atanh(r). τ and A_R are fitted from the unturned run.
        ForecastSession session = Session();
        (Angle steady, Duration tau, BenchForecast unturned) = FirstOrderFit(session);

        // The scene is close to first order: at 2τ the unturned lean is 1 − e⁻² = 86.5 % of the way (first-order solution).
        Instant twoTau = unturned.LeanTrack[0].At + (tau * 2);
        double atTwoTau = unturned.LeanTrack.MinBy(s => Math.Abs((s.At - twoTau).TotalHours))!.Lean.Tilt.Radians / steady.Radians;
        Assert.InRange(atTwoTau, 0.865 - 0.03, 0.865 + 0.03);

        // Windows of zero width: the choice rests on the on-time peak alone (the timing check is tested on its own).
        RotationPlan plan = RotationPolicyPlanner.Plan(session, TargetAt(ratio, steady) with { WindowFraction = 0 });
        BenchRotationAdvice advice = Assert.Single(plan.Benches);
        double analyticDays = 2 * tau.TotalDays * Math.Atanh(ratio);
        Duration[] grid = [.. RotationPolicyOptions.DefaultIntervals.OrderBy(d => d)];
        int expected = Array.FindLastIndex(grid, d => d.TotalDays <= analyticDays);
        int chosen = Array.IndexOf(grid, advice.Policy.Interval);
        output.WriteLine(
            $"τ = {tau.TotalHours:0.0} h, A_R = {steady.Degrees:0.000}°, target {advice.TargetLean.Degrees:0.000}° (r = {ratio}): " +
            $"T* = 2τ·atanh(r) = {analyticDays:0.00} d; chosen {advice.Policy} (peak {advice.PeakLeanWithPlan.Degrees:0.000}°, " +
            $"late {advice.PeakLeanWhenLate?.Degrees:0.000}°); first order at that T: {steady.Degrees * Math.Tanh(advice.Policy.Interval.TotalDays / (2 * tau.TotalDays)):0.000}°");
        foreach (RotationCandidate c in advice.Candidates)
        {
            output.WriteLine($"  {c.Policy,-18} {c.Rotations,2} turns  peak {c.PeakLean.Degrees:0.000}°  late {c.LatePeakLean?.Degrees:0.000}°  holds {c.Holds}");
        }

        Assert.Equal(RotationVerdict.Rotate, advice.Verdict);
        Assert.Equal(HalfTurn, advice.Policy.Angle);
        Assert.InRange(chosen, expected - 1, expected + 1);
    }

    [Fact]
    public void No_rotation_is_chosen_when_the_unturned_peak_stays_within_the_target()
    {
        // MODEL.md §6: rotation is labour; with the default 20 % margin the 15° limit leaves 12°, far above this scene's
        // steady lean of under 2°, so no turn is planned and only the unturned run is made.
        ForecastSession session = Session();
        BenchRotationAdvice advice = Assert.Single(RotationPolicyPlanner.Plan(session, RotationPolicyOptions.Default).Benches);

        Assert.Equal(RotationVerdict.NoRotationNeeded, advice.Verdict);
        Assert.True(advice.Policy.IsNone);
        Assert.Empty(advice.Rotations);
        Assert.Equal(0, advice.RotationsToSale);
        Assert.Single(advice.Candidates);
        Assert.Equal(advice.PeakLeanWithoutPlan, advice.PeakLeanWithPlan);
        Assert.True(advice.PeakLeanWithoutPlan <= advice.TargetLean);
        Assert.Equal(0.8 * 15, advice.TargetLean.Degrees, 1e-9);
        Assert.Null(advice.Remedy);
    }

    [Fact]
    public void Rotation_cannot_hold_when_even_the_shortest_interval_fails()
    {
        // First order: at T ≥ 2 d the half-turn peak A_R·tanh(T/2τ) with τ ≈ 1 d is ≥ 0.76 A_R, so a target of 0.4 A_R
        // cannot be held by 2- or 3-day intervals, nor by quarter turns (which relax only half the lean each turn).
        ForecastSession session = Session();
        (Angle steady, _, _) = FirstOrderFit(session);
        RotationPolicyOptions options = TargetAt(0.4, steady, HalfTurn, Angle.FromDegrees(90)) with
        {
            Intervals = [Duration.FromDays(3), Duration.FromDays(2)],
        };
        BenchRotationAdvice advice = Assert.Single(RotationPolicyPlanner.Plan(session, options).Benches);

        Assert.Equal(RotationVerdict.RotationCannotHold, advice.Verdict);
        Assert.Equal(RotationPolicyPlanner.SideLampRemedy, advice.Remedy);
        Assert.Equal(5, advice.Candidates.Length); // none, then 3 d and 2 d with both angles
        Assert.All(advice.Candidates, c => Assert.False(c.Holds));
        Assert.Equal(advice.Candidates.Min(c => c.PeakLean), advice.PeakLeanWithPlan);
        Assert.True(advice.PeakLeanWithPlan < advice.PeakLeanWithoutPlan, "turning still lowers the peak");
        Assert.True(advice.PeakLeanWithPlan > advice.TargetLean);
        Assert.False(advice.Policy.IsNone);
        Assert.NotEmpty(advice.Rotations);
    }

    [Fact]
    public void More_turns_are_never_chosen_when_fewer_hold()
    {
        // The least-labour rule of MODEL.md §6, checked against every policy on the grid simulated here on its own:
        // each policy with fewer turns to the sale than the chosen one goes over the target on time (windows of zero
        // width, so timing does not enter).
        ForecastSession session = Session();
        (Angle steady, _, _) = FirstOrderFit(session);
        RotationPolicyOptions options = TargetAt(0.7, steady, HalfTurn, Angle.FromDegrees(90)) with { WindowFraction = 0 };
        BenchRotationAdvice advice = Assert.Single(RotationPolicyPlanner.Plan(session, options).Benches);
        Assert.Equal(RotationVerdict.Rotate, advice.Verdict);

        Instant sale = advice.SaleAt;
        foreach (Duration interval in options.Intervals)
        {
            foreach (Angle angle in options.Angles)
            {
                ImmutableArray<RotationRecord> turns = [.. RotationPolicy.Every(angle, interval).Times(session.Now, sale).Select(t => new RotationRecord(t, angle))];
                if (turns.Length >= advice.RotationsToSale)
                {
                    continue;
                }

                BenchForecast run = session.RunLot("lot-b", new LotScenario { PlannedRotations = turns });
                double peak = GradedPeakDeg(run, session.Now, turns[0].At, sale, advice.TargetLean.Degrees);
                output.WriteLine($"{angle.Degrees:0}° every {interval.TotalDays:0.#} d: {turns.Length} turns, peak {peak:0.000}° vs target {advice.TargetLean.Degrees:0.000}°");
                Assert.True(peak > advice.TargetLean.Degrees, $"{angle.Degrees}° every {interval} holds with {turns.Length} turns");
            }
        }

        // And the candidates the search shows agree: none with fewer turns holds.
        Assert.All(advice.Candidates.Where(c => c.Rotations < advice.RotationsToSale), c => Assert.False(c.Holds));
    }

    [Fact]
    public void The_chosen_plan_holds_with_turns_late_or_alternately_early_and_late_in_their_windows()
    {
        // The robustness rule of the task: simulate the badly timed plans on their own and grade them the same way.
        ForecastSession session = Session();
        (Angle steady, _, _) = FirstOrderFit(session);
        BenchRotationAdvice advice = Assert.Single(RotationPolicyPlanner.Plan(session, TargetAt(0.8, steady)).Benches);
        Assert.True(advice.Rotations.Length >= 2);
        Assert.True(advice.Rotations.Any(r => r.Latest > r.At), "the windows have some width");
        ImmutableArray<RotationRecord> late = [.. advice.Rotations.Select(r => new RotationRecord(r.Latest, r.Angle))];
        ImmutableArray<RotationRecord> alternating = [.. advice.Rotations.Select((r, i) => new RotationRecord(i % 2 == 0 ? r.Earliest : r.Latest, r.Angle))];

        double PeakOf(ImmutableArray<RotationRecord> turns) => GradedPeakDeg(
            session.RunLot("lot-b", new LotScenario { PlannedRotations = turns }), session.Now, turns[0].At, advice.CheckedUntil, advice.TargetLean.Degrees);
        double latePeak = PeakOf(late), alternatingPeak = PeakOf(alternating);
        output.WriteLine($"{advice.Policy}: on time {advice.PeakLeanWithPlan.Degrees:0.000}°, late {latePeak:0.000}°, alternating {alternatingPeak:0.000}°, target {advice.TargetLean.Degrees:0.000}°");
        Assert.True(latePeak <= advice.TargetLean.Degrees, $"late peak {latePeak:0.000}° vs target {advice.TargetLean.Degrees:0.000}°");
        Assert.True(alternatingPeak <= advice.TargetLean.Degrees, $"alternating peak {alternatingPeak:0.000}°");
        Assert.Equal(Math.Max(latePeak, alternatingPeak), advice.PeakLeanWhenLate!.Value.Degrees, 1e-9);
    }

    [Fact]
    public void Timing_slack_never_buys_a_longer_interval()
    {
        // A plan must hold on time and with its turns timed badly inside their windows, so windows can only keep or
        // shorten the interval chosen without them (fewer or equal turns without windows).
        ForecastSession session = Session();
        (Angle steady, _, _) = FirstOrderFit(session);
        RotationPolicyOptions options = TargetAt(0.8, steady);
        BenchRotationAdvice exact = Assert.Single(RotationPolicyPlanner.Plan(session, options with { WindowFraction = 0 }).Benches);
        BenchRotationAdvice slack = Assert.Single(RotationPolicyPlanner.Plan(session, options).Benches);
        output.WriteLine($"on time: {exact.Policy} ({exact.RotationsToSale} turns); with ± {options.WindowFraction:P0} windows: {slack.Policy} ({slack.RotationsToSale} turns)");

        Assert.True(slack.Policy.Interval <= exact.Policy.Interval);
        Assert.True(slack.RotationsToSale >= exact.RotationsToSale);
    }

    [Fact]
    public void A_plan_that_only_holds_on_time_gets_windows_of_zero_width()
    {
        // At r = 0.8 the 2-day half-turn holds on time with little room (first-order peak 0.75 A_R; simulated 0.79 A_R),
        // so gaps stretched by twice 0.45 × 2 d = 43 h, or half that, go over the target (the 3-day policy peaks at
        // 0.93 A_R); no other interval is offered, so the plan keeps the 2-day policy with every turn on its nominal time.
        ForecastSession session = Session();
        (Angle steady, _, _) = FirstOrderFit(session);
        RotationPolicyOptions options = TargetAt(0.8, steady) with { Intervals = [Duration.FromDays(2)], WindowFraction = 0.45 };
        BenchRotationAdvice advice = Assert.Single(RotationPolicyPlanner.Plan(session, options).Benches);

        foreach (RotationCandidate c in advice.Candidates)
        {
            output.WriteLine($"  {c.Policy,-18} {c.Rotations,2} turns  peak {c.PeakLean.Degrees:0.000}°  late {c.LatePeakLean?.Degrees:0.000}° at {c.WindowFraction}  holds {c.Holds}; target {advice.TargetLean.Degrees:0.000}°");
        }

        Assert.Equal(RotationVerdict.Rotate, advice.Verdict);
        Assert.Equal(Duration.FromDays(2), advice.Policy.Interval);
        Assert.All(advice.Rotations, r => Assert.True(r.Earliest == r.At && r.At == r.Latest));
        RotationCandidate chosen = advice.Candidates.Single(c => c.Policy == advice.Policy);
        Assert.True(chosen.Holds);
        Assert.Equal(0, chosen.WindowFraction);
        Assert.Equal(advice.PeakLeanWithPlan, advice.PeakLeanWhenLate);
    }

    [Theory]
    [InlineData(180)]
    [InlineData(90)]
    public void Planned_turns_fall_before_the_sale_each_inside_its_window(double angleDeg)
    {
        ForecastSession session = Session();
        (Angle steady, _, _) = FirstOrderFit(session);
        Angle angle = Angle.FromDegrees(angleDeg);
        BenchRotationAdvice advice = Assert.Single(RotationPolicyPlanner.Plan(session, TargetAt(0.9, steady, angle)).Benches);
        Assert.NotEmpty(advice.Rotations);

        Lot lot = Assert.Single(session.Lots);
        for (int i = 0; i < advice.Rotations.Length; i++)
        {
            PlannedRotation r = advice.Rotations[i];
            Assert.True(r.At < advice.SaleAt, $"turn {i} at {r.At} is not before the sale {advice.SaleAt}");
            Assert.True(r.Earliest >= session.Now && r.Earliest <= r.At && r.At <= r.Latest && r.Latest <= advice.CheckedUntil);
            Assert.Equal(angle, r.Angle); // 90° turns always clockwise (RotationPolicy remarks)
            Assert.Equal((lot.Id, lot.BenchId, lot.Pots), (r.LotId, r.BenchId, r.Pots));
            if (i > 0)
            {
                Assert.Equal(advice.Policy.Interval, r.At - advice.Rotations[i - 1].At);
            }
        }

        Assert.Equal(session.Now, advice.Rotations[0].At); // no turn done yet: the first one as soon as allowed
    }

    [Fact]
    public void A_turn_already_done_sets_the_rhythm_of_the_plan()
    {
        Lot lot = Lot(10, new RotationRecord(Now - Duration.FromHours(20), HalfTurn));
        ForecastSession session = Session(lot);
        (Angle steady, _, _) = FirstOrderFit(Session());
        BenchRotationAdvice advice = Assert.Single(RotationPolicyPlanner.Plan(session, TargetAt(0.8, steady)).Benches);

        Assert.Equal(RotationVerdict.Rotate, advice.Verdict);
        Assert.Equal(Now - Duration.FromHours(20) + advice.Policy.Interval, advice.Rotations[0].At);
    }

    [Fact]
    public void The_first_turn_waits_for_the_time_allowed()
    {
        ForecastSession session = Session();
        (Angle steady, _, _) = FirstOrderFit(session);
        Instant allowed = Now + Duration.FromHours(20);
        BenchRotationAdvice advice = Assert.Single(RotationPolicyPlanner.Plan(session, TargetAt(0.9, steady) with { FirstTurnNotBefore = allowed }).Benches);

        Assert.Equal(allowed, advice.Rotations[0].At);
        Assert.All(advice.Rotations, r => Assert.True(r.Earliest >= allowed));
    }

    [Fact]
    public void A_lot_sold_before_now_needs_no_turns()
    {
        // The sale is at the start of today (local), before now (noon UTC): nothing is left to grade, whatever the target.
        ForecastSession session = Session(Lot(0));
        BenchRotationAdvice advice = Assert.Single(RotationPolicyPlanner.Plan(session, RotationPolicyOptions.Default with { Margin = 0.99 }).Benches);

        Assert.True(advice.SaleAt <= session.Now);
        Assert.Equal(RotationVerdict.NoRotationNeeded, advice.Verdict);
        Assert.Empty(advice.Rotations);
        Assert.Equal(advice.LeanNow, advice.PeakLeanWithoutPlan);
    }

    [Fact]
    public void The_plan_does_not_depend_on_how_the_lots_are_scheduled()
    {
        // Lots run in parallel; each search is self-contained, so two runs and a run of each lot alone agree exactly.
        ForecastSession session = TwoBenchSession();
        (Angle steady, _, _) = FirstOrderFit(session);
        RotationPolicyOptions options = TargetAt(0.7, steady, HalfTurn, Angle.FromDegrees(90));
        var fractions = new List<double>();
        RotationPlan first = RotationPolicyPlanner.Plan(session, options, new SynchronousProgress(fractions.Add));
        RotationPlan second = RotationPolicyPlanner.Plan(session, options);

        Assert.Equal(["lot-b", "lot-far"], first.Benches.Select(b => b.LotId));
        Assert.Equal(Describe(first), Describe(second));
        Assert.Equal(1.0, fractions.Max());
        Assert.Equal(2, fractions.Count);
        Assert.Equal(first.Tasks.Length, first.Benches.Sum(b => b.RotationsToSale));
        Assert.True(first.Tasks.Zip(first.Tasks.Skip(1)).All(p => p.First.At <= p.Second.At));
        Assert.Equal(first.Benches.Count(b => b.RotationsToSale > 0), first.PlannedRotationsByLot.Count);
    }

    public static TheoryData<string, Func<RotationPolicyOptions, RotationPolicyOptions>, string> BadOptions => new()
    {
        { "no interval", o => o with { Intervals = [] }, "options.intervals" },
        { "an interval under an hour", o => o with { Intervals = [Duration.FromMinutes(30)] }, "options.intervals[0]" },
        { "an interval twice", o => o with { Intervals = [Duration.FromDays(1), Duration.FromDays(1)] }, "options.intervals[1]" },
        { "a 45° turn", o => o with { Angles = [Angle.FromDegrees(45)] }, "options.angles[0]" },
        { "a margin of 100 %", o => o with { Margin = 1 }, "options.margin" },
        { "a negative margin", o => o with { Margin = -0.1 }, "options.margin" },
        { "windows that overlap", o => o with { WindowFraction = 0.5 }, "options.windowFraction" },
        { "a first turn before now", o => o with { FirstTurnNotBefore = Now - Duration.FromHours(1) }, "options.firstTurnNotBefore" },
    };

    [Theory]
    [MemberData(nameof(BadOptions))]
    public void Bad_options_are_rejected_with_their_path(string label, Func<RotationPolicyOptions, RotationPolicyOptions> change, string path)
    {
        ForecastSession session = Session();
        var error = Assert.Throws<InvalidInputException>(() => RotationPolicyPlanner.Plan(session, change(RotationPolicyOptions.Default)));
        Assert.True(error.Errors.Any(e => e.Path == path), $"{label}: {string.Join("; ", error.Errors)}");
    }

    /// <summary>The planner's grading, recomputed here: the largest lean from now to the end; if the lean now is over the
    /// target, from the first sample back within it at least one nutation period (2 h for the test crop) after the first
    /// turn.</summary>
    private static double GradedPeakDeg(BenchForecast run, Instant now, Instant firstTurn, Instant until, double targetDeg)
    {
        var span = run.LeanTrack.Where(s => s.At >= now && s.At <= until).ToList();
        int from = span[0].Lean.Tilt.Degrees <= targetDeg
            ? 0
            : span.FindIndex(s => s.At >= firstTurn + Duration.FromHours(SteadyCrop.NutationPeriodHours.Value) && s.Lean.Tilt.Degrees <= targetDeg);
        return from < 0 ? span.Max(s => s.Lean.Tilt.Degrees) : span.Skip(from).Max(s => s.Lean.Tilt.Degrees);
    }

    private static string Describe(RotationPlan plan) => string.Join(
        "\n",
        plan.Benches.Select(b =>
            $"{b.LotId} {b.Verdict} {b.Policy} {b.PeakLeanWithPlan.Radians:R} {b.PeakLeanWhenLate?.Radians:R} " +
            string.Join(",", b.Rotations.Select(r => $"{r.At}/{r.Earliest}/{r.Latest}/{r.Angle.Radians:R}")) + " | " +
            string.Join(",", b.Candidates.Select(c => $"{c.Policy}:{c.Rotations}:{c.PeakLean.Radians:R}:{c.LatePeakLean?.Radians:R}:{c.WindowFraction}:{c.Holds}"))));

    private sealed class SynchronousProgress(Action<double> report) : IProgress<double>
    {
        public void Report(double value) => report(value);
    }
}
