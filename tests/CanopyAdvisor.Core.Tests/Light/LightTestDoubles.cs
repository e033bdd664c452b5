using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Structures;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Light;

// Test doubles for the parts other helpers deliver (enclosure, beam distributions, outside light), written
// from the definitions in MODEL.md and the contracts' doc comments, so the light field can be tested alone.

/// <summary>Lambertian beam: I = cos θ / π per unit flux in the forward hemisphere (integral over the sphere = 1).</summary>
internal sealed class LambertianTestDistribution : BeamDistribution
{
    public static LambertianTestDistribution Instance { get; } = new();

    public override bool IsAxiallySymmetric => true;

    public override double IntensityPerUnitFlux(double polarRadians, double aroundRadians) =>
        polarRadians < Math.PI / 2 ? Math.Cos(polarRadians) / Math.PI : 0;
}

/// <summary>Isotropic source: I = 1 / (4π) per unit flux in every direction.</summary>
internal sealed class IsotropicTestDistribution : BeamDistribution
{
    public static IsotropicTestDistribution Instance { get; } = new();

    public override bool IsAxiallySymmetric => true;

    public override double IntensityPerUnitFlux(double polarRadians, double aroundRadians) => 1 / (4 * Math.PI);
}

/// <summary>Records the last (polar, around) asked for, to check the lamp-frame convention.</summary>
internal sealed class RecordingTestDistribution : BeamDistribution
{
    public double LastPolar { get; private set; }

    public double LastAround { get; private set; }

    public override bool IsAxiallySymmetric => false;

    public override double IntensityPerUnitFlux(double polarRadians, double aroundRadians)
    {
        LastPolar = polarRadians;
        LastAround = aroundRadians;
        return 0;
    }
}

/// <summary>No structure at all: the whole upper hemisphere is sky, nothing blocks a lamp.</summary>
internal sealed class OpenSkyTestEnclosure : IEnclosure
{
    public static OpenSkyTestEnclosure Instance { get; } = new();

    public double SkyTransmittance(Vector3 origin, Vector3 towardSky) => towardSky.Z > 0 ? 1 : 0;

    public bool IsBlocked(Vector3 from, Vector3 to) => false;
}

/// <summary>A single horizontal glass ceiling with one transmittance for every direction.</summary>
internal sealed class GlassCeilingTestEnclosure(double transmittance) : IEnclosure
{
    public double SkyTransmittance(Vector3 origin, Vector3 towardSky) => towardSky.Z > 0 ? transmittance : 0;

    public bool IsBlocked(Vector3 from, Vector3 to) => false;
}

/// <summary>An indoor room: no sky, nothing blocks a lamp.</summary>
internal sealed class IndoorTestEnclosure : IEnclosure
{
    public static IndoorTestEnclosure Instance { get; } = new();

    public double SkyTransmittance(Vector3 origin, Vector3 towardSky) => 0;

    public bool IsBlocked(Vector3 from, Vector3 to) => false;
}

/// <summary>
/// A glass ceiling whose transmittance falls with incidence, plus a low opaque wall on one side (sign of x) that hides
/// the sky below 30° elevation on that side and blocks lamps on that side below 1 m. Mirror-symmetric to the same
/// double with the opposite side.
/// </summary>
internal sealed class OneSidedWallTestEnclosure(double side) : IEnclosure
{
    public double SkyTransmittance(Vector3 origin, Vector3 towardSky)
    {
        if (towardSky.Z <= 0)
        {
            return 0;
        }

        if (side * towardSky.X > 0 && towardSky.Z < 0.5)
        {
            return 0;
        }

        return 0.9 * (0.5 + (0.5 * towardSky.Z));
    }

    public bool IsBlocked(Vector3 from, Vector3 to) => side * to.X > 2.5 && to.Z < 1;
}

/// <summary>An outside light source that returns a fixed state at every instant.</summary>
internal sealed class FixedOutsideLight(Vector3 sun, double dni, double dhi) : IOutsideLightSource
{
    public static FixedOutsideLight Night { get; } = new(new Vector3(0, 0, -1), 0, 0);

    public OutsideLight At(Instant time) =>
        new(time, sun, dni, dhi, dhi + (dni * Math.Max(0, sun.Z)));
}

/// <summary>Darkness with NaN (a log gap) between two instants.</summary>
internal sealed class GappyOutsideLight(Instant gapStart, Instant gapEnd) : IOutsideLightSource
{
    public OutsideLight At(Instant time) =>
        time >= gapStart && time < gapEnd
            ? new OutsideLight(time, new Vector3(0, 0, -1), double.NaN, double.NaN, double.NaN)
            : OutsideLight.Dark(time, new Vector3(0, 0, -1));
}

/// <summary>Progress that records reports synchronously (Progress&lt;T&gt; posts them later).</summary>
internal sealed class RecordingProgress : IProgress<double>
{
    public List<double> Reports { get; } = [];

    public void Report(double value) => Reports.Add(value);
}

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
