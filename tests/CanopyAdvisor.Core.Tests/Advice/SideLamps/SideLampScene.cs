using System.Collections.Immutable;
using CanopyAdvisor.Core.Advice.SideLamps;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Tests.Forecast;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Advice.SideLamps;

/// <summary>
/// A small indoor scene (invented test data): a 1 m × 1 m bench with one sample point in a 10 m × 10 m room, one
/// isotropic lamp west of it that pushes the blue light vector sideways, and a rail east of it, 2 m out and 1 m above
/// the sensing point, running north–south.
/// </summary>
internal static class SideLampScene
{
    /// <summary>The sensing point: bench centre (5, 5), bench top 0.8 m + lot height 0.08 m − sensing depth 0.01 m
    /// (half the test crop's 20 mm growth zone).</summary>
    public static Vector3 Point { get; } = new(5, 5, 0.87);

    public const double ExistingPpf = 500;

    public const double AddedPpf = 1000;

    public const double AddedWatts = 200;

    /// <summary>The existing lamp: 1.5 m west of the point and 1 m above it.</summary>
    public static Vector3 ExistingLamp { get; } = new(3.5, 5, 1.87);

    public static MountingRail EastRail { get; } = new("east", new Vector3(7, 3, 1.87), new Vector3(7, 7, 1.87));

    public static SideLampType IsotropicType { get; } =
        new("iso-1000", IsotropicDistribution.Instance, AddedPpf, ForecastTestKit.White, AddedWatts);

    public static SideLampType LambertianType { get; } =
        new("lambert-1000", LambertianDistribution.Instance, AddedPpf, ForecastTestKit.White, AddedWatts);

    public static Site Site(params Lamp[] extra) => Site(ExistingLamp, extra);

    /// <summary>The scene with the existing lamp somewhere else (straight above the point gives no lateral light).</summary>
    public static Site Site(Vector3 existingLamp, params Lamp[] extra)
    {
        Bench bench = ForecastTestKit.Bench("b", 4.5, 4.5, 1, 1, 1, 1);
        var lamp = new Lamp(
            "west", existingLamp, LampAim.Down, IsotropicDistribution.Instance, ExistingPpf, ForecastTestKit.White, 1, 150,
            LampSchedule.AlwaysOn);
        return ForecastTestKit.Site(
            ForecastTestKit.Room, [bench], [lamp, .. extra], ForecastTestKit.Lot("b", ForecastTestKit.WinterNow, heightMm: 80, pots: 20));
    }

    /// <summary>A one-day forecast without the band; the reference spacing sets the canopy's leaf area density
    /// (crop LAD 10 m² m⁻³ × (reference / 0.15 m)²), so 0.0015 m makes it 0.001 m² m⁻³: no attenuation to 1e-5.</summary>
    public static ForecastRequest Request(Site site, double referenceSpacingM = 0.0015) =>
        ForecastTestKit.Request(site) with
        {
            Horizon = Duration.FromDays(1),
            IncludeUncertainty = false,
            ReferenceSpacingM = referenceSpacingM,
        };

    public static SideLampBrief Brief(SideLampType? type = null, double energyWeight = 0, int maxLamps = 1) =>
        new([EastRail], [type ?? IsotropicType], maxLamps, LampSchedule.AlwaysOn)
        {
            BenchIds = ["b"],
            EnergyWeightPerKilowatt = energyWeight,
            Seed = 7,
            Starts = 3,
        };

    public static ImmutableArray<T> Array<T>(params T[] items) => [.. items];
}
