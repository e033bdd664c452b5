using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Validation;
using NodaTime;
using Xunit.Abstractions;
using static CanopyAdvisor.Core.Tests.Plants.StemTestKit;

namespace CanopyAdvisor.Core.Tests.Plants;

/// <summary>Symmetries and common-practice behaviour the stem must show whatever its parameters.</summary>
public class StemInvariantTests(ITestOutputHelper output)
{
    private static readonly Duration QuarterHour = Duration.FromMinutes(15);
    private const double Elongation = 0.0005; // 12 mm/day, a plausible bedding-plant rate (common practice)

    private static StemParameters Crop(double nutationDeg = 0) =>
        new(2.0, 1.5, 0.02, 0.5, 0.03, Duration.FromHours(2), Angle.FromDegrees(nutationDeg), 1, Duration.FromHours(1));

    private static (double East, double North) MeanHorizontal(List<Vector3> offsets)
    {
        double e = 0, n = 0;
        foreach (Vector3 o in offsets)
        {
            Vector3 unit = o.Normalized();
            e += unit.X;
            n += unit.Y;
        }

        return (e / offsets.Count, n / offsets.Count);
    }

    // Symmetry of the model (no stimulus but gravity along the axis): an upright stem under isotropic light stays straight.
    [Fact]
    public void Upright_stem_without_a_light_vector_stays_straight_for_a_month()
    {
        Stem stem = Stem.Upright(Crop(), 0.05);
        for (int i = 0; i < 30 * 96; i++)
        {
            stem.Step(QuarterHour, Elongation, Vector3.Zero);
        }

        output.WriteLine($"lean {stem.Shape.LeanTilt.Degrees:E3}°, height {stem.Shape.HeightM:F4} m");
        Assert.True(stem.Shape.LeanTilt.Degrees < 0.01);
        Assert.Equal(0.05 + (30 * 24 * Elongation), stem.Shape.HeightM, 9);
    }

    // Circumnutation is a rotating disturbance: averaged over whole periods it leaves no lean (MODEL.md §4). A segment
    // of 3.75 mm matures every 7.5 h at 0.5 mm/h; periods of 2.5, 3.75 and 7.5 h divide that interval exactly, the case
    // where locking one nutation phase into each matured segment would build a false lean.
    [Theory]
    [InlineData(2.0)]
    [InlineData(2.5)]
    [InlineData(3.75)]
    [InlineData(7.5)]
    public void With_nutation_the_period_averaged_lean_stays_near_zero(double periodHours)
    {
        StemParameters p = Crop(nutationDeg: 10) with { NutationPeriod = Duration.FromMinutes(periodHours * 60) };
        Stem stem = Stem.Upright(p, 0.05);
        var lastPeriod = new List<Vector3>();
        double largest = 0;
        int samples = (int)(periodHours * 4);
        for (int i = 0; i < 30 * 96; i++)
        {
            stem.Step(QuarterHour, Elongation, Vector3.Zero);
            largest = Math.Max(largest, stem.Shape.LeanTilt.Degrees);
            if (i >= (30 * 96) - samples)
            {
                lastPeriod.Add(stem.ApexOffset); // the last whole period, evenly sampled
            }
        }

        (double e, double n) = MeanHorizontal(lastPeriod);
        double averaged = Math.Asin(Math.Sqrt((e * e) + (n * n))) * Angle.DegreesPerRadian;
        output.WriteLine($"largest instantaneous lean {largest:F3}°, apex tilt now {stem.Shape.ApexAngle.Degrees:F3}°, period-averaged lean {averaged:F4}°");
        Assert.True(averaged < 0.1);
        Assert.True(stem.Shape.ApexAngle.Degrees > 1, "nutation must actually move the apex");
    }

    // Rotational symmetry about the vertical: turning the light turns the lean by the same angle.
    [Theory]
    [InlineData(30, 100)]
    [InlineData(200, 315)]
    public void Rotating_the_light_about_the_vertical_rotates_the_lean_equally(double fromDeg, double toDeg)
    {
        Stem a = Stem.Upright(Crop(), 0.05), b = Stem.Upright(Crop(), 0.05);
        for (int i = 0; i < 5 * 96; i++)
        {
            a.Step(QuarterHour, Elongation, LightFrom(fromDeg, 60, 40));
            b.Step(QuarterHour, Elongation, LightFrom(toDeg, 60, 40));
        }

        output.WriteLine($"{a.Shape} / {b.Shape}");
        Assert.Equal(a.Shape.LeanTilt.Degrees, b.Shape.LeanTilt.Degrees, 6);
        Assert.Equal(a.Shape.CrookM, b.Shape.CrookM, 9);
        Assert.Equal(toDeg - fromDeg, b.Shape.LeanAzimuth.Degrees - a.Shape.LeanAzimuth.Degrees, 6);
    }

    // Bending is differential growth: without growth nothing bends (Bastien et al. 2013: dκ/dt ∝ ε̇).
    [Fact]
    public void No_growth_means_no_bending()
    {
        Stem stem = Stem.Leaning(Crop(nutationDeg: 10), 0.08, Angle.FromDegrees(30), Angle.FromDegrees(45));
        stem.Step(QuarterHour, Elongation, LightFrom(270, 80));
        StemShape before = stem.Shape;
        for (int i = 0; i < 500; i++)
        {
            stem.Step(QuarterHour, 0, LightFrom(270, 80, 200));
        }

        Assert.Equal(before, stem.Shape);
    }

    // Common practice: plants on a bench lean toward the brighter side.
    [Fact]
    public void Plants_lean_toward_the_brighter_side()
    {
        Stem stem = Stem.Upright(Crop(nutationDeg: 5), 0.05);
        Vector3 light = LightFrom(270, 70, 80) + LightFrom(90, 70, 30); // brighter from the west
        for (int i = 0; i < 7 * 96; i++)
        {
            stem.Step(QuarterHour, Elongation, light);
        }

        output.WriteLine(stem.Shape.ToString());
        Assert.True(stem.Shape.LeanTilt.Degrees > 1);
        Assert.InRange(stem.Shape.LeanAzimuth.Degrees, 260, 280);
    }

    // Common practice: turning pots 180° makes a lean grow back toward the vertical over the same time.
    [Fact]
    public void Turning_the_pot_half_round_brings_the_lean_back_down()
    {
        Stem stem = Stem.Upright(Crop(nutationDeg: 5), 0.05);
        Vector3 light = LightFrom(180, 70, 50);
        for (int i = 0; i < 7 * 96; i++)
        {
            stem.Step(QuarterHour, Elongation, light);
        }

        StemShape leaned = stem.Shape;
        stem.RotatePot(Angle.FromDegrees(180));
        StemShape turned = stem.Shape;
        for (int i = 0; i < 7 * 96; i++)
        {
            stem.Step(QuarterHour, Elongation, light);
        }

        StemShape after = stem.Shape;
        output.WriteLine($"week 1 {leaned}\nturned {turned}\nweek 2 {after}");
        Assert.Equal(leaned.LeanTilt.Degrees, turned.LeanTilt.Degrees, 9);
        Assert.Equal((leaned.LeanAzimuth.Degrees + 180) % 360, turned.LeanAzimuth.Degrees, 6); // turned half round
        Assert.True(after.LeanTilt.Degrees < 0.5 * leaned.LeanTilt.Degrees);
    }

    // Pot rotation is a rigid turn about the vertical: compass azimuth + φ (clockwise from above, MODEL.md §0).
    [Fact]
    public void Pot_rotation_turns_the_shape_rigidly_clockwise()
    {
        Stem stem = Stem.Upright(Crop(nutationDeg: 5), 0.05);
        for (int i = 0; i < 3 * 96; i++)
        {
            stem.Step(QuarterHour, Elongation, LightFrom(90, 60));
        }

        StemShape before = stem.Shape;
        Stem copy = stem.Clone();
        copy.RotatePot(Angle.FromDegrees(90));
        Assert.Equal(before.LeanTilt.Degrees, copy.Shape.LeanTilt.Degrees, 9);
        Assert.Equal(before.CrookM, copy.Shape.CrookM, 12);
        Assert.Equal(before.HeightM, copy.Shape.HeightM, 12);
        Assert.Equal((before.LeanAzimuth.Degrees + 90) % 360, copy.Shape.LeanAzimuth.Degrees, 6);
        Assert.Equal(before, stem.Shape); // the clone is independent
    }

    [Fact]
    public void Bad_input_lists_every_problem()
    {
        var p = new StemParameters(-1, 1, 0, 0, 0, Duration.Zero, Angle.FromDegrees(5), 0, Duration.FromHours(-1));
        InvalidInputException e = Assert.Throws<InvalidInputException>(() => Stem.Upright(p, 0.1, 0));
        string[] paths = e.Errors.Select(x => x.Path).ToArray();
        Assert.Contains("balanceNumber", paths);
        Assert.Contains("growthZoneLengthM", paths);
        Assert.Contains("nutationPeriod", paths);
        Assert.Contains("nutationSense", paths);
        Assert.Contains("gravitropicDelay", paths);
        Assert.Contains("growthZoneSegments", paths);

        Stem stem = Stem.Upright(Crop(), 0.05);
        Assert.Throws<InvalidInputException>(() => stem.Step(Duration.FromHours(-1), Elongation, Vector3.Zero));
        Assert.Throws<InvalidInputException>(() => stem.Step(QuarterHour, double.NaN, Vector3.Zero));
        Assert.Throws<InvalidInputException>(() => Stem.Upright(Crop(), 0.01)); // shorter than its growth zone
    }
}
