using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Validation;
using NodaTime;
using Xunit.Abstractions;
using static CanopyAdvisor.Core.Tests.Plants.StemTestKit;

namespace CanopyAdvisor.Core.Tests.Plants;

/// <summary>The period-averaged lean rate (<see cref="LeanRate"/>).</summary>
public class StemLeanRateTests(ITestOutputHelper output)
{
    private static readonly Instant Start = Instant.FromUtc(2026, 3, 1, 0, 0);

    // Worked example built from its definition: a lean growing at a known rate toward 120° plus a rotating disturbance
    // (circular nutation of the lean vector, radius 0.05 = about 2.9°) of period P. Averaging over whole periods removes
    // the disturbance exactly (trapezoid rule on a periodic function sampled evenly), so the known rate comes back.
    [Theory]
    [InlineData(2.0, 3.0, 1.0)]
    [InlineData(-0.5, 1.5, 6.0)]
    [InlineData(0.2, 2.4, 3.0)]
    public void Recovers_a_known_rate_through_a_rotating_disturbance(double rateDegPerDay, double periodHours, double startDeg)
    {
        var times = new List<Instant>();
        var offsets = new List<Vector3>();
        Vector3 toward = Direction.FromAzimuthZenith(Angle.FromDegrees(120), Angle.RightAngle);
        Vector3 across = Direction.FromAzimuthZenith(Angle.FromDegrees(210), Angle.RightAngle);
        double omega = 2 * Math.PI / periodHours;
        for (int i = 0; i <= 3 * 24 * 10; i++) // 3 days at 6-minute samples
        {
            double hours = i / 10.0;
            double tilt = (startDeg + (rateDegPerDay * hours / 24)) * Angle.RadiansPerDegree;
            Vector3 horizontal = (toward * Math.Sin(tilt)) + (0.05 * ((toward * Math.Cos(omega * hours)) + (across * Math.Sin(omega * hours))));
            double z = Math.Sqrt(1 - horizontal.LengthSquared);
            times.Add(Start + Duration.FromMinutes(i * 6));
            offsets.Add((horizontal + (Vector3.UnitZ * z)) * 0.2);
        }

        double rate = LeanRate.DegreesPerDay(times, offsets, Duration.FromMinutes(periodHours * 60));
        output.WriteLine($"rate {rate:F5} °/day, expected {rateDegPerDay}");
        Assert.Equal(rateDegPerDay, rate, 2);
    }

    // Cross-check on the simulator: nutation must not change the period-averaged lean rate much (MODEL.md §4).
    [Fact]
    public void Simulated_lean_rate_with_nutation_matches_the_rate_without()
    {
        double Rate(double nutationDeg)
        {
            var p = new StemParameters(2.0, 1.5, 0.02, 0.5, 0.03, Duration.FromHours(2), Angle.FromDegrees(nutationDeg), 1, Duration.FromHours(1));
            Stem stem = Stem.Upright(p, 0.08);
            var times = new List<Instant>();
            var offsets = new List<Vector3>();
            for (int i = 1; i <= 4 * 96; i++)
            {
                stem.Step(Duration.FromMinutes(15), 0.0005, LightFrom(90, 70, 40));
                times.Add(Start + Duration.FromMinutes(15 * i));
                offsets.Add(stem.ApexOffset);
            }

            return LeanRate.DegreesPerDay(times, offsets, p.NutationPeriod);
        }

        double with = Rate(8), without = Rate(0);
        output.WriteLine($"with nutation {with:F4} °/day, without {without:F4} °/day");
        Assert.True(without > 0.1);
        Assert.InRange(with, without - 0.1, without + 0.1);
    }

    [Fact]
    public void Bad_series_lists_the_problems()
    {
        Instant[] times = [Start, Start];
        Vector3[] offsets = [Vector3.UnitZ];
        InvalidInputException e = Assert.Throws<InvalidInputException>(() => LeanRate.DegreesPerDay(times, offsets, Duration.Zero));
        Assert.Contains(e.Errors, x => x.Path == "apexOffsets");
        Assert.Contains(e.Errors, x => x.Path == "times[1]");
        Assert.Contains(e.Errors, x => x.Path == "nutationPeriod");
    }
}
