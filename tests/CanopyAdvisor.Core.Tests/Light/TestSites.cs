using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Sites;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Light;

internal static class TestSites
{
    public static DateTimeZone London => DateTimeZoneProviders.Tzdb["Europe/London"];

    public static BandFractions WhiteBands { get; } = new(0.2, 0.4, 0.4, 0.05);

    public static Site Make(Structure structure, IEnumerable<Bench> benches, IEnumerable<Lamp> lamps, DateTimeZone? zone = null) =>
        new(
            "test",
            "test site",
            new GeoLocation(Angle.FromDegrees(52), Angle.FromDegrees(0), 0),
            zone ?? London,
            structure,
            [.. benches],
            [.. lamps],
            ImmutableArray<Obstruction>.Empty,
            new WeatherSettings(3, 1));

    public static Structure Glasshouse { get; } = new Glasshouse(
        new Footprint(-50, -50, Angle.Zero, 100, 100), 10, 10, 4, Angle.FromDegrees(22),
        new Cover("glass", false, 1.526, 4, 0.004, 1),
        new Cover("glass", false, 1.526, 4, 0.004, 1),
        new Cover("glass", false, 1.526, 4, 0.004, 1),
        new Cover("glass", false, 1.526, 4, 0.004, 1),
        new Cover("glass", false, 1.526, 4, 0.004, 1),
        0);

    public static Structure Room { get; } = new IndoorRoom(new Footprint(-50, -50, Angle.Zero, 100, 100), 4);

    /// <summary>A bench whose length runs north from (x, y), of the given size and sample counts.</summary>
    public static Bench Bench(
        string id, double x, double y, double lengthM, double widthM, int along, int across,
        double surfaceM = 0.8, double canopyM = 0.2, double depthM = 0, double lad = 0) =>
        new(id, new Footprint(x, y, Angle.Zero, lengthM, widthM), surfaceM, new Canopy(canopyM, depthM, lad), along, across);

    public static Lamp Lamp(
        string id, Vector3 position, BeamDistribution distribution, double ppf,
        LampAim? aim = null, LampSchedule? schedule = null, BandFractions? bands = null, double dimming = 1) =>
        new(id, position, aim ?? LampAim.Down, distribution, ppf, bands ?? WhiteBands, dimming, 100, schedule ?? LampSchedule.AlwaysOn);
}
