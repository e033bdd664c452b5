using System.Globalization;
using System.Text;
using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using NodaTime;
using static CanopyAdvisor.Core.Tests.Forecast.ForecastTestKit;

namespace CanopyAdvisor.Core.Tests.Forecast;

/// <summary>Rotation, growth, flags and determinism of the forecast.</summary>
public class BenchForecasterGrowthTests
{
    private static Site SouthBench(params RotationRecord[] rotations) =>
        Site(OpaqueNorthGlasshouse, [Bench("south", 3, 1, 2, 1.5, 4, 4)], [], Lot("south", WinterNow, rotations: rotations));

    [Fact]
    public void A_recorded_half_turn_reduces_the_lean()
    {
        // Common practice: turning pots by 180° straightens plants that lean to one side; MODEL.md §4 (rotation check:
        // a lean flipped by 180° every T stays below the unrotated lean).
        BenchForecast none = Assert.Single(BenchForecaster.Run(Request(SouthBench()) with { IncludeUncertainty = false }).Benches);
        BenchForecast turned = Assert.Single(BenchForecaster.Run(
            Request(SouthBench(new RotationRecord(WinterNow - Duration.FromDays(3), Angle.FromDegrees(180)))) with { IncludeUncertainty = false }).Benches);

        Assert.True(turned.LeanNow.Tilt < none.LeanNow.Tilt * 0.8,
            $"turned {turned.LeanNow.Tilt.Degrees:0.00}° vs none {none.LeanNow.Tilt.Degrees:0.00}°");
    }

    [Fact]
    public void Below_the_base_temperature_nothing_grows_and_nothing_bends()
    {
        // Cardinal-temperature model (Yan & Hunt 1999, Ann Bot 84:607): no elongation at or below the base
        // temperature (4 °C for the test crop); bending rate is proportional to elongation (Bastien et al. 2013).
        BenchForecast forecast = Assert.Single(BenchForecaster.Run(Request(SouthBench(), temperature: new ConstantTemperature(2))).Benches);

        Assert.Equal(0, forecast.LeanNow.Tilt.Degrees, 1e-9);
        Assert.Equal(0, forecast.LeanAtHorizon.Tilt.Degrees, 1e-9);
        Assert.Equal(0, forecast.LeanRateDegreesPerDay, 1e-9);
        Assert.Equal(80, forecast.HeightNowMm, 1e-9);
        Assert.Equal(80, forecast.HeightAtSaleMm, 1e-9);
        Assert.Null(forecast.LeavesGradeAt);
    }

    [Fact]
    public void Height_over_grade_by_the_sale_date_raises_a_leggy_flag()
    {
        // MODEL.md §5 flags: "height over spec by sale date" is a leggy risk, with the number behind it. At 20 °C the
        // test crop grows at most Ė_ref = 5 mm/d times its stretch factors, so 140 mm 21 days before sale passes 150 mm.
        Site site = Site(OpaqueNorthGlasshouse, [Bench("south", 3, 1, 2, 1.5, 4, 4)], [], Lot("south", WinterNow, heightMm: 140));
        BenchForecast forecast = Assert.Single(BenchForecaster.Run(Request(site) with { IncludeUncertainty = false }).Benches);

        ForecastFlag flag = Assert.Single(forecast.Flags, f => f.Cause == "heightOverGrade");
        Assert.Equal(ForecastFlagKind.Leggy, flag.Kind);
        Assert.Equal(forecast.HeightAtSaleMm, flag.Value);
        Assert.Equal(150, flag.Limit);
        Assert.Equal("mm", flag.Unit);
        Assert.True(forecast.HeightAtSaleMm > forecast.HeightAtHorizonMm && forecast.HeightAtHorizonMm > forecast.HeightNowMm);
    }

    [Fact]
    public void The_uncertainty_band_holds_the_forecast_and_names_its_drivers()
    {
        // MODEL.md §7: the forecast says how sure it is from the parameter ranges.
        BenchForecast forecast = Assert.Single(BenchForecaster.Run(Request(SouthBench())).Benches);
        LeanUncertainty band = Assert.IsType<LeanUncertainty>(forecast.Uncertainty);

        Assert.True(band.Low <= forecast.LeanAtHorizon.Tilt && forecast.LeanAtHorizon.Tilt <= band.High);
        Assert.True(band.High > band.Low);
        Assert.Equal(4, band.Drivers.Length);
        for (int i = 1; i < band.Drivers.Length; i++)
        {
            Assert.True(band.Drivers[i - 1].Swing >= band.Drivers[i].Swing);
        }
    }

    [Fact]
    public void Two_runs_give_the_same_forecast()
    {
        // Determinism (ARCHITECTURE.md: a forecast stores the hash of its inputs and is served again from the store).
        Site site = Site(
            OpaqueNorthGlasshouse,
            [Bench("south", 3, 1, 2, 1.5, 4, 4), Bench("middle", 3, 9, 2, 1.5, 3, 3), Bench("north", 3, 16, 2, 1.5, 3, 4)],
            [],
            Lot("south", WinterNow), Lot("middle", WinterNow), Lot("north", WinterNow));
        Assert.Equal(Dump(BenchForecaster.Run(Request(site))), Dump(BenchForecaster.Run(Request(site))));
    }

    [Fact]
    public void Progress_reaches_one()
    {
        var seen = new List<double>();
        var progress = new SynchronousProgress(seen);
        BenchForecaster.Run(Request(SouthBench()) with { IncludeUncertainty = false }, progress);
        Assert.Equal(1.0, seen.Max());
    }

    private static string Dump(SiteForecast forecast)
    {
        var text = new StringBuilder();
        foreach (BenchForecast b in forecast.Benches)
        {
            text.Append(CultureInfo.InvariantCulture, $"{b with { Flags = [], PointLeansAtHorizon = [], Uncertainty = null }}");
            foreach (ForecastFlag f in b.Flags)
            {
                text.Append(CultureInfo.InvariantCulture, $"|{f}");
            }

            foreach (LeanReading p in b.PointLeansAtHorizon)
            {
                text.Append(CultureInfo.InvariantCulture, $"|{p.Tilt.Radians:R},{p.Azimuth.Radians:R}");
            }

            if (b.Uncertainty is { } u)
            {
                text.Append(CultureInfo.InvariantCulture, $"|{u.Low.Radians:R},{u.High.Radians:R}");
                foreach (ParameterSwing s in u.Drivers)
                {
                    text.Append(CultureInfo.InvariantCulture, $"|{s.Key},{s.LeanAtMinimum.Radians:R},{s.LeanAtMaximum.Radians:R}");
                }
            }

            text.AppendLine();
        }

        return text.ToString();
    }

    private sealed class SynchronousProgress(List<double> seen) : IProgress<double>
    {
        public void Report(double value)
        {
            lock (seen)
            {
                seen.Add(value);
            }
        }
    }
}
