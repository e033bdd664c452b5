using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Plants;
using NodaTime;
using Xunit.Abstractions;
using static CanopyAdvisor.Core.Tests.Plants.StemTestKit;

namespace CanopyAdvisor.Core.Tests.Plants;

/// <summary>Circumnutation: period, sense and amplitude as the parameters define them (MODEL.md §4; StemParameters).</summary>
public class StemNutationTests(ITestOutputHelper output)
{
    // With nothing else acting (B = 0, no light) the drive's scaling makes the growth zone a uniform arc of curvature
    // α/L_gz rotating with period P, so the apex tangent tilts by α (an arc turns its tangent by κL) and its azimuth turns
    // once per period: counter-clockwise from above (compass azimuth decreasing) for sense +1. Bending in place the
    // tilt is α exactly; while growing the maturing basal segment fades out of the nutation (see Stem's remarks).
    [Theory]
    [InlineData(1, 8.0, 2.0, false)]
    [InlineData(-1, 8.0, 2.0, false)]
    [InlineData(1, 15.0, 3.5, true)]
    [InlineData(-1, 5.0, 1.5, true)]
    public void Apex_circles_with_the_given_period_sense_and_amplitude(int sense, double amplitudeDeg, double periodHours, bool growing)
    {
        StemParameters p = Parameters(0, 1.5, growthZoneM: 0.03, nutationDeg: amplitudeDeg, nutationHours: periodHours, sense: sense);
        Stem stem = Stem.Upright(p, 0.06);
        Duration dt = Duration.FromMinutes(5);
        double unwrapped = 0, previous = double.NaN, minTilt = double.MaxValue, maxTilt = 0;
        int steps = (int)(10 * periodHours * 12);
        for (int i = 0; i < steps; i++)
        {
            if (growing)
            {
                stem.Step(dt, 0.0005, Vector3.Zero);
            }
            else
            {
                stem.BendInPlace(dt, 0.0005, Vector3.Zero);
            }

            double azimuth = Direction.Azimuth(stem.ApexTangent).Degrees;
            if (!double.IsNaN(previous))
            {
                double step = azimuth - previous;
                unwrapped += step - (360 * Math.Round(step / 360));
            }

            previous = azimuth;
            minTilt = Math.Min(minTilt, stem.Shape.ApexAngle.Degrees);
            maxTilt = Math.Max(maxTilt, stem.Shape.ApexAngle.Degrees);
        }

        double turns = unwrapped / 360;
        double measuredPeriod = (steps - 1) * dt.TotalHours / Math.Abs(turns);
        output.WriteLine($"sense {sense}: {turns:F3} turns (compass), period {measuredPeriod:F4} h vs {periodHours}, apex tilt {minTilt:F3}–{maxTilt:F3}° vs {amplitudeDeg}°");
        Assert.Equal(-sense, Math.Sign(turns));
        Assert.InRange(measuredPeriod / periodHours, 0.99, 1.01);
        // Growing, the maturing basal segment (1/8 of the zone) fades out of the nutation: α(1 − 1/8) to α, ±1 %.
        double low = growing ? 0.875 - 0.01 : 0.999, high = growing ? 1.01 : 1.001;
        Assert.InRange(minTilt / amplitudeDeg, low, high);
        Assert.InRange(maxTilt / amplitudeDeg, low, high);
    }
}
