using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Light;

/// <summary>Bench tops are opaque: a rack tier shades the tiers below it from lamps and from the sky.</summary>
public class BenchTopShadingTests
{
    private static readonly OutsideLight Night = OutsideLight.Dark(Instant.FromUtc(2026, 1, 1, 0, 0), new Vector3(0, 0, -1));

    // Two tiers of the same footprint, 0.9 m apart; one Lambertian lamp of 1000 µmol s⁻¹ over each tier, 0.5 m above
    // its sensing points. Each tier's centre point sees only its own lamp: (Φ/π)/h² = 1273.24 (MODEL.md §3,
    // E = (Φ/π) h²/(h²+r²)² on axis). Without the bench top the lower tier would also get the upper lamp's light.
    [Fact]
    public void Each_tier_sees_only_the_lamp_over_it()
    {
        Bench lower = TestSites.Bench("lower", 0, 0, 1, 1, 1, 1, surfaceM: 0.3, canopyM: 0.1);
        Bench upper = TestSites.Bench("upper", 0, 0, 1, 1, 1, 1, surfaceM: 1.2, canopyM: 0.1);
        Lamp overLower = TestSites.Lamp("l1", new Vector3(0.5, 0.5, 0.9), LambertianTestDistribution.Instance, 1000);
        Lamp overUpper = TestSites.Lamp("l2", new Vector3(0.5, 0.5, 1.8), LambertianTestDistribution.Instance, 1000);
        CompiledLightField field = LightFieldCompiler.Compile(
            TestSites.Make(TestSites.Room, [lower, upper], [overLower, overUpper]), IndoorTestEnclosure.Instance);

        var light = new PointLight[2];
        field.Step(Night, new LocalTime(12, 0), light);
        double expected = 1000 / Math.PI / (0.5 * 0.5);
        Assert.Equal(expected, light[0].HorizontalPpfd, 6);
        Assert.Equal(expected, light[1].HorizontalPpfd, 6);
        Assert.Equal(0, light[1].LightVector.X, 9);   // the lower lamp does not shine up through the upper bench either
        Assert.Equal(expected, light[1].LightVector.Z, 6);
    }

    // Under an open sky (transmittance 1) the point 0.8 m under the centre of a 1 m × 1 m bench top loses the view
    // factor of that square: four corner rectangles 0.5 × 0.5 m at c = 0.8 m (Howell's catalogue, B-3):
    // F = (1/2π)[A/√(1+A²) atan(B/√(1+A²)) + B/√(1+B²) atan(A/√(1+B²))], A = B = 0.625 → 4F = 0.32896, f = 0.67104.
    // Tolerance 2 %: the default quadrature's documented accuracy for sharp-edged openings (HemisphereQuadrature).
    [Fact]
    public void A_bench_above_hides_the_sky()
    {
        Bench lower = TestSites.Bench("lower", 0, 0, 1, 1, 1, 1, surfaceM: 0.3, canopyM: 0.1);
        Bench upper = TestSites.Bench("upper", 0, 0, 1, 1, 1, 1, surfaceM: 1.2, canopyM: 0.1);
        Bench alone = TestSites.Bench("alone", 5, 0, 1, 1, 1, 1, surfaceM: 0.3, canopyM: 0.1);
        CompiledLightField field = LightFieldCompiler.Compile(
            TestSites.Make(TestSites.Glasshouse, [lower, upper, alone], []), OpenSkyTestEnclosure.Instance);

        double a = 0.625, root = Math.Sqrt(1 + (a * a));
        double corner = 1 / (2 * Math.PI) * 2 * (a / root * Math.Atan(a / root));
        Assert.Equal(1 - (4 * corner), field.SkyViewAt(0).ViewFactor, 0.02);
        Assert.Equal(1, field.SkyViewAt(2).ViewFactor, 0.002);   // the far bench top hides only a sliver near the horizon
    }
}
