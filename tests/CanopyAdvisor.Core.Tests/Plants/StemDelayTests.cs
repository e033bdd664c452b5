using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Plants;
using NodaTime;
using Xunit.Abstractions;
using static CanopyAdvisor.Core.Tests.Plants.StemTestKit;

namespace CanopyAdvisor.Core.Tests.Plants;

/// <summary>
/// The delayed gravitropic loop against the linear delay equation x′(t) = −k·x(t − τ), which is stable for kτ &lt; π/2
/// and oscillates with period 4τ at the onset kτ = π/2 (Hayes 1950, J. London Math. Soc. 25:226; Rand 2011,
/// Differential-Delay Equations, ch. 1).
/// </summary>
/// <remarks>
/// Mapping: a one-segment growth zone of length L (the whole stem), its base tilted by a small A_b, bending in place,
/// no light, no nutation. The curvature κ is uniform, so the midpoint (where the stimulus is sensed) has the angle
/// x = A_b − κL/2 and the apex A_b − κL = 2x − A_b. With γ → 0 (proprioception off) the model
/// dκ/dt = ε̇ (β/L) sin x(t − τ) gives x′ = −(ε̇β/2) sin x(t − τ), so k = ε̇β/2 in the small-angle limit. The test
/// uses γ = 10⁻⁶ (ε̇γτ = 4·10⁻⁷, negligible) and B = β/γ.
/// </remarks>
public class StemDelayTests(ITestOutputHelper output)
{
    private const double DelayHours = 2;
    private const double GrowthZoneM = 0.05;
    private const double ElongationMPerHour = 0.01; // ε̇ = 0.2 h⁻¹
    private const double BaseTiltDeg = 0.2; // linear regime

    private static List<(double Hours, double X)> Run(double kTau, double periods)
    {
        double epsDot = ElongationMPerHour / GrowthZoneM;
        double k = kTau / DelayHours;
        double beta = 2 * k / epsDot;
        const double gamma = 1e-6;
        StemParameters p = Parameters(beta / gamma, gamma, growthZoneM: GrowthZoneM, delayHours: DelayHours);
        Stem stem = Stem.Leaning(p, GrowthZoneM, Angle.FromDegrees(BaseTiltDeg), Angle.FromDegrees(90), 1);
        double dtHours = DelayHours / 50;
        int steps = (int)(periods * 4 * DelayHours / dtHours);
        var series = new List<(double, double)>(steps);
        for (int i = 1; i <= steps; i++)
        {
            stem.BendInPlace(Duration.FromMinutes(dtHours * 60), ElongationMPerHour, Vector3.Zero);
            double apex = SignedTiltDeg(stem.ApexTangent, 90);
            series.Add((i * dtHours, (apex + BaseTiltDeg) / 2)); // x, the midpoint angle
        }

        return series;
    }

    private static double MaxAbs(List<(double Hours, double X)> s, double fromHours, double toHours) =>
        s.Where(e => e.Hours >= fromHours && e.Hours < toHours).Max(e => Math.Abs(e.X));

    [Theory]
    [InlineData(1.4, false)] // below π/2: decays (Hayes 1950)
    [InlineData(1.7, true)] // above π/2: grows
    public void Delayed_loop_is_stable_below_and_unstable_above_k_tau_of_half_pi(double kTau, bool grows)
    {
        List<(double Hours, double X)> s = Run(kTau, 12);
        double period = 4 * DelayHours;
        double early = MaxAbs(s, 2 * period, 4 * period);
        double late = MaxAbs(s, 10 * period, 12 * period);
        output.WriteLine($"kτ={kTau}: peak |x| {early:F4}° (periods 2–4) → {late:F4}° (periods 10–12)");
        Assert.Equal(grows, late > early);
        Assert.True(grows ? late > 1.5 * early : late < early / 1.5, "the change must be clear, not marginal");
    }

    [Fact]
    public void Onset_oscillation_has_period_four_tau()
    {
        List<(double Hours, double X)> s = Run(Math.PI / 2, 12);
        var crossings = new List<double>();
        for (int i = 1; i < s.Count; i++)
        {
            if (s[i - 1].X < 0 && s[i].X >= 0 && s[i].Hours > 8 * DelayHours)
            {
                double f = -s[i - 1].X / (s[i].X - s[i - 1].X);
                crossings.Add(s[i - 1].Hours + (f * (s[i].Hours - s[i - 1].Hours)));
            }
        }

        double period = (crossings[^1] - crossings[0]) / (crossings.Count - 1);
        double early = MaxAbs(s, 8 * DelayHours, 24 * DelayHours);
        double late = MaxAbs(s, 32 * DelayHours, 48 * DelayHours);
        output.WriteLine($"kτ=π/2: period {period:F4} h = {period / DelayHours:F4} τ over {crossings.Count - 1} cycles; amplitude {early:F4}° → {late:F4}°");
        Assert.InRange(period / (4 * DelayHours), 0.98, 1.02);
        Assert.InRange(late / early, 0.9, 1.1); // neutral at the onset
    }
}
