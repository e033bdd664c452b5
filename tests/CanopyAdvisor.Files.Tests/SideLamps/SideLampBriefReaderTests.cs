using System.Text.Json.Nodes;
using CanopyAdvisor.Core.Advice.SideLamps;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.SideLamps;
using Json.Schema;
using NodaTime;

namespace CanopyAdvisor.Files.Tests.SideLamps;

/// <summary>The side-lamp brief reader, the site's lamp types, the demo brief and the brief schema.</summary>
public class SideLampBriefReaderTests
{
    private static readonly JsonSchema Schema = JsonSchema.FromText(SideLampBriefSchema.ReadText());

    [Fact]
    public void The_site_lamp_types_are_read_by_the_site_reader_with_their_photometry()
    {
        // The demo site's side-600 type (demo data): 600 µmol s⁻¹, 220 W, blue 0.15, a cosⁿ beam of 60° full angle at
        // half maximum. A beam angle is the full angle where intensity falls to half the axis value (IES/CIE definition,
        // common practice), so I(30°)/I(0°) = 0.5.
        SideLampType side = BriefJson.LampTypes["side-600"];
        Assert.Equal(600, side.PpfMicromolesPerSecond);
        Assert.Equal(220, side.Watts);
        Assert.Equal(0.15, side.Bands.Blue);
        double ratio = side.Distribution.IntensityPerUnitFlux(Math.PI / 6, 0) / side.Distribution.IntensityPerUnitFlux(0, 0);
        Assert.Equal(0.5, ratio, 9);
        Assert.Equal(["toplight-2100", "side-600"], BriefJson.LampTypes.Keys);
    }

    [Fact]
    public void The_demo_brief_reads_as_written()
    {
        SideLampBrief brief = BriefJson.Parse(BriefJson.Demo);

        Assert.Equal(2, brief.Rails.Length);
        MountingRail east = brief.Rails[0];
        Assert.Equal("east-wall-north", east.Id);
        Assert.Equal(new Core.Geometry.Vector3(47.7, 37, 2.5), east.Start);
        Assert.Equal(new Core.Geometry.Vector3(47.7, 57, 2.5), east.End);
        Assert.Equal(270, east.Facing!.Value.Degrees, 9);
        Assert.Equal(80, east.YawHalfRange.Degrees, 9);
        Assert.Equal("side-600", Assert.Single(brief.LampTypes).Name);
        Assert.Equal(4, brief.MaxLamps);
        Assert.Empty(brief.BenchIds);
        Assert.Equal(0.3, brief.RiskFraction);
        Assert.Equal(600, brief.DefaultPpfdCeiling);
        Assert.Equal(450, brief.PpfdCeilingByCrop["basil"]);
        Assert.Equal(0.7, brief.UniformityFloor);
        Assert.Equal(0.05, brief.EnergyWeightPerKilowatt);
        Assert.Equal(30, brief.MinTilt.Degrees, 9);
        Assert.Equal(90, brief.MaxTilt.Degrees, 9);
        Assert.Equal(new LampSchedule(new LocalTime(4, 0), new LocalTime(22, 0), 500), brief.Schedule);
        Assert.Equal(1, brief.Seed);
        Assert.Equal(3, brief.Starts);
    }

    [Fact]
    public void Defaults_apply_to_what_a_brief_leaves_out()
    {
        string json = """
            { "formatVersion": 1, "rails": [ { "id": "r", "start": { "xM": 47.7, "yM": 40, "zM": 2.5 }, "end": { "xM": 47.7, "yM": 50, "zM": 2.5 } } ],
              "lampTypes": ["side-600"], "maxLamps": 1, "schedule": { "on": "06:00", "off": "06:00" } }
            """;
        SideLampBrief brief = BriefJson.Parse(json);
        Assert.Null(brief.Rails[0].Facing);
        Assert.Equal(90, brief.Rails[0].YawHalfRange.Degrees, 9);
        Assert.Equal(0.5, brief.RiskFraction);
        Assert.Equal(0.7, brief.UniformityFloor);
        Assert.Null(brief.DefaultPpfdCeiling);
        Assert.Equal(4, brief.Starts);
    }

    /// <summary>Each bad brief gives an error at the named path (the reader's contract, SideLamps/README.md "Errors").</summary>
    [Theory]
    [InlineData("rails", BriefJson.Remove, "rails", "is required")]
    [InlineData("rails[0].end.zM", BriefJson.Remove, "rails[0].end.zM", "is required")]
    [InlineData("rails[0].start.xM", "\"east\"", "rails[0].start.xM", "must be a number")]
    [InlineData("rails[0].facingdeg", "270", "rails[0].facingdeg", "did you mean 'facingDeg'")]
    [InlineData("rails[1].end", """{ "xM": 0.3, "yM": 70, "zM": 2.5 }""", "rails[1]", "outside the structure")]
    [InlineData("rails[0].start", """{ "xM": 47.7, "yM": 37, "zM": 9 }""", "rails[0]", "not between the floor and the roof")]
    [InlineData("rails[1].id", "\"east-wall-north\"", "rails[1].id", "used twice")]
    [InlineData("lampTypes[0]", "\"side-900\"", "lampTypes[0]", "unknown lamp type 'side-900' (the site defines: toplight-2100, side-600)")]
    [InlineData("lampTypes[0]", "7", "lampTypes[0]", "must be a string")]
    [InlineData("maxLamps", "40", "maxLamps", "must be within [0, 12]")]
    [InlineData("maxLamps", "-1", "maxLamps", "must be within [0, 12]")] // issue 4 bad input: lamp counts below zero
    [InlineData("maxLamps", "2.5", "maxLamps", "must be an integer")]
    [InlineData("benches", "[\"north-9\"]", "benches[0]", "no bench 'north-9'")]
    [InlineData("riskFraction", "0", "riskFraction", "must be within (0, 1]")]
    [InlineData("ppfdCeilings.byCrop.basil", "-5", "ppfdCeilings.byCrop.basil", "must be a finite number > 0")]
    [InlineData("ppfdCeilings.byBench", """{ "north-9": 300 }""", "ppfdCeilings.byBench.north-9", "no bench 'north-9'")]
    [InlineData("uniformityFloor", "1.2", "uniformityFloor", "must be within [0, 1]")]
    [InlineData("energyWeightPerKW", "-1", "energyWeightPerKW", "≥ 0")]
    [InlineData("tiltDeg.max", "20", "tiltDeg.max", "must not be below tiltDeg.min")]
    [InlineData("schedule.on", "\"4 am\"", "schedule.on", "must be a local time \"HH:mm\"")]
    [InlineData("schedule", BriefJson.Remove, "schedule", "is required")]
    [InlineData("starts", "0", "starts", "must be within [1, 64]")]
    [InlineData("formatVersion", "2", "formatVersion", "unsupported format version 2")]
    [InlineData("site", "\"elsewhere\"", "site", "written for site 'elsewhere'")]
    [InlineData("colour", "\"blue\"", "colour", "unknown property")]
    public void Bad_briefs_give_errors_at_their_paths(string path, string value, string errorPath, string message)
    {
        var ex = Assert.Throws<InvalidInputException>(() => BriefJson.Parse(BriefJson.With(path, value)));
        Assert.Contains(ex.Errors, e => e.Path == errorPath && e.Message.Contains(message, StringComparison.Ordinal));
    }

    [Fact]
    public void Every_problem_is_reported_at_once()
    {
        string json = BriefJson.With("maxLamps", "\"many\"");
        json = JsonNode.Parse(json)!.AsObject().Also(o => o["lampTypes"] = new JsonArray("nope")).ToJsonString();
        var ex = Assert.Throws<InvalidInputException>(() => BriefJson.Parse(json));
        Assert.Contains(ex.Errors, e => e.Path == "maxLamps");
        Assert.Contains(ex.Errors, e => e.Path == "lampTypes[0]");
    }

    [Fact]
    public void Malformed_json_gives_the_line()
    {
        var ex = Assert.Throws<InvalidInputException>(() => BriefJson.Parse("{\n  \"formatVersion\": 1,\n  \"rails\": [,]\n}"));
        ValidationError error = Assert.Single(ex.Errors);
        Assert.Equal("brief.json:3", error.Path);
        Assert.Contains("malformed JSON at line 3", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void The_demo_brief_conforms_to_the_schema()
    {
        // JsonSchema.Net 7.4.0, an independent JSON Schema 2020-12 implementation, also checks the schema itself
        // against the 2020-12 meta-schema.
        EvaluationResults result = Schema.Evaluate(JsonNode.Parse(BriefJson.Demo), new EvaluationOptions { ValidateAgainstMetaSchema = true, OutputFormat = OutputFormat.List });
        Assert.True(result.IsValid, string.Join("; ", (result.Details ?? []).Where(d => d.Errors is not null).SelectMany(d => d.Errors!.Select(e => $"{d.InstanceLocation}: {e.Value}"))));
    }

    /// <summary>Changes that both the schema and the reader reject: the two describe the same format.</summary>
    [Theory]
    [InlineData("maxLamps", "40")]
    [InlineData("rails[0].yawRangeDeg", "0")]
    [InlineData("schedule.off", "\"25:00\"")]
    [InlineData("uniformityFloor", "1.5")]
    [InlineData("rails[0].start.zM", BriefJson.Remove)]
    [InlineData("colour", "\"blue\"")]
    [InlineData("lampTypes", BriefJson.Remove)]
    public void The_schema_rejects_what_the_reader_rejects(string path, string value)
    {
        string json = BriefJson.With(path, value);
        Assert.False(Schema.Evaluate(JsonNode.Parse(json)).IsValid);
        Assert.Throws<InvalidInputException>(() => BriefJson.Parse(json));
    }
}
