using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;

namespace CanopyAdvisor.Core.Tests.Lamps;

// Expected vectors follow from the LampAim contract (MODEL.md §0 ENU frame, azimuth clockwise from north) by hand.
public class LampFrameTests
{
    private static void Near(Vector3 expected, Vector3 actual) =>
        Assert.True((expected - actual).Length < 1e-12, $"expected {expected}, got {actual}");

    [Fact]
    public void Unaimed_lamp_points_down_with_reference_toward_yaw()
    {
        var f = new LampFrame(new LampAim(Angle.FromDegrees(90), Angle.Zero, Angle.Zero));
        Near(-Vector3.UnitZ, f.Axis);
        Near(Vector3.UnitX, f.Reference);

        // C = 90° is Reference × Axis: for a downward lamp with C0 east that is north (counter-clockwise seen from above,
        // the usual reading of LM-63 type C horizontal angles; from memory).
        Near(Vector3.UnitY, f.Lateral);
    }

    [Fact]
    public void Tilt_of_90_at_yaw_90_points_east()
    {
        var f = new LampFrame(new LampAim(Angle.FromDegrees(90), Angle.FromDegrees(90), Angle.Zero));
        Near(Vector3.UnitX, f.Axis);
        Near(Vector3.UnitZ, f.Reference);
    }

    [Fact]
    public void Tilt_of_45_toward_north()
    {
        var f = new LampFrame(new LampAim(Angle.Zero, Angle.FromDegrees(45), Angle.Zero));
        double h = Math.Sqrt(0.5);
        Near(new Vector3(0, h, -h), f.Axis);
    }

    [Fact]
    public void Spin_turns_the_reference_toward_c90()
    {
        var unspun = new LampFrame(LampAim.Down);
        var spun = new LampFrame(new LampAim(Angle.Zero, Angle.Zero, Angle.FromDegrees(90)));
        Near(unspun.Lateral, spun.Reference);
        Near(unspun.Axis, spun.Axis);

        // What the unspun lamp sent toward around angle 30° the spun lamp sends toward 120°.
        var dirUnspun = unspun.ToWorld(new LampAngles(Angle.FromDegrees(50), Angle.FromDegrees(120)));
        var anglesSpun = spun.ToLampAngles(dirUnspun);
        Assert.Equal(30, anglesSpun.Around.Degrees, 9);
        Assert.Equal(50, anglesSpun.Polar.Degrees, 9);
    }

    [Theory]
    [InlineData(0, 0, 0)]
    [InlineData(33, 71, 12)]
    [InlineData(250, 135, -40)]
    [InlineData(180, 180, 90)]
    public void World_and_lamp_angles_round_trip(double yaw, double tilt, double spin)
    {
        var f = new LampFrame(new LampAim(Angle.FromDegrees(yaw), Angle.FromDegrees(tilt), Angle.FromDegrees(spin)));
        Assert.Equal(0, Vector3.Dot(f.Axis, f.Reference), 12);
        Assert.Equal(0, Vector3.Dot(f.Axis, f.Lateral), 12);
        var random = new Random(3);
        for (int i = 0; i < 200; i++)
        {
            var a = new LampAngles(Angle.FromDegrees(1 + (random.NextDouble() * 178)), Angle.FromDegrees(random.NextDouble() * 359.9));
            var back = f.ToLampAngles(f.ToWorld(a) * 3.7);
            Assert.Equal(a.Polar.Degrees, back.Polar.Degrees, 9);
            Assert.Equal(a.Around.Degrees, back.Around.Degrees, 9);
        }
    }

    [Fact]
    public void Intensity_follows_the_aimed_axis()
    {
        var f = new LampFrame(new LampAim(Angle.FromDegrees(90), Angle.FromDegrees(90), Angle.Zero));
        var d = LambertianDistribution.Instance;
        Assert.Equal(1 / Math.PI, f.IntensityPerUnitFlux(d, new Vector3(5, 0, 0)), 12);
        Assert.Equal(0, f.IntensityPerUnitFlux(d, new Vector3(-1, 0, 0)));
        Assert.Equal(0, f.IntensityPerUnitFlux(d, new Vector3(0, 0, -1)), 12);
    }
}
