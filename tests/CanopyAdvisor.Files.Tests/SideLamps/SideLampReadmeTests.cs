using System.Text.Json.Nodes;
using CanopyAdvisor.Core.Advice.SideLamps;
using CanopyAdvisor.Files.SideLamps;
using Json.Schema;

namespace CanopyAdvisor.Files.Tests.SideLamps;

/// <summary>The example in the brief reference (src/CanopyAdvisor.Files/SideLamps/README.md) is the shipped demo brief,
/// reads against the demo site and conforms to the schema.</summary>
public class SideLampReadmeTests
{
    private static string ReadmeExample()
    {
        string? dir = AppContext.BaseDirectory;
        while (dir is not null && !File.Exists(Path.Combine(dir, "CanopyAdvisor.sln")))
        {
            dir = Path.GetDirectoryName(dir);
        }

        Assert.NotNull(dir);
        string text = File.ReadAllText(Path.Combine(dir, "src", "CanopyAdvisor.Files", "SideLamps", "README.md"));
        int start = text.IndexOf("```json\n", StringComparison.Ordinal) + "```json\n".Length;
        int end = text.IndexOf("```", start, StringComparison.Ordinal);
        return text[start..end];
    }

    [Fact]
    public void Readme_example_is_the_demo_brief_and_conforms_to_the_schema()
    {
        string json = ReadmeExample();
        SideLampBrief fromReadme = BriefJson.Parse(json);
        SideLampBrief demo = BriefJson.Parse(BriefJson.Demo);

        Assert.Equal(demo.Rails.ToArray(), fromReadme.Rails.ToArray());
        Assert.Equal(demo.LampTypes.Select(t => t.Name), fromReadme.LampTypes.Select(t => t.Name));
        Assert.Equal(demo.MaxLamps, fromReadme.MaxLamps);
        Assert.Equal(demo.Schedule, fromReadme.Schedule);
        Assert.Equal(demo.PpfdCeilingByCrop, fromReadme.PpfdCeilingByCrop);
        Assert.Equal(demo.DefaultPpfdCeiling, fromReadme.DefaultPpfdCeiling);
        Assert.Equal((demo.RiskFraction, demo.UniformityFloor, demo.EnergyWeightPerKilowatt, demo.MinTilt, demo.MaxTilt, demo.Seed, demo.Starts),
            (fromReadme.RiskFraction, fromReadme.UniformityFloor, fromReadme.EnergyWeightPerKilowatt, fromReadme.MinTilt, fromReadme.MaxTilt, fromReadme.Seed, fromReadme.Starts));
        Assert.True(JsonSchema.FromText(SideLampBriefSchema.ReadText()).Evaluate(JsonNode.Parse(json)).IsValid);
    }
}
