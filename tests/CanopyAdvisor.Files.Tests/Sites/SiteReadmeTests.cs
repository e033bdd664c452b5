using System.Text.Json.Nodes;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Files.Sites;
using Json.Schema;

namespace CanopyAdvisor.Files.Tests.Sites;

/// <summary>The example in the site file reference (src/CanopyAdvisor.Files/Sites/README.md) is a valid site.</summary>
public class SiteReadmeTests
{
    private static string ReadmeExample()
    {
        string? dir = AppContext.BaseDirectory;
        while (dir is not null && !File.Exists(Path.Combine(dir, "CanopyAdvisor.sln")))
        {
            dir = Path.GetDirectoryName(dir);
        }

        Assert.NotNull(dir);
        string text = File.ReadAllText(Path.Combine(dir, "src", "CanopyAdvisor.Files", "Sites", "README.md"));
        int start = text.IndexOf("```json\n", StringComparison.Ordinal) + "```json\n".Length;
        int end = text.IndexOf("```", start, StringComparison.Ordinal);
        return text[start..end];
    }

    [Fact]
    public void Readme_example_reads_and_conforms_to_the_schema()
    {
        string json = ReadmeExample();

        Site site = new SiteFileReader(new TestBeams()).Parse(json, "README.md", null);
        EvaluationResults result = JsonSchema.FromText(SiteSchema.ReadText()).Evaluate(JsonNode.Parse(json));

        Assert.Equal(4, site.Lamps.Length);
        Assert.Equal("petunia-compact", Assert.Single(site.Lots).CropId);
        Assert.Equal(new TemperatureSetpoints(20, 17, 3, 2), site.Temperatures);
        Assert.True(result.IsValid);
    }
}
