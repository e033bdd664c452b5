using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Structures;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Light;

public class CompiledLightFieldStepTests
{
    private static readonly Instant Time = Instant.FromUtc(2026, 6, 21, 12, 0);

    private static PointLight[] Evaluate(CompiledLightField field, OutsideLight outside)
    {
        var into = new PointLight[field.Points.Length];
        field.Step(outside, LocalTime.Noon, into);
        return into;
    }

    private static OutsideLight Sun(double azimuthDeg, double zenithDeg, double dni, double dhi)
    {
        Vector3 sun = Direction.FromAzimuthZenith(Angle.FromDegrees(azimuthDeg), Angle.FromDegrees(zenithDeg));
        return new OutsideLight(Time, sun, dni, dhi, dhi + (dni * Math.Max(0, sun.Z)));
    }

    // Global horizontal = diffuse horizontal + direct normal × cos z (the closure relation of the sky models, MODEL.md
    // §1), so an unobstructed point with no canopy must read exactly the outside GHI; its light vector is
    // DHI·ẑ + DNI·ŝ (MODEL.md §3), whose horizontal part points at the sun's azimuth.
    [Theory]
    [InlineData(180, 30, 1500, 200)]
    [InlineData(135, 60, 900, 300)]
    [InlineData(250, 80, 400, 150)]
    [InlineData(0, 0, 1800, 100)]
    public void Open_sky_gives_global_horizontal_and_points_at_the_sun(double azimuthDeg, double zenithDeg, double dni, double dhi)
    {
        Bench bench = TestSites.Bench("b", 0, 0, 2, 1, 2, 2);
        CompiledLightField field = LightFieldCompiler.Compile(TestSites.Make(TestSites.Glasshouse, [bench], []), OpenSkyTestEnclosure.Instance);
        OutsideLight outside = Sun(azimuthDeg, zenithDeg, dni, dhi);

        foreach (PointLight light in Evaluate(field, outside))
        {
            Assert.Equal(dhi + (dni * Math.Cos(zenithDeg * Math.PI / 180)), light.HorizontalPpfd, 9);
            Vector3 expected = (Vector3.UnitZ * dhi) + (outside.SunDirection * dni);
            Assert.Equal(expected.X, light.LightVector.X, 9);
            Assert.Equal(expected.Y, light.LightVector.Y, 9);
            Assert.Equal(expected.Z, light.LightVector.Z, 9);
            if (zenithDeg > 0)
            {
                Assert.Equal(azimuthDeg, Direction.Azimuth(light.LightVector).Degrees, 9);
            }

            // Daylight alone has the sunlight R:FR (ModelConstants.SunlightRedToFarRed, common practice 1.14).
            Assert.Equal(ModelConstants.SunlightRedToFarRed, light.RedToFarRed, 9);
        }
    }

    // Isotropic light has no net vector sideways (MODEL.md §3: "isotropic light has none"): under a uniform glass
    // ceiling of transmittance 0.8 an overcast sky gives 0.8·DHI on the horizontal and a vertical vector.
    [Fact]
    public void Isotropic_sky_gives_a_vertical_light_vector_and_no_lateral_blue()
    {
        Bench bench = TestSites.Bench("b", 0, 0, 3, 1, 3, 2);
        CompiledLightField field = LightFieldCompiler.Compile(TestSites.Make(TestSites.Glasshouse, [bench], []), new GlassCeilingTestEnclosure(0.8));
        OutsideLight overcast = Sun(150, 70, 0, 400);

        foreach (PointLight light in Evaluate(field, overcast))
        {
            Assert.Equal(320, light.HorizontalPpfd, 9);
            Assert.Equal(0, light.LightVector.X, 9);
            Assert.Equal(0, light.LightVector.Y, 9);
            Assert.Equal(320, light.LightVector.Z, 9);
            Assert.Equal(0, light.BlueVector.X, 9);
            Assert.Equal(0, light.BlueVector.Y, 9);
            Assert.Equal(ModelConstants.DaylightBlueFraction * 320, light.BlueVector.Z, 9);
        }
    }

    // Beam through the canopy top (Monsi & Saeki 1953; G = 0.5): sun at 30° elevation over the middle of a wide
    // bench, sensing depth 0.1 m, LAD 3: path 0.1/sin 30° = 0.2 m, so the beam's horizontal PPFD is
    // DNI·sin 30°·exp(−0.5·3·0.2) = 1000·0.5·0.740818 = 370.409 (hand-computed).
    [Fact]
    public void Sun_beam_is_attenuated_through_the_canopy_top()
    {
        Bench bench = TestSites.Bench("b", 0, 0, 10, 10, 1, 1, canopyM: 0.3, depthM: 0.1, lad: 3);
        CompiledLightField field = LightFieldCompiler.Compile(TestSites.Make(TestSites.Glasshouse, [bench], []), OpenSkyTestEnclosure.Instance);
        PointLight light = Evaluate(field, Sun(180, 60, 1000, 0))[0];
        Assert.Equal(370.409, light.HorizontalPpfd, 3);
    }

    // Mirror symmetry: reflecting the whole scene in the plane x = 0 (benches, lamps with their aim, the structure and
    // the sun) must reflect every light vector (x → −x) and leave the scalars unchanged — a property of the
    // geometry itself, independent of any value in the model.
    [Theory]
    [InlineData(120, 50)]
    [InlineData(200, 75)]
    public void Mirrored_site_gives_mirrored_light_vectors(double sunAzimuthDeg, double sunZenithDeg)
    {
        static Site Scene(double s)
        {
            // s = +1: as drawn; s = −1: mirrored east–west. Bench east edge x = 3 mirrors to west edge x = −3.
            Bench bench = TestSites.Bench("b", s > 0 ? 1 : -3, 0, 4, 2, 4, 3, canopyM: 0.3, depthM: 0.1, lad: 3);
            Lamp top = TestSites.Lamp("top", new Vector3(2 * s, 1, 2.5), LambertianTestDistribution.Instance, 800);
            Lamp side = TestSites.Lamp(
                "side", new Vector3(0.5 * s, 2, 1.2), LambertianTestDistribution.Instance, 600,
                aim: new LampAim(Angle.FromDegrees(s > 0 ? 100 : 260), Angle.FromDegrees(60), Angle.Zero),
                bands: new BandFractions(0.5, 0.1, 0.4, 0.1));
            Lamp far = TestSites.Lamp("far", new Vector3(3.5 * s, 3, 0.9), IsotropicTestDistribution.Instance, 300);
            return TestSites.Make(TestSites.Glasshouse, [bench], [top, side, far]);
        }

        CompiledLightField a = LightFieldCompiler.Compile(Scene(1), new OneSidedWallTestEnclosure(1));
        CompiledLightField b = LightFieldCompiler.Compile(Scene(-1), new OneSidedWallTestEnclosure(-1));
        PointLight[] la = Evaluate(a, Sun(sunAzimuthDeg, sunZenithDeg, 1200, 250));
        PointLight[] lb = Evaluate(b, Sun(360 - sunAzimuthDeg, sunZenithDeg, 1200, 250));

        for (int i = 0; i < la.Length; i++)
        {
            Vector3 p = a.Points[i].Position;
            int j = b.Points.ToList().FindIndex(q => Math.Abs(q.Position.X + p.X) < 1e-9 && Math.Abs(q.Position.Y - p.Y) < 1e-9);
            Assert.True(j >= 0);
            Assert.Equal(la[i].HorizontalPpfd, lb[j].HorizontalPpfd, 9);
            Assert.Equal(la[i].LightVector.X, -lb[j].LightVector.X, 9);
            Assert.Equal(la[i].LightVector.Y, lb[j].LightVector.Y, 9);
            Assert.Equal(la[i].LightVector.Z, lb[j].LightVector.Z, 9);
            Assert.Equal(la[i].BlueVector.X, -lb[j].BlueVector.X, 9);
            Assert.Equal(la[i].BlueVector.Y, lb[j].BlueVector.Y, 9);
            Assert.Equal(la[i].Red660, lb[j].Red660, 9);
            Assert.Equal(la[i].FarRed730, lb[j].FarRed730, 9);
        }

        // The scene is not symmetric in itself, so the check is not empty: the lateral component is substantial.
        Assert.Contains(la, l => Math.Abs(l.LightVector.X) > 10);
    }

    // R:FR of mixed sources: window fluxes are summed before the ratio (CompiledLightField doc). Daylight alone has
    // R:FR 1.14; a lamp with red 0.4 and far-red 0.05 alone has 0.4/(2·0.05) = 4; together the 660 and 730 fluxes add.
    [Fact]
    public void Mixed_sources_sum_window_fluxes_before_the_ratio()
    {
        Bench bench = TestSites.Bench("b", 0, 0, 1, 1, 1, 1);
        Lamp lamp = TestSites.Lamp("l", new Vector3(0.5, 0.5, 2.0), LambertianTestDistribution.Instance, 1000 * Math.PI);
        CompiledLightField field = LightFieldCompiler.Compile(TestSites.Make(TestSites.Glasshouse, [bench], [lamp]), OpenSkyTestEnclosure.Instance);
        PointLight light = Evaluate(field, Sun(180, 90, 0, 500))[0];

        // Sky: scalar flux s·DHI = 2·500 = 1000; lamp: E = 1000 on axis (Φ/π at 1 m).
        double red = (1000 * ModelConstants.DaylightRedFraction / 10) + (1000 * 0.4 / 10);
        double farRed = (1000 * ModelConstants.DaylightRedFraction / 10 / ModelConstants.SunlightRedToFarRed) + (1000 * 0.05 / 5);
        Assert.Equal(red, light.Red660, 9);
        Assert.Equal(farRed, light.FarRed730, 9);
        Assert.Equal(red / farRed, light.RedToFarRed, 9);
    }

    // Step over a sub-range writes exactly the same values as the whole step (the simulation splits points across threads).
    [Fact]
    public void Stepping_a_range_matches_stepping_all_points()
    {
        Bench bench = TestSites.Bench("b", 0, 0, 3, 2, 5, 4, canopyM: 0.3, depthM: 0.1, lad: 2);
        Lamp lamp = TestSites.Lamp("l", new Vector3(1, 1, 2.5), LambertianTestDistribution.Instance, 900);
        CompiledLightField field = LightFieldCompiler.Compile(TestSites.Make(TestSites.Glasshouse, [bench], [lamp]), new OneSidedWallTestEnclosure(1));
        OutsideLight outside = Sun(100, 50, 800, 200);
        PointLight[] all = Evaluate(field, outside);
        var part = new PointLight[7];
        field.Step(outside, LocalTime.Noon, 5, part);
        Assert.Equal(all.AsSpan(5, 7).ToArray(), part);
    }

    [Fact]
    public void Unusable_outside_light_is_recognised()
    {
        Assert.True(CompiledLightField.IsUsable(Sun(100, 50, 800, 200)));
        Assert.False(CompiledLightField.IsUsable(new OutsideLight(Time, Vector3.UnitZ, double.NaN, 1, 1)));
        Assert.False(CompiledLightField.IsUsable(new OutsideLight(Time, new Vector3(double.NaN, 0, 1), 1, 1, 1)));
    }
}
