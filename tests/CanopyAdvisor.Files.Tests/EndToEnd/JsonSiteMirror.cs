using System.Text.Json.Nodes;

namespace CanopyAdvisor.Files.Tests.EndToEnd;

/// <summary>Mirrors a site file east–west (x → −x) at the JSON level, following the site file reference (Sites/README.md).</summary>
/// <remarks>
/// A footprint's width runs to the right of its axis; mirroring flips handedness, so the mirrored footprint starts at the
/// image of the far corner of the width, (cornerX + w cos a, cornerY − w sin a) → x negated, with axis −a. Glasshouse
/// left and right walls swap; lamp and row positions and row steps have x negated; aims have yaw and spin negated.
/// </remarks>
internal static class JsonSiteMirror
{
    public static string Mirror(string json)
    {
        JsonNode root = JsonNode.Parse(json)!;
        MirrorFootprints(root);
        JsonObject covers = root["structure"]!["covers"]!.AsObject();
        (covers["leftWall"], covers["rightWall"]) = (covers["rightWall"]!.DeepClone(), covers["leftWall"]!.DeepClone());
        foreach (JsonNode? lamp in root["lamps"]?.AsArray() ?? [])
        {
            Negate(lamp!, "xM");
            MirrorAim(lamp!);
        }

        foreach (JsonNode? row in root["lampRows"]?.AsArray() ?? [])
        {
            Negate(row!["start"]!, "xM");
            Negate(row!["step"]!, "xM");
            MirrorAim(row!);
        }

        return root.ToJsonString();
    }

    private static void MirrorFootprints(JsonNode node)
    {
        switch (node)
        {
            case JsonObject o when o.ContainsKey("cornerXM"):
                {
                    double a = (double)o["axisAzimuthDeg"]! * Math.PI / 180;
                    double w = (double)o["widthM"]!;
                    double x = (double)o["cornerXM"]! + (w * Math.Cos(a));
                    double y = (double)o["cornerYM"]! - (w * Math.Sin(a));
                    o["cornerXM"] = -x;
                    o["cornerYM"] = y;
                    o["axisAzimuthDeg"] = -(double)o["axisAzimuthDeg"]!;
                    break;
                }

            case JsonObject o:
                foreach (KeyValuePair<string, JsonNode?> child in o.ToList())
                {
                    if (child.Value is not null)
                    {
                        MirrorFootprints(child.Value);
                    }
                }

                break;
            case JsonArray array:
                foreach (JsonNode? item in array)
                {
                    if (item is not null)
                    {
                        MirrorFootprints(item);
                    }
                }

                break;
        }
    }

    private static void MirrorAim(JsonNode holder)
    {
        if (holder["aim"] is JsonObject aim)
        {
            Negate(aim, "yawDeg");
            Negate(aim, "spinDeg");
        }
    }

    private static void Negate(JsonNode o, string name)
    {
        if (o[name] is JsonNode value)
        {
            o[name] = -(double)value;
        }
    }
}
