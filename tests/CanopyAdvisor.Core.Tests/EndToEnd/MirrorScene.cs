using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Sites;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.EndToEnd;

/// <summary>
/// An invented glasshouse (test data, not a real site) with nothing symmetric about it: a ridge at 17°, three bays,
/// different covers on each side wall, an opaque back (north-north-east) wall, structural shading, benches, a two-tier
/// rack and obstructions off-centre, and lamps aimed every which way.
/// </summary>
internal static class MirrorScene
{
    // Float glass 4 mm: n = 1.526, K = 4 m⁻¹ (Duffie & Beckman ch. 5 typical values); twin-wall sheet n = 1.586
    // (polycarbonate, from memory), two layers.
    public static readonly Cover Glass = new("float glass 4 mm", false, 1.526, 4, 0.004, 1);
    public static readonly Cover TwinWall = new("twin-wall sheet", false, 1.586, 10, 0.001, 2);

    public const double AxisDeg = 17;
    public const double BayWidthM = 6.4;
    public const int Bays = 3;
    public const double LengthM = 30;
    public const double GutterM = 4.5;

    private static readonly Footprint House = new(3.0, -7.0, Angle.FromDegrees(AxisDeg), LengthM, Bays * BayWidthM);

    public static readonly BandFractions RedHeavy = new(0.1, 0.1, 0.8, 0.03);
    public static readonly BandFractions White = new(0.3, 0.2, 0.5, 0.12);
    public static readonly BandFractions FarRedRich = new(0.15, 0.15, 0.7, 0.4);

    // Overhead lamps: 04:00–22:00, off when the outside is above 600 µmol m⁻² s⁻¹; side lamps 06:00–20:00;
    // the night lamp runs past midnight, 20:00–02:00.
    public static readonly LampSchedule Toplight = new(new LocalTime(4, 0), new LocalTime(22, 0), 600);
    public static readonly LampSchedule Sidelight = new(new LocalTime(6, 0), new LocalTime(20, 0), null);
    public static readonly LampSchedule Nightlight = new(new LocalTime(20, 0), new LocalTime(2, 0), null);

    /// <summary>A site frame point from house coordinates: u along the ridge from the front wall, v across from the left wall.</summary>
    public static Vector3 Local(double u, double v, double z) =>
        House.Corner + (u * House.AxisDirection) + (v * House.WidthDirection) + new Vector3(0, 0, z);

    private static Footprint LocalFootprint(double u, double v, double turnDeg, double length, double width)
    {
        Vector3 c = Local(u, v, 0);
        return new Footprint(c.X, c.Y, Angle.FromDegrees(AxisDeg + turnDeg), length, width);
    }

    /// <summary>
    /// A distribution that is symmetric about its C0–C180 plane but not about C90–C270, so that yaw and spin matter and
    /// the mirror image of the lamp is the lamp with mirrored aim: I ∝ cos^1.5 θ (1 + 0.6 cos φ) on a 10° × 30° grid.
    /// </summary>
    public static TabulatedDistribution ForwardThrow()
    {
        Angle[] polar = [.. Enumerable.Range(0, 19).Select(i => Angle.FromDegrees(i * 10))];
        Angle[] around = [.. Enumerable.Range(0, 12).Select(i => Angle.FromDegrees(i * 30))];
        var values = new double[around.Length, polar.Length];
        for (int a = 0; a < around.Length; a++)
        {
            for (int p = 0; p < polar.Length; p++)
            {
                double c = Math.Max(0, polar[p].Cos());
                values[a, p] = Math.Pow(c, 1.5) * (1 + (0.6 * around[a].Cos()));
            }
        }

        return new TabulatedDistribution(polar, around, values);
    }

    public static Site Build()
    {
        var glasshouse = new Glasshouse(
            House, Bays, BayWidthM, GutterM, Angle.FromDegrees(24),
            Roof: Glass, LeftWall: TwinWall, RightWall: Glass, FrontWall: Glass, BackWall: Cover.OpaqueSurface("insulated panel"),
            StructuralShading: 0.13);

        Bench[] benches =
        [
            new("bench-1", LocalFootprint(2, 1.5, 0, 8, 1.6), 0.8, new Canopy(0.35, 0.08, 5), 6, 3),
            new("bench-2", LocalFootprint(14, 9.0, 0, 10, 1.8), 0.75, new Canopy(0.4, 0.1, 8), 5, 4),
            new("rack-low", LocalFootprint(20, 14.5, 0, 6, 1.2), 0.3, new Canopy(0.25, 0.05, 12), 4, 2),
            new("rack-high", LocalFootprint(20, 14.5, 0, 6, 1.2), 1.1, new Canopy(0.3, 0.06, 6), 4, 2),
            // Turned 90°: its length runs across the house (toward the right wall), its width back toward the front wall.
            new("bench-turned", LocalFootprint(27, 3, 90, 5, 1.5), 0.7, new Canopy(0.3, 0.05, 4), 4, 3),
        ];

        var lamps = new List<Lamp>();
        int k = 0;
        foreach (double u in new[] { 4.0, 10.0, 16.0, 22.0 })
        {
            foreach (double v in new[] { 3.2, 9.6, 16.0 })
            {
                // Overhead Lambertian toplights, slightly tilted (5° toward yaw 30°) so that the aim matters.
                lamps.Add(new Lamp($"top-{++k}", Local(u, v, 4.0), new LampAim(Angle.FromDegrees(30), Angle.FromDegrees(5), Angle.FromDegrees(10)),
                    LambertianDistribution.Instance, 1000, RedHeavy, 1, 400, Toplight));
            }
        }

        CosinePowerDistribution spot = CosinePowerDistribution.FromBeamAngle(Angle.FromDegrees(60));
        lamps.Add(new Lamp("side-back-1", Local(29.5, 5, 3.0), new LampAim(Angle.FromDegrees(AxisDeg + 180 + 12), Angle.FromDegrees(55), Angle.FromDegrees(20)),
            spot, 600, White, 0.7, 250, Sidelight));
        lamps.Add(new Lamp("side-back-2", Local(29.5, 12, 3.2), new LampAim(Angle.FromDegrees(AxisDeg + 180 - 25), Angle.FromDegrees(62), Angle.FromDegrees(-40)),
            spot, 600, White, 0.7, 250, Sidelight));
        lamps.Add(new Lamp("side-left", Local(12, 0.4, 2.5), new LampAim(Angle.FromDegrees(AxisDeg + 90 + 10), Angle.FromDegrees(70), Angle.Zero),
            CosinePowerDistribution.FromBeamAngle(Angle.FromDegrees(40)), 450, White, 1, 200, Sidelight));
        lamps.Add(new Lamp("throw", Local(11, 10, 3.2), new LampAim(Angle.FromDegrees(AxisDeg + 15), Angle.FromDegrees(40), Angle.FromDegrees(35)),
            ForwardThrow(), 800, FarRedRich, 0.9, 300, Nightlight));

        Obstruction[] obstructions =
        [
            new("column-tank", LocalFootprint(10, 15, 0, 1.5, 1.5), 0, 3.5),
            new("silo", new Footprint(25, -20, Angle.FromDegrees(40), 6, 6), 0, 14),
        ];

        return new Site(
            "mirror-test",
            "Mirror test range (invented test data)",
            new GeoLocation(Angle.FromDegrees(52), Angle.FromDegrees(4.4), 0),
            DateTimeZoneProviders.Tzdb["Europe/Amsterdam"],
            glasshouse,
            [.. benches],
            [.. lamps],
            [.. obstructions],
            new WeatherSettings(3, 0.6));
    }
}
