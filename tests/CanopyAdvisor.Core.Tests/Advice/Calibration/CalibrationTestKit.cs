using System.Collections.Immutable;
using CanopyAdvisor.Core.Advice.Calibration;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Sites;
using NodaTime;
using static CanopyAdvisor.Core.Tests.Forecast.ForecastTestKit;

namespace CanopyAdvisor.Core.Tests.Advice.Calibration;

/// <summary>A small winter glasshouse scene and synthetic lean observations made by the simulator itself from known
/// parameters plus seeded noise (invented test data).</summary>
internal static class CalibrationTestKit
{
    public static Instant Now { get; } = WinterNow;

    public static LocalDate Today => Now.InZone(London).Date;

    /// <summary>Planted 12 days before now; turned 180° five days before now, at 10:00 UTC.</summary>
    public static LocalDate Planted => Today.PlusDays(-12);

    public static Instant Turned { get; } = WinterNow - Duration.FromDays(5) - Duration.FromHours(2);

    /// <summary>The test crop with a wider γ range (for data made outside the calibrated crop's range).</summary>
    public static Crop WideCrop { get; } = TestCrop with
    {
        ProprioceptiveSensitivity = TestCrop.ProprioceptiveSensitivity with { Maximum = 8 },
    };

    public static Lot SouthLot { get; } = new(
        "lot-south", "south", TestCrop.Id, Planted, Today.PlusDays(20), 60, Today, 0.15, 20,
        [new RotationRecord(Turned, Angle.FromDegrees(180))]);

    public static Lot WestLot { get; } = new("lot-west", "west", TestCrop.Id, Planted, Today.PlusDays(20), 60, Today, 0.15, 20, []);

    public static Site Scene { get; } = Site(
        OpaqueNorthGlasshouse,
        [Bench("south", 3, 1, 2, 1.5, 2, 2), Bench("west", 0.5, 8, 2, 1.5, 2, 2)],
        [],
        SouthLot,
        WestLot);

    /// <summary>A cheap request: coarse sky quadrature, two growth-zone segments, 15-minute steps.</summary>
    public static ForecastRequest Request(params Crop[] crops) => CanopyAdvisor.Core.Tests.Forecast.ForecastTestKit.Request(Scene, now: Now, crops: crops.Length == 0 ? [TestCrop] : crops) with
    {
        LightOptions = new LightFieldOptions(SkyZenithBands: 4),
        GrowthZoneSegments = 2,
        Step = Duration.FromMinutes(15),
        IncludeUncertainty = false,
    };

    /// <summary>The test crop with M and γ (and B) set, inside the wide crop's ranges.</summary>
    public static Crop Truth(double m, double gamma, double? b = null)
    {
        Crop c = WideCrop.WithParameter("photoCoefficient", m).WithParameter("proprioceptiveSensitivity", gamma);
        return b is double value ? c.WithParameter("balanceNumber", value) : c;
    }

    /// <summary>Observations of the benches at the given instants (each on a whole hour, where the lean track has a
    /// sample), from a run of the true crop set up as the calibrator sets up its runs (spin-up from planting, one hour
    /// past now), with Gaussian noise of standard deviation σ/√plants on each lean-vector component (seeded).</summary>
    public static List<LeanObservation> Observe(Crop truth, IEnumerable<(string Bench, Instant At)> when, double sigma, int plants, int seed)
    {
        ForecastRequest request = Request(WideCrop) with
        {
            Crops = new Dictionary<string, Crop> { [TestCrop.Id] = WideCrop },
            SpinUp = Now - Planted.AtStartOfDayInZone(London).ToInstant(),
            Horizon = Duration.FromHours(1),
        };
        ForecastSession session = ForecastSession.Prepare(request);
        var tracks = new Dictionary<string, ImmutableArray<LeanSample>>();
        foreach (Lot lot in Scene.Lots)
        {
            tracks[lot.BenchId] = session.RunLot(lot.Id, new LotScenario { Crop = truth }).LeanTrack;
        }

        var random = new Random(seed);
        var list = new List<LeanObservation>();
        foreach ((string bench, Instant at) in when)
        {
            LeanSample sample = tracks[bench].Single(s => s.At == at);
            (double east, double north) = Vector(sample.Lean);
            double s = sigma / Math.Sqrt(plants);
            east += s * Gaussian(random);
            north += s * Gaussian(random);
            LeanReading noisy = LeanReading.FromLeanVector(east, north);
            list.Add(new LeanObservation(bench, at, noisy.Tilt, noisy.Azimuth, null, plants));
        }

        return list;
    }

    /// <summary>Whole hours 08:00 and 14:00 UTC on each of the given days before today (day 0 = today, only hours before now).</summary>
    public static IEnumerable<(string Bench, Instant At)> Daily(string bench, params int[] daysBefore)
    {
        foreach (int d in daysBefore)
        {
            foreach (int hour in new[] { 8, 14 })
            {
                Instant at = Today.PlusDays(-d).AtMidnight().InUtc().ToInstant() + Duration.FromHours(hour);
                if (at <= Now)
                {
                    yield return (bench, at);
                }
            }
        }
    }

    // Box–Muller: a standard normal deviate from two uniforms.
    private static double Gaussian(Random random)
    {
        double u1 = 1.0 - random.NextDouble();
        double u2 = random.NextDouble();
        return Math.Sqrt(-2 * Math.Log(u1)) * Math.Cos(2 * Math.PI * u2);
    }
}
