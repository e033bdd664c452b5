using CanopyAdvisor.Core.Advice.Calibration;
using CanopyAdvisor.Files.Observations;

namespace CanopyAdvisor.Files.Tests.Observations;

/// <summary>The demo observations are what their header says: the simulator's leans with the stated parameters and noise.</summary>
public class DemoObservationsTests
{
    [Fact]
    public void The_glasshouse_demo_file_is_the_simulators_lean_plus_the_stated_noise()
    {
        string expected = DemoObservationsGenerator.Generate();
        var made = LeanObservationReader.Parse(expected, "generated");
        var shipped = DemoObservations.Load("glasshouse");

        Assert.True(made.Length == shipped.Length, expected);
        for (int i = 0; i < made.Length; i++)
        {
            LeanObservation a = made[i];
            LeanObservation b = shipped[i];
            Assert.True(a.BenchId == b.BenchId && a.At == b.At && a.PlantsMeasured == b.PlantsMeasured && a.HeightMm == b.HeightMm, expected);
            // Written to 0.01° tilt and 0.1° azimuth; a little more room for rounding in later builds of the simulator.
            Assert.True(Math.Abs(a.Tilt.Degrees - b.Tilt.Degrees) <= 0.02, expected);
            Assert.True(Math.Abs(a.Azimuth.Degrees - b.Azimuth.Degrees) <= 0.2, expected);
        }
    }

    [Fact]
    public void The_demo_file_is_marked_as_demo_data_and_dated_before_the_season_forecast()
    {
        string text = DemoObservations.ReadText("glasshouse");
        Assert.StartsWith("# DEMO DATA, invented", text, StringComparison.Ordinal);
        var observations = DemoObservations.Load("glasshouse");
        Assert.All(observations, o => Assert.True(o.At < NodaTime.Instant.FromUtc(2026, 12, 2, 0, 0)));
        Assert.Equal("demo:glasshouse:7", observations[0].Where);
        Assert.Throws<ArgumentException>(() => DemoObservations.ReadText("elsewhere"));
    }
}
