using System.Globalization;
using System.Text.Json;
using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Photometry;
using NodaTime.Text;
using NodaTime;

namespace CanopyAdvisor.Files.Sites;

/// <summary>Reads a site file (the JSON format described in Sites/README.md and site.schema.json) into a <see cref="Site"/>.</summary>
/// <remarks>
/// <para>
/// Every problem is reported, each with a path in the file's own names (<c>benches[3].footprint.widthM: must be &gt; 0</c>):
/// malformed JSON (with line and byte), wrong JSON types, missing required and unknown properties, unknown time
/// zones, lamp and cover types, dates and times not in ISO-8601 form, and then every range and geometry rule of
/// <see cref="SiteValidator"/> (lots, temperature setpoints, tariff and labour settings included). On any problem the reader throws
/// <see cref="InvalidInputException"/> with all of them; it never returns a partly built site.
/// </para>
/// <para>
/// To report range problems in parts of the file that did parse while other parts did not, the reader validates a
/// draft in which missing numbers are NaN; a draft error is dropped when a parse error was already reported at
/// the same place or inside it (so a missing width gives "is required", not also "must be &gt; 0, got NaN").
/// </para>
/// <para>Beam distributions come from the <see cref="IBeamFactory"/> given at construction. Thread-safe if the factory is.</para>
/// </remarks>
public sealed class SiteFileReader
{
    /// <summary>The site file format version this reader reads.</summary>
    public const int FormatVersion = 1;

    /// <summary>Most lamps one entry of <c>lampRows</c> may place.</summary>
    public const int MaxLampsPerRow = 1000;

    private static readonly LocalTimePattern TimePattern = LocalTimePattern.CreateWithInvariantCulture("HH:mm");

    // ISO-8601 date-time with seconds, optional fraction and a required offset ("Z", "+01", "+01:00").
    private static readonly OffsetDateTimePattern InstantWithOffsetPattern =
        OffsetDateTimePattern.CreateWithInvariantCulture("uuuu'-'MM'-'dd'T'HH':'mm':'ss;FFFFFFFFFo<G>");

    // An indoor room has no sky: its weather is never used. A file may still give one; otherwise this fills the slot.
    private static readonly WeatherSettings IndoorWeather = new(SiteValidator.MinLinkeTurbidity, 1);

    // Working days in the site file, Monday first: ISO 8601 numbers the days Monday = 1 … Sunday = 7 but names none; these
    // are short English names, and a day's number is its place in this list plus one.
    private static readonly string[] DayNames = ["mon", "tue", "wed", "thu", "fri", "sat", "sun"];

    private readonly IBeamFactory beams;

    /// <summary>Creates a reader that makes beam distributions with the given factory.</summary>
    public SiteFileReader(IBeamFactory beams)
    {
        ArgumentNullException.ThrowIfNull(beams);
        this.beams = beams;
    }

    /// <summary>Reads a site file from disk; IES files named in it are found relative to its folder.</summary>
    /// <exception cref="InvalidInputException">The file cannot be read or is not a valid site; carries every problem.</exception>
    public Site Read(string path)
    {
        ArgumentException.ThrowIfNullOrEmpty(path);
        string fullPath = Path.GetFullPath(path);
        string json;
        try
        {
            json = File.ReadAllText(fullPath);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or NotSupportedException)
        {
            throw new InvalidInputException(Path.GetFileName(fullPath), $"cannot read the site file: {e.Message}");
        }

        return Parse(json, Path.GetFileName(fullPath), Path.GetDirectoryName(fullPath));
    }

    /// <summary>Parses site JSON text.</summary>
    /// <param name="json">The file's text.</param>
    /// <param name="sourceName">Name of the text's origin for malformed-JSON messages (e.g. the file name).</param>
    /// <param name="baseDirectory">Folder that relative IES file paths are resolved against; null when there is none.</param>
    /// <exception cref="InvalidInputException">The text is not a valid site; carries every problem.</exception>
    public Site Parse(string json, string sourceName, string? baseDirectory)
    {
        ArgumentNullException.ThrowIfNull(json);
        ArgumentNullException.ThrowIfNull(sourceName);
        JsonDocument document = JsonObjectReader.ParseDocument(json, sourceName);

        using (document)
        {
            return new Parsing(beams, baseDirectory).Run(document.RootElement);
        }
    }

    /// <summary>One parse: the errors found so far and the parts built from the file.</summary>
    private sealed class Parsing(IBeamFactory beams, string? baseDirectory)
    {
        private readonly List<ValidationError> errors = [];

        // Places whose value is unknown because of a problem reported elsewhere; draft errors there are dropped.
        private readonly List<string> unknown = [];
        private readonly Dictionary<string, Cover> coverTypes = new(StringComparer.Ordinal);
        private readonly Dictionary<string, LampType> lampTypes = new(StringComparer.Ordinal);
        private readonly HashSet<string> definedCoverTypes = new(StringComparer.Ordinal);
        private readonly HashSet<string> definedLampTypes = new(StringComparer.Ordinal);
        private readonly Dictionary<string, string> coverPaths = new(StringComparer.Ordinal);
        private readonly List<Bench> benches = [];
        private readonly List<string> benchPaths = [];
        private readonly List<Lamp> lamps = [];
        private readonly List<string> lampPaths = [];
        private readonly List<string> lampTypePaths = [];
        private readonly List<Obstruction> obstructions = [];
        private readonly List<string> obstructionPaths = [];
        private readonly List<Lot> lots = [];

        public Site Run(JsonElement rootElement)
        {
            JsonObjectReader? root = JsonObjectReader.Open(rootElement, string.Empty, errors);
            if (root is null)
            {
                throw new InvalidInputException(errors);
            }

            // An editor hint ("$schema": "site.schema.json"); it does not change the site.
            root.Text("$schema", required: false);
            int? version = root.Integer("formatVersion");
            if (version is int v && v != FormatVersion)
            {
                root.Error("formatVersion", $"unsupported format version {v}; this reader reads version {FormatVersion}");
            }

            string? id = root.Text("id");
            string? name = root.Text("name");
            root.Boolean("demoData", required: false);
            GeoLocation location = ReadLocation(root);
            DateTimeZone? zone = ReadZone(root);

            ReadCoverTypes(root);
            (Structure? structure, bool structureComplete, string? kind) = ReadStructure(root);
            WeatherSettings weather = ReadWeather(root, kind);

            ReadLampTypes(root);
            ReadBenches(root);
            ReadLamps(root);
            ReadLampRows(root);
            ReadObstructions(root);
            TemperatureSetpoints temperatures = ReadTemperatures(root);
            EnergyTariff tariff = ReadTariff(root);
            LabourSettings labour = ReadLabour(root);
            JobScheduleSettings schedule = ReadSchedule(root);
            ReadLots(root, zone);
            root.Finish();

            // Validate what was built; when parts failed to parse, validate a draft so their neighbours' problems still show.
            var draft = new Site(
                id ?? string.Empty,
                name ?? string.Empty,
                location,
                zone ?? DateTimeZone.Utc,
                structureComplete && structure is not null ? structure : new UnreadStructure(),
                [.. benches],
                [.. lamps],
                [.. obstructions],
                weather)
            {
                Lots = [.. lots],
                Temperatures = temperatures,
                Tariff = tariff,
                Labour = labour,
                Schedule = schedule,
            };
            var paths = new SitePaths(
                i => benchPaths[i],
                i => lampPaths[i],
                i => lampTypePaths[i],
                i => obstructionPaths[i],
                surface => coverPaths.TryGetValue(surface, out string? p) ? p : $"structure.covers.{surface}");
            var found = new List<ValidationError>(SiteValidator.Validate(draft, paths));
            if (!structureComplete && structure is not null)
            {
                found.AddRange(SiteValidator.CheckStructure(structure, "structure", paths.Cover));
            }

            // Types that no lamp or surface uses are still checked.
            foreach ((string typeName, LampType type) in lampTypes)
            {
                found.AddRange(SiteValidator.CheckLampOutput(type.PpfMicromolesPerSecond, type.Watts, type.Bands, JsonObjectReader.Child("lampTypes", typeName)));
            }

            foreach ((string coverName, Cover cover) in coverTypes)
            {
                found.AddRange(SiteValidator.CheckCover(cover, JsonObjectReader.Child("coverTypes", coverName)));
            }

            List<string> reported = [.. errors.Select(e => e.Path), .. unknown];
            List<ValidationError> all = [.. errors, .. found.Where(f => !reported.Any(r => Overlaps(r, f.Path)))];
            all = ShortenRows(all.Distinct().ToList());
            if (all.Count > 0)
            {
                throw new InvalidInputException(all);
            }

            return draft;
        }

        /// <summary>Keeps the first few placement errors of each lamp row and counts the rest, so one wrong row is not 100 lines.</summary>
        private static List<ValidationError> ShortenRows(List<ValidationError> all)
        {
            const int Shown = 3;
            var result = new List<ValidationError>();
            // Placement errors of a row share the row's path; every other error keeps a group of its own.
            IEnumerable<IGrouping<string, ValidationError>> groups = all
                .Select((e, i) => (Error: e, Key: IsRowPlacement(e.Path) ? e.Path : string.Create(CultureInfo.InvariantCulture, $"#{i}")))
                .GroupBy(t => t.Key, t => t.Error);
            foreach (IGrouping<string, ValidationError> group in groups)
            {
                result.AddRange(group.Take(Shown));
                int more = group.Count() - Shown;
                if (more > 0)
                {
                    result.Add(new ValidationError(group.Key, $"… and {more} more problems with lamps of this row"));
                }
            }

            return result;
        }

        private static bool IsRowPlacement(string path) =>
            path.StartsWith("lampRows[", StringComparison.Ordinal) && path.EndsWith(']') && path.IndexOf('.', StringComparison.Ordinal) < 0;

        private static bool Overlaps(string a, string b) => a == b || IsInside(a, b) || IsInside(b, a);

        private static bool IsInside(string inner, string outer) =>
            inner.Length > outer.Length && inner.StartsWith(outer, StringComparison.Ordinal) && inner[outer.Length] is '.' or '[';

        private static double Num(double? value) => value ?? double.NaN;

        private static GeoLocation ReadLocation(JsonObjectReader root)
        {
            JsonObjectReader? o = root.Object("location");
            double? lat = o?.Number("latitudeDeg");
            double? lon = o?.Number("longitudeDeg");
            double? elevation = o?.Number("elevationM");
            o?.Finish();
            return new GeoLocation(Angle.FromDegrees(Num(lat)), Angle.FromDegrees(Num(lon)), Num(elevation));
        }

        private static DateTimeZone? ReadZone(JsonObjectReader root)
        {
            string? zoneId = root.Text("timeZone");
            if (zoneId is null)
            {
                return null;
            }

            DateTimeZone? zone = DateTimeZoneProviders.Tzdb.GetZoneOrNull(zoneId);
            if (zone is null)
            {
                root.Error("timeZone", $"unknown IANA time zone '{zoneId}'");
            }

            return zone;
        }

        private static WeatherSettings ReadWeather(JsonObjectReader root, string? structureKind)
        {
            JsonObjectReader? o = root.Object("weather", required: structureKind == "glasshouse");
            if (o is null)
            {
                return IndoorWeather;
            }

            double? turbidity = o.Number("linkeTurbidity");
            double? clearness = o.Number("dailyClearness");
            o.Finish();
            return new WeatherSettings(Num(turbidity), Num(clearness));
        }

        private static Footprint ReadFootprint(JsonObjectReader parent, string name = "footprint")
        {
            JsonObjectReader? o = parent.Object(name);
            double? x = o?.Number("cornerXM");
            double? y = o?.Number("cornerYM");
            double? azimuth = o?.Number("axisAzimuthDeg");
            double? length = o?.Number("lengthM");
            double? width = o?.Number("widthM");
            o?.Finish();
            return new Footprint(Num(x), Num(y), Angle.FromDegrees(Num(azimuth)), Num(length), Num(width));
        }

        /// <summary>Reads a map of named definitions (cover or lamp types): records every name, reads each that is an object.</summary>
        private void ReadDefinitions(JsonObjectReader root, string section, HashSet<string> defined, Action<string, JsonElement, JsonObjectReader> read)
        {
            JsonObjectReader? map = root.Object(section, required: false);
            if (map is null)
            {
                return;
            }

            foreach ((string name, JsonElement value, string path) in map.Entries())
            {
                defined.Add(name);
                if (JsonObjectReader.Open(value, path, errors) is JsonObjectReader o)
                {
                    read(name, value, o);
                }
            }
        }

        private void ReadCoverTypes(JsonObjectReader root) => ReadDefinitions(root, "coverTypes", definedCoverTypes, (typeName, _, o) =>
            {
                bool opaque = o.Boolean("opaque", required: false) ?? false;
                double? n = o.Number("refractiveIndex", required: !opaque);
                double? k = o.Number("extinctionPerM", required: !opaque);
                double? thickness = o.Number("thicknessM", required: !opaque);
                int? layers = o.Integer("layers", required: !opaque);
                o.Finish();
                coverTypes[typeName] = opaque
                    ? Cover.OpaqueSurface(typeName)
                    : new Cover(typeName, false, Num(n), Num(k), Num(thickness), layers ?? 0);
            });

        private (Structure? Structure, bool Complete, string? Kind) ReadStructure(JsonObjectReader root)
        {
            JsonObjectReader? o = root.Object("structure");
            if (o is null)
            {
                return (null, false, null);
            }

            int before = errors.Count;
            string? kind = o.Text("kind");
            Structure? structure = null;
            switch (kind)
            {
                case "glasshouse":
                    {
                        Footprint footprint = ReadFootprint(o);
                        int? bayCount = o.Integer("bayCount");
                        double? bayWidth = o.Number("bayWidthM");
                        double? gutter = o.Number("gutterHeightM");
                        double? slope = o.Number("roofSlopeDeg");
                        double? shading = o.Number("structuralShading");
                        JsonObjectReader? covers = o.Object("covers");
                        var surfaces = SiteValidator.GlasshouseSurfaces.Select(s => ReadCoverReference(covers, s)).ToList();
                        covers?.Finish();
                        structure = new Glasshouse(
                            footprint, bayCount ?? 0, Num(bayWidth), Num(gutter), Angle.FromDegrees(Num(slope)),
                            surfaces[0], surfaces[1], surfaces[2], surfaces[3], surfaces[4], Num(shading));
                        break;
                    }

                case "indoorRoom":
                    {
                        Footprint footprint = ReadFootprint(o);
                        double? height = o.Number("heightM");
                        structure = new IndoorRoom(footprint, Num(height));
                        break;
                    }

                case null:
                    break;
                default:
                    o.Error("kind", $"unknown structure kind '{kind}' (expected \"glasshouse\" or \"indoorRoom\")");
                    break;
            }

            if (structure is not null)
            {
                o.Finish();
            }

            return (structure, structure is not null && errors.Count == before, kind);
        }

        private Cover ReadCoverReference(JsonObjectReader? covers, string surface)
        {
            string? typeName = covers?.Text(surface);
            if (typeName is not null && coverTypes.TryGetValue(typeName, out Cover? cover))
            {
                coverPaths[surface] = JsonObjectReader.Child("coverTypes", typeName);
                return cover;
            }

            if (typeName is not null && !definedCoverTypes.Contains(typeName))
            {
                string defined = definedCoverTypes.Count == 0 ? "none defined in coverTypes" : "defined: " + string.Join(", ", definedCoverTypes);
                covers!.Error(surface, $"unknown cover type '{typeName}' ({defined})");
            }

            // Either missing, unknown, or defined but unreadable (already reported there): a stand-in for the draft.
            coverPaths[surface] = covers?.PathOf(surface) ?? $"structure.covers.{surface}";
            return Cover.OpaqueSurface(typeName ?? surface);
        }

        private void ReadLampTypes(JsonObjectReader root) => ReadDefinitions(root, "lampTypes", definedLampTypes, (typeName, value, o) =>
            {
                (BeamDistribution beam, double? filePpf) = ReadBeam(o);

                // An IES beam brings its own flux (if its file fails, that is reported there, not as a missing PPF).
                bool ies = value.ValueKind == JsonValueKind.Object
                    && value.TryGetProperty("beam", out JsonElement b) && b.ValueKind == JsonValueKind.Object
                    && b.TryGetProperty("kind", out JsonElement k) && k.ValueKind == JsonValueKind.String && k.GetString() == "ies";
                double? ppf = o.Number("ppfUmolPerS", required: !ies);
                if (ies && ppf is null && filePpf is null)
                {
                    unknown.Add(o.PathOf("ppfUmolPerS"));
                }

                double? watts = o.Number("watts");
                JsonObjectReader? bands = o.Object("bands");
                double? blue = bands?.Number("blue");
                double? green = bands?.Number("green");
                double? red = bands?.Number("red");
                double? farRed = bands?.Number("farRed");
                bands?.Finish();
                o.Finish();
                lampTypes[typeName] = new LampType(
                    beam, ppf ?? filePpf ?? double.NaN, Num(watts), new BandFractions(Num(blue), Num(green), Num(red), Num(farRed)));
            });

        private (BeamDistribution Beam, double? FilePpf) ReadBeam(JsonObjectReader type)
        {
            JsonObjectReader? o = type.Object("beam");
            if (o is null)
            {
                return (UnreadBeam.Instance, null);
            }

            string? kind = o.Text("kind");
            BeamDistribution beam = UnreadBeam.Instance;
            double? filePpf = null;
            switch (kind)
            {
                case "isotropic":
                    beam = beams.Isotropic();
                    break;
                case "lambertian":
                    beam = beams.Lambertian();
                    break;
                case "cosinePower":
                    {
                        double? angle = o.Number("beamAngleDeg");
                        if (angle is double a && !(a > 0 && a < 180))
                        {
                            o.Error("beamAngleDeg", $"must be within (0, 180), got {a}");
                        }
                        else if (angle is double ok)
                        {
                            try
                            {
                                beam = beams.CosinePower(Angle.FromDegrees(ok));
                            }
                            catch (ArgumentException e)
                            {
                                o.Error("beamAngleDeg", e.Message);
                            }
                        }

                        break;
                    }

                case "ies":
                    (beam, filePpf) = ReadIes(o);
                    break;
                case null:
                    break;
                default:
                    o.Error("kind", $"unknown beam kind '{kind}' (expected \"isotropic\", \"lambertian\", \"cosinePower\" or \"ies\")");
                    return (beam, null);
            }

            if (kind is not null)
            {
                o.Finish();
            }

            return (beam, filePpf);
        }

        private (BeamDistribution Beam, double? FilePpf) ReadIes(JsonObjectReader o)
        {
            string? file = o.Text("file");
            string? values = o.Text("values");
            bool lumen = values == "lumen";
            double? perLumen = o.Number("micromolesPerLumen", required: lumen);
            IesValueUnits? unit = values switch
            {
                "photon" => IesValueUnits.Photon,
                "lumen" => IesValueUnits.Lumen,
                _ => null,
            };
            if (values is not null && unit is null)
            {
                o.Error("values", $"must be \"photon\" or \"lumen\", got '{values}'");
            }

            if (perLumen is double p && !(p > 0))
            {
                o.Error("micromolesPerLumen", $"must be > 0, got {p}");
                return (UnreadBeam.Instance, null);
            }

            if (perLumen is not null && unit == IesValueUnits.Photon)
            {
                o.Error("micromolesPerLumen", "is used only with \"values\": \"lumen\"");
                return (UnreadBeam.Instance, null);
            }

            if (file is null || unit is null)
            {
                return (UnreadBeam.Instance, null);
            }

            string fullPath;
            if (Path.IsPathFullyQualified(file))
            {
                fullPath = file;
            }
            else if (baseDirectory is null)
            {
                o.Error("file", $"relative path '{file}' needs the site file's folder, and this site was not read from a file");
                return (UnreadBeam.Instance, null);
            }
            else
            {
                fullPath = Path.GetFullPath(Path.Combine(baseDirectory, file));
            }

            try
            {
                IesBeam ies = beams.LoadIes(fullPath, unit.Value, perLumen);
                return (ies.Distribution, ies.PpfMicromolesPerSecond);
            }
            catch (InvalidInputException e)
            {
                foreach (ValidationError inner in e.Errors)
                {
                    o.Error("file", $"{inner.Path}: {inner.Message}");
                }
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                o.Error("file", $"cannot read '{file}': {e.Message}");
            }

            return (UnreadBeam.Instance, null);
        }

        private void ReadBenches(JsonObjectReader root)
        {
            IReadOnlyList<(JsonElement Item, string Path)>? items = root.Array("benches");
            if (items is null)
            {
                return;
            }

            if (items.Count == 0)
            {
                root.Error("benches", "must list at least one bench");
            }

            foreach ((JsonElement item, string path) in items)
            {
                JsonObjectReader? o = JsonObjectReader.Open(item, path, errors);
                if (o is null)
                {
                    continue;
                }

                string? id = o.Text("id");
                Footprint footprint = ReadFootprint(o);
                double? surface = o.Number("surfaceHeightM");
                JsonObjectReader? c = o.Object("canopy");
                double? height = c?.Number("heightM");
                double? depth = c?.Number("sensingDepthM");
                double? lad = c?.Number("leafAreaDensityM2PerM3");
                c?.Finish();
                int? along = o.Integer("samplesAlongLength");
                int? across = o.Integer("samplesAcrossWidth");
                o.Finish();
                benches.Add(new Bench(id ?? string.Empty, footprint, Num(surface), new Canopy(Num(height), Num(depth), Num(lad)), along ?? 0, across ?? 0));
                benchPaths.Add(path);
            }
        }

        private (LampType Type, string TypePath) ReadLampTypeReference(JsonObjectReader o)
        {
            string? typeName = o.Text("type");
            if (typeName is not null && lampTypes.TryGetValue(typeName, out LampType? type))
            {
                return (type, JsonObjectReader.Child("lampTypes", typeName));
            }

            if (typeName is not null && !definedLampTypes.Contains(typeName))
            {
                string defined = definedLampTypes.Count == 0 ? "none defined in lampTypes" : "defined: " + string.Join(", ", definedLampTypes);
                o.Error("type", $"unknown lamp type '{typeName}' ({defined})");
            }

            // Unknown (reported here) or defined but unreadable (reported at its definition): the draft's checks of
            // this stand-in are then dropped as overlapping the error already reported.
            return (LampType.Unread, typeName is not null && definedLampTypes.Contains(typeName) ? JsonObjectReader.Child("lampTypes", typeName) : o.PathOf("type"));
        }

        private static (LampAim Aim, double Dimming, LampSchedule Schedule) ReadLampSettings(JsonObjectReader o)
        {
            LampAim aim = LampAim.Down;
            JsonObjectReader? a = o.Object("aim", required: false);
            if (a is not null)
            {
                double? yaw = a.Number("yawDeg", required: false);
                double? tilt = a.Number("tiltDeg", required: false);
                double? spin = a.Number("spinDeg", required: false);
                a.Finish();
                aim = new LampAim(Angle.FromDegrees(yaw ?? 0), Angle.FromDegrees(tilt ?? 0), Angle.FromDegrees(spin ?? 0));
            }

            double dimming = o.Number("dimming", required: false) ?? (o.Has("dimming") ? double.NaN : 1.0);
            LampSchedule schedule = LampSchedule.AlwaysOn;
            JsonObjectReader? s = o.Object("schedule");
            if (s is not null)
            {
                LocalTime? on = ReadTime(s, "on");
                LocalTime? off = ReadTime(s, "off");
                double? threshold = s.Number("offAboveOutsidePpfd", required: false);
                s.Finish();
                schedule = new LampSchedule(on ?? LocalTime.Midnight, off ?? LocalTime.Midnight, threshold);
            }

            return (aim, dimming, schedule);
        }

        private static LocalTime? ReadTime(JsonObjectReader o, string name)
        {
            string? text = o.Text(name);
            if (text is null)
            {
                return null;
            }

            ParseResult<LocalTime> result = TimePattern.Parse(text);
            if (!result.Success)
            {
                o.Error(name, $"must be a local time \"HH:mm\" from 00:00 to 23:59, got '{text}'");
                return null;
            }

            return result.Value;
        }

        private void ReadLamps(JsonObjectReader root)
        {
            IReadOnlyList<(JsonElement Item, string Path)>? items = root.Array("lamps", required: false);
            foreach ((JsonElement item, string path) in items ?? [])
            {
                JsonObjectReader? o = JsonObjectReader.Open(item, path, errors);
                if (o is null)
                {
                    continue;
                }

                string? id = o.Text("id");
                (LampType type, string typePath) = ReadLampTypeReference(o);
                double? x = o.Number("xM");
                double? y = o.Number("yM");
                double? z = o.Number("zM");
                (LampAim aim, double dimming, LampSchedule schedule) = ReadLampSettings(o);
                o.Finish();
                AddLamp(id ?? string.Empty, new Vector3(Num(x), Num(y), Num(z)), type, aim, dimming, schedule, path, typePath);
            }
        }

        private void ReadLampRows(JsonObjectReader root)
        {
            IReadOnlyList<(JsonElement Item, string Path)>? items = root.Array("lampRows", required: false);
            foreach ((JsonElement item, string path) in items ?? [])
            {
                JsonObjectReader? o = JsonObjectReader.Open(item, path, errors);
                if (o is null)
                {
                    continue;
                }

                string? id = o.Text("id");
                (LampType type, string typePath) = ReadLampTypeReference(o);
                Vector3? start = ReadPoint(o, "start");
                Vector3? step = ReadPoint(o, "step");
                int? count = o.Integer("count");
                (LampAim aim, double dimming, LampSchedule schedule) = ReadLampSettings(o);
                o.Finish();
                if (count is int n && n is < 1 or > MaxLampsPerRow)
                {
                    o.Error("count", $"must be within [1, {MaxLampsPerRow}], got {n}");
                    continue;
                }

                if (count is null || start is null || step is null)
                {
                    continue;
                }

                for (int k = 0; k < count.Value; k++)
                {
                    string lampId = string.IsNullOrEmpty(id) ? string.Empty : $"{id}-{k + 1}";
                    AddLamp(lampId, start.Value + (step.Value * k), type, aim, dimming, schedule, path, typePath);
                }
            }
        }

        private static Vector3? ReadPoint(JsonObjectReader parent, string name)
        {
            JsonObjectReader? o = parent.Object(name);
            if (o is null)
            {
                return null;
            }

            double? x = o.Number("xM");
            double? y = o.Number("yM");
            double? z = o.Number("zM");
            o.Finish();
            return x is null || y is null || z is null ? null : new Vector3(x.Value, y.Value, z.Value);
        }

        private void AddLamp(string id, Vector3 position, LampType type, LampAim aim, double dimming, LampSchedule schedule, string path, string typePath)
        {
            lamps.Add(new Lamp(id, position, aim, type.Beam, type.PpfMicromolesPerSecond, type.Bands, dimming, type.Watts, schedule));
            lampPaths.Add(path);
            lampTypePaths.Add(typePath);
        }

        private static TemperatureSetpoints ReadTemperatures(JsonObjectReader root)
        {
            JsonObjectReader? o = root.Object("temperatures", required: false);
            if (o is null)
            {
                return TemperatureSetpoints.Default;
            }

            double? day = o.Number("dayC");
            double? night = o.Number("nightC");
            double dropC = o.Number("preDawnDropC", required: false) ?? (o.Has("preDawnDropC") ? double.NaN : 0);
            double dropHours = o.Number("preDawnDropHours", required: false) ?? (o.Has("preDawnDropHours") ? double.NaN : 0);
            o.Finish();
            return new TemperatureSetpoints(Num(day), Num(night), dropC, dropHours);
        }

        private static EnergyTariff ReadTariff(JsonObjectReader root)
        {
            JsonObjectReader? o = root.Object("tariff", required: false);
            if (o is null)
            {
                return EnergyTariff.Unknown;
            }

            double? price = o.Number("pricePerKWh");
            string? currency = o.Text("currency");
            o.Finish();
            return new EnergyTariff(Num(price), currency ?? string.Empty);
        }

        private LabourSettings ReadLabour(JsonObjectReader root)
        {
            JsonObjectReader? o = root.Object("labour", required: false);
            if (o is null)
            {
                return LabourSettings.Default;
            }

            double secondsPerPot = o.Number("secondsPerPot", required: false)
                ?? (o.Has("secondsPerPot") ? double.NaN : LabourSettings.Default.SecondsPerPot);
            double setUp = o.Number("setUpMinutesPerBench", required: false)
                ?? (o.Has("setUpMinutesPerBench") ? double.NaN : LabourSettings.Default.SetUpMinutesPerBench);
            var crews = new List<Crew>();
            IReadOnlyList<(JsonElement Item, string Path)>? items = o.Array("crews");
            if (items is null)
            {
                // Missing (reported as required) or not an array (reported): the draft's "at least one crew" is then dropped.
                unknown.Add(o.PathOf("crews"));
            }

            foreach ((JsonElement item, string path) in items ?? [])
            {
                crews.Add(ReadCrew(item, path));
            }

            var holidays = new List<LocalDate>();
            IReadOnlyList<(JsonElement Item, string Path)>? days = o.Array("holidays", required: false);
            foreach ((JsonElement item, string path) in days ?? [])
            {
                if (item.ValueKind == JsonValueKind.String && LocalDatePattern.Iso.Parse(item.GetString()!) is { Success: true } parsed)
                {
                    holidays.Add(parsed.Value);
                }
                else
                {
                    errors.Add(new(path, $"must be a date \"YYYY-MM-DD\", got {JsonObjectReader.Describe(item)}"));
                }
            }

            o.Finish();
            return new LabourSettings(secondsPerPot, setUp, [.. crews], [.. holidays]);
        }

        private static JobScheduleSettings ReadSchedule(JsonObjectReader root)
        {
            JobScheduleSettings defaults = JobScheduleSettings.Default;
            JsonObjectReader? o = root.Object("schedule", required: false);
            if (o is null)
            {
                return defaults;
            }

            LocalTime nightly = (o.Has("nightlyForecastAt") ? ReadTime(o, "nightlyForecastAt") : null) ?? defaults.NightlyForecastAt;
            LocalTime outlookAt = (o.Has("outlookAt") ? ReadTime(o, "outlookAt") : null) ?? defaults.OutlookAt;
            IsoDayOfWeek outlookDay = defaults.OutlookDay;
            if (o.Text("outlookDay", required: false) is string day)
            {
                if (DayOfWeek(day) is IsoDayOfWeek known)
                {
                    outlookDay = known;
                }
                else
                {
                    o.Error("outlookDay", $"must be a day of the week, one of {string.Join(", ", DayNames)}; got '{day}'");
                }
            }

            o.Finish();
            return new JobScheduleSettings(nightly, outlookDay, outlookAt);
        }

        private Crew ReadCrew(JsonElement item, string path)
        {
            // The validator names crews by index (labour.crews[i]); keep one draft crew per item so the indices match.
            JsonObjectReader? o = JsonObjectReader.Open(item, path, errors);
            if (o is null)
            {
                unknown.Add(path);
                return new Crew(string.Empty, string.Empty, 1, [IsoDayOfWeek.Monday], LocalTime.Midnight, LocalTime.Noon);
            }

            string? id = o.Text("id");
            string? name = o.Text("name", required: false);
            // A people count that could not be read is reported there; the draft takes 1 so nothing more is said about it.
            int people = o.Integer("people", required: false) ?? 1;

            var workingDays = new List<IsoDayOfWeek>();
            IReadOnlyList<(JsonElement Item, string Path)>? days = o.Array("days");
            foreach ((JsonElement day, string dayPath) in days ?? [])
            {
                IsoDayOfWeek? d = day.ValueKind == JsonValueKind.String ? DayOfWeek(day.GetString()!) : null;
                if (d is IsoDayOfWeek known)
                {
                    workingDays.Add(known);
                }
                else
                {
                    errors.Add(new(dayPath, $"must be a day of the week, one of {string.Join(", ", DayNames)}; got {JsonObjectReader.Describe(day)}"));
                    unknown.Add(o.PathOf("days"));
                }
            }

            if (days is null)
            {
                unknown.Add(o.PathOf("days"));
            }

            LocalTime? start = ReadTime(o, "start");
            LocalTime? end = ReadTime(o, "end");
            o.Finish();
            if (start is null || end is null)
            {
                unknown.Add(o.PathOf("end"));
            }

            return new Crew(
                id ?? string.Empty,
                name ?? id ?? string.Empty,
                people,
                [.. workingDays],
                start ?? LocalTime.Midnight,
                end ?? LocalTime.Noon);
        }

        private static IsoDayOfWeek? DayOfWeek(string name)
        {
            int index = Array.IndexOf(DayNames, name);
            return index < 0 ? null : (IsoDayOfWeek)(index + 1);
        }

        private void ReadLots(JsonObjectReader root, DateTimeZone? zone)
        {
            IReadOnlyList<(JsonElement Item, string Path)>? items = root.Array("lots", required: false);
            foreach ((JsonElement item, string path) in items ?? [])
            {
                // The validator names lots by index (lots[i]); keep one draft lot per item so the indices match.
                JsonObjectReader? o = JsonObjectReader.Open(item, path, errors);
                if (o is null)
                {
                    unknown.Add(path);
                    lots.Add(new Lot(string.Empty, string.Empty, "unread", default, default, double.NaN, default, double.NaN, 0, []));
                    continue;
                }

                string? id = o.Text("id");
                string? benchId = o.Text("benchId");
                string? crop = o.Text("crop");
                LocalDate? planted = ReadDate(o, "plantedOn");
                LocalDate? sale = ReadDate(o, "saleOn");
                double? height = o.Number("heightMm");
                LocalDate? measured = ReadDate(o, "measuredOn");
                double? spacing = o.Number("spacingM");
                int? pots = o.Integer("pots");
                List<RotationRecord> rotations = ReadRotations(o);
                o.Finish();

                // Checks that need all three dates are left out when one of them is unknown; rotation times also need the zone.
                if (planted is null || sale is null || measured is null)
                {
                    unknown.Add(o.PathOf("saleOn"));
                    unknown.Add(o.PathOf("measuredOn"));
                }

                if (planted is null || sale is null || measured is null || zone is null)
                {
                    foreach (int r in Enumerable.Range(0, rotations.Count))
                    {
                        unknown.Add($"{JsonObjectReader.Item(o.PathOf("rotations"), r)}.at");
                    }
                }

                lots.Add(new Lot(
                    id ?? string.Empty,
                    benchId ?? string.Empty,
                    crop ?? string.Empty,
                    planted ?? default,
                    sale ?? default,
                    Num(height),
                    measured ?? default,
                    Num(spacing),
                    pots ?? 0,
                    [.. rotations]));
            }
        }

        private List<RotationRecord> ReadRotations(JsonObjectReader lot)
        {
            var result = new List<RotationRecord>();
            var unread = new List<int>();
            IReadOnlyList<(JsonElement Item, string Path)>? items = lot.Array("rotations", required: false);
            foreach ((JsonElement item, string path) in items ?? [])
            {
                JsonObjectReader? o = JsonObjectReader.Open(item, path, errors);
                Instant? at = null;
                double? angle = null;
                if (o is not null)
                {
                    at = ReadInstant(o, "at");
                    angle = o.Number("angleDeg");
                    o.Finish();
                }
                else
                {
                    unknown.Add(path);
                }

                if (at is null)
                {
                    unread.Add(result.Count);
                    unknown.Add($"{path}.at");
                }

                result.Add(new RotationRecord(at ?? default, Angle.FromDegrees(Num(angle))));
            }

            // A rotation whose time could not be read takes its neighbour's time, so it does not upset the order check of the next one.
            foreach (int i in unread)
            {
                Instant? neighbour = result.Take(i).Select((r, k) => (r, k)).Where(t => !unread.Contains(t.k)).Select(t => (Instant?)t.r.At).LastOrDefault()
                    ?? result.Skip(i + 1).Select((r, k) => (r, k: k + i + 1)).Where(t => !unread.Contains(t.k)).Select(t => (Instant?)t.r.At).FirstOrDefault();
                if (neighbour is Instant n)
                {
                    result[i] = result[i] with { At = n };
                }
            }

            return result;
        }

        private static LocalDate? ReadDate(JsonObjectReader o, string name)
        {
            string? text = o.Text(name);
            if (text is null)
            {
                return null;
            }

            ParseResult<LocalDate> result = LocalDatePattern.Iso.Parse(text);
            if (!result.Success)
            {
                o.Error(name, $"must be a date \"YYYY-MM-DD\", got '{text}'");
                return null;
            }

            return result.Value;
        }

        private static Instant? ReadInstant(JsonObjectReader o, string name)
        {
            string? text = o.Text(name);
            if (text is null)
            {
                return null;
            }

            ParseResult<OffsetDateTime> result = InstantWithOffsetPattern.Parse(text);
            if (!result.Success)
            {
                o.Error(name, $"must be an ISO-8601 date and time with seconds and a UTC offset, e.g. \"2026-11-28T08:00:00+01:00\", got '{text}'");
                return null;
            }

            return result.Value.ToInstant();
        }

        private void ReadObstructions(JsonObjectReader root)
        {
            IReadOnlyList<(JsonElement Item, string Path)>? items = root.Array("obstructions", required: false);
            foreach ((JsonElement item, string path) in items ?? [])
            {
                JsonObjectReader? o = JsonObjectReader.Open(item, path, errors);
                if (o is null)
                {
                    continue;
                }

                string? id = o.Text("id");
                Footprint footprint = ReadFootprint(o);
                double? baseHeight = o.Number("baseHeightM");
                double? top = o.Number("topHeightM");
                o.Finish();
                obstructions.Add(new Obstruction(id ?? string.Empty, footprint, Num(baseHeight), Num(top)));
                obstructionPaths.Add(path);
            }
        }
    }

    /// <summary>A lamp type as read: its beam, photon output and spectrum.</summary>
    private sealed record LampType(BeamDistribution Beam, double PpfMicromolesPerSecond, double Watts, BandFractions Bands)
    {
        public static LampType Unread { get; } = new(UnreadBeam.Instance, double.NaN, double.NaN, new BandFractions(double.NaN, double.NaN, double.NaN, double.NaN));
    }

    /// <summary>Stands in, in a draft that is validated but never returned, for a structure that could not be read.</summary>
    private sealed record UnreadStructure : Structure;

    /// <summary>Stands in, in a draft that is validated but never returned, for a beam that could not be read.</summary>
    private sealed class UnreadBeam : BeamDistribution
    {
        public static UnreadBeam Instance { get; } = new();

        public override bool IsAxiallySymmetric => true;

        public override double IntensityPerUnitFlux(double polarRadians, double aroundRadians) =>
            throw new InvalidOperationException("A beam that could not be read is never used: the site was rejected.");
    }
}
