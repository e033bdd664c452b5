using System.Collections.Immutable;
using CanopyAdvisor.Core.Advice.Calibration;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Validation;
using NodaTime;
using Xunit.Abstractions;
using static CanopyAdvisor.Core.Tests.Advice.Calibration.CalibrationTestKit;
using static CanopyAdvisor.Core.Tests.Forecast.ForecastTestKit;

namespace CanopyAdvisor.Core.Tests.Advice.Calibration;

/// <summary>Synthetic recovery: observations made by the simulator from known parameters plus seeded noise are fitted
/// back (the standard check of an estimator, e.g. Seber &amp; Wild 1989, Nonlinear Regression, from memory: estimates
/// within about two standard errors of the truth, standard errors falling as data are added).</summary>
public class CropCalibratorTests(ITestOutputHelper output)
{
    private static readonly int[] TenDays = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10];

    private static string Describe(CalibrationResult r) =>
        string.Join("; ", r.Estimates.Select(e => $"{e.Symbol} = {e.Value:G5} ± {e.StandardError:G3}")) +
        $"; r = {(r.Correlation.Length > 1 ? r.Correlation[0][1] : 1):0.000}; it {r.Iterations}, runs {r.SimulatorRuns}; rms {r.InitialRmsMisfitDegrees:0.000}° → {r.RmsMisfitDegrees:0.000}°; " +
        string.Join(" | ", r.Warnings);

    [Fact]
    public void M_and_gamma_are_recovered_within_two_standard_errors()
    {
        Crop truth = Truth(1.4, 2.2);
        List<LeanObservation> observations = Observe(truth, Daily("south", TenDays).Concat(Daily("west", TenDays)), 0.01, 5, seed: 11);

        CalibrationResult result = CropCalibrator.Fit(Request(), TestCrop.Id, observations);
        output.WriteLine(Describe(result));

        Assert.True(result.Converged);
        Assert.Equal(["photoCoefficient", "proprioceptiveSensitivity"], result.Estimates.Select(e => e.Key));
        Assert.InRange(Math.Abs(result.Estimates[0].Value - 1.4), 0, 2 * result.Estimates[0].StandardError);
        Assert.InRange(Math.Abs(result.Estimates[1].Value - 2.2), 0, 2 * result.Estimates[1].StandardError);
        Assert.True(result.RmsMisfitDegrees < result.InitialRmsMisfitDegrees);
        Assert.DoesNotContain(result.Warnings, w => w.Contains("cannot separate", StringComparison.Ordinal));
        Assert.True(result.Identified);
        Assert.Equal(observations.Count, result.Residuals.Length);
    }

    [Fact]
    public void B_is_recovered_too_when_the_data_span_a_rotation_and_many_days()
    {
        Crop truth = Truth(1.4, 2.2, 4.0);
        List<LeanObservation> observations = Observe(truth, Daily("south", TenDays).Concat(Daily("west", TenDays)), 0.005, 5, seed: 12);
        var options = CalibrationOptions.Default with { Parameters = CalibrationOptions.FittableKeys };

        CalibrationResult result = CropCalibrator.Fit(Request(), TestCrop.Id, observations, options);
        output.WriteLine(Describe(result));

        double[] expected = [1.4, 2.2, 4.0];
        for (int k = 0; k < 3; k++)
        {
            Assert.InRange(Math.Abs(result.Estimates[k].Value - expected[k]), 0, 2 * result.Estimates[k].StandardError);
        }
    }

    [Fact]
    public void Standard_errors_shrink_with_more_data()
    {
        Crop truth = Truth(1.4, 2.2);
        List<LeanObservation> few = Observe(truth, Daily("south", 1, 4, 7, 10), 0.01, 5, seed: 21);
        List<LeanObservation> many = Observe(truth, Daily("south", TenDays).Concat(Daily("west", TenDays)), 0.01, 5, seed: 21);

        CalibrationResult a = CropCalibrator.Fit(Request(), TestCrop.Id, few);
        CalibrationResult b = CropCalibrator.Fit(Request(), TestCrop.Id, many);
        output.WriteLine(Describe(a));
        output.WriteLine(Describe(b));

        Assert.True(b.Estimates[0].StandardError < a.Estimates[0].StandardError);
        Assert.True(b.Estimates[1].StandardError < a.Estimates[1].StandardError);
    }

    [Fact]
    public void One_observation_time_raises_the_warning_that_the_data_cannot_separate_the_parameters()
    {
        Crop truth = Truth(1.4, 2.2);
        Instant at = Now - Duration.FromHours(4);
        List<LeanObservation> observations = Observe(truth, [("south", at), ("west", at)], 0.01, 5, seed: 31);

        CalibrationResult result = CropCalibrator.Fit(Request(), TestCrop.Id, observations);
        output.WriteLine(Describe(result));

        Assert.Contains(result.Warnings, w => w.StartsWith("all observations are from one day", StringComparison.Ordinal));
        Assert.Contains(result.Warnings, w => w.StartsWith("only 2 observation(s) for 2 parameter(s)", StringComparison.Ordinal));
    }

    [Fact]
    public void Leans_measured_only_just_after_planting_cannot_separate_M_and_gamma()
    {
        // In the AC model (MODEL.md §4) a stem that starts upright first bends at the rate ε̇·ν/L_gz·sin(angle to the
        // light), with ν = β·M = B·γ·M: early leans fix only the product γ·M, so M and γ trade off against each other
        // (their log estimates correlate near −1) until proprioception and gravitropism start to straighten the stem.
        Crop truth = Truth(1.4, 2.2);
        Instant nine = Planted.AtMidnight().InUtc().ToInstant() + Duration.FromHours(9);
        IEnumerable<(string, Instant)> hours = Enumerable.Range(0, 6).SelectMany(h => new[] { ("south", nine + Duration.FromHours(h)), ("west", nine + Duration.FromHours(h)) });
        List<LeanObservation> observations = Observe(truth, hours, 0.01, 5, seed: 32);

        CalibrationResult result = CropCalibrator.Fit(Request(), TestCrop.Id, observations);
        output.WriteLine(Describe(result));

        Assert.True(result.Correlation[0][1] < -0.97, $"correlation {result.Correlation[0][1]}");
        Assert.Contains(result.Warnings, w => w.StartsWith("the data cannot separate M and γ: their estimates correlate at -", StringComparison.Ordinal));
        Assert.False(result.Identified); // such data are refused: no variant is to be saved from them
        // What the early leans do fix, the product γ·M, is recovered (truth 2.2 × 1.4 = 3.08).
        Assert.Equal(3.08, result.Estimates[0].Value * result.Estimates[1].Value, 0.05 * 3.08);
    }

    [Fact]
    public void An_estimate_stays_within_the_crop_range_and_says_so_at_a_bound()
    {
        // Data made with γ = 7, above the calibrated crop's range [0.5, 4]: the fit ends on the upper bound.
        Crop truth = Truth(1.4, 7);
        List<LeanObservation> observations = Observe(truth, Daily("south", TenDays).Concat(Daily("west", TenDays)), 0.005, 5, seed: 41);

        CalibrationResult result = CropCalibrator.Fit(Request(), TestCrop.Id, observations);
        output.WriteLine(Describe(result));

        foreach (ParameterEstimate e in result.Estimates)
        {
            Assert.InRange(e.Value, e.Minimum, e.Maximum);
        }

        ParameterEstimate gamma = result.Estimates[1];
        Assert.True(gamma.AtBound);
        Assert.Equal(4, gamma.Value, 1e-9);
        Assert.Contains(result.Warnings, w => w.StartsWith("γ (proprioceptiveSensitivity) stopped at the upper end", StringComparison.Ordinal));
        Assert.Empty(CropValidator.Validate(result.Variant));
    }

    [Fact]
    public void The_variant_carries_the_estimates_narrowed_ranges_and_calibrated_provenance()
    {
        Crop truth = Truth(1.4, 2.2);
        List<LeanObservation> observations = Observe(truth, Daily("south", 2, 4, 6, 8), 0.01, 3, seed: 51);

        CalibrationResult result = CropCalibrator.Fit(Request(), TestCrop.Id, observations);
        Crop variant = result.Variant;

        Assert.Equal("test-crop-forecast-test", variant.Id);
        Assert.Equal(TestCrop.Id, variant.BaseId);
        Assert.Empty(CropValidator.Validate(variant));
        foreach (ParameterEstimate e in result.Estimates)
        {
            CropParameter p = variant.GetParameter(e.Key);
            Assert.Equal(e.Value, p.Value);
            Assert.InRange(p.Minimum, e.Minimum, e.Value);
            Assert.InRange(p.Maximum, e.Value, e.Maximum);
            // crops/README.md, "Provenance": calibrated: <site>, <dates>, n = <count>.
            Assert.StartsWith($"calibrated: forecast-test, {Today.PlusDays(-8):uuuu-MM-dd} to {Today.PlusDays(-2):uuuu-MM-dd}, n = 8;", p.Provenance, StringComparison.Ordinal);
        }

        Assert.Same(TestCrop.BalanceNumber, variant.BalanceNumber);
        Assert.Same(TestCrop.GrowthZoneLengthMm, variant.GrowthZoneLengthMm);
    }

    [Fact]
    public void The_default_stopping_rule_stops_within_a_small_part_of_a_standard_error_of_a_strict_one()
    {
        // The default relative tolerance (1e-4 on the sum of squares) against 1e-9: the estimates may differ only by
        // a small fraction of their standard errors (a property of the optimum, not a published value).
        List<LeanObservation> observations = Observe(Truth(1.4, 2.2), Daily("south", TenDays).Concat(Daily("west", TenDays)), 0.01, 5, seed: 11);
        CalibrationResult loose = CropCalibrator.Fit(Request(), TestCrop.Id, observations);
        CalibrationResult strict = CropCalibrator.Fit(Request(), TestCrop.Id, observations, CalibrationOptions.Default with { Tolerance = 1e-9, MaxIterations = 60 });
        output.WriteLine(Describe(loose));
        output.WriteLine(Describe(strict));
        for (int k = 0; k < 2; k++)
        {
            Assert.InRange(Math.Abs(loose.Estimates[k].Value - strict.Estimates[k].Value), 0, 0.05 * strict.Estimates[k].StandardError);
        }
    }

    [Fact]
    public void Progress_rises_to_one_and_a_cancelled_fit_stops()
    {
        List<LeanObservation> observations = Observe(Truth(1.4, 2.2), Daily("south", 1, 3, 5, 7), 0.01, 5, seed: 81);
        var reports = new List<double>();
        CropCalibrator.Fit(Request(), TestCrop.Id, observations, progress: new SynchronousProgress(reports.Add));
        Assert.Equal(1, reports[^1]);
        Assert.Equal(reports.Order(), reports);

        using var cancelled = new CancellationTokenSource();
        cancelled.Cancel();
        Assert.ThrowsAny<OperationCanceledException>(() => CropCalibrator.Fit(Request(), TestCrop.Id, observations, cancellationToken: cancelled.Token));
    }

    private sealed class SynchronousProgress(Action<double> report) : IProgress<double>
    {
        public void Report(double value) => report(value);
    }

    [Fact]
    public void Fitting_is_deterministic()
    {
        List<LeanObservation> observations = Observe(Truth(1.4, 2.2), Daily("south", 1, 3, 5, 7), 0.01, 5, seed: 61);
        CalibrationResult a = CropCalibrator.Fit(Request(), TestCrop.Id, observations);
        CalibrationResult b = CropCalibrator.Fit(Request(), TestCrop.Id, observations);
        Assert.Equal(a.Estimates.AsEnumerable(), b.Estimates.AsEnumerable());
        Assert.Equal(a.Iterations, b.Iterations);
    }

    [Fact]
    public void Bad_observations_are_all_rejected_with_their_paths()
    {
        Instant planted = Planted.AtStartOfDayInZone(London).ToInstant();
        LeanObservation good = new("south", Now - Duration.FromDays(1), Angle.FromDegrees(5), Angle.FromDegrees(180), null, 3);
        LeanObservation[] observations =
        [
            good,
            good with { BenchId = "nowhere" },
            good with { At = planted - Duration.FromHours(1) },
            good with { At = Now + Duration.FromHours(1) },
            good with { Tilt = Angle.FromDegrees(double.NaN) },
            good with { Tilt = Angle.FromDegrees(95) },
            good with { PlantsMeasured = 0 },
            good with { HeightMm = -4 },
            good with { Tilt = Angle.FromDegrees(-1), Where = "lean.csv:9" },
        ];

        var ex = Assert.Throws<InvalidInputException>(() => CropCalibrator.Fit(Request(), TestCrop.Id, observations));
        string[] paths = [.. ex.Errors.Select(e => e.Path)];
        Assert.Equal(
            ["observations[1].benchId", "observations[2].at", "observations[3].at", "observations[4].tiltDeg", "observations[5].tiltDeg",
             "observations[6].plants", "observations[7].heightMm", "lean.csv:9"],
            paths);
        Assert.StartsWith("tiltDeg: ", ex.Errors[^1].Message, StringComparison.Ordinal);
        Assert.Contains("before lot 'lot-south' was planted", ex.Errors[1].Message, StringComparison.Ordinal);
        Assert.Contains("after now", ex.Errors[2].Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Bad_options_a_foreign_bench_and_too_few_observations_are_rejected()
    {
        LeanObservation one = new("south", Now - Duration.FromDays(1), Angle.FromDegrees(5), Angle.FromDegrees(180), null, 3);
        var options = CalibrationOptions.Default with { Parameters = ["photoCoefficient", "leafAreaDensityM2PerM3", "photoCoefficient"], MaxIterations = 0 };

        var ex = Assert.Throws<InvalidInputException>(() => CropCalibrator.Fit(Request(), TestCrop.Id, [one], options));
        Assert.Equal(["parameters[1]", "parameters[2]", "maxIterations", "observations"], ex.Errors.Select(e => e.Path));

        var other = Assert.Throws<InvalidInputException>(() => CropCalibrator.Fit(Request(), "petunia", [one, one]));
        Assert.Contains(other.Errors, e => e.Path == "crop" && e.Message.Contains("unknown crop", StringComparison.Ordinal));
        Assert.Contains(other.Errors, e => e.Path == "observations[0].benchId" && e.Message.Contains("not of 'petunia'", StringComparison.Ordinal));
    }

    [Fact]
    public void The_crop_is_taken_from_the_observed_benches_when_not_named()
    {
        List<LeanObservation> observations = Observe(Truth(1.4, 2.2), Daily("south", 1, 3, 5, 7), 0.01, 5, seed: 71);
        CalibrationResult result = CropCalibrator.Fit(Request(), null, observations, CalibrationOptions.Default with { MaxIterations = 1 });
        Assert.Equal(TestCrop.Id, result.CropId);
        Assert.Equal(1, result.Iterations);
    }

    [Fact]
    public void The_track_is_interpolated_linearly_in_the_lean_vector()
    {
        // Halfway between a 10° lean to the east and a 10° lean to the west the lean vector is zero (by definition of
        // linear interpolation of the components; interpolating the azimuth instead would give 10° to the south).
        Instant t0 = Instant.FromUtc(2026, 12, 1, 10, 0);
        ImmutableArray<LeanSample> track =
        [
            new(t0, Angle.FromDegrees(10), Angle.FromDegrees(90)),
            new(t0 + Duration.FromHours(1), Angle.FromDegrees(10), Angle.FromDegrees(270)),
        ];
        (double east, double north) = CropCalibrator.Interpolate(track, t0 + Duration.FromMinutes(30));
        Assert.Equal(0, east, 1e-12);
        Assert.Equal(0, north, 1e-12);
        (east, _) = CropCalibrator.Interpolate(track, t0 + Duration.FromMinutes(15));
        Assert.Equal(Math.Sin(10 * Math.PI / 180) / 2, east, 1e-12);
        Assert.Equal(Math.Sin(10 * Math.PI / 180), CropCalibrator.Interpolate(track, t0 - Duration.FromHours(1)).East, 1e-12);
    }
}
