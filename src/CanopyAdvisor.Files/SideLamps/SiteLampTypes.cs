using System.Text.Json;
using System.Text.Json.Nodes;
using CanopyAdvisor.Core.Advice.SideLamps;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Sites;

namespace CanopyAdvisor.Files.SideLamps;

/// <summary>The lamp types a site file defines (its <c>lampTypes</c>), by name, as side-lamp candidates.</summary>
/// <remarks>
/// The types are read by the site file reader itself, so a brief's lamp type means exactly what it means in the site:
/// the site file's <c>lampTypes</c> object is placed, unchanged, in a small stand-in site (an empty 10 m room with one
/// lamp of each type) and read with <see cref="SiteFileReader"/>; IES files resolve against the site file's folder as
/// they do for the site. Errors in a type are reported by the site reader at the type's own path
/// (<c>lampTypes.top.bands</c>); read the site first, so they are normally found there.
/// </remarks>
public static class SiteLampTypes
{
    /// <summary>Reads the lamp types of a site file's JSON text.</summary>
    /// <param name="siteJson">The site file's text.</param>
    /// <param name="baseDirectory">The site file's folder (for IES files), or null for a built-in demo site.</param>
    /// <param name="beams">The beam factory the site is read with.</param>
    /// <returns>The types by name, in file order; empty when the site defines none.</returns>
    /// <exception cref="InvalidInputException">The text is not JSON or a lamp type is not valid.</exception>
    public static IReadOnlyDictionary<string, SideLampType> Read(string siteJson, string? baseDirectory, IBeamFactory beams)
    {
        ArgumentNullException.ThrowIfNull(siteJson);
        ArgumentNullException.ThrowIfNull(beams);
        JsonNode? root;
        try
        {
            root = JsonNode.Parse(siteJson.StartsWith('\uFEFF') ? siteJson[1..] : siteJson);
        }
        catch (JsonException e)
        {
            throw new InvalidInputException("site", $"malformed JSON: {e.Message}");
        }

        var result = new Dictionary<string, SideLampType>(StringComparer.Ordinal);
        if (root is not JsonObject site || site["lampTypes"] is not JsonObject types || types.Count == 0)
        {
            return result;
        }

        var names = types.Select(t => t.Key).ToList();
        var lamps = new JsonArray();
        for (int i = 0; i < names.Count; i++)
        {
            lamps.Add(new JsonObject
            {
                ["id"] = $"type-{i}",
                ["type"] = names[i],
                ["xM"] = 5,
                ["yM"] = 5,
                ["zM"] = 5,
                ["schedule"] = new JsonObject { ["on"] = "00:00", ["off"] = "00:00" },
            });
        }

        var standIn = new JsonObject
        {
            ["formatVersion"] = SiteFileReader.FormatVersion,
            ["id"] = "lamp-types",
            ["name"] = "lamp types of the site",
            ["location"] = new JsonObject { ["latitudeDeg"] = 0, ["longitudeDeg"] = 0, ["elevationM"] = 0 },
            ["timeZone"] = "UTC",
            ["structure"] = new JsonObject
            {
                ["kind"] = "indoorRoom",
                ["footprint"] = Footprint(0, 0, 10, 10),
                ["heightM"] = 10,
            },
            ["benches"] = new JsonArray(new JsonObject
            {
                ["id"] = "stand-in",
                ["footprint"] = Footprint(0, 0, 1, 1),
                ["surfaceHeightM"] = 0.5,
                ["canopy"] = new JsonObject { ["heightM"] = 0.1, ["sensingDepthM"] = 0, ["leafAreaDensityM2PerM3"] = 0 },
                ["samplesAlongLength"] = 1,
                ["samplesAcrossWidth"] = 1,
            }),
            ["lampTypes"] = types.DeepClone(),
            ["lamps"] = lamps,
        };

        Site read = new SiteFileReader(beams).Parse(standIn.ToJsonString(), "site lampTypes", baseDirectory);
        for (int i = 0; i < names.Count; i++)
        {
            Lamp lamp = read.Lamps[i];
            result[names[i]] = new SideLampType(names[i], lamp.Distribution, lamp.PpfMicromolesPerSecond, lamp.Bands, lamp.Watts);
        }

        return result;
    }

    private static JsonObject Footprint(double x, double y, double length, double width) => new()
    {
        ["cornerXM"] = x,
        ["cornerYM"] = y,
        ["axisAzimuthDeg"] = 0,
        ["lengthM"] = length,
        ["widthM"] = width,
    };
}
