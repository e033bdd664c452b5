using CanopyAdvisor.Core.Advice.SideLamps;
using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Tests.Advice.SideLamps;

/// <summary>
/// A side lamp that must cancel one known lateral blue vector: the optimum follows from the point-source laws, so the
/// planner's answer can be checked against a hand derivation.
/// </summary>
/// <remarks>
/// Derivation (inverse-square law and the cosine projection of a point source, E = I/d², horizontal part E·a/d; any
/// photometry text, e.g. the IES Lighting Handbook point method; MODEL.md §3): an isotropic lamp of flux Φ has
/// I = Φ/4π. The existing lamp (Φ₁ = 500 µmol s⁻¹, horizontal offset a₁ = 1.5 m west, 1 m up, d₁² = 3.25 m²) gives a
/// lateral component Φ₁ a₁ / (4π d₁³) toward the west. A lamp of Φ₂ = 1000 on the east rail (a₂ = 2 m, 1 m up,
/// d₂² = 5 m²) at dimming δ gives δ Φ₂ a₂ / (4π d₂³) toward the east. Both have the same blue fraction, so the lateral
/// blue vector vanishes at δ₀ = (Φ₁/Φ₂)(a₁/a₂)(d₂/d₁)³ = 0.5 × 0.75 × (5/3.25)^1.5 ≈ 0.71559. Off the rail's middle
/// (y ≠ 5) the lamp adds a north–south component and reaches the point more weakly, so the best position is the middle
/// (fraction 0.5) by symmetry.
/// </remarks>
public class SideLampAnalyticTests
{
    private static readonly double D1 = Math.Sqrt(3.25), D2 = Math.Sqrt(5);

    private static double Delta0 => SideLampScene.ExistingPpf / SideLampScene.AddedPpf * (1.5 / 2) * Math.Pow(D2 / D1, 3);

    [Fact]
    public void The_lamp_cancels_the_lateral_blue_at_the_analytic_position_and_dimming()
    {
        SideLampPlan plan = SideLampPlanner.Plan(SideLampScene.Brief(), SideLampScene.Request(SideLampScene.Site()));

        ProposedSideLamp lamp = Assert.Single(plan.Lamps);
        // Inverse-square and cosine laws (derivation in the class remarks): δ₀ ≈ 0.7156, at the rail's middle.
        Assert.Equal(0.715589, Delta0, 5);
        Assert.Equal(Delta0, lamp.Lamp.Dimming, 3);
        Assert.Equal(0.5, lamp.PositionFraction, 2);
        Assert.Equal(5.0, lamp.Lamp.Position.Y, 2);
        Assert.True(plan.LateralBlueRemaining < 1e-4, $"remaining {plan.LateralBlueRemaining}");
    }

    [Fact]
    public void An_energy_weight_lowers_the_dimming_as_the_quadratic_optimum_says()
    {
        // J(δ) = (kδ − L)²/L² + w·W·δ/1000 with k δ₀ = L: dJ/dδ = 0 at δ* = δ₀ − (w W / 2000) δ₀² (calculus on the
        // objective's definition, SideLampPlanner remarks). w = 1 per kW, W = 200 W: δ* = δ₀ − 0.1 δ₀² ≈ 0.66438.
        SideLampPlan plan = SideLampPlanner.Plan(SideLampScene.Brief(energyWeight: 1), SideLampScene.Request(SideLampScene.Site()));

        ProposedSideLamp lamp = Assert.Single(plan.Lamps);
        double expected = Delta0 - (0.1 * Delta0 * Delta0);
        Assert.Equal(expected, lamp.Lamp.Dimming, 3);
        Assert.Equal(0.5, lamp.PositionFraction, 2);
    }

    [Fact]
    public void Canopy_attenuation_changes_the_dimming_by_the_ratio_of_the_Beer_Lambert_transmissions()
    {
        // Reference spacing 0.15 m = the lot's spacing: LAD = the crop's 10 m² m⁻³. A ray to a lamp at elevation e leaves
        // the canopy through its top after depth / sin e (depth 0.01 m), transmission exp(−G·LAD·path), G = 0.5
        // (Monsi & Saeki 1953; MODEL.md §3). sin e₁ = 1/d₁, sin e₂ = 1/d₂, so δ = δ₀ · T₁ / T₂.
        double t1 = Math.Exp(-0.5 * 10 * 0.01 * D1), t2 = Math.Exp(-0.5 * 10 * 0.01 * D2);
        SideLampPlan plan = SideLampPlanner.Plan(
            SideLampScene.Brief(), SideLampScene.Request(SideLampScene.Site(), referenceSpacingM: 0.15));

        ProposedSideLamp lamp = Assert.Single(plan.Lamps);
        Assert.Equal(Delta0 * t1 / t2, lamp.Lamp.Dimming, 3);
        Assert.True(Math.Abs((t1 / t2) - 1) > 0.01, "the test must be able to tell attenuation from none");
    }

    [Fact]
    public void A_Lambertian_lamp_is_aimed_west_toward_the_bench()
    {
        // A Lambertian lamp's intensity is greatest on its axis (I ∝ cos θ; MODEL.md §3), so with an energy weight the
        // cheapest cancelling lamp points its axis at the point: yaw 270° (west), tilt from nadir atan2(2, 1) ≈ 63.4°.
        SideLampPlan plan = SideLampPlanner.Plan(
            SideLampScene.Brief(SideLampScene.LambertianType, energyWeight: 1), SideLampScene.Request(SideLampScene.Site()));

        ProposedSideLamp lamp = Assert.Single(plan.Lamps);
        Assert.Equal(270, lamp.Lamp.Aim.Yaw.Normalized().Degrees, 0);
        Assert.Equal(Math.Atan2(2, 1) * Angle.DegreesPerRadian, lamp.Lamp.Aim.Tilt.Degrees, 0);
        Assert.True(plan.LateralBlueRemaining < 0.01);
    }
}
