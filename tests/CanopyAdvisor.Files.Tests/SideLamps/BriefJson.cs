using System.Text.Json.Nodes;
using CanopyAdvisor.Core.Advice.SideLamps;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Files.SideLamps;
using CanopyAdvisor.Files.Sites;

namespace CanopyAdvisor.Files.Tests.SideLamps;

/// <summary>The demo glasshouse site and brief, and edits of the brief for the bad-file tests.</summary>
internal static class BriefJson
{
    public const string Remove = "<remove>";

    public static Site Site { get; } = DemoSites.Load("glasshouse", StandardBeamFactory.Instance);

    public static IReadOnlyDictionary<string, SideLampType> LampTypes { get; } =
        SiteLampTypes.Read(DemoSites.ReadText("glasshouse"), null, StandardBeamFactory.Instance);

    public static string Demo => DemoSideLampBriefs.ReadText("glasshouse");

    public static SideLampBrief Parse(string json) => new SideLampBriefReader(LampTypes).Parse(json, "brief.json", Site);

    /// <summary>The demo brief with the value at a dotted path (<c>rails[0].end.zM</c>) replaced by JSON text, or removed.</summary>
    public static string With(string path, string json)
    {
        JsonNode root = JsonNode.Parse(Demo)!;
        string[] parts = path.Replace("[", ".[", StringComparison.Ordinal).Split('.');
        JsonNode parent = root;
        for (int i = 0; i < parts.Length - 1; i++)
        {
            parent = Step(parent, parts[i])!;
        }

        string last = parts[^1];
        if (last.StartsWith('['))
        {
            int index = int.Parse(last.Trim('[', ']'), System.Globalization.CultureInfo.InvariantCulture);
            if (json == Remove)
            {
                parent.AsArray().RemoveAt(index);
            }
            else
            {
                parent.AsArray()[index] = JsonNode.Parse(json);
            }
        }
        else if (json == Remove)
        {
            parent.AsObject().Remove(last);
        }
        else
        {
            parent.AsObject()[last] = JsonNode.Parse(json);
        }

        return root.ToJsonString();
    }

    private static JsonNode? Step(JsonNode node, string part) =>
        part.StartsWith('[')
            ? node.AsArray()[int.Parse(part.Trim('[', ']'), System.Globalization.CultureInfo.InvariantCulture)]
            : node[part];
}
