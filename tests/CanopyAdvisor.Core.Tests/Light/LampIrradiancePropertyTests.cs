using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CsCheck;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Light;

public class LampIrradiancePropertyTests
{
    // MODEL.md §3: a downward Lambertian lamp of flux Φ at height h gives E = (Φ/π) h²/(h² + r²)² on the horizontal at
    // horizontal offset r (point-source law E = I cos(incidence)/d² with I = Φ cos θ / π). Checked for random h, r and
    // offset directions, including a rotated bench axis.
    [Fact]
    public void Lambertian_lamp_follows_the_point_source_formula_everywhere()
    {
        Gen.Select(Gen.Double[0.2, 5], Gen.Double[0, 5], Gen.Double[0, 2 * Math.PI], Gen.Double[0, 360])
            .Sample((h, r, direction, axisDeg) =>
            {
                var bench = new Bench("b", new Footprint(-0.05, -0.05, Angle.FromDegrees(axisDeg), 0.1, 0.1), 0.8, new Canopy(0.2, 0, 0), 1, 1);
                Vector3 point = SampleGrid.ForBench(bench, 0)[0].Position;
                var lampPosition = new Vector3(point.X + (r * Math.Sin(direction)), point.Y + (r * Math.Cos(direction)), point.Z + h);
                var lamp = TestSites.Lamp("l", lampPosition, LambertianTestDistribution.Instance, 1000);
                CompiledLightField field = LightFieldCompiler.Compile(TestSites.Make(TestSites.Room, [bench], [lamp]), IndoorTestEnclosure.Instance);
                var into = new PointLight[1];
                field.Step(OutsideLight.Dark(Instant.FromUtc(2026, 1, 1, 0, 0), -Vector3.UnitZ), LocalTime.Noon, into);

                double expected = 1000 / Math.PI * h * h / Math.Pow((h * h) + (r * r), 2);
                return Math.Abs(into[0].HorizontalPpfd - expected) <= 1e-9 * Math.Max(1, expected);
            }, iter: 200);
    }

    // The per-step evaluation is meant to run allocation-free (COMMON.md budget for the hot path); this counts managed
    // bytes allocated on the thread across 50 steps, which must be zero (no timing involved).
    [Fact]
    public void Step_allocates_nothing()
    {
        Bench bench = TestSites.Bench("b", 0, 0, 3, 2, 6, 4, canopyM: 0.3, depthM: 0.1, lad: 2);
        var lamps = Enumerable.Range(0, 6).Select(i => TestSites.Lamp($"l{i}", new Vector3(i * 0.5, 1, 2.5), LambertianTestDistribution.Instance, 900,
            schedule: new LampSchedule(new LocalTime(i, 0), new LocalTime(20, 0), 800)));
        CompiledLightField field = LightFieldCompiler.Compile(TestSites.Make(TestSites.Glasshouse, [bench], lamps), new GlassCeilingTestEnclosure(0.7));
        var outside = new OutsideLight(Instant.FromUtc(2026, 3, 1, 9, 0), Direction.FromAzimuthZenith(Angle.FromDegrees(140), Angle.FromDegrees(55)), 900, 200, 700);
        var into = new PointLight[field.Points.Length];
        field.Step(outside, new LocalTime(9, 0), into);

        long before = GC.GetAllocatedBytesForCurrentThread();
        for (int i = 0; i < 50; i++)
        {
            field.Step(outside, new LocalTime(9, 0), into);
        }

        Assert.Equal(0, GC.GetAllocatedBytesForCurrentThread() - before);
        Assert.True(into[0].HorizontalPpfd > 0);
    }
}
