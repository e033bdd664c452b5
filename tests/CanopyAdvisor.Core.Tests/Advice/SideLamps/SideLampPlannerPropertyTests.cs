using CanopyAdvisor.Core.Advice.SideLamps;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Sites;
using CsCheck;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Advice.SideLamps;

/// <summary>Promises that hold for any brief: bounds, the lamp count, limits reported as they are, never worse than no
/// lamps, and one plan per seed.</summary>
/// <remarks>The expected behaviour is the planner's own contract (SideLampPlanner remarks: the bounded transform keeps
/// every tried point inside the bounds; a lamp is kept only if it lowers the objective).</remarks>
public class SideLampPlannerPropertyTests
{
    /// <summary>A random brief for the test scene: one or two rails somewhere in the room's upper part, random facing,
    /// yaw and tilt ranges, up to three lamps of either type, random energy weight and seed.</summary>
    private static SideLampBrief RandomBrief(int seed)
    {
        var r = new Random(seed);
        double Between(double low, double high) => low + ((high - low) * r.NextDouble());
        MountingRail Rail(string id)
        {
            var start = new Vector3(Between(0.2, 9.8), Between(0.2, 9.8), Between(1.2, 3.8));
            var end = new Vector3(Between(0.2, 9.8), Between(0.2, 9.8), Between(1.2, 3.8));
            return new MountingRail(id, start, end)
            {
                Facing = r.Next(3) == 0 ? null : Angle.FromDegrees(Between(0, 360)),
                YawHalfRange = Angle.FromDegrees(Between(5, 180)),
            };
        }

        MountingRail[] rails = r.Next(2) == 0 ? [Rail("a")] : [Rail("a"), Rail("b")];
        double minTilt = Between(0, 90);
        SideLampType[] types = r.Next(2) == 0 ? [SideLampScene.IsotropicType] : [SideLampScene.LambertianType, SideLampScene.IsotropicType];
        return new SideLampBrief([.. rails], [.. types], r.Next(0, 4), LampSchedule.AlwaysOn)
        {
            BenchIds = ["b"],
            EnergyWeightPerKilowatt = Between(0, 2),
            MinTilt = Angle.FromDegrees(minTilt),
            MaxTilt = Angle.FromDegrees(Between(minTilt, 180)),
            Seed = r.Next(),
            Starts = 1,
            DefaultPpfdCeiling = r.Next(2) == 0 ? null : Between(5, 20),
            UniformityFloor = Between(0, 1),
        };
    }

    [Fact]
    public void Every_proposed_lamp_is_within_its_bounds_and_the_plan_is_never_worse_than_no_lamps()
    {
        Site site = SideLampScene.Site();
        Gen.Int[0, int.MaxValue].Sample(
            seed =>
            {
                SideLampBrief brief = RandomBrief(seed);
                SideLampPlan plan = SideLampPlanner.Plan(brief, SideLampScene.Request(site));

                Assert.True(plan.Lamps.Length <= brief.MaxLamps);
                foreach (SideLampBenchOutcome bench in plan.Benches)
                {
                    // A limit reported as met holds in the numbers; one that does not hold is never reported as met.
                    bool ceilingHolds = bench.PpfdCeiling is not double c || bench.LightAfter.PeakPpfd <= c * (1 + 1e-9);
                    Assert.Equal(ceilingHolds, bench.Ceiling is LimitCheck.Met or LimitCheck.NotSet);
                    bool floorHolds = brief.UniformityFloor == 0 || (bench.LightAfter.Uniformity ?? 1) >= brief.UniformityFloor - 1e-9;
                    Assert.Equal(floorHolds, bench.Uniformity is LimitCheck.Met or LimitCheck.NotSet);
                }

                Assert.True(plan.Objective <= plan.ObjectiveWithoutLamps, $"{plan.Objective} > {plan.ObjectiveWithoutLamps}");
                foreach (ProposedSideLamp p in plan.Lamps)
                {
                    MountingRail rail = brief.Rails.Single(x => x.Id == p.RailId);
                    Assert.InRange(p.PositionFraction, 0, 1);
                    Vector3 expected = rail.At(p.PositionFraction);
                    Assert.True((p.Lamp.Position - expected).Length < 1e-9, "the lamp hangs on its rail");
                    Assert.InRange(p.Lamp.Dimming, 0, 1);
                    Assert.InRange(p.Lamp.Aim.Tilt.Radians, brief.MinTilt.Radians - 1e-12, brief.MaxTilt.Radians + 1e-12);
                    if (rail.Facing is Angle facing)
                    {
                        double off = Math.Abs(Math.IEEERemainder(p.Lamp.Aim.Yaw.Radians - facing.Radians, 2 * Math.PI));
                        Assert.True(off <= rail.YawHalfRange.Radians + 1e-9, $"yaw {p.Lamp.Aim.Yaw} is {off} rad off {facing}");
                    }
                }
            },
            iter: 12,
            threads: 1);
    }

    [Fact]
    public void The_same_seed_gives_the_same_plan_and_another_seed_may_search_differently()
    {
        SideLampBrief brief = SideLampScene.Brief(SideLampScene.LambertianType, energyWeight: 0.5, maxLamps: 2) with
        {
            Rails = [SideLampScene.EastRail, new MountingRail("north", new Vector3(3, 8, 2.5), new Vector3(7, 8, 2.5))],
            Starts = 4,
        };
        SideLampPlan first = SideLampPlanner.Plan(brief, SideLampScene.Request(SideLampScene.Site()));
        SideLampPlan second = SideLampPlanner.Plan(brief, SideLampScene.Request(SideLampScene.Site()));

        Assert.Equal(first.Lamps.Length, second.Lamps.Length);
        for (int i = 0; i < first.Lamps.Length; i++)
        {
            Assert.Equal(first.Lamps[i], second.Lamps[i]);
        }

        Assert.Equal(first.Objective, second.Objective);
    }

    [Fact]
    public void Nothing_is_added_when_no_bench_is_at_risk()
    {
        // No bench named, and the only lamp straight above the only point: no lateral light, so the stem stays upright
        // (gravitropism alone keeps it vertical, MODEL.md §4) and the bench is not at risk.
        SideLampBrief brief = SideLampScene.Brief() with { BenchIds = [], RiskFraction = 0.5 };
        SideLampPlan plan = SideLampPlanner.Plan(brief, SideLampScene.Request(SideLampScene.Site(new Vector3(5, 5, 1.87))));

        Assert.Empty(plan.BenchesAtRisk);
        Assert.Empty(plan.Lamps);
        Assert.Same(plan.ForecastBefore, plan.ForecastAfter);
        Assert.Equal(0, plan.Energy.KilowattHoursPerWeek);
        Assert.Contains(plan.Notes, n => n.Contains("no side lamps are proposed", StringComparison.Ordinal));
    }

    [Fact]
    public void The_forecast_after_sees_the_added_lamp()
    {
        SideLampPlan plan = SideLampPlanner.Plan(SideLampScene.Brief(), SideLampScene.Request(SideLampScene.Site()));
        SideLampBenchOutcome bench = Assert.Single(plan.Benches);

        // With the lateral blue cancelled, the stem is bent by gravitropism and proprioception only (MODEL.md §4), so
        // its lean at the horizon falls.
        Assert.True(bench.ForecastAfter.LeanAtHorizon.Tilt < bench.ForecastBefore.LeanAtHorizon.Tilt);
        Assert.True(bench.LightAfter.LateralBlue < 0.01 * bench.LightBefore.LateralBlue);
        Assert.Equal(plan.Lamps.Length + 1, plan.ProposedSite.Lamps.Length);
    }
}
