using System.Text.Json;

namespace CanopyAdvisor.Cli.Tests;

/// <summary><c>canopy calibrate</c>: from the demo site and its demo observations (made by the simulator with M = 1.2 and
/// γ = 1.1 plus seeded noise, see the file's header) to estimates, residuals and a variant file the crop library loads.</summary>
public sealed class CalibrateCommandTests : IDisposable
{
    private readonly string _directory = Directory.CreateTempSubdirectory("canopy-calibrate-").FullName;

    public void Dispose() => Directory.Delete(_directory, recursive: true);

    [Fact]
    public void The_demo_recovers_the_parameters_the_demo_observations_were_made_with()
    {
        var (code, output, error) = CliRunner.Run("calibrate", "demo:glasshouse", "--observations", "demo:glasshouse", "--json");
        Assert.True(code == 0, error);
        using JsonDocument doc = JsonDocument.Parse(output);
        JsonElement root = doc.RootElement;
        Assert.Equal("petunia", root.GetProperty("crop").GetString());
        Assert.Equal(20, root.GetProperty("observations").GetInt32());
        Assert.Equal(20, root.GetProperty("residuals").GetArrayLength());
        Assert.True(root.GetProperty("converged").GetBoolean());
        double[] truth = [1.2, 1.1]; // the generator's values (tests/CanopyAdvisor.Files.Tests/Observations/DemoObservationsGenerator.cs)
        JsonElement estimates = root.GetProperty("estimates");
        for (int k = 0; k < 2; k++)
        {
            double value = estimates[k].GetProperty("value").GetDouble();
            double se = estimates[k].GetProperty("standardError").GetDouble();
            Assert.InRange(Math.Abs(value - truth[k]), 0, 2 * se);
        }

        Assert.True(root.GetProperty("rmsMisfitDeg").GetDouble() < root.GetProperty("initialRmsMisfitDeg").GetDouble());
        Assert.Contains("calibrating", error, StringComparison.Ordinal);
    }

    [Fact]
    public void The_variant_is_written_where_asked_and_the_crop_library_loads_it()
    {
        string path = Path.Combine(_directory, "petunia-house-a.toml");
        var (code, output, error) = CliRunner.Run("calibrate", "demo:glasshouse", "--observations", "demo:glasshouse", "--out", path);
        Assert.True(code == 0, error);
        Assert.Contains("warnings: none", output, StringComparison.Ordinal);
        Assert.Contains($"variant 'petunia-house-a' written to {path}", output, StringComparison.Ordinal);
        Assert.StartsWith("# DEMO DATA", File.ReadAllText(path), StringComparison.Ordinal);

        var (showCode, shown, showError) = CliRunner.Run("crops", "show", "petunia-house-a", "--crops", _directory);
        Assert.True(showCode == 0, showError);
        Assert.Contains("calibrated: demo-glasshouse, 2026-11-14 to 2026-12-01, n = 20", shown, StringComparison.Ordinal);
    }

    [Fact]
    public void Bad_observations_are_reported_by_file_and_line_and_nothing_is_computed()
    {
        string file = Path.Combine(_directory, "lean.csv");
        File.WriteAllText(file, """
            benchId,at,tiltDeg,azimuthDeg,plants
            south-1,2026-11-20T11:00:00+01:00,8,85,5
            south-9,2026-11-21T11:00:00+01:00,8,85,5
            south-1,2026-11-01T11:00:00+01:00,8,85,5
            south-2,2026-11-22T11:00:00+01:00,8,85,5
            """);
        var (code, output, error) = CliRunner.Run("calibrate", "demo:glasshouse", "--observations", file, "--crop", "petunia");
        Assert.Equal(CanopyCommandLine.InvalidInputExitCode, code);
        Assert.Equal(string.Empty, output);
        Assert.Contains("lean.csv:3: benchId: no bench 'south-9' on the site", error, StringComparison.Ordinal);
        Assert.Contains("lean.csv:4: at: 2026-11-01T11:00+01:00 is before lot 'lot-south-1' was planted (2026-11-12)", error, StringComparison.Ordinal);
        Assert.Contains("lean.csv:5: benchId: bench 'south-2' carries lot 'lot-south-2' of crop 'pelargonium', not of 'petunia'", error, StringComparison.Ordinal);
    }

    [Fact]
    public void Observations_that_cannot_identify_the_parameters_are_refused_and_nothing_is_saved()
    {
        // Issue check: calibration refuses data that cannot identify the parameters. Two leans on one afternoon give
        // four lean components for two parameters and one moment of bending: M and γ trade off (AC model, MODEL.md §4).
        string file = Path.Combine(_directory, "one-day.csv");
        File.WriteAllText(file, """
            benchId,at,tiltDeg,azimuthDeg,plants
            south-1,2026-11-20T14:00:00+01:00,8.8,85.1,10
            south-1,2026-11-20T15:00:00+01:00,8.7,85.3,10
            """);
        string path = Path.Combine(_directory, "petunia-one-day.toml");
        var (code, output, error) = CliRunner.Run("calibrate", "demo:glasshouse", "--observations", file, "--out", path);
        Assert.Equal(CanopyCommandLine.InvalidInputExitCode, code);
        Assert.Contains("the data cannot separate M and γ", output, StringComparison.Ordinal);
        Assert.Contains("not saved: the observations cannot identify the parameters", output, StringComparison.Ordinal);
        Assert.Contains("the variant was not saved", error, StringComparison.Ordinal);
        Assert.False(File.Exists(path));
    }

    [Fact]
    public void Now_defaults_to_the_lots_height_measurement_when_the_observations_end_earlier()
    {
        // The demo lot's height was measured on 2026-12-01 (demo site file); these rows of the demo observations end on
        // 2026-11-26, and a forecast cannot start before the height measurement, so now is its noon.
        string file = Path.Combine(_directory, "early.csv");
        File.WriteAllText(file, """
            benchId,at,tiltDeg,azimuthDeg,heightMm,plants
            south-1,2026-11-14T11:00:00+01:00,8.37,80.8,,10
            south-1,2026-11-16T15:00:00+01:00,7.92,87.2,,10
            south-1,2026-11-20T11:00:00+01:00,8.85,81.5,,10
            south-1,2026-11-22T15:00:00+01:00,9.24,87.2,,10
            south-1,2026-11-24T15:00:00+01:00,8.16,266.7,,10
            south-1,2026-11-26T11:00:00+01:00,2.08,276.8,,10
            """);
        var (code, output, error) = CliRunner.Run("calibrate", "demo:glasshouse", "--observations", file, "--json");
        Assert.True(code == 0, error);
        using JsonDocument doc = JsonDocument.Parse(output);
        Assert.Equal("2026-12-01T12:00+01:00", doc.RootElement.GetProperty("now").GetString());
        Assert.Equal(6, doc.RootElement.GetProperty("residuals").GetArrayLength());
    }

    [Theory]
    [InlineData("--params", "M,delta", "'delta' is not a parameter to fit")]
    [InlineData("--now", "2026-11-20T12:00:00+01:00", "is after now (2026-11-20T12:00+01:00)")]
    [InlineData("--out", "Not An Id.toml", "is not a crop id")]
    public void Bad_options_are_refused(string option, string value, string message)
    {
        string argument = option == "--out" ? Path.Combine(_directory, value) : value;
        var (code, _, error) = CliRunner.Run("calibrate", "demo:glasshouse", "--observations", "demo:glasshouse", option, argument);
        Assert.Equal(CanopyCommandLine.InvalidInputExitCode, code);
        Assert.Contains(message, error, StringComparison.Ordinal);
    }
}
