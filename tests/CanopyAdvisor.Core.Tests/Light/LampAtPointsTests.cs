using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CsCheck;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Light;

/// <summary>One lamp tried against a compiled field's points gives what compiling the site with that lamp gives.</summary>
/// <remarks>The planner relies on this (SideLampPlanner remarks, "Added light"): the light of a lamp is additive
/// (superposition of independent sources, MODEL.md §3), so field(site + lamp) − field(site) must equal the lamp alone,
/// canopy attenuation and blocking included.</remarks>
public class LampAtPointsTests
{
    [Fact]
    public void A_tried_lamp_matches_the_compile_with_it_for_any_aim_and_place()
    {
        Bench[] benches = [TestSites.Bench("a", 0, 0, 2, 1, 4, 2, canopyM: 0.3, depthM: 0.1, lad: 8), TestSites.Bench("b", 3, 0, 2, 1, 3, 2, lad: 4)];
        Lamp existing = TestSites.Lamp("top", new Vector3(1, 1, 3), LambertianDistribution.Instance, 800);
        Site site = TestSites.Make(TestSites.Room, benches, [existing]);
        CompiledLightField without = LightFieldCompiler.Compile(site, IndoorTestEnclosure.Instance);
        int[] points = [.. Enumerable.Range(0, without.Points.Length)];
        OutsideLight dark = new(Instant.FromUtc(2026, 12, 1, 0, 0), new Vector3(0, 0, -1), 0, 0, 0);

        Gen.Select(Gen.Double[-2, 6], Gen.Double[-2, 3], Gen.Double[1.2, 3], Gen.Double[0, 360], Gen.Double[0, 120], Gen.Double[0.1, 1]).Sample(
            (x, y, z, yawDeg, tiltDeg, dimming) =>
            {
                Lamp tried = TestSites.Lamp(
                    "side", new Vector3(x, y, z), CosinePowerDistribution.FromBeamAngle(Angle.FromDegrees(70)), 600,
                    new LampAim(Angle.FromDegrees(yawDeg), Angle.FromDegrees(tiltDeg), Angle.Zero), dimming: dimming);
                CompiledLightField with = LightFieldCompiler.Compile(site with { Lamps = [existing, tried] }, IndoorTestEnclosure.Instance);
                double[] vectors = new double[4 * points.Length];
                LightFieldCompiler.LampAtPoints(tried, without, points, vectors);

                var a = new PointLight[points.Length];
                var b = new PointLight[points.Length];
                with.Step(dark, LocalTime.Noon, a);
                without.Step(dark, LocalTime.Noon, b);
                for (int p = 0; p < points.Length; p++)
                {
                    Vector3 difference = a[p].LightVector - b[p].LightVector;
                    Assert.Equal(difference.X, vectors[4 * p], 9);
                    Assert.Equal(difference.Y, vectors[(4 * p) + 1], 9);
                    Assert.Equal(difference.Z, vectors[(4 * p) + 2], 9);
                    Assert.Equal(a[p].HorizontalPpfd - b[p].HorizontalPpfd, vectors[(4 * p) + 3], 9);
                }
            },
            iter: 40,
            threads: 1);
    }
}
