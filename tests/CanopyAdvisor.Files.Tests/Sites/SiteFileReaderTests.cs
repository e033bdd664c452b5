using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Sites;
using NodaTime;

namespace CanopyAdvisor.Files.Tests.Sites;

/// <summary>How the site file maps onto the Core records (Sites/README.md is the reference for every expected value).</summary>
public sealed class SiteFileReaderTests : IDisposable
{
    private readonly string folder = Directory.CreateTempSubdirectory("canopy-sitefiles-").FullName;

    public void Dispose() => Directory.Delete(folder, recursive: true);

    [Fact]
    public void Glasshouse_file_maps_onto_the_site_records()
    {
        var beams = new TestBeams();
        Site site = new SiteFileReader(beams).Parse(SiteJson.Glasshouse, "test.json", null);

        Assert.Equal("test-glasshouse", site.Id);
        Assert.Equal(52.0, site.Location.Latitude.Degrees, 12);
        Assert.Equal(52.0 * Math.PI / 180, site.Location.Latitude.Radians, 12); // degrees in the file, radians inside (MODEL.md §0)
        Assert.Equal("Europe/Amsterdam", site.Zone.Id);
        Assert.Equal(new WeatherSettings(3, 0.5), site.Weather);

        var g = Assert.IsType<Glasshouse>(site.Structure);
        Assert.Equal(2, g.BayCount);
        Assert.Equal(22.0, g.RoofSlope.Degrees, 12);
        Assert.Equal(new Cover("glass", false, 1.526, 20, 0.004, 1), g.Roof);
        Assert.True(g.BackWall.Opaque);
        Assert.Equal("panel", g.BackWall.Name);

        Bench bench = Assert.Single(site.Benches);
        Assert.Equal(new Canopy(0.3, 0.05, 6), bench.Canopy);
        Assert.Equal(1.8, bench.Footprint.WidthM);

        // One lamp listed, then a row of three: ids "<row id>-<n>", positions start + (n − 1) × step (README, lampRows).
        Assert.Equal(["side-1", "row-1", "row-2", "row-3"], site.Lamps.Select(l => l.Id));
        Assert.Equal(new Vector3(4, 14, 4.5), site.Lamps[3].Position);
        Assert.Equal(1.0, site.Lamps[3].Dimming); // default full output
        Assert.Equal(Angle.Zero, site.Lamps[3].Aim.Tilt); // default straight down
        Assert.Null(site.Lamps[3].Schedule.OffAboveOutsidePpfd);
        Lamp side = site.Lamps[0];
        Assert.Equal(60.0, side.Aim.Tilt.Degrees, 12);
        Assert.Equal(180.0, side.Aim.Yaw.Degrees, 12);
        Assert.Equal(0.8, side.Dimming);
        Assert.Equal(new LocalTime(4, 0), side.Schedule.On);
        Assert.Equal(new LocalTime(22, 0), side.Schedule.Off);
        Assert.Equal(500.0, side.Schedule.OffAboveOutsidePpfd);
        Assert.Equal(600.0, side.PpfMicromolesPerSecond);
        Assert.Equal(0.75, side.Bands.Red);
        Assert.Equal("lambertian", Assert.IsType<TestBeams.Labelled>(side.Distribution).Label);
        Assert.Equal("cosinePower 110", Assert.IsType<TestBeams.Labelled>(site.Lamps[1].Distribution).Label);

        // One distribution per lamp type, shared by its lamps.
        Assert.Same(site.Lamps[1].Distribution, site.Lamps[2].Distribution);
        Assert.Equal(["cosinePower 110", "lambertian"], beams.Calls);

        Obstruction tank = Assert.Single(site.Obstructions);
        Assert.Equal(6.0, tank.TopHeightM);
    }

    [Fact]
    public void Indoor_room_needs_no_weather_and_keeps_a_photoperiod_past_midnight()
    {
        Site site = new SiteFileReader(new TestBeams()).Parse(SiteJson.IndoorRoom, "room.json", null);

        var room = Assert.IsType<IndoorRoom>(site.Structure);
        Assert.Equal(3.0, room.HeightM);
        Assert.Equal(13, site.Lamps.Length);
        Assert.Equal(new LocalTime(22, 0), site.Lamps[0].Schedule.On);
        Assert.Equal(new LocalTime(16, 0), site.Lamps[0].Schedule.Off);
        Assert.True(site.Lamps[0].Schedule.IsOn(new LocalTime(2, 0), 0)); // 22:00–16:00 runs past midnight (README, schedule)
    }

    [Fact]
    public void Many_errors_are_all_reported_at_once()
    {
        string json = SiteJson.With(
            SiteJson.Glasshouse,
            ("location.latitudeDeg", "95"),
            ("timeZone", "\"Mars/Olympus\""),
            ("structure.structuralShading", "1.2"),
            ("coverTypes.glass.layers", "0"),
            ("benches[0].footprint.widthM", "-1"),
            ("benches[0].samplesAlongLength", "1000"),
            ("lampTypes.top.bands.blue", "0.5"),
            ("lamps[0].type", "\"nope\""),
            ("lamps[0].dimming", "2"),
            ("lampRows[0].schedule.off", "\"late\""),
            ("obstructions[0].topHeightM", "-1"),
            ("obstructions[0].colour", "\"grey\""));

        var e = Assert.Throws<InvalidInputException>(() => new SiteFileReader(new TestBeams()).Parse(json, "test.json", null));

        string[] expected =
        [
            "location.latitudeDeg", "timeZone", "structure.structuralShading", "coverTypes.glass.layers",
            "benches[0].footprint.widthM", "benches[0].samplesAlongLength", "lampTypes.top.bands", "lamps[0].type",
            "lamps[0].dimming", "lampRows[0].schedule.off", "obstructions[0].topHeightM", "obstructions[0].colour",
        ];
        Assert.All(expected, p => Assert.Contains(e.Errors, x => x.Path == p));
        Assert.Equal(expected.Length, e.Errors.Select(x => x.Path).Distinct().Count());
    }

    [Fact]
    public void A_missing_value_is_reported_once_not_also_as_out_of_range()
    {
        string json = SiteJson.With(SiteJson.Glasshouse, ("benches[0].footprint.widthM", SiteJson.Remove));

        var e = Assert.Throws<InvalidInputException>(() => new SiteFileReader(new TestBeams()).Parse(json, "test.json", null));

        ValidationError only = Assert.Single(e.Errors);
        Assert.Equal("benches[0].footprint.widthM: is required", only.ToString());
    }

    [Fact]
    public void A_lamp_type_that_cannot_be_read_is_reported_only_at_its_definition()
    {
        string json = SiteJson.With(SiteJson.Glasshouse, ("lampTypes.top", "5"));

        var e = Assert.Throws<InvalidInputException>(() => new SiteFileReader(new TestBeams()).Parse(json, "test.json", null));

        Assert.Equal("lampTypes.top: must be an object, got the number 5", Assert.Single(e.Errors).ToString());
    }

    [Fact]
    public void A_number_too_large_for_a_double_is_not_finite()
    {
        // 1e400 exceeds the largest IEEE 754 double (about 1.8e308).
        string json = SiteJson.With(SiteJson.Glasshouse, ("location.elevationM", "1e400"));

        var e = Assert.Throws<InvalidInputException>(() => new SiteFileReader(new TestBeams()).Parse(json, "test.json", null));

        Assert.Equal("location.elevationM: must be a finite number", Assert.Single(e.Errors).ToString());
    }

    [Fact]
    public void A_structure_that_cannot_be_read_does_not_hide_range_errors_elsewhere()
    {
        string json = SiteJson.With(SiteJson.Glasshouse, ("structure.kind", "\"tunnel\""), ("lamps[0].dimming", "3"));

        var e = Assert.Throws<InvalidInputException>(() => new SiteFileReader(new TestBeams()).Parse(json, "test.json", null));

        Assert.Equal(["structure.kind", "lamps[0].dimming"], e.Errors.Select(x => x.Path));
    }

    [Fact]
    public void A_wrong_row_is_summarised_after_three_lamps()
    {
        string json = SiteJson.With(SiteJson.IndoorRoom, ("lampRows[0].start.zM", "3.5"));

        var e = Assert.Throws<InvalidInputException>(() => new SiteFileReader(new TestBeams()).Parse(json, "room.json", null));

        Assert.Equal(4, e.Errors.Count);
        Assert.StartsWith("lamp 'bars-1' at (1.6, 1.3, 3.5) m", e.Errors[0].Message, StringComparison.Ordinal);
        Assert.Equal("lampRows[0]: … and 10 more problems with lamps of this row", e.Errors[3].ToString());
    }

    [Fact]
    public void Malformed_json_reports_its_line()
    {
        // Line 3 lacks the comma after "id" (RFC 8259 grammar).
        const string json = "{\n  \"formatVersion\": 1,\n  \"id\": \"x\"\n  \"name\": \"y\"\n}";

        var e = Assert.Throws<InvalidInputException>(() => new SiteFileReader(new TestBeams()).Parse(json, "broken.json", null));

        ValidationError only = Assert.Single(e.Errors);
        Assert.Equal("broken.json:4", only.Path);
        Assert.StartsWith("malformed JSON at line 4, byte 3:", only.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("{ \"a\": 1, }", "trailing comma (RFC 8259 allows none)")]
    [InlineData("// note\n{}", "comment (RFC 8259 has none)")]
    [InlineData("", "empty text")]
    public void Text_that_is_not_strict_json_is_malformed(string json, string label)
    {
        var e = Assert.Throws<InvalidInputException>(() => new SiteFileReader(new TestBeams()).Parse(json, "f.json", null));
        Assert.True(e.Errors[0].Message.StartsWith("malformed JSON", StringComparison.Ordinal), label);
    }

    [Fact]
    public void A_leading_byte_order_mark_is_ignored()
    {
        // U+FEFF at the start of a text is a byte-order mark, not content (Unicode standard, ch. 23.8).
        Site site = new SiteFileReader(new TestBeams()).Parse("\uFEFF" + SiteJson.IndoorRoom, "room.json", null);
        Assert.Equal("test-room", site.Id);
    }

    [Fact]
    public void Root_must_be_an_object()
    {
        var e = Assert.Throws<InvalidInputException>(() => new SiteFileReader(new TestBeams()).Parse("[]", "f.json", null));
        Assert.Equal("$: must be an object, got an array", Assert.Single(e.Errors).ToString());
    }

    [Fact]
    public void Duplicate_property_is_reported()
    {
        string json = SiteJson.Glasshouse.Replace("\"id\": \"test-glasshouse\",", "\"id\": \"a\", \"id\": \"b\",", StringComparison.Ordinal);
        var e = Assert.Throws<InvalidInputException>(() => new SiteFileReader(new TestBeams()).Parse(json, "f.json", null));
        Assert.Equal("id: duplicate property", Assert.Single(e.Errors).ToString());
    }

    [Fact]
    public void Read_resolves_ies_files_next_to_the_site_file_and_takes_ppf_from_the_file()
    {
        Directory.CreateDirectory(Path.Combine(folder, "photometry"));
        File.WriteAllText(Path.Combine(folder, "photometry", "top.ies"), "IESNA:LM-63-2002");
        string json = SiteJson.With(
            SiteJson.Glasshouse,
            ("lampTypes.top.beam", """{ "kind": "ies", "file": "photometry/top.ies", "values": "lumen", "micromolesPerLumen": 0.015 }"""),
            ("lampTypes.top.ppfUmolPerS", SiteJson.Remove));
        string path = Path.Combine(folder, "site.json");
        File.WriteAllText(path, json);
        var beams = new TestBeams { IesPpf = 1999 };

        Site site = new SiteFileReader(beams).Read(path);

        Assert.Contains("ies top.ies Lumen 0.015", beams.Calls);
        Lamp row1 = site.Lamps.Single(l => l.Id == "row-1");
        Assert.Equal(1999.0, row1.PpfMicromolesPerSecond);
        Assert.Equal("ies top.ies", Assert.IsType<TestBeams.Labelled>(row1.Distribution).Label);
    }

    [Fact]
    public void Ppf_in_the_site_file_overrides_the_ies_flux()
    {
        File.WriteAllText(Path.Combine(folder, "top.ies"), "IESNA:LM-63-2002");
        string json = SiteJson.With(SiteJson.Glasshouse, ("lampTypes.top.beam", """{ "kind": "ies", "file": "top.ies", "values": "photon" }"""));

        Site site = new SiteFileReader(new TestBeams()).Parse(json, "site.json", folder);

        Assert.Equal(2100.0, site.Lamps.Single(l => l.Id == "row-1").PpfMicromolesPerSecond);
    }

    [Theory]
    [InlineData("""{ "kind": "ies", "file": "bad.ies", "values": "photon" }""", "lampTypes.top.beam.file", "bad.ies:3: expected TILT=")]
    [InlineData("""{ "kind": "ies", "file": "absent.ies", "values": "photon" }""", "lampTypes.top.beam.file", "cannot read 'absent.ies'")]
    [InlineData("""{ "kind": "ies", "file": "good.ies", "values": "lumen" }""", "lampTypes.top.beam.micromolesPerLumen", "is required")]
    [InlineData("""{ "kind": "ies", "file": "good.ies", "values": "photon", "micromolesPerLumen": 0.015 }""", "lampTypes.top.beam.micromolesPerLumen", "is used only with \"values\": \"lumen\"")]
    [InlineData("""{ "kind": "ies", "file": "good.ies", "values": "lumen", "micromolesPerLumen": 0 }""", "lampTypes.top.beam.micromolesPerLumen", "must be > 0")]
    [InlineData("""{ "kind": "ies", "file": "good.ies", "values": "candela" }""", "lampTypes.top.beam.values", "must be \"photon\" or \"lumen\"")]
    public void Ies_problems_are_reported_at_the_lamp_type(string beamJson, string expectedPath, string expectedMessage)
    {
        // The unit of an IES file is stated by the user, never guessed from the numbers (MODEL.md §3).
        File.WriteAllText(Path.Combine(folder, "good.ies"), "IESNA:LM-63-2002");
        File.WriteAllText(Path.Combine(folder, "bad.ies"), "IESNA:LM-63-2002");
        var beams = new TestBeams();
        beams.BadIesFiles.Add("bad.ies");
        string json = SiteJson.With(SiteJson.Glasshouse, ("lampTypes.top.beam", beamJson), ("lampTypes.top.ppfUmolPerS", SiteJson.Remove));

        var e = Assert.Throws<InvalidInputException>(() => new SiteFileReader(beams).Parse(json, "site.json", folder));

        // Only the IES problem: no missing PPF, nothing about the lamps that use the type.
        ValidationError only = Assert.Single(e.Errors);
        Assert.Equal(expectedPath, only.Path);
        Assert.Contains(expectedMessage, only.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Relative_ies_path_without_a_folder_is_an_error()
    {
        string json = SiteJson.With(SiteJson.Glasshouse, ("lampTypes.top.beam", """{ "kind": "ies", "file": "top.ies", "values": "photon" }"""));

        var e = Assert.Throws<InvalidInputException>(() => new SiteFileReader(new TestBeams()).Parse(json, "site.json", null));

        Assert.Contains(e.Errors, x => x.Path == "lampTypes.top.beam.file" && x.Message.Contains("needs the site file's folder", StringComparison.Ordinal));
    }

    [Fact]
    public void Unreadable_site_file_is_reported_by_name()
    {
        var e = Assert.Throws<InvalidInputException>(() => new SiteFileReader(new TestBeams()).Read(Path.Combine(folder, "missing.json")));
        Assert.Equal("missing.json", Assert.Single(e.Errors).Path);
    }

    [Fact]
    public void Odd_map_names_are_quoted_in_paths()
    {
        string json = SiteJson.With(
            SiteJson.Glasshouse,
            ("lampTypes.top.bands.red", "0.2"));
        json = json.Replace("\"top\"", "\"top light\"", StringComparison.Ordinal);

        var e = Assert.Throws<InvalidInputException>(() => new SiteFileReader(new TestBeams()).Parse(json, "f.json", null));

        Assert.Contains(e.Errors, x => x.Path == "lampTypes[\"top light\"].bands");
    }
}
