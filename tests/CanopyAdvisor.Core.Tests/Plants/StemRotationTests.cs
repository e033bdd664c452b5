using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Plants;
using NodaTime;
using Xunit.Abstractions;
using static CanopyAdvisor.Core.Tests.Plants.StemTestKit;

namespace CanopyAdvisor.Core.Tests.Plants;

/// <summary>Pot rotation in the first-order limit of the model.</summary>
/// <remarks>
/// Derivation (periodic steady state of a first-order system): a lean x relaxing as x′ = (A_R − x)/τ, flipped to −x
/// every T. Just before a flip x = x_p; just after, −x_p; after T more, x_p = A_R + (−x_p − A_R)·e^(−T/τ), so
/// x_p (1 + e^(−T/τ)) = A_R (1 − e^(−T/τ)) and x_p = A_R·tanh(T/2τ).
/// Mapping to the model: one-segment growth zone of length L (the whole stem) with an upright clamped base, bending
/// in place, no delay, no nutation, horizontal light. The chord of a uniform arc is parallel to its midpoint tangent,
/// so the lean is the midpoint angle x = κL/2 and, for small angles,
/// x′ = ε̇ [ ν/2 − (β/2 + γ) x ]: A_R = ν/(β + 2γ) = B·M/(B + 2) and τ = 2/(ε̇γ(B + 2)).
/// </remarks>
public class StemRotationTests(ITestOutputHelper output)
{
    private const double GrowthZoneM = 0.05;
    private const double ElongationMPerHour = 0.01; // ε̇ = 0.2 h⁻¹
    private const double Balance = 2;
    private const double Gamma = 1;
    private const double PhotoRatio = 0.05; // small angles: A_R = 1.43°

    private static double LeanTowardLightDeg(Stem stem) => SignedTiltDeg(stem.ApexOffset, 90);

    private static double TimeConstantHours() => 2 / (ElongationMPerHour / GrowthZoneM * Gamma * (Balance + 2));

    private static double TargetDeg() => Balance * PhotoRatio / (Balance + 2) * Angle.DegreesPerRadian;

    [Fact]
    public void Without_rotation_the_lean_settles_at_the_first_order_target()
    {
        Stem stem = Stem.Upright(Parameters(Balance, Gamma, PhotoRatio, GrowthZoneM), GrowthZoneM, 1);
        double tau = TimeConstantHours(), dt = tau / 100;
        double atTau = 0;
        for (int i = 1; i <= 2000; i++)
        {
            stem.BendInPlace(Duration.FromMinutes(dt * 60), ElongationMPerHour, LightFrom(90, 90));
            if (i == 100)
            {
                atTau = LeanTowardLightDeg(stem);
            }
        }

        double final = LeanTowardLightDeg(stem);
        output.WriteLine($"A_R model {final:F5}° vs first-order {TargetDeg():F5}°; at t = τ {atTau / final:F4} of it (1 − 1/e = 0.6321)");
        Assert.InRange(final / TargetDeg(), 0.99, 1.01);
        Assert.InRange(atTau / final, 0.6321 - 0.01, 0.6321 + 0.01);
    }

    [Theory]
    [InlineData(0.5)]
    [InlineData(1.0)]
    [InlineData(3.0)]
    public void Flipping_every_T_peaks_at_A_R_tanh_T_over_two_tau(double periodsOfTau)
    {
        Stem stem = Stem.Upright(Parameters(Balance, Gamma, PhotoRatio, GrowthZoneM), GrowthZoneM, 1);
        double tau = TimeConstantHours(), dt = tau / 200;
        int stepsPerFlip = (int)Math.Round(periodsOfTau * 200);
        double peak = 0;
        for (int flip = 0; flip < 40; flip++)
        {
            for (int i = 0; i < stepsPerFlip; i++)
            {
                stem.BendInPlace(Duration.FromMinutes(dt * 60), ElongationMPerHour, LightFrom(90, 90));
            }

            peak = LeanTowardLightDeg(stem);
            stem.RotatePot(Angle.FromDegrees(180));
        }

        double expected = TargetDeg() * Math.Tanh(periodsOfTau / 2);
        output.WriteLine($"T = {periodsOfTau} τ: peak {peak:F5}° vs A_R·tanh(T/2τ) = {expected:F5}° ({(peak / expected) - 1:P2})");
        Assert.InRange(peak / expected, 0.97, 1.03);
    }
}
