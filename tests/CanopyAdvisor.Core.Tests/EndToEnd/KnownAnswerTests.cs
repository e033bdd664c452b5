using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Structures;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.EndToEnd;

// Known answers through the real chain: Site records → EnclosureBuilder.Build → LightFieldCompiler.Compile →
// CompiledLightField.Step / LightSimulation.Run, with the real distributions, enclosures and outside-light source.
public sealed class KnownAnswerTests
{
    private static readonly DateTimeZone Amsterdam = DateTimeZoneProviders.Tzdb["Europe/Amsterdam"];
    private static readonly GeoLocation Location52North = new(Angle.FromDegrees(52.0), Angle.FromDegrees(4.2), 0);
    private static readonly BandFractions White = new(0.2, 0.4, 0.4, 0.05);

    // Float glass 4 mm: n = 1.526, K = 4 m⁻¹ (Duffie & Beckman ch. 5 typical values).
    private const double N = 1.526, K = 4, L = 0.004;
    private static readonly Cover Glass = new("float glass 4 mm", false, N, K, L, 1);

    private static Site MakeSite(Structure structure, Bench[] benches, Lamp[] lamps) =>
        new("known-answer", "Known-answer test site (invented test data)", Location52North, Amsterdam, structure,
            [.. benches], [.. lamps], ImmutableArray<Obstruction>.Empty, new WeatherSettings(3, 1));

    /// <summary>A one-point bench whose single sample point is at (x, y, 1.0 m): a 1 m × 1 m bench top at 0.8 m with a 0.2 m canopy of LAD 0.</summary>
    private static Bench OnePoint(string id, double x, double y) =>
        new(id, new Footprint(x - 0.5, y - 0.5, Angle.Zero, 1, 1), 0.8, new Canopy(0.2, 0, 0), 1, 1);

    // MODEL.md §3 check: a downward Lambertian lamp of Φ = 1000 µmol s⁻¹ at h = 1 m gives E = Φ/(π h²) = 318.31 on axis and
    // (Φ/π) h²/(h² + r²)² = 79.58 at a horizontal offset r = 1 m. Always on for a 24 h local day, DLI = PPFD × 3600 × 24 / 10⁶
    // (MODEL.md §0, ANSI/ASABE S640) = 27.50 and 6.875 mol m⁻² d⁻¹. The real ClearSkyOutsideLight is passed in; a room has no sky.
    [Fact]
    public void Lambertian_lamp_one_metre_above_a_bench_in_a_room_gives_the_textbook_ppfd_and_dli()
    {
        var room = new IndoorRoom(new Footprint(0, 0, Angle.Zero, 10, 8), 3);
        Lamp lamp = new("l", new Vector3(2.5, 2.5, 2.0), LampAim.Down, LambertianDistribution.Instance, 1000, White, 1, 300, LampSchedule.AlwaysOn);
        Site site = MakeSite(room, [OnePoint("axis", 2.5, 2.5), OnePoint("offset", 3.5, 2.5)], [lamp]);
        Assert.Empty(SiteValidator.Validate(site));

        CompiledLightField field = LightFieldCompiler.Compile(site, EnclosureBuilder.Build(site));
        var date = new LocalDate(2026, 6, 15);
        var outside = new ClearSkyOutsideLight(site.Location, site.Zone, site.Weather);
        LightPeriodSummary run = LightSimulation.Run(field, outside, date, date);

        double onAxis = 1000 / Math.PI; // 318.3099
        double offset = 1000 / Math.PI * 1 / Math.Pow(1 + 1, 2); // 79.5775
        Assert.Equal(318.31, onAxis, 2);
        Assert.Equal(79.58, offset, 2);

        BenchDayLight axis = run.Days.Single(d => d.BenchId == "axis");
        BenchDayLight side = run.Days.Single(d => d.BenchId == "offset");
        Assert.Equal(Duration.FromHours(24), axis.DayLength);
        Assert.Equal(0, axis.MissingSteps);
        Assert.Equal(onAxis, axis.MeanHorizontalPpfd, 9);
        Assert.Equal(onAxis * 24 * 3600 / 1e6, axis.Dli, 9);
        Assert.Equal(27.50, axis.Dli, 2);
        Assert.Equal(0, axis.LightVectorTilt.Degrees, 9);

        // The offset point sees the lamp 45° up to the west: E·û with E = Φ·(cos 45°/π)/2 m² and û = (−1, 0, 1)/√2.
        Assert.Equal(offset, side.MeanHorizontalPpfd, 9);
        Assert.Equal(6.875, side.Dli, 3);
        Assert.Equal(45, side.LightVectorTilt.Degrees, 9);
        Assert.Equal(270, side.LightVectorAzimuth.Degrees, 9);
    }

    // Duffie & Beckman, Solar Engineering of Thermal Processes, ch. 5, written out here independently of the code:
    // Snell sin θ₂ = sin θ₁/n; r⊥ = sin²(θ₂ − θ₁)/sin²(θ₂ + θ₁), r∥ = tan²(θ₂ − θ₁)/tan²(θ₂ + θ₁);
    // τ_r = ½[(1 − r∥)/(1 + (2N − 1) r∥) + (1 − r⊥)/(1 + (2N − 1) r⊥)]; τ_a = exp(−N K L / cos θ₂); τ = τ_r τ_a.
    private static double DuffieBeckmanTau(double incidenceDeg, double n, double k, double l, int layers)
    {
        double t1 = incidenceDeg * Math.PI / 180;
        double t2 = Math.Asin(Math.Sin(t1) / n);
        double perpendicular = Math.Pow(Math.Sin(t2 - t1), 2) / Math.Pow(Math.Sin(t2 + t1), 2);
        double parallel = Math.Pow(Math.Tan(t2 - t1), 2) / Math.Pow(Math.Tan(t2 + t1), 2);
        int m = (2 * layers) - 1;
        double tauR = 0.5 * (((1 - parallel) / (1 + (m * parallel))) + ((1 - perpendicular) / (1 + (m * perpendicular))));
        return tauR * Math.Exp(-layers * k * l / Math.Cos(t2));
    }

    // The hand formula above against the check values of MODEL.md §2 (computed, n = 1.526): τ_r 0.9011 at 45°, 0.8421 at 60°,
    // 0.4554 at 80°; two covers 0.7588 at 60°; K = 4 m⁻¹, L = 2 mm: τ 0.8340 at 60°.
    [Theory]
    [InlineData(45, 0, 0.002, 1, 0.9011)]
    [InlineData(60, 0, 0.002, 1, 0.8421)]
    [InlineData(80, 0, 0.002, 1, 0.4554)]
    [InlineData(60, 0, 0.002, 2, 0.7588)]
    [InlineData(60, 4, 0.002, 1, 0.8340)]
    public void The_hand_written_fresnel_formula_reproduces_the_model_check_values(double incidenceDeg, double k, double l, int layers, double expected) =>
        Assert.Equal(expected, DuffieBeckmanTau(incidenceDeg, 1.526, k, l, layers), 4);

    // A wide single bay (20 m, ridge north–south, roof slope 12°, gutter 4 m) with sample points 1.0 m above ground under the
    // ridge (v = 10 m from the west wall) and a quarter across (v = 5 m). The sun lies in the east–west plane across the
    // ridge, so the ray meets one roof plane and no wall. The west roof plane rises eastward, normal (−sin s, 0, cos s); the
    // east plane normal is (sin s, 0, cos s); with the sun at zenith z toward the east, û = (sin z, 0, cos z):
    //   under the ridge, east sun: the ray leaves through the east plane, cos θ = cos(z − s) → θ = 30 − 12 = 18°;
    //   under the ridge, west sun: the west plane, θ = 18°;
    //   quarter point, east sun: the ray climbs faster (cot 30° = 1.73 m/m) than the roof (tan 12° = 0.21) and meets the
    //   west plane at v = 7.67 m, before the ridge: cos θ = cos(z + s) → θ = 42°;
    //   quarter point, west sun: the west plane at v = 2.91 m, θ = 18°; quarter point, sun at the zenith: θ = s = 12°.
    // Beam horizontal PPFD = DNI · τ(θ) · (1 − shading) · cos z (MODEL.md §3), with no diffuse light (DHI = 0).
    [Theory]
    [InlineData("ridge", 90, 30, 18)]
    [InlineData("ridge", 270, 30, 18)]
    [InlineData("quarter", 90, 30, 42)]
    [InlineData("quarter", 270, 30, 18)]
    [InlineData("quarter", 0, 0, 12)]
    public void Sun_through_a_glass_roof_gives_the_fresnel_beam(string bench, double sunAzimuthDeg, double sunZenithDeg, double incidenceDeg)
    {
        const double Shading = 0.15, Dni = 1000;
        var house = new Glasshouse(
            new Footprint(0, 0, Angle.Zero, 40, 20), 1, 20, 4, Angle.FromDegrees(12),
            Glass, Glass, Glass, Glass, Glass, Shading);
        Site site = MakeSite(house, [OnePoint("ridge", 10, 15), OnePoint("quarter", 5, 25)], []);
        Assert.Empty(SiteValidator.Validate(site));
        CompiledLightField field = LightFieldCompiler.Compile(site, EnclosureBuilder.Build(site));

        Vector3 sun = Direction.FromAzimuthZenith(Angle.FromDegrees(sunAzimuthDeg), Angle.FromDegrees(sunZenithDeg));
        var outside = new OutsideLight(Instant.FromUtc(2026, 6, 21, 11, 0), sun, Dni, 0, Dni * sun.Z);
        var light = new PointLight[field.Points.Length];
        field.Step(outside, new LocalTime(13, 0), light);

        int index = field.PointsOfBench(site.Benches.IndexOf(site.Benches.Single(b => b.Id == bench))).Start;
        double cosZenith = Math.Cos(sunZenithDeg * Math.PI / 180);
        double normal = Dni * DuffieBeckmanTau(incidenceDeg, N, K, L, 1) * (1 - Shading);
        Assert.Equal(normal * cosZenith, light[index].HorizontalPpfd, 9);
        Assert.Equal(0, (light[index].LightVector - (normal * sun)).Length, 9);
    }
    // Diffuse sky through a flat glass roof (Duffie & Beckman ch. 5, diffuse radiation): an isotropic sky of horizontal
    // PAR DHI seen through a horizontal cover gives DHI · τ_d · (1 − shading) on a horizontal surface, with
    // τ_d = 2 ∫₀^{π/2} τ(θ) cos θ sin θ dθ (integrated here by the midpoint rule with 4000 intervals of the hand formula
    // above; Brandemuehl & Beckman summarise it as τ at about 60°, from memory). The point is in the middle of a
    // 200 m × 200 m house with a flat roof 4 m up, so the walls fill only the sky below 1.7° elevation, a cosine-weighted
    // share sin² 1.7° = 0.09 %. Tolerance 0.5 %: the documented accuracy of the default sky quadrature for a smooth weight
    // (HemisphereQuadrature: below 0.5 % at 16 bands) plus that wall share. The sky vector of an isotropic sky seen through
    // a horizontal cover points straight up (MODEL.md §3), so the light vector's horizontal part must vanish.
    [Fact]
    public void Isotropic_sky_through_a_flat_glass_roof_gives_the_diffuse_transmittance()
    {
        const double Shading = 0.12, Dhi = 200;
        var house = new Glasshouse(
            new Footprint(-100, -100, Angle.Zero, 200, 200), 1, 200, 4, Angle.Zero,
            Glass, Glass, Glass, Glass, Glass, Shading);
        Site site = MakeSite(house, [OnePoint("middle", 0, 0)], []);
        Assert.Empty(SiteValidator.Validate(site));
        CompiledLightField field = LightFieldCompiler.Compile(site, EnclosureBuilder.Build(site));

        var outside = new OutsideLight(Instant.FromUtc(2026, 1, 10, 12, 0), -Vector3.UnitZ, 0, Dhi, Dhi);
        var light = new PointLight[1];
        field.Step(outside, new LocalTime(13, 0), light);

        const int Intervals = 4000;
        double h = Math.PI / 2 / Intervals, tauD = 0;
        for (int i = 0; i < Intervals; i++)
        {
            double theta = (i + 0.5) * h;
            tauD += 2 * DuffieBeckmanTau(theta * 180 / Math.PI, N, K, L, 1) * Math.Cos(theta) * Math.Sin(theta) * h;
        }

        double expected = Dhi * tauD * (1 - Shading);
        Assert.InRange(light[0].HorizontalPpfd, expected * 0.995, expected * 1.005);
        Assert.True(Math.Abs(light[0].LightVector.X) < 1e-9 * Dhi && Math.Abs(light[0].LightVector.Y) < 1e-6 * Dhi,
            $"horizontal part of the sky vector: {light[0].LightVector}");
    }
    // Low sun through the walls of the same kind of house (20 m × 40 m, ridge north, gutter 4 m), points 1 m inside a wall
    // at 1.0 m height, so the ray leaves through the wall below the gutter (it rises only cot z ≤ 0.39 m per metre). For a
    // vertical wall with outward normal n̂ and the sun û = (sin z sin a, sin z cos a, cos z): cos θ = û·n̂.
    //   front (south) wall, twin-wall sheet of two layers (n = 1.586, K = 10 m⁻¹, L = 1 mm; polycarbonate values from
    //   memory), sun at a = 180°, z = 70°: cos θ = sin 70° → θ = 20°; at a = 200°: cos θ = sin 70° cos 20° = 0.8830 → θ = 27.99°;
    //   left (west) wall, float glass, sun at a = 270°, z = 75°: θ = 15°;
    //   back (north) wall opaque: no beam at all.
    [Theory]
    [InlineData("front", 180, 70, 2)]
    [InlineData("front", 200, 70, 2)]
    [InlineData("west", 270, 75, 1)]
    [InlineData("back", 0, 70, 0)]
    public void Low_sun_through_a_wall_gives_the_fresnel_beam(string bench, double sunAzimuthDeg, double sunZenithDeg, int layers)
    {
        const double Shading = 0.1, Dni = 800;
        var twinWall = new Cover("twin-wall sheet", false, 1.586, 10, 0.001, 2);
        var house = new Glasshouse(
            new Footprint(0, 0, Angle.Zero, 40, 20), 1, 20, 4, Angle.FromDegrees(12),
            Roof: Glass, LeftWall: Glass, RightWall: Glass, FrontWall: twinWall, BackWall: Cover.OpaqueSurface("panel"), Shading);
        Site site = MakeSite(house, [OnePoint("front", 10, 1), OnePoint("west", 1, 20), OnePoint("back", 10, 39)], []);
        Assert.Empty(SiteValidator.Validate(site));
        CompiledLightField field = LightFieldCompiler.Compile(site, EnclosureBuilder.Build(site));

        Vector3 sun = Direction.FromAzimuthZenith(Angle.FromDegrees(sunAzimuthDeg), Angle.FromDegrees(sunZenithDeg));
        var outside = new OutsideLight(Instant.FromUtc(2026, 12, 21, 11, 0), sun, Dni, 0, Dni * sun.Z);
        var light = new PointLight[field.Points.Length];
        field.Step(outside, new LocalTime(12, 0), light);
        int index = field.PointsOfBench(site.Benches.IndexOf(site.Benches.Single(b => b.Id == bench))).Start;

        double z = sunZenithDeg * Math.PI / 180;
        Vector3 normal = bench switch
        {
            "front" => new Vector3(0, -1, 0),
            "west" => new Vector3(-1, 0, 0),
            _ => new Vector3(0, 1, 0),
        };
        double cosIncidence = Vector3.Dot(sun, normal);
        Assert.True(cosIncidence > 0, "the sun must be on the outer side of the wall");
        double incidenceDeg = Math.Acos(cosIncidence) * 180 / Math.PI;
        double tau = bench switch
        {
            "front" => DuffieBeckmanTau(incidenceDeg, 1.586, 10, 0.001, layers),
            "west" => DuffieBeckmanTau(incidenceDeg, N, K, L, layers),
            _ => 0,
        };
        if (sunAzimuthDeg == 200)
        {
            Assert.Equal(27.99, incidenceDeg, 2);
        }

        Assert.Equal(Dni * tau * (1 - Shading) * Math.Cos(z), light[index].HorizontalPpfd, 9);
        Assert.Equal(0, (light[index].LightVector - (Dni * tau * (1 - Shading) * sun)).Length, 9);
    }
    // A clear midsummer day at 52° N through the real ClearSkyOutsideLight and LightSimulation, in the middle of a
    // 200 m × 200 m house with a flat glass roof: each 15-minute step's outside light (taken from the same source at the
    // step's midpoint) is carried through the roof by hand, beam DNI · τ(θ = z) · (1 − shading) · cos z plus diffuse
    // DHI · τ_d · (1 − shading) (Duffie & Beckman ch. 5; MODEL.md §3), and summed into DLI = Σ PPFD · Δt / 10⁶ (MODEL.md §0).
    // Tolerance 0.5 %: the sky quadrature's documented accuracy for a smooth weight (it touches only the diffuse part),
    // plus the walls, which take the place of the roof only below 1.7° elevation.
    [Fact]
    public void Clear_day_under_a_flat_glass_roof_integrates_to_the_hand_computed_dli()
    {
        const double Shading = 0.12;
        var house = new Glasshouse(
            new Footprint(-100, -100, Angle.Zero, 200, 200), 1, 200, 4, Angle.Zero,
            Glass, Glass, Glass, Glass, Glass, Shading);
        Site site = MakeSite(house, [OnePoint("middle", 0, 0)], []);
        CompiledLightField field = LightFieldCompiler.Compile(site, EnclosureBuilder.Build(site));
        var source = new ClearSkyOutsideLight(site.Location, site.Zone, site.Weather);
        var date = new LocalDate(2026, 6, 21);
        BenchDayLight day = LightSimulation.Run(field, source, date, date).Days.Single();

        const int Intervals = 4000;
        double h = Math.PI / 2 / Intervals, tauD = 0;
        for (int i = 0; i < Intervals; i++)
        {
            double theta = (i + 0.5) * h;
            tauD += 2 * DuffieBeckmanTau(theta * 180 / Math.PI, N, K, L, 1) * Math.Cos(theta) * Math.Sin(theta) * h;
        }

        Instant start = Amsterdam.AtStartOfDay(date).ToInstant();
        double sum = 0, beamSum = 0;
        for (int step = 0; step < 96; step++)
        {
            OutsideLight o = source.At(start + Duration.FromMinutes((15 * step) + 7.5));
            double cosZ = o.SunDirection.Normalized().Z;
            double beam = cosZ > 0 && o.DirectNormalPpfd > 0
                ? o.DirectNormalPpfd * DuffieBeckmanTau(Math.Acos(cosZ) * 180 / Math.PI, N, K, L, 1) * (1 - Shading) * cosZ
                : 0;
            beamSum += beam * 900;
            sum += (beam + (o.DiffuseHorizontalPpfd * tauD * (1 - Shading))) * 900;
        }

        double expectedDli = sum / 1e6;
        Assert.True(beamSum > 0.5 * sum, "a clear summer day is mostly beam light");
        Assert.InRange(day.Dli, expectedDli * 0.995, expectedDli * 1.005);
    }
}
