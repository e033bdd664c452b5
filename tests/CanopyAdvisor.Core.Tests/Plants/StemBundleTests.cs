using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Validation;
using NodaTime;
using Xunit.Abstractions;

namespace CanopyAdvisor.Core.Tests.Plants;

/// <summary>
/// StemBundle against single stems stepped one by one under the same light, growth, steps and rotations.
/// reference: Stem (the AC model, Bastien et al. 2013/2015, as implemented and checked in StemTests)
/// </summary>
/// <remarks>
/// The bundle is the same model arranged for speed (the same floating-point operations in the same order, per stem
/// on vector lanes), so it should reproduce Stem to rounding; the brief allows 1e-12 relative in apex offset and
/// tangent after thousands of steps, and the observed difference is printed (0 means bit for bit).
/// </remarks>
public class StemBundleTests(ITestOutputHelper output)
{
    private const double Tolerance = 1e-12;

    /// <summary>
    /// The cases: stem count (padding to the vector width: 1, 3, 5 do not fill it), growth-zone segments, nutation
    /// amplitude (deg), gravitropic delay (h), photo coefficient a and exponent b of M(I) = a·I^b, start lean (deg),
    /// rotation angles applied (deg), elongation (mm/h, mean), steps.
    /// </summary>
    public static IEnumerable<object[]> Cases =>
    [
        // label, count, segments, nutationDeg, delayH, photoA, photoB, leanDeg, rotationDeg, elongationMmPerH, steps
        new object[] { "reference: Stem; plain gravitropism and light, 16 stems, 4 segments", 16, 4, 0.0, 0.0, 0.2, 0.0, 0.0, 0.0, 1.0, 2000 },
        new object[] { "reference: Stem; full model (nutation, delay, M = a·I^b), 16 × 4", 16, 4, 8.0, 1.0, 0.05, 0.5, 0.0, 180.0, 1.0, 2400 },
        new object[] { "reference: Stem; one stem (3 padding lanes), 8 segments, nutation", 1, 8, 10.0, 0.0, 0.1, 0.3, 0.0, 90.0, 1.5, 2000 },
        new object[] { "reference: Stem; three stems, delay only, leaning start 40°", 3, 4, 0.0, 2.0, 0.1, 0.0, 40.0, 90.0, 1.0, 2000 },
        new object[] { "reference: Stem; four stems, one segment (freezes every 30 mm)", 4, 1, 8.0, 0.5, 0.05, 0.5, 0.0, 180.0, 4.0, 2200 },
        new object[] { "reference: Stem; five stems, 8 segments, many freezes, rotations 90°", 5, 8, 6.0, 1.0, 0.02, 0.5, 10.0, 90.0, 5.0, 3000 },
        new object[] { "reference: Stem; sixteen stems, laid over at 90°, clockwise nutation", 16, 4, 5.0, 1.5, 0.05, -0.2, 90.0, 180.0, 2.0, 2000 },
        new object[] { "reference: Stem; strong light bends a one-segment zone past the series range", 5, 1, 0.0, 0.0, 40.0, 0.0, 60.0, 90.0, 3.0, 2000 },
        new object[] { "reference: Stem; no light response (a = 0), rotations by 37°", 4, 4, 8.0, 1.0, 0.0, 0.0, 20.0, 37.0, 1.0, 2000 },
    ];

    [Theory]
    [MemberData(nameof(Cases))]
    public void Every_stem_matches_its_single_stem_twin(
        string label, int count, int segments, double nutationDeg, double delayH, double photoA, double photoB, double leanDeg,
        double rotationDeg, double elongationMmPerH, int steps)
    {
        StemParameters parameters = new(
            2.0, 1.5, photoA, photoB, 0.03, Duration.FromHours(2), Angle.FromDegrees(nutationDeg), leanDeg == 90 ? -1 : 1,
            Duration.FromMinutes(delayH * 60));
        foreach (bool vectorised in new[] { true, false })
        {
            (double offset, double tangent, double lean, double travel) = Run(
                parameters, count, segments, leanDeg, rotationDeg, elongationMmPerH / 1000, steps, vectorised);
            output.WriteLine(
                $"{label} [{(vectorised ? $"vector of {System.Numerics.Vector<double>.Count}" : "one by one")}]: max relative difference apex offset {offset:E2}, tangent {tangent:E2}; " +
                $"max difference of the horizontal lean vector {lean:E2}; " +
                $"apex tangent turned up to {travel:F1}°");
            Assert.InRange(offset, 0, Tolerance);
            Assert.InRange(tangent, 0, Tolerance);
            Assert.InRange(lean, 0, Tolerance);
        }
    }

    [Fact]
    public void Stepping_with_the_wrong_number_of_light_vectors_is_rejected_with_its_path()
    {
        // Contract: the same input rules as Stem.Step, plus one vector per stem.
        StemBundle bundle = StemBundle.Upright(Parameters(), 0.1, 3, 4);
        InvalidInputException e = Assert.Throws<InvalidInputException>(
            () => bundle.Step(Duration.FromMinutes(10), 0.001, new Vector3[2]));
        Assert.Contains(e.Errors, x => x.Path == "blueFluxVectors");
    }

    [Fact]
    public void Non_finite_light_and_negative_rates_are_rejected_and_leave_the_stems_unchanged()
    {
        // Contract: the same input rules as Stem.Step ("never half-compute").
        StemBundle bundle = StemBundle.Upright(Parameters(), 0.1, 3, 4);
        Vector3 before = bundle.ApexOffset(1);
        Vector3[] blue = [new(1, 0, 0), new(double.NaN, 0, 0), new(0, 1, 0)];
        InvalidInputException e = Assert.Throws<InvalidInputException>(() => bundle.Step(Duration.FromMinutes(10), -1, blue));
        Assert.Contains(e.Errors, x => x.Path == "blueFluxVectors[1]");
        Assert.Contains(e.Errors, x => x.Path == "elongationMetresPerHour");
        Assert.Equal(before, bundle.ApexOffset(1));
        Assert.Equal(Duration.Zero, bundle.Elapsed);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(5000)]
    public void Stem_counts_out_of_range_are_rejected(int count)
    {
        // Contract: 1 to 4,096 stems per bundle.
        InvalidInputException e = Assert.Throws<InvalidInputException>(() => StemBundle.Upright(Parameters(), 0.1, count, 4));
        Assert.Contains(e.Errors, x => x.Path == "count");
    }

    [Fact]
    public void Every_problem_with_the_start_is_listed_at_once()
    {
        // Contract: "report every problem" (the validation rules of Stem.Leaning, plus the stem count).
        InvalidInputException e = Assert.Throws<InvalidInputException>(
            () => StemBundle.Leaning(Parameters(), 0.01, Angle.FromDegrees(200), Angle.Zero, 0, 0));
        Assert.Equal(["heightM", "growthZoneSegments", "lean", "count"], e.Errors.Select(x => x.Path));
    }

    private static StemParameters Parameters() =>
        new(2.0, 1.5, 0.05, 0.5, 0.03, Duration.FromHours(2), Angle.FromDegrees(8), 1, Duration.FromHours(1));

    /// <summary>
    /// Steps a bundle and its single-stem twins through a varied schedule and returns the largest relative differences
    /// of apex offset and apex tangent over all steps and stems, the largest difference of the horizontal lean vector
    /// (east, north of the unit apex offset; absolute, as it is near zero for upright stems), and how far any apex tangent
    /// turned from vertical.
    /// </summary>
    private static (double Offset, double Tangent, double Lean, double TravelDeg) Run(
        StemParameters parameters, int count, int segments, double leanDeg, double rotationDeg, double elongationMPerH,
        int steps, bool vectorised)
    {
        Angle lean = Angle.FromDegrees(leanDeg), azimuth = Angle.FromDegrees(120);
        StemBundle bundle = StemBundle.Create(parameters, 0.08, lean, azimuth, count, segments, vectorised);
        var stems = new Stem[count];
        for (int i = 0; i < count; i++)
        {
            stems[i] = Stem.Leaning(parameters, 0.08, lean, azimuth, segments);
        }

        var blue = new Vector3[count];
        double offset = Compare(bundle, stems, (b, i) => b.ApexOffset(i), s => s.ApexOffset);
        double tangent = Compare(bundle, stems, (b, i) => b.ApexTangent(i), s => s.ApexTangent);
        double travel = 0, leanDifference = 0;
        var east = new double[count];
        var north = new double[count];
        for (int k = 0; k < steps; k++)
        {
            // Steps of 10 min, every 50th of 30 min, every 97th of 60 min (several freezes in one step at high
            // rates), every 211th of zero length.
            Duration dt = k % 211 == 5 ? Duration.Zero
                : k % 97 == 3 ? Duration.FromMinutes(60)
                : k % 50 == 7 ? Duration.FromMinutes(30)
                : Duration.FromMinutes(10);
            // Growth with a daily swing, no growth every 13th step and through one 3-hour stretch.
            double elongation = k % 13 == 0 || (k >= 400 && k < 418) ? 0
                : elongationMPerH * (1 + (0.5 * Math.Sin(k / 23.0)));
            if (k % 97 == 3)
            {
                elongation *= 4;
            }

            for (int i = 0; i < count; i++)
            {
                // Light from a slowly turning direction, different per stem; all dark every 7th step, stem 0 dark
                // through a stretch, and light from below the horizon for the last stem now and then.
                bool dark = k % 7 == 0 || (i == 0 && k >= 600 && k < 700);
                double azimuthDeg = (40 * i) + (0.7 * k);
                double zenithDeg = i == count - 1 && k % 5 == 0 ? 110 : 50 + (25 * Math.Sin((k / 31.0) + i));
                double magnitude = 20 + (12 * i) + (8 * Math.Sin(k / 11.0));
                blue[i] = dark ? Vector3.Zero : Direction.FromAzimuthZenith(Angle.FromDegrees(azimuthDeg), Angle.FromDegrees(zenithDeg)) * magnitude;
            }

            if (rotationDeg != 0 && (k == steps / 4 || k == steps / 2 || k == (3 * steps / 4) + 1))
            {
                Angle angle = Angle.FromDegrees(k == steps / 2 ? -rotationDeg : rotationDeg);
                bundle.RotatePot(angle);
                foreach (Stem s in stems)
                {
                    s.RotatePot(angle);
                }
            }

            bundle.Step(dt, elongation, blue);
            for (int i = 0; i < count; i++)
            {
                stems[i].Step(dt, elongation, blue[i]);
                travel = Math.Max(travel, Direction.Zenith(stems[i].ApexTangent).Degrees);
            }

            offset = Math.Max(offset, Compare(bundle, stems, (b, i) => b.ApexOffset(i), s => s.ApexOffset));
            tangent = Math.Max(tangent, Compare(bundle, stems, (b, i) => b.ApexTangent(i), s => s.ApexTangent));
            bundle.HorizontalLean(east, north);
            for (int i = 0; i < count; i++)
            {
                Vector3 unit = stems[i].ApexOffset * (1 / stems[i].ApexOffset.Length); // as the forecast measured single stems
                leanDifference = Math.Max(leanDifference, Math.Max(Math.Abs(east[i] - unit.X), Math.Abs(north[i] - unit.Y)));
            }
        }

        Assert.Equal(stems[0].Elapsed, bundle.Elapsed);
        Assert.Equal(stems[0].LengthM, bundle.LengthM);
        return (offset, tangent, leanDifference, travel);
    }

    private static double Compare(StemBundle bundle, Stem[] stems, Func<StemBundle, int, Vector3> ofBundle, Func<Stem, Vector3> ofStem)
    {
        double worst = 0;
        for (int i = 0; i < stems.Length; i++)
        {
            Vector3 expected = ofStem(stems[i]);
            double difference = (ofBundle(bundle, i) - expected).Length / expected.Length;
            worst = Math.Max(worst, double.IsNaN(difference) ? double.PositiveInfinity : difference);
        }

        return worst;
    }
}
