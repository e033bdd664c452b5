using System.Text.Json;
using System.Text.Json.Nodes;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Sites;
using Json.Schema;

namespace CanopyAdvisor.Files.Tests.Sites;

/// <summary>
/// The published schema (site.schema.json) against an independent JSON Schema 2020-12 implementation
/// (JsonSchema.Net 7.4.0, which also checks the schema against the 2020-12 meta-schema).
/// </summary>
public class SiteSchemaTests
{
    private static readonly JsonSchema Schema = JsonSchema.FromText(SiteSchema.ReadText());

    private static EvaluationResults Evaluate(string json) =>
        Schema.Evaluate(JsonNode.Parse(json), new EvaluationOptions { OutputFormat = OutputFormat.List, ValidateAgainstMetaSchema = true });

    public static TheoryData<string> DemoNames() => new(DemoSites.Names);

    [Theory]
    [MemberData(nameof(DemoNames))]
    public void Demo_site_files_conform_to_the_schema(string name)
    {
        EvaluationResults result = Evaluate(DemoSites.ReadText(name));
        Assert.True(result.IsValid, Describe(result));
    }

    [Theory]
    [InlineData("glasshouse")]
    [InlineData("room")]
    public void Test_base_files_conform_to_the_schema(string which)
    {
        EvaluationResults result = Evaluate(which == "glasshouse" ? SiteJson.Glasshouse : SiteJson.IndoorRoom);
        Assert.True(result.IsValid, Describe(result));
    }

    /// <summary>Changes that both the schema and the reader reject: the two describe the same format.</summary>
    [Theory]
    [InlineData("benches[0].footprint.widthM", "0", "size > 0")]
    [InlineData("location.latitudeDeg", "91", "latitude range")]
    [InlineData("structure.structuralShading", "1", "shading below 1")]
    [InlineData("benches[0].samplesAcrossWidth", "401", "sample count")]
    [InlineData("lamps[0].dimming", "1.5", "dimming range")]
    [InlineData("lamps[0].schedule.on", "\"25:00\"", "time format")]
    [InlineData("benches[0].widht", "2", "unknown property")]
    [InlineData("structure.kind", "\"tunnel\"", "structure kind")]
    [InlineData("lampTypes.top.beam", """{ "kind": "ies", "file": "a.ies", "values": "lumen" }""", "lumen needs µmol per lumen")]
    [InlineData("lampTypes.top.ppfUmolPerS", SiteJson.Remove, "PPF needed for a parametric beam")]
    [InlineData("coverTypes.glass.layers", SiteJson.Remove, "glazing needs its layers")]
    [InlineData("weather", SiteJson.Remove, "glasshouse needs weather")]
    [InlineData("formatVersion", "2", "format version")]
    [InlineData("lots[0].heightMm", "0", "lot height > 0")]
    [InlineData("lots[0].spacingM", "5", "spacing below 5 m")]
    [InlineData("lots[0].pots", "0", "at least one pot")]
    [InlineData("lots[0].crop", "\"Petunia\"", "crop id form")]
    [InlineData("lots[0].plantedOn", "\"20 Nov 2026\"", "date form")]
    [InlineData("lots[0].rotations[0].at", "\"2026-11-28T08:00:00\"", "timestamp needs an offset")]
    [InlineData("lots[0].rotations[0].angleDeg", "0", "rotation angle not 0")]
    [InlineData("lots[0].rotations[0].angleDeg", "-360", "rotation angle above −360")]
    [InlineData("lots[0].benchId", SiteJson.Remove, "lot needs its bench")]
    [InlineData("temperatures.dayC", "46", "day setpoint range")]
    [InlineData("temperatures.preDawnDropHours", "13", "drop hours range")]
    [InlineData("temperatures.nightC", SiteJson.Remove, "night setpoint required")]
    [InlineData("labour.crews", "[]", "at least one crew")]
    [InlineData("labour.secondsPerPot", "0", "seconds per pot > 0")]
    [InlineData("labour.setUpMinutesPerBench", "241", "set-up at most 240 min")]
    [InlineData("labour.crews[0].people", "0", "at least one person")]
    [InlineData("labour.crews[0].days", "[]", "at least one working day")]
    [InlineData("labour.crews[0].days", "[\"mon\", \"mon\"]", "no day twice")]
    [InlineData("labour.crews[0].days[0]", "\"monday\"", "short day names")]
    [InlineData("labour.crews[0].start", "\"7:00\"", "time form")]
    [InlineData("labour.crews[0].end", SiteJson.Remove, "crew needs its end")]
    [InlineData("labour.holidays[0]", "\"25 Dec\"", "holiday date form")]
    [InlineData("labour.overtime", "1", "no unknown labour field")]
    public void Schema_and_reader_reject_the_same_change(string path, string valueJson, string label)
    {
        string json = SiteJson.With(SiteJson.Glasshouse, (path, valueJson));

        Assert.False(Evaluate(json).IsValid, "schema accepted: " + label);
        Assert.Throws<InvalidInputException>(() => new SiteFileReader(new TestBeams()).Parse(json, "f.json", null));
    }

    [Fact]
    public void Every_property_in_the_schema_has_a_description()
    {
        JsonNode root = JsonNode.Parse(SiteSchema.ReadText())!;
        var missing = new List<string>();
        Walk(root, "#", missing);
        Assert.Empty(missing);
    }

    [Fact]
    public void Every_property_name_the_demo_files_use_is_declared_in_the_schema()
    {
        // Guards against additionalProperties being dropped from a definition: collect declared names, compare.
        JsonNode schema = JsonNode.Parse(SiteSchema.ReadText())!;
        var declared = new HashSet<string>(StringComparer.Ordinal);
        CollectDeclared(schema, declared);
        foreach (string name in DemoSites.Names)
        {
            JsonNode demo = JsonNode.Parse(DemoSites.ReadText(name))!;
            var used = new HashSet<string>(StringComparer.Ordinal);
            CollectUsed(demo, used, insideMap: false);
            Assert.Empty(used.Except(declared));
        }
    }

    private static void Walk(JsonNode? node, string at, List<string> missing)
    {
        if (node is JsonObject o)
        {
            if (o["properties"] is JsonObject props)
            {
                foreach ((string name, JsonNode? value) in props)
                {
                    if (value is not JsonObject p || p["description"] is null)
                    {
                        missing.Add($"{at}/properties/{name}");
                    }
                }
            }

            // Conditions ("if", "not") test properties that are declared elsewhere; they declare nothing.
            foreach ((string key, JsonNode? value) in o.Where(kv => kv.Key is not ("if" or "not")))
            {
                Walk(value, $"{at}/{key}", missing);
            }
        }
        else if (node is JsonArray a)
        {
            for (int i = 0; i < a.Count; i++)
            {
                Walk(a[i], $"{at}/{i}", missing);
            }
        }
    }

    private static void CollectDeclared(JsonNode? node, HashSet<string> declared)
    {
        if (node is JsonObject o)
        {
            if (o["properties"] is JsonObject props)
            {
                foreach ((string name, _) in props)
                {
                    declared.Add(name);
                }
            }

            foreach ((_, JsonNode? value) in o)
            {
                CollectDeclared(value, declared);
            }
        }
        else if (node is JsonArray a)
        {
            foreach (JsonNode? item in a)
            {
                CollectDeclared(item, declared);
            }
        }
    }

    private static void CollectUsed(JsonNode? node, HashSet<string> used, bool insideMap)
    {
        if (node is JsonObject o)
        {
            foreach ((string name, JsonNode? value) in o)
            {
                if (!insideMap)
                {
                    used.Add(name);
                }

                // coverTypes and lampTypes are maps: their keys are user names, not properties.
                CollectUsed(value, used, insideMap: !insideMap && name is "coverTypes" or "lampTypes");
            }
        }
        else if (node is JsonArray a)
        {
            foreach (JsonNode? item in a)
            {
                CollectUsed(item, used, insideMap: false);
            }
        }
    }

    private static string Describe(EvaluationResults result) =>
        string.Join('\n', (result.Details ?? []).Where(d => d.HasErrors)
            .SelectMany(d => d.Errors!.Select(e => $"{d.InstanceLocation} ({d.EvaluationPath}): {e.Key}: {e.Value}")))
        + (result.HasErrors ? "\n" + JsonSerializer.Serialize(result.Errors) : string.Empty);
}
