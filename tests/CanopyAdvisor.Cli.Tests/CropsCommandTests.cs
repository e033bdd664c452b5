namespace CanopyAdvisor.Cli.Tests;

/// <summary><c>canopy crops</c>: the library as growers read it, with provenance beside every value.</summary>
public class CropsCommandTests
{
    [Fact]
    public void List_names_every_group()
    {
        var (code, output, error) = CliRunner.Run("crops", "list");
        Assert.True(code == 0, error);
        foreach (string group in new[] { "BeddingPlant", "PotPlant", "Herb", "VegetableTransplant", "Microgreen" })
        {
            Assert.Contains(group, output, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void Show_gives_unit_range_and_source_of_each_parameter()
    {
        var (code, output, _) = CliRunner.Run("crops", "show", "petunia");
        Assert.Equal(0, code);
        // Bedding-plant young plants need a DLI of 10–12 mol m⁻² d⁻¹ (Craver, Boldt & Lopez 2019, HortScience 54:52).
        string dliLine = output.Split('\n').Single(l => l.StartsWith("dliMinimum", StringComparison.Ordinal));
        Assert.Contains("mol m-2 d-1", dliLine, StringComparison.Ordinal);
        Assert.Contains("Craver", dliLine, StringComparison.Ordinal);
        Assert.DoesNotContain(output.Split('\n'), l => l.EndsWith(' '));
    }

    [Fact]
    public void Unknown_crop_is_named()
    {
        var (code, _, error) = CliRunner.Run("crops", "show", "petuna");
        Assert.Equal(CanopyCommandLine.InvalidInputExitCode, code);
        Assert.Contains("unknown crop 'petuna'", error, StringComparison.Ordinal);
    }
}
