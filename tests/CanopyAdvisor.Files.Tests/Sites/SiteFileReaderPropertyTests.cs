using System.Text.Json.Nodes;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Sites;
using CsCheck;

namespace CanopyAdvisor.Files.Tests.Sites;

/// <summary>
/// COMMON.md "bad input: never crash, never half-compute": whatever one value of a valid file is replaced with, the
/// reader either returns a site that passes SiteValidator or throws InvalidInputException with at least one error.
/// </summary>
public class SiteFileReaderPropertyTests
{
    private static readonly string[] Replacements =
    [
        "null", "0", "-1", "1e300", "0.5", "2.5", "400", "401", "true", "\"\"", "\"x\"", "\"25:00\"", "[]", "{}", "[1, 2]", "{ \"kind\": \"ies\" }",
    ];

    private static List<string> LeafPaths(JsonNode? node, string path)
    {
        var result = new List<string>();
        switch (node)
        {
            case JsonObject o:
                foreach ((string name, JsonNode? value) in o)
                {
                    result.AddRange(LeafPaths(value, path.Length == 0 ? name : $"{path}.{name}"));
                }

                break;
            case JsonArray a:
                for (int i = 0; i < a.Count; i++)
                {
                    result.AddRange(LeafPaths(a[i], $"{path}[{i}]"));
                }

                break;
            default:
                result.Add(path);
                break;
        }

        return result;
    }

    [Fact]
    public void Any_single_replaced_value_gives_a_sound_site_or_errors_never_a_crash()
    {
        List<string> leaves = LeafPaths(JsonNode.Parse(SiteJson.Glasshouse), string.Empty);
        Gen.Select(Gen.Int[0, leaves.Count - 1], Gen.Int[0, Replacements.Length - 1], Gen.Bool)
            .Sample(
                (leaf, replacement, remove) =>
                {
                    string json = SiteJson.With(SiteJson.Glasshouse, (leaves[leaf], remove ? SiteJson.Remove : Replacements[replacement]));
                    try
                    {
                        Site site = new SiteFileReader(new TestBeams()).Parse(json, "f.json", null);
                        return SiteValidator.Validate(site).Count == 0;
                    }
                    catch (InvalidInputException e)
                    {
                        return e.Errors.Count > 0 && e.Errors.All(x => x.Path.Length > 0 && x.Message.Length > 0);
                    }
                },
                iter: 2000);
    }
}
