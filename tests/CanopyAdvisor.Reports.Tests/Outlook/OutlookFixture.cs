using System.Collections.Immutable;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Files.Crops;
using CanopyAdvisor.Files.Sites;
using CanopyAdvisor.Reports.Outlook;
using NodaTime;

namespace CanopyAdvisor.Reports.Tests.Outlook;

/// <summary>Hand-made forecasts on the demo glasshouse (invented demo data), so the outlook can be checked against
/// numbers worked by hand without running the simulation.</summary>
internal static class OutlookFixture
{
    public static readonly Instant Now = Instant.FromUtc(2026, 12, 2, 7, 0);

    public static readonly Site Site = DemoSites.Load("glasshouse", StandardBeamFactory.Instance);

    public static readonly IReadOnlyDictionary<string, Crop> Crops = LoadCrops();

    private static Dictionary<string, Crop> LoadCrops()
    {
        CropLibrary library = CropLibrary.LoadBuiltIn();
        return Site.Lots.Select(l => l.CropId).Distinct().ToDictionary(id => id, library.Get, StringComparer.Ordinal);
    }

    /// <summary>A bench forecast of the demo lot on <paramref name="benchId"/> with the given numbers.</summary>
    public static BenchForecast Bench(
        string benchId,
        double leanNowDeg,
        double leanEndDeg,
        double azimuthDeg,
        double limitDeg = 15,
        Instant? leavesAt = null,
        ImmutableArray<ForecastFlag> flags = default,
        (double Low, double High)? band = null)
    {
        Lot lot = Site.Lots.Single(l => l.BenchId == benchId);
        LeanReading Reading(double tilt) => new(Angle.FromDegrees(tilt), Angle.FromDegrees(azimuthDeg), Direction.CompassPoint(Angle.FromDegrees(azimuthDeg)));
        ImmutableArray<LeanSample> track = [.. Enumerable.Range(-24, 24 * 7 + 25).Select(h =>
            new LeanSample(Now + Duration.FromHours(h), Angle.FromDegrees(leanNowDeg + ((leanEndDeg - leanNowDeg) * Math.Max(h, 0) / (24.0 * 7))), Angle.FromDegrees(azimuthDeg)))];
        return new BenchForecast(
            benchId,
            lot.Id,
            lot.CropId,
            Reading(leanNowDeg),
            Reading(leanNowDeg * 1.5),
            Reading(leanEndDeg),
            Reading(leanEndDeg * 1.5),
            (leanEndDeg - leanNowDeg) / 7,
            Angle.FromDegrees(limitDeg),
            leavesAt,
            50,
            80,
            120,
            150,
            11.5,
            0.7,
            1,
            band is (double lo, double hi) ? new LeanUncertainty(Angle.FromDegrees(lo), Angle.FromDegrees(hi), []) : null,
            flags.IsDefault ? [] : flags,
            [Reading(leanEndDeg)])
        {
            LeanTrack = track,
        };
    }

    public static SiteForecast Forecast(params BenchForecast[] benches) =>
        new(Now, Now + Duration.FromDays(7), Duration.FromMinutes(12), [.. benches], 0, 0);

    /// <summary>Eight benches: south-3 leaves grade on day 3, north-1 already over, the rest in a known order.</summary>
    public static SiteForecast Eight() => Forecast(
        Bench("south-1", 3, 6, 90, band: (2, 9)),                                             // 40 %, low
        Bench("south-2", 1, 1.2, 30, band: (0.5, 2)),                                          // 8 %, low
        Bench("south-3", 9, 16, 135, leavesAt: Now + Duration.FromDays(3), band: (12, 20)),    // leaves grade day 3
        Bench("south-4", 1, 9, 270, limitDeg: 12, band: (6, 11)),                              // 75 %, watch
        Bench("north-1", 13, 14, 45, limitDeg: 12, leavesAt: Now, band: (12, 16)),             // already over: first
        Bench("north-2", 2, 3, 180, limitDeg: 20, flags: [new ForecastFlag(ForecastFlagKind.Leggy, "heightOverGrade", 202, 200, "mm")]), // 15 %, 1 flag
        Bench("north-3", 2, 2.25, 0, flags: [new ForecastFlag(ForecastFlagKind.Leggy, "lowDli", 8.1, 10, "mol m-2 d-1"), new ForecastFlag(ForecastFlagKind.Leggy, "highDif", 3.2, 2, "K")]), // 15 %, 2 flags
        Bench("north-4", 5, 7, 225, band: (3, 15.5)));                                         // 46.7 %, band reaches limit: watch

    /// <summary>The order the documented rule gives for <see cref="Eight"/>, worked by hand.</summary>
    public static readonly string[] EightRanked = ["north-1", "south-3", "south-4", "north-4", "south-1", "north-3", "north-2", "south-2"];

    public static OutlookInput Input(SiteForecast forecast) => new(Site, forecast, Crops, []);
}
