using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Core.Tests.Lamps;

// Check values: MODEL.md §3 (lamp law E = I cos i / d²): downward Lambertian lamp, Φ = 1000 µmol s⁻¹ at h = 1 m:
// E = (Φ/π) h²/(h² + r²)² → 318.31 on axis, 79.58 at r = 1 m; isotropic Φ/(4πh²) = 79.58 (computed from the formulas).
public class PointSourceIrradianceTests
{
    private static readonly Vector3 Lamp = new(2, 3, 1);

    [Theory]
    [InlineData("lambertian", 0, 318.31)]
    [InlineData("lambertian", 1, 79.58)]
    [InlineData("isotropic", 0, 79.58)]
    public void Horizontal_irradiance_below_a_downward_lamp(string kind, double offsetM, double expected)
    {
        BeamDistribution d = kind == "lambertian" ? LambertianDistribution.Instance : IsotropicDistribution.Instance;
        var point = new Vector3(2 + offsetM, 3, 0);
        double e = PointSourceIrradiance.OnSurface(Lamp, LampFrame.Down, d, 1000, point, Vector3.UnitZ);
        Assert.Equal(expected, e, 2);
    }

    // Same law written out in full, E = (Φ/π) h²/(h² + r²)², at a range of offsets (exact formula, MODEL.md §3).
    [Theory]
    [InlineData(0.5)]
    [InlineData(2)]
    [InlineData(3.3)]
    public void Lambertian_matches_the_closed_form(double r)
    {
        const double h = 1.7;
        var point = new Vector3(2, 3 + r, 1 - h);
        double e = PointSourceIrradiance.OnSurface(Lamp, LampFrame.Down, LambertianDistribution.Instance, 1000, point, Vector3.UnitZ);
        double expected = 1000 / Math.PI * h * h / Math.Pow((h * h) + (r * r), 2);
        Assert.Equal(expected, e, 10);
    }

    [Fact]
    public void Normal_irradiance_is_intensity_over_distance_squared()
    {
        var point = new Vector3(3, 3, 0);
        double e = PointSourceIrradiance.Normal(Lamp, LampFrame.Down, IsotropicDistribution.Instance, 1000, point);
        Assert.Equal(1000 / (4 * Math.PI) / 2, e, 10);

        // Flux vector: normal irradiance along the unit vector back toward the lamp; its z part is the horizontal irradiance.
        var v = PointSourceIrradiance.FluxVector(Lamp, LampFrame.Down, IsotropicDistribution.Instance, 1000, point);
        Assert.Equal(e, v.Length, 10);
        Assert.Equal(PointSourceIrradiance.OnSurface(Lamp, LampFrame.Down, IsotropicDistribution.Instance, 1000, point, Vector3.UnitZ), v.Z, 10);
    }

    [Fact]
    public void Surface_facing_away_gets_nothing()
    {
        double e = PointSourceIrradiance.OnSurface(Lamp, LampFrame.Down, IsotropicDistribution.Instance, 1000, new Vector3(2, 3, 0), -Vector3.UnitZ);
        Assert.Equal(0, e);
    }

    [Fact]
    public void Point_at_the_lamp_is_rejected()
    {
        Assert.Throws<InvalidInputException>(() =>
            PointSourceIrradiance.Normal(Lamp, LampFrame.Down, IsotropicDistribution.Instance, 1000, Lamp));
    }

    // Aimed lamp, worked by hand from E = I cos i / d²: Lambertian lamp at (0, 0, 1) tilted 45° toward east (yaw 90°)
    // points straight at (1, 0, 0), so I = Φ/π, d² = 2 and cos i = 1/√2 on the horizontal: E = 1000/(2√2 π) = 112.54.
    // Straight below it the direction is 45° off axis: I = Φ cos 45°/π, d = 1, cos i = 1: E = 225.08.
    [Theory]
    [InlineData(1, 112.54)]
    [InlineData(0, 225.08)]
    public void Tilted_lamp_follows_the_lamp_law(double x, double expected)
    {
        var frame = new LampFrame(new LampAim(Angle.FromDegrees(90), Angle.FromDegrees(45), Angle.Zero));
        double e = PointSourceIrradiance.OnSurface(new Vector3(0, 0, 1), frame, LambertianDistribution.Instance, 1000, new Vector3(x, 0, 0), Vector3.UnitZ);
        Assert.Equal(expected, e, 2);
    }
}
