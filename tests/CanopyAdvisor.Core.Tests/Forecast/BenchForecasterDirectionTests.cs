using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Tests.EndToEnd;
using CanopyAdvisor.Core.Tests.Light;
using NodaTime;
using static CanopyAdvisor.Core.Tests.Forecast.ForecastTestKit;

namespace CanopyAdvisor.Core.Tests.Forecast;

/// <summary>Which way the forecast leans benches: trade facts (common practice) and symmetry.</summary>
public class BenchForecasterDirectionTests
{
    [Fact]
    public void A_bench_by_the_south_glass_wall_in_December_leans_south()
    {
        // Common practice: in a glasshouse at 52° N in winter the low sun (noon elevation about 15° in December,
        // computed: 90° − 52° − 23.4°) comes in through the south side, and plants near the south wall with an opaque
        // north wall lean toward the south.
        Site site = Site(OpaqueNorthGlasshouse, [Bench("south", 3, 1, 2, 1.5, 4, 4)], [], Lot("south", WinterNow));
        BenchForecast forecast = Assert.Single(BenchForecaster.Run(Request(site)).Benches);

        Assert.True(forecast.LeanNow.Tilt.Degrees > 1, $"lean now {forecast.LeanNow.Tilt.Degrees:0.00}°");
        Assert.True(BearingDifferenceDeg(forecast.LeanNow.Azimuth, Angle.FromDegrees(180)) < 45,
            $"lean azimuth {forecast.LeanNow.Azimuth.Degrees:0.0}° ({forecast.LeanNow.CompassPoint})");
        Assert.True(BearingDifferenceDeg(forecast.LeanAtHorizon.Azimuth, Angle.FromDegrees(180)) < 45);
        Assert.Contains(forecast.LeanNow.CompassPoint, new[] { "SE", "SSE", "S", "SSW", "SW" });
    }

    [Fact]
    public void Plants_lean_toward_a_side_lamp()
    {
        // Common practice (phototropism): plants lean toward the brighter side; here an isotropic lamp 2.5 m east of the
        // bench centre at 1.1 m in an indoor room, with no other light.
        Lamp side = new("side", new Vector3(7.5, 5, 1.1), LampAim.Down, IsotropicDistribution.Instance, 400, White, 1, 100, LampSchedule.AlwaysOn);
        Site site = Site(Room, [Bench("b", 4, 4, 2, 2, 4, 4)], [side], Lot("b", WinterNow));
        BenchForecast forecast = Assert.Single(BenchForecaster.Run(Request(site, temperature: new ConstantTemperature(20))).Benches);

        Assert.True(forecast.LeanAtHorizon.Tilt.Degrees > 1, $"lean {forecast.LeanAtHorizon.Tilt.Degrees:0.00}°");
        Assert.True(BearingDifferenceDeg(forecast.LeanAtHorizon.Azimuth, Angle.FromDegrees(90)) < 10,
            $"azimuth {forecast.LeanAtHorizon.Azimuth.Degrees:0.0}°");
    }

    [Theory]
    [InlineData(0, 1e-6)] // no circumnutation: exact balance up to rounding
    [InlineData(5, 0.01)] // 5° circumnutation: averaged out over whole periods (0.0005° remains)
    public void Under_a_uniform_lamp_grid_the_middle_of_a_centred_bench_stays_upright(double nutationDeg, double toleranceDeg)
    {
        // Symmetry (MODEL.md §3: isotropic or balanced light has no net vector): a bench centred under a uniform grid
        // in a room has a balanced light vector at its centre, so the middle stem and the bench mean do not lean.
        Site site = Site(Room, [Bench("b", 3.5, 3.5, 3, 3, 5, 5)], UniformLampGrid(), Lot("b", WinterNow));
        var crop = TestCrop with { NutationAmplitudeDeg = new CropParameter(nutationDeg, "deg", 0, 15, "demo: test value") };
        BenchForecast forecast = Assert.Single(BenchForecaster.Run(
            Request(site, temperature: new ConstantTemperature(20), crops: crop) with { IncludeUncertainty = false }).Benches);

        LeanReading middle = forecast.PointLeansAtHorizon[(2 * 5) + 2];
        Assert.True(middle.Tilt.Degrees < toleranceDeg, $"middle {middle.Tilt.Degrees:0.000000}°");
        Assert.True(forecast.LeanAtHorizon.Tilt.Degrees < toleranceDeg, $"bench {forecast.LeanAtHorizon.Tilt.Degrees:0.000000}°");
    }

    [Fact]
    public void Edge_plants_lean_outward_more_than_the_middle()
    {
        // Common practice (the edge effect, MODEL.md §3): inside a dense canopy low-angle light reaches edge plants
        // from outside the bench but is shaded for middle plants, so edge plants lean outward. A small bench in the
        // middle of a one-bay glass house under an overcast sky (low sky light comes in through the glass side and end
        // walls), short dense plants (40 mm, LAD 20 at 0.15 m, here at 0.1 m spacing), so stems sense 20 mm deep and
        // edge points sit 0.1 m from the edge.
        var overcast = new FixedOutsideLight(new Vector3(0, 0, -1), 0, 200);
        var house = new Glasshouse(new Footprint(0, 0, Angle.Zero, 40, 10), 1, 10, 4, Angle.FromDegrees(22), Glass, Glass, Glass, Glass, Glass, 0);
        Site site = Site(house, [Bench("b", 4.5, 19.5, 1, 1, 5, 5)], [], Lot("b", WinterNow, heightMm: 40, spacingM: 0.1, pots: 100));
        var crop = TestCrop with { GrowthZoneLengthMm = TestCrop.GrowthZoneLengthMm.WithValue(40), LeafAreaDensityM2PerM3 = TestCrop.LeafAreaDensityM2PerM3.WithValue(20) };
        BenchForecast forecast = Assert.Single(BenchForecaster.Run(
            Request(site, overcast, new ConstantTemperature(20), crops: crop) with { IncludeUncertainty = false }).Benches);

        LeanReading middle = forecast.PointLeansAtHorizon[(2 * 5) + 2];
        for (int i = 0; i < 5; i++)
        {
            for (int j = 0; j < 5; j++)
            {
                if (i is not (0 or 4) && j is not (0 or 4))
                {
                    continue;
                }

                // The bench's length runs north (index i), its width east (index j); outward from the centre.
                double outEast = j - 2, outNorth = i - 2;
                LeanReading edge = forecast.PointLeansAtHorizon[(i * 5) + j];
                (double e, double n) = Vector(edge);
                Assert.True((e * outEast) + (n * outNorth) > 0, $"point ({i}, {j}) leans ({e:0.0000}, {n:0.0000})");
                Assert.True(edge.Tilt > middle.Tilt, $"point ({i}, {j}) {edge.Tilt.Degrees:0.000}° vs middle {middle.Tilt.Degrees:0.000}°");
            }
        }
    }

    [Fact]
    public void Turning_the_site_and_the_sun_turns_the_lean_by_the_same_angle()
    {
        // Symmetry: the model has no preferred direction, so turning the whole site and the sun by 90° about the
        // vertical turns every lean azimuth by 90° and keeps the tilt (up to the sky quadrature's resolution).
        var sun = new Vector3(0.2, -0.9, 0.35).Normalized();
        Site site = Site(OpaqueNorthGlasshouse, [Bench("south", 3, 1, 2, 1.5, 4, 4)], [], Lot("south", WinterNow));
        var turn = new SiteRotation(90);
        BenchForecast a = Assert.Single(BenchForecaster.Run(
            Request(site, new FixedOutsideLight(sun, 300, 60), new ConstantTemperature(20)) with { IncludeUncertainty = false }).Benches);
        BenchForecast b = Assert.Single(BenchForecaster.Run(
            Request(turn.Site(site), new FixedOutsideLight(turn.Point(sun), 300, 60), new ConstantTemperature(20)) with { IncludeUncertainty = false }).Benches);

        Assert.True(a.LeanAtHorizon.Tilt.Degrees > 1);
        Assert.Equal(a.LeanAtHorizon.Tilt.Degrees, b.LeanAtHorizon.Tilt.Degrees, 0.05 * a.LeanAtHorizon.Tilt.Degrees);
        Assert.True(BearingDifferenceDeg(a.LeanAtHorizon.Azimuth + Angle.FromDegrees(90), b.LeanAtHorizon.Azimuth) < 2,
            $"{a.LeanAtHorizon.Azimuth.Degrees:0.00}° then {b.LeanAtHorizon.Azimuth.Degrees:0.00}°");
    }
}
