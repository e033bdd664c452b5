using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Sites;

namespace CanopyAdvisor.Files.Tests.Sites;

/// <summary>
/// One bad file per rule of the site file reference (src/CanopyAdvisor.Files/Sites/README.md, "Rules"), each asserting the
/// exact path the error names. The label of each case says where the rule comes from.
/// </summary>
public class SiteFileReaderBadFileTests
{
    private const string G = "glasshouse";
    private const string R = "room";

    /// <summary>label, base file, path to change, new value (JSON), expected error path, expected message fragment.</summary>
    public static TheoryData<string, string, string, string, string, string> Cases => new()
    {
        // Geographic ranges: the definition of latitude and longitude (ISO 6709).
        { "latitude above 90° (ISO 6709)", G, "location.latitudeDeg", "91", "location.latitudeDeg", "must be within [-90, 90], got 91" },
        { "longitude below −180° (ISO 6709)", G, "location.longitudeDeg", "-181", "location.longitudeDeg", "must be within [-180, 180]" },
        { "elevation far below the lowest land (README rule)", G, "location.elevationM", "-1000", "location.elevationM", "must be within [-500, 9000]" },
        { "unknown IANA zone (IANA tz database has no Europe/Atlantis)", G, "timeZone", "\"Europe/Atlantis\"", "timeZone", "unknown IANA time zone 'Europe/Atlantis'" },

        // Sizes must be positive (README rule: negative or zero sizes).
        { "bench width 0 (README: sizes > 0)", G, "benches[0].footprint.widthM", "0", "benches[0].footprint.widthM", "must be > 0, got 0" },
        { "bench length negative (README: sizes > 0)", G, "benches[0].footprint.lengthM", "-2", "benches[0].footprint.lengthM", "must be > 0, got -2" },
        { "structure length 0 (README: sizes > 0)", G, "structure.footprint.lengthM", "0", "structure.footprint.lengthM", "must be > 0" },
        { "gutter height 0 (README: sizes > 0)", G, "structure.gutterHeightM", "0", "structure.gutterHeightM", "must be > 0" },
        { "room height negative (README: sizes > 0)", R, "structure.heightM", "-3", "structure.heightM", "must be > 0" },
        { "canopy height 0 (README: sizes > 0)", G, "benches[0].canopy.heightM", "0", "benches[0].canopy.heightM", "must be > 0" },
        { "bench surface below ground (README: heights ≥ 0)", G, "benches[0].surfaceHeightM", "-0.1", "benches[0].surfaceHeightM", "must be ≥ 0" },
        { "leaf area density negative (README: LAD ≥ 0)", G, "benches[0].canopy.leafAreaDensityM2PerM3", "-1", "benches[0].canopy.leafAreaDensityM2PerM3", "must be ≥ 0" },

        // Glasshouse geometry (MODEL.md §2: gutter-connected bays fill the range; README: ±0.01 m).
        { "bays 2 × 7.9 m ≠ 16 m (MODEL.md §2)", G, "structure.bayWidthM", "7.9", "structure.bayWidthM", "bayCount × bayWidthM = 15.8 m must equal footprint.widthM = 16 m" },
        { "bay count 0 (README: ≥ 1)", G, "structure.bayCount", "0", "structure.bayCount", "must be ≥ 1, got 0" },
        { "roof slope 90° (README: [0, 90))", G, "structure.roofSlopeDeg", "90", "structure.roofSlopeDeg", "must be within [0, 90)" },
        { "structural shading 1 (MODEL.md §2: a fraction below 1)", G, "structure.structuralShading", "1", "structure.structuralShading", "must be within [0, 1), got 1" },
        { "structural shading negative (MODEL.md §2)", G, "structure.structuralShading", "-0.1", "structure.structuralShading", "must be within [0, 1)" },

        // Covers (Duffie & Beckman ch. 5: real glazings have n ≥ 1, K ≥ 0, at least one layer).
        { "refractive index 0.9 (physics: n ≥ 1)", G, "coverTypes.glass.refractiveIndex", "0.9", "coverTypes.glass.refractiveIndex", "must be ≥ 1, got 0.9" },
        { "extinction negative (Duffie & Beckman K ≥ 0)", G, "coverTypes.glass.extinctionPerM", "-4", "coverTypes.glass.extinctionPerM", "must be ≥ 0" },
        { "0 layers on a glazing (README: ≥ 1 unless opaque)", G, "coverTypes.glass.layers", "0", "coverTypes.glass.layers", "must be ≥ 1 for a cover that is not opaque" },
        { "glazing without thickness (README: required unless opaque)", G, "coverTypes.glass.thicknessM", SiteJson.Remove, "coverTypes.glass.thicknessM", "is required" },
        { "unknown cover type (README: covers name a coverTypes entry)", G, "structure.covers.roof", "\"acrylic\"", "structure.covers.roof", "unknown cover type 'acrylic'" },

        // Benches against the structure (README rules).
        { "bench reaches past the east wall (README: benches inside)", G, "benches[0].footprint.cornerXM", "15", "benches[0].footprint", "reaches outside the structure's footprint" },
        { "canopy top above the gutter (README)", G, "benches[0].canopy.heightM", "4.5", "benches[0].canopy.heightM", "bench top + canopy = 5.25 m is above structure.gutterHeightM = 5 m" },
        { "tier canopy above the ceiling (README)", R, "benches[0].canopy.heightM", "1.2", "benches[0].canopy.heightM", "is above structure.heightM = 3 m" },
        { "sensing depth below the canopy (README: ≤ canopy height)", G, "benches[0].canopy.sensingDepthM", "0.4", "benches[0].canopy.sensingDepthM", "must be ≤ canopy.heightM = 0.3 m, got 0.4 m" },
        { "0 samples along (README: 1–400)", G, "benches[0].samplesAlongLength", "0", "benches[0].samplesAlongLength", "must be within [1, 400], got 0" },
        { "401 samples across (README: 1–400)", G, "benches[0].samplesAcrossWidth", "401", "benches[0].samplesAcrossWidth", "must be within [1, 400], got 401" },
        { "empty bench id (README: ids non-empty)", G, "benches[0].id", "\"\"", "benches[0].id", "must not be empty" },
        { "no benches (README: at least one)", G, "benches", "[]", "benches", "must list at least one bench" },
        {
            "duplicate bench id (README: unique ids)", G, "benches[1]",
            """{ "id": "b1", "footprint": { "cornerXM": 6, "cornerYM": 2, "axisAzimuthDeg": 0, "lengthM": 10, "widthM": 1.8 }, "surfaceHeightM": 0.75, "canopy": { "heightM": 0.3, "sensingDepthM": 0.05, "leafAreaDensityM2PerM3": 6 }, "samplesAlongLength": 5, "samplesAcrossWidth": 2 }""",
            "benches[1].id", "duplicate bench id 'b1' (first used at benches[0])"
        },

        {
            "two benches in the same space (README: benches apart)", G, "benches[1]",
            """{ "id": "b2", "footprint": { "cornerXM": 3, "cornerYM": 2, "axisAzimuthDeg": 0, "lengthM": 10, "widthM": 1.8 }, "surfaceHeightM": 0.75, "canopy": { "heightM": 0.3, "sensingDepthM": 0.05, "leafAreaDensityM2PerM3": 6 }, "samplesAlongLength": 5, "samplesAcrossWidth": 2 }""",
            "benches[1].footprint", "bench 'b2' overlaps bench 'b1' (benches[0]) at the same height"
        },

        // Lamps (README rules; lamps hang inside the structure).
        { "lamp inside a bench's canopy (README)", G, "lamps[0]", """{ "id": "low", "type": "side", "xM": 3, "yM": 5, "zM": 0.9, "schedule": { "on": "00:00", "off": "00:00" } }""", "lamps[0]", "lamp 'low' at (3, 5, 0.9) m is inside the canopy of bench 'b1'" },
        { "lamp west of the west wall (README: lamps inside)", G, "lamps[0].xM", "-3", "lamps[0]", "is outside the structure's footprint" },
        { "lamp above the roof (README: lamps inside)", G, "lamps[0].zM", "9", "lamps[0]", "is not between the floor and the roof" },
        { "lamp above the ceiling (README: lamps inside)", R, "lampRows[0].start.zM", "3.5", "lampRows[0]", "is not between the floor and the ceiling (3 m there)" },
        { "dimming 1.5 (README: [0, 1])", G, "lamps[0].dimming", "1.5", "lamps[0].dimming", "must be within [0, 1], got 1.5" },
        { "row dimming negative (README: [0, 1])", G, "lampRows[0].dimming", "-0.1", "lampRows[0].dimming", "must be within [0, 1]" },
        { "tilt 190° (README: [0, 180])", G, "lamps[0].aim.tiltDeg", "190", "lamps[0].aim.tiltDeg", "must be within [0, 180]" },
        { "daylight threshold negative (README: ≥ 0)", G, "lamps[0].schedule.offAboveOutsidePpfd", "-1", "lamps[0].schedule.offAboveOutsidePpfd", "must be ≥ 0" },
        { "time 25:00 (ISO 8601 24 h clock)", G, "lamps[0].schedule.on", "\"25:00\"", "lamps[0].schedule.on", "must be a local time \"HH:mm\"" },
        { "unknown lamp type (README: type names a lampTypes entry)", G, "lamps[0].type", "\"x\"", "lamps[0].type", "unknown lamp type 'x' (defined: top, side)" },
        { "lamp id repeats a row lamp's id (README: unique ids)", G, "lamps[0].id", "\"row-2\"", "lampRows[0].id", "duplicate lamp id 'row-2' (first used at lamps[0])" },
        { "row of 0 lamps (README: 1–1000)", G, "lampRows[0].count", "0", "lampRows[0].count", "must be within [1, 1000], got 0" },

        // Lamp types (MODEL.md §0 bands: blue, green and red split PAR, so they add up to 1).
        { "bands add up to 0.66 (MODEL.md §0)", G, "lampTypes.top.bands.red", "0.5", "lampTypes.top.bands", "blue + green + red must be 1 (±0.01), got 0.66" },
        { "negative far-red (MODEL.md §0)", G, "lampTypes.top.bands.farRed", "-0.1", "lampTypes.top.bands.farRed", "must be ≥ 0" },
        { "PPF 0 (README: > 0)", G, "lampTypes.top.ppfUmolPerS", "0", "lampTypes.top.ppfUmolPerS", "must be > 0" },
        { "negative watts (README: ≥ 0)", G, "lampTypes.side.watts", "-5", "lampTypes.side.watts", "must be ≥ 0" },
        { "beam angle 180° (cosⁿ needs a beam angle below 180°)", G, "lampTypes.top.beam.beamAngleDeg", "180", "lampTypes.top.beam.beamAngleDeg", "must be within (0, 180)" },
        { "unknown beam kind (README: four kinds)", G, "lampTypes.top.beam.kind", "\"spot\"", "lampTypes.top.beam.kind", "unknown beam kind 'spot'" },

        // Obstructions and weather (README rules).
        { "obstruction top at its base (README: top > base)", G, "obstructions[0].topHeightM", "0", "obstructions[0].topHeightM", "must be above baseHeightM = 0 m, got 0 m" },
        { "daily clearness 0 (README: (0, 1])", G, "weather.dailyClearness", "0", "weather.dailyClearness", "must be within (0, 1], got 0" },
        { "Linke turbidity below 1 (Ineichen & Perez 2002: 1 = clean dry air)", G, "weather.linkeTurbidity", "0.5", "weather.linkeTurbidity", "must be within [1, 10]" },
        { "glasshouse without weather (README: required for a glasshouse)", G, "weather", SiteJson.Remove, "weather", "is required" },

        // Lots (README "lots[]": one case per rule).
        { "lot on an unknown bench (README: benchId names a bench)", G, "lots[0].benchId", "\"b9\"", "lots[0].benchId", "unknown bench 'b9' (benches: b1)" },
        {
            "duplicate lot id (README: unique ids)", G, "lots[1]",
            """{ "id": "lot-1", "benchId": "b1", "crop": "basil", "plantedOn": "2026-11-20", "saleOn": "2027-01-15", "heightMm": 60, "measuredOn": "2026-12-01", "spacingM": 0.12, "pots": 100 }""",
            "lots[1].id", "duplicate lot id 'lot-1' (first used at lots[0])"
        },
        {
            "second lot on a bench (README: at most one lot per bench)", G, "lots[1]",
            """{ "id": "lot-2", "benchId": "b1", "crop": "basil", "plantedOn": "2026-11-20", "saleOn": "2027-01-15", "heightMm": 60, "measuredOn": "2026-12-01", "spacingM": 0.12, "pots": 100 }""",
            "lots[1].benchId", "bench 'b1' already holds lot 'lot-1' (lots[0]); at most one lot per bench"
        },
        { "sale before planting (README: saleOn after plantedOn)", G, "lots[0].saleOn", "\"2026-11-01\"", "lots[0].saleOn", "must be after plantedOn (2026-11-20), got 2026-11-01" },
        { "sale on the planting day (README: strictly after)", G, "lots[0].saleOn", "\"2026-11-20\"", "lots[0].saleOn", "must be after plantedOn (2026-11-20), got 2026-11-20" },
        { "measured before planting (README: within [plantedOn, saleOn])", G, "lots[0].measuredOn", "\"2026-11-19\"", "lots[0].measuredOn", "must be within [plantedOn, saleOn] = [2026-11-20, 2027-01-15], got 2026-11-19" },
        { "measured after sale (README: within [plantedOn, saleOn])", G, "lots[0].measuredOn", "\"2027-01-16\"", "lots[0].measuredOn", "must be within [plantedOn, saleOn] = [2026-11-20, 2027-01-15], got 2027-01-16" },
        { "height 0 mm (README: (0, 3000))", G, "lots[0].heightMm", "0", "lots[0].heightMm", "must be within (0, 3000) mm, got 0" },
        { "height 3000 mm (README: (0, 3000))", G, "lots[0].heightMm", "3000", "lots[0].heightMm", "must be within (0, 3000) mm, got 3000" },
        { "spacing 0 m (README: (0, 5))", G, "lots[0].spacingM", "0", "lots[0].spacingM", "must be within (0, 5) m, got 0" },
        { "spacing 5 m (README: (0, 5))", G, "lots[0].spacingM", "5", "lots[0].spacingM", "must be within (0, 5) m, got 5" },
        { "no pots (README: ≥ 1)", G, "lots[0].pots", "0", "lots[0].pots", "must be ≥ 1, got 0" },
        // 10 m × 1.8 m = 18 m², × 1.05 = 18.9 m²; 1400 × 0.12² = 20.16 m² (README: pots × spacing² ≤ area × 1.05, common practice).
        { "1400 pots at 0.12 m on 18 m² (common practice: pots × spacing² ≤ area × 1.05)", G, "lots[0].pots", "1400", "lots[0].pots", "1400 pots at 0.12 m spacing need 20.16 m², more than bench 'b1' holds (18 m² × 1.05 = 18.9 m², at most 1312 pots)" },
        { "crop id with capitals (README: [a-z0-9-/])", G, "lots[0].crop", "\"Petunia\"", "lots[0].crop", "must be a crop id of lower-case letters, digits, '-' and '/'" },
        { "empty lot id (README: ids non-empty)", G, "lots[0].id", "\"\"", "lots[0].id", "must not be empty" },
        { "date not ISO (ISO 8601 calendar date)", G, "lots[0].plantedOn", "\"20/11/2026\"", "lots[0].plantedOn", "must be a date \"YYYY-MM-DD\", got '20/11/2026'" },
        { "no 31 November (ISO 8601 calendar date)", G, "lots[0].saleOn", "\"2026-11-31\"", "lots[0].saleOn", "must be a date \"YYYY-MM-DD\"" },
        {
            "rotations out of order (README: in time order)", G, "lots[0].rotations",
            """[ { "at": "2026-11-28T08:00:00+01:00", "angleDeg": 180 }, { "at": "2026-11-25T08:00:00+01:00", "angleDeg": 90 } ]""",
            "lots[0].rotations[1].at", "list rotations in time order"
        },
        { "rotation before planting (README: from the start of plantedOn)", G, "lots[0].rotations[0].at", "\"2026-11-19T23:00:00+01:00\"", "lots[0].rotations[0].at", "is before the lot was planted (2026-11-20)" },
        { "rotation after the measurement is planned, not done (README)", G, "lots[0].rotations[0].at", "\"2026-12-02T08:00:00+01:00\"", "lots[0].rotations[0].at", "is after measuredOn (2026-12-01): list only rotations already done" },
        // 23:30 UTC on 1 December is 00:30 on 2 December in Amsterdam (UTC+1 in winter, IANA tz database).
        { "rotation late on measuredOn in UTC is the next local day (IANA tz)", G, "lots[0].rotations[0].at", "\"2026-12-01T23:30:00Z\"", "lots[0].rotations[0].at", "is after measuredOn (2026-12-01)" },
        { "rotation angle 0 (README: not 0)", G, "lots[0].rotations[0].angleDeg", "0", "lots[0].rotations[0].angleDeg", "must be within (−360, 360) and not 0, got 0" },
        { "rotation angle 360 (README: (−360, 360))", G, "lots[0].rotations[0].angleDeg", "360", "lots[0].rotations[0].angleDeg", "must be within (−360, 360) and not 0, got 360" },
        { "timestamp without offset (ISO 8601 with UTC offset)", G, "lots[0].rotations[0].at", "\"2026-11-28T08:00:00\"", "lots[0].rotations[0].at", "must be an ISO-8601 date and time with seconds and a UTC offset" },
        { "rotation with a misspelt field (README: no unknown names)", G, "lots[0].rotations[0].angleDg", "90", "lots[0].rotations[0].angleDg", "unknown property; did you mean 'angleDeg'?" },

        // Temperature setpoints (README "temperatures").
        { "day setpoint 46 °C (README: [−10, 45])", G, "temperatures.dayC", "46", "temperatures.dayC", "must be within [-10, 45], got 46" },
        { "night setpoint −11 °C (README: [−10, 45])", G, "temperatures.nightC", "-11", "temperatures.nightC", "must be within [-10, 45], got -11" },
        { "night 31 °C over a 20 °C day (README: night ≤ day + 10)", G, "temperatures.nightC", "31", "temperatures.nightC", "must be at most 10 °C above dayC = 20 °C, got 31 °C" },
        { "negative pre-dawn drop (README: [0, 15])", G, "temperatures.preDawnDropC", "-1", "temperatures.preDawnDropC", "must be within [0, 15], got -1" },
        { "pre-dawn drop 16 °C (README: [0, 15])", G, "temperatures.preDawnDropC", "16", "temperatures.preDawnDropC", "must be within [0, 15], got 16" },
        { "pre-dawn drop 13 h (README: [0, 12])", G, "temperatures.preDawnDropHours", "13", "temperatures.preDawnDropHours", "must be within [0, 12], got 13" },
        { "setpoints without a day value (README: dayC required)", G, "temperatures.dayC", SiteJson.Remove, "temperatures.dayC", "is required" },

        // Electricity tariff (README "tariff"; currency codes are ISO 4217's three capital letters).
        { "negative price (README: [0, 100])", G, "tariff.pricePerKWh", "-0.1", "tariff.pricePerKWh", "must be within [0, 100], got -0.1" },
        { "price in cents by mistake (README: [0, 100])", G, "tariff.pricePerKWh", "210", "tariff.pricePerKWh", "must be within [0, 100], got 210" },
        { "currency in lower case (ISO 4217)", G, "tariff.currency", "\"eur\"", "tariff.currency", "must be an ISO 4217 code of three capital letters" },
        { "currency symbol (ISO 4217)", G, "tariff.currency", "\"€\"", "tariff.currency", "must be an ISO 4217 code of three capital letters" },

        // Labour (README "labour"; one case per rule).
        { "no crews (README: at least one)", G, "labour.crews", "[]", "labour.crews", "must list at least one crew" },
        { "crews missing (README: required)", G, "labour.crews", SiteJson.Remove, "labour.crews", "is required" },
        { "seconds per pot 0 (README: (0, 600])", G, "labour.secondsPerPot", "0", "labour.secondsPerPot", "must be within (0, 600] s, got 0" },
        { "negative set-up (README: [0, 240])", G, "labour.setUpMinutesPerBench", "-5", "labour.setUpMinutesPerBench", "must be within [0, 240] min, got -5" },
        { "crew ends before it starts (README: end after start)", G, "labour.crews[0].end", "\"06:00\"", "labour.crews[0].end", "must be after start (07:00), got 06:00" },
        { "crew end not a time (ISO 8601 24 h clock)", G, "labour.crews[0].end", "\"24:00\"", "labour.crews[0].end", "must be a local time \"HH:mm\"" },
        { "no people (README: [1, 100])", G, "labour.crews[0].people", "0", "labour.crews[0].people", "must be within [1, 100], got 0" },
        { "people as a fraction (README: a count)", G, "labour.crews[0].people", "1.5", "labour.crews[0].people", "must be an integer, got 1.5" },
        { "no working days (README: at least one)", G, "labour.crews[0].days", "[]", "labour.crews[0].days", "must name at least one working day" },
        { "a day twice (README: no repeats)", G, "labour.crews[0].days", "[\"mon\", \"mon\"]", "labour.crews[0].days[1]", "Monday is listed twice" },
        { "unknown day name (README: mon … sun)", G, "labour.crews[0].days[0]", "\"monday\"", "labour.crews[0].days[0]", "must be a day of the week, one of mon, tue, wed, thu, fri, sat, sun; got the string \"monday\"" },
        { "duplicate crew id (README: unique)", G, "labour.crews[1].id", "\"team\"", "labour.crews[1].id", "duplicate crew id 'team' (first used at labour.crews[0])" },
        { "empty crew id (README: non-empty)", G, "labour.crews[0].id", "\"\"", "labour.crews[0].id", "must not be empty" },
        { "holiday not a date (ISO 8601 calendar date)", G, "labour.holidays[0]", "\"25/12/2026\"", "labour.holidays[0]", "must be a date \"YYYY-MM-DD\", got the string \"25/12/2026\"" },
        { "holiday twice (README: no repeats)", G, "labour.holidays[1]", "\"2026-12-25\"", "labour.holidays[1]", "2026-12-25 is listed twice (first at labour.holidays[0])" },
        { "misspelt crew field (README: no unknown names)", G, "labour.crews[0].peple", "2", "labour.crews[0].peple", "unknown property; did you mean 'people'?" },

        // The shape of the file (README: format).
        { "unknown property (README: no unknown names)", G, "benches[0].colour", "2", "benches[0].colour", "unknown property (expected one of: canopy, footprint, id," },
        { "misspelt property gets a hint (README: no unknown names)", G, "benches[0].footprint.widhtM", "2", "benches[0].footprint.widhtM", "unknown property; did you mean 'widthM'?" },
        { "integer given as text (README: bayCount is an integer)", G, "structure.bayCount", "\"six\"", "structure.bayCount", "must be an integer, got the string \"six\"" },
        { "integer given as a fraction (README: bayCount is an integer)", G, "structure.bayCount", "2.5", "structure.bayCount", "must be an integer, got 2.5" },
        { "number given as text (README: numbers)", G, "location.elevationM", "\"low\"", "location.elevationM", "must be a number, got the string \"low\"" },
        { "missing required field (README)", G, "benches[0].surfaceHeightM", SiteJson.Remove, "benches[0].surfaceHeightM", "is required" },
        { "array expected (README)", G, "obstructions", "{}", "obstructions", "must be an array, got an object" },
        { "object expected (README)", G, "location", "52", "location", "must be an object, got the number 52" },
        { "unknown structure kind (README: glasshouse or indoorRoom)", G, "structure.kind", "\"tunnel\"", "structure.kind", "unknown structure kind 'tunnel'" },
        { "future format version (README: version 1)", G, "formatVersion", "2", "formatVersion", "unsupported format version 2" },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Bad_file_is_rejected_with_the_exact_path(string label, string baseFile, string path, string valueJson, string expectedPath, string expectedMessage)
    {
        string json = SiteJson.With(baseFile == G ? SiteJson.Glasshouse : SiteJson.IndoorRoom, (path, valueJson));

        var e = Assert.Throws<InvalidInputException>(() => new SiteFileReader(new TestBeams()).Parse(json, "test.json", null));

        Assert.True(
            e.Errors.Any(x => x.Path == expectedPath && x.Message.Contains(expectedMessage, StringComparison.Ordinal)),
            $"{label}: expected '{expectedPath}: …{expectedMessage}…' among:\n{string.Join('\n', e.Errors)}");
    }

    [Theory]
    [InlineData("glasshouse")]
    [InlineData("room")]
    public void Base_files_of_the_table_are_valid(string baseFile)
    {
        // Guards the table: each case changes one thing in a file that is otherwise accepted.
        var site = new SiteFileReader(new TestBeams()).Parse(baseFile == G ? SiteJson.Glasshouse : SiteJson.IndoorRoom, "test.json", null);
        Assert.NotEmpty(site.Benches);
    }
}
