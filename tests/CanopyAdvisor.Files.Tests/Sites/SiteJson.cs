using System.Globalization;
using System.Text.Json;
using System.Text.Json.Nodes;
using System.Text.RegularExpressions;

namespace CanopyAdvisor.Files.Tests.Sites;

/// <summary>Small valid site files for tests, and a way to change one value in them by its path.</summary>
internal static partial class SiteJson
{
    /// <summary>A two-bay glasshouse, 20 m × 16 m, one bench, one side lamp, one row of three toplights, one obstruction, setpoints, tariff, labour and one lot.</summary>
    public const string Glasshouse = """
        {
          "formatVersion": 1,
          "id": "test-glasshouse",
          "name": "Test glasshouse",
          "demoData": true,
          "location": { "latitudeDeg": 52.0, "longitudeDeg": 4.4, "elevationM": 0 },
          "timeZone": "Europe/Amsterdam",
          "weather": { "linkeTurbidity": 3, "dailyClearness": 0.5 },
          "structure": {
            "kind": "glasshouse",
            "footprint": { "cornerXM": 0, "cornerYM": 0, "axisAzimuthDeg": 0, "lengthM": 20, "widthM": 16 },
            "bayCount": 2, "bayWidthM": 8, "gutterHeightM": 5, "roofSlopeDeg": 22, "structuralShading": 0.15,
            "covers": { "roof": "glass", "leftWall": "glass", "rightWall": "glass", "frontWall": "glass", "backWall": "panel" }
          },
          "coverTypes": {
            "glass": { "opaque": false, "refractiveIndex": 1.526, "extinctionPerM": 20, "thicknessM": 0.004, "layers": 1 },
            "panel": { "opaque": true }
          },
          "benches": [
            { "id": "b1", "footprint": { "cornerXM": 2, "cornerYM": 2, "axisAzimuthDeg": 0, "lengthM": 10, "widthM": 1.8 },
              "surfaceHeightM": 0.75, "canopy": { "heightM": 0.3, "sensingDepthM": 0.05, "leafAreaDensityM2PerM3": 6 },
              "samplesAlongLength": 5, "samplesAcrossWidth": 2 }
          ],
          "lampTypes": {
            "top": { "beam": { "kind": "cosinePower", "beamAngleDeg": 110 }, "ppfUmolPerS": 2100, "watts": 750,
                     "bands": { "blue": 0.1, "green": 0.06, "red": 0.84, "farRed": 0.02 } },
            "side": { "beam": { "kind": "lambertian" }, "ppfUmolPerS": 600, "watts": 220,
                      "bands": { "blue": 0.15, "green": 0.1, "red": 0.75, "farRed": 0.02 } }
          },
          "lamps": [
            { "id": "side-1", "type": "side", "xM": 3, "yM": 19.5, "zM": 3,
              "aim": { "yawDeg": 180, "tiltDeg": 60, "spinDeg": 0 }, "dimming": 0.8,
              "schedule": { "on": "04:00", "off": "22:00", "offAboveOutsidePpfd": 500 } }
          ],
          "lampRows": [
            { "id": "row", "type": "top", "start": { "xM": 4, "yM": 2, "zM": 4.5 }, "step": { "xM": 0, "yM": 6, "zM": 0 },
              "count": 3, "schedule": { "on": "04:00", "off": "22:00" } }
          ],
          "obstructions": [
            { "id": "tank", "footprint": { "cornerXM": 2, "cornerYM": -10, "axisAzimuthDeg": 0, "lengthM": 5, "widthM": 5 },
              "baseHeightM": 0, "topHeightM": 6 }
          ],
          "temperatures": { "dayC": 20, "nightC": 17, "preDawnDropC": 3, "preDawnDropHours": 2 },
          "tariff": { "pricePerKWh": 0.2, "currency": "EUR" },
          "labour": {
            "secondsPerPot": 3, "setUpMinutesPerBench": 10,
            "crews": [
              { "id": "team", "name": "bench team", "people": 2, "days": ["mon", "tue", "wed", "thu", "fri"], "start": "07:00", "end": "15:30" },
              { "id": "sat", "days": ["sat"], "start": "08:00", "end": "12:00" }
            ],
            "holidays": ["2026-12-25", "2027-01-01"]
          },
          "lots": [
            { "id": "lot-1", "benchId": "b1", "crop": "petunia-compact", "plantedOn": "2026-11-20", "saleOn": "2027-01-15",
              "heightMm": 60, "measuredOn": "2026-12-01", "spacingM": 0.12, "pots": 800,
              "rotations": [ { "at": "2026-11-28T08:00:00+01:00", "angleDeg": 180 } ] }
          ]
        }
        """;

    /// <summary>An indoor room, 10 m × 6 m × 3 m, one rack tier with a row of LED bars over it.</summary>
    public const string IndoorRoom = """
        {
          "formatVersion": 1,
          "id": "test-room",
          "name": "Test room",
          "location": { "latitudeDeg": 41.8, "longitudeDeg": -87.9, "elevationM": 190 },
          "timeZone": "America/Chicago",
          "structure": {
            "kind": "indoorRoom",
            "footprint": { "cornerXM": 0, "cornerYM": 0, "axisAzimuthDeg": 0, "lengthM": 10, "widthM": 6 },
            "heightM": 3
          },
          "benches": [
            { "id": "tier-1", "footprint": { "cornerXM": 1, "cornerYM": 1, "axisAzimuthDeg": 0, "lengthM": 8, "widthM": 1.2 },
              "surfaceHeightM": 2.0, "canopy": { "heightM": 0.2, "sensingDepthM": 0.05, "leafAreaDensityM2PerM3": 12 },
              "samplesAlongLength": 8, "samplesAcrossWidth": 2 }
          ],
          "lampTypes": {
            "bar": { "beam": { "kind": "isotropic" }, "ppfUmolPerS": 190, "watts": 70,
                     "bands": { "blue": 0.2, "green": 0.1, "red": 0.7, "farRed": 0.02 } }
          },
          "lampRows": [
            { "id": "bars", "type": "bar", "start": { "xM": 1.6, "yM": 1.3, "zM": 2.8 }, "step": { "xM": 0, "yM": 0.6, "zM": 0 },
              "count": 13, "schedule": { "on": "22:00", "off": "16:00" } }
          ]
        }
        """;

    /// <summary>Marks a property to remove in <see cref="With"/>.</summary>
    public const string Remove = "<remove>";

    /// <summary>
    /// The file with changes: each pair is a path in the file's names (<c>benches[0].footprint.widthM</c>) and a JSON
    /// value to put there (or <see cref="Remove"/>). Array items past the end are appended.
    /// </summary>
    public static string With(string json, params (string Path, string ValueJson)[] changes)
    {
        JsonNode root = JsonNode.Parse(json)!;
        foreach ((string path, string valueJson) in changes)
        {
            List<object> steps = Steps(path);
            JsonNode parent = root;
            for (int i = 0; i < steps.Count - 1; i++)
            {
                parent = steps[i] is int index ? parent[index]! : parent[(string)steps[i]]!;
            }

            object last = steps[^1];
            JsonNode? value = valueJson == Remove ? null : JsonNode.Parse(valueJson);
            if (last is int at)
            {
                JsonArray array = parent.AsArray();
                if (valueJson == Remove)
                {
                    array.RemoveAt(at);
                }
                else if (at >= array.Count)
                {
                    array.Add(value);
                }
                else
                {
                    array[at] = value;
                }
            }
            else if (valueJson == Remove)
            {
                parent.AsObject().Remove((string)last);
            }
            else
            {
                parent[(string)last] = value;
            }
        }

        return root.ToJsonString(new JsonSerializerOptions { WriteIndented = true });
    }

    private static List<object> Steps(string path)
    {
        var steps = new List<object>();
        foreach (Match m in Step().Matches(path))
        {
            if (m.Groups["name"].Success)
            {
                steps.Add(m.Groups["name"].Value);
            }
            else
            {
                steps.Add(int.Parse(m.Groups["index"].Value, CultureInfo.InvariantCulture));
            }
        }

        return steps;
    }

    [GeneratedRegex(@"(?<name>[A-Za-z0-9_$-]+)|\[(?<index>\d+)\]")]
    private static partial Regex Step();
}
