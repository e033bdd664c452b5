using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Light;

namespace CanopyAdvisor.Core.Tests.Light;

public class LampOrientationTests
{
    // LampAim contract: unaimed = straight down, C = 0° toward compass Yaw; tilt swings the axis up toward Yaw;
    // BeamDistribution contract: angle about the axis counter-clockwise looking against the beam (IES type C seen
    // from below), so for a downward lamp C = 90° is 90° clockwise from C = 0° seen from above.
    [Theory]
    [InlineData(0, 0, 0, 0, 0, -1, 0, 0)]        // unaimed, straight down: on axis
    [InlineData(0, 0, 0, 0, 1, -1, 45, 0)]       // down and north (Yaw 0): C = 0°
    [InlineData(0, 0, 0, 1, 0, -1, 45, 90)]      // down and east: C = 90°
    [InlineData(0, 0, 0, -1, 0, -1, 45, 270)]    // down and west: C = 270°
    [InlineData(90, 90, 0, 1, 0, 0, 0, 0)]       // tilted 90° toward east: the axis points east
    [InlineData(90, 90, 0, 1, 0, 1, 45, 0)]      // ... and C = 0° has swung up
    [InlineData(90, 90, 0, 1, -1, 0, 45, 90)]    // ... and C = 90° points south (Yaw + 90°)
    [InlineData(0, 0, 90, 1, 0, -1, 45, 0)]      // spin 90°: C = 0° now points east
    public void World_direction_maps_to_polar_and_around(
        double yawDeg, double tiltDeg, double spinDeg, double dx, double dy, double dz, double polarDeg, double aroundDeg)
    {
        var frame = new LampOrientation(new LampAim(Angle.FromDegrees(yawDeg), Angle.FromDegrees(tiltDeg), Angle.FromDegrees(spinDeg)));
        var recorder = new RecordingTestDistribution();
        frame.IntensityPerUnitFlux(recorder, new Vector3(dx, dy, dz).Normalized());
        Assert.Equal(polarDeg, recorder.LastPolar * 180 / Math.PI, 6);
        if (polarDeg > 0)
        {
            // On the axis the angle about it is undefined.
            Assert.Equal(aroundDeg, recorder.LastAround * 180 / Math.PI, 6);
        }
    }
}
