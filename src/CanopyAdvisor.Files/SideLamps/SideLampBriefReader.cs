using System.Collections.Immutable;
using System.Text.Json;
using CanopyAdvisor.Core.Advice.SideLamps;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Sites;
using NodaTime;
using NodaTime.Text;

namespace CanopyAdvisor.Files.SideLamps;

/// <summary>Reads a side-lamp brief file (the JSON format of SideLamps/README.md and side-lamp-brief.schema.json).</summary>
/// <remarks>
/// <para>Every problem is reported with its path in the file's own names (<c>rails[1].end.zM: is required</c>): malformed
/// JSON (with line and byte), wrong JSON types, missing required and unknown properties, times not in <c>"HH:mm"</c>
/// form, lamp types the site does not define. When the file's shape is right, the brief is then checked against the
/// site by <see cref="SideLampPlanner.Validate"/> (rails inside the structure and out of the canopies, benches that
/// exist and carry lots, ranges), with the same paths. On any problem it throws <see cref="InvalidInputException"/>
/// with all of them; it never returns a partly read brief.</para>
/// <para>Lamp types are named, not defined, in a brief: they are the site file's <c>lampTypes</c>
/// (<see cref="SiteLampTypes"/>). Thread-safe.</para>
/// </remarks>
public sealed class SideLampBriefReader
{
    /// <summary>The brief format version this reader reads.</summary>
    public const int FormatVersion = 1;

    private static readonly LocalTimePattern TimePattern = LocalTimePattern.CreateWithInvariantCulture("HH:mm");

    private readonly IReadOnlyDictionary<string, SideLampType> lampTypes;

    /// <summary>Creates a reader for briefs that name the given lamp types.</summary>
    /// <param name="lampTypes">The site's lamp types by name (<see cref="SiteLampTypes.Read"/>).</param>
    public SideLampBriefReader(IReadOnlyDictionary<string, SideLampType> lampTypes)
    {
        ArgumentNullException.ThrowIfNull(lampTypes);
        this.lampTypes = lampTypes;
    }

    /// <summary>Reads a brief file from disk and checks it against the site.</summary>
    /// <exception cref="InvalidInputException">The file cannot be read or is not a valid brief for the site.</exception>
    public SideLampBrief Read(string path, Site site)
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
            throw new InvalidInputException(Path.GetFileName(fullPath), $"cannot read the brief file: {e.Message}");
        }

        return Parse(json, Path.GetFileName(fullPath), site);
    }

    /// <summary>Parses brief JSON text and checks it against the site.</summary>
    /// <param name="json">The file's text.</param>
    /// <param name="sourceName">Name of the text's origin for malformed-JSON messages.</param>
    /// <param name="site">The site the lamps would be added to.</param>
    /// <exception cref="InvalidInputException">The text is not a valid brief for the site; carries every problem.</exception>
    public SideLampBrief Parse(string json, string sourceName, Site site)
    {
        ArgumentNullException.ThrowIfNull(json);
        ArgumentNullException.ThrowIfNull(sourceName);
        ArgumentNullException.ThrowIfNull(site);
        JsonDocument document = JsonObjectReader.ParseDocument(json, sourceName);

        var errors = new List<ValidationError>();
        SideLampBrief? brief;
        using (document)
        {
            brief = ReadBrief(document.RootElement, site, errors);
        }

        if (errors.Count > 0 || brief is null)
        {
            throw new InvalidInputException(errors);
        }

        IReadOnlyList<ValidationError> problems = SideLampPlanner.Validate(brief, site);
        if (problems.Count > 0)
        {
            throw new InvalidInputException(problems);
        }

        return brief;
    }

    private SideLampBrief? ReadBrief(JsonElement element, Site site, List<ValidationError> errors)
    {
        JsonObjectReader? root = JsonObjectReader.Open(element, string.Empty, errors);
        if (root is null)
        {
            return null;
        }

        root.Text("$schema", required: false);
        int? version = root.Integer("formatVersion");
        if (version is int v && v != FormatVersion)
        {
            root.Error("formatVersion", $"unsupported format version {v}; this reader reads version {FormatVersion}");
        }

        root.Boolean("demoData", required: false);
        if (root.Text("site", required: false) is string siteId && siteId != site.Id)
        {
            root.Error("site", $"the brief is written for site '{siteId}', not for '{site.Id}'");
        }

        var rails = new List<MountingRail>();
        foreach ((JsonElement item, string path) in root.Array("rails") ?? [])
        {
            if (ReadRail(item, path, errors) is MountingRail rail)
            {
                rails.Add(rail);
            }
        }

        var types = new List<SideLampType>();
        foreach ((string name, string path) in Strings(root, "lampTypes", required: true, errors))
        {
            if (lampTypes.TryGetValue(name, out SideLampType? type))
            {
                types.Add(type);
            }
            else
            {
                string defined = lampTypes.Count == 0 ? "the site defines none in its lampTypes" : "the site defines: " + string.Join(", ", lampTypes.Keys);
                errors.Add(new(path, $"unknown lamp type '{name}' ({defined})"));
            }
        }

        int? maxLamps = root.Integer("maxLamps");
        ImmutableArray<string> benches = [.. Strings(root, "benches", required: false, errors).Select(s => s.Value)];
        double? riskFraction = root.Number("riskFraction", required: false);
        (ImmutableDictionary<string, double> byCrop, ImmutableDictionary<string, double> byBench, double? fallback) = ReadCeilings(root);
        double? floor = root.Number("uniformityFloor", required: false);
        double? energyWeight = root.Number("energyWeightPerKW", required: false);
        JsonObjectReader? tilt = root.Object("tiltDeg", required: false);
        double? minTilt = tilt?.Number("min", required: false);
        double? maxTilt = tilt?.Number("max", required: false);
        tilt?.Finish();
        LampSchedule? schedule = ReadSchedule(root);
        int? seed = root.Integer("seed", required: false);
        int? starts = root.Integer("starts", required: false);
        root.Finish();

        if (errors.Count > 0 || maxLamps is null || schedule is null)
        {
            return null;
        }

        var defaults = new SideLampBrief([], [], 0, LampSchedule.AlwaysOn);
        return new SideLampBrief([.. rails], [.. types], maxLamps.Value, schedule)
        {
            BenchIds = benches,
            RiskFraction = riskFraction ?? defaults.RiskFraction,
            PpfdCeilingByCrop = byCrop,
            PpfdCeilingByBench = byBench,
            DefaultPpfdCeiling = fallback,
            UniformityFloor = floor ?? defaults.UniformityFloor,
            EnergyWeightPerKilowatt = energyWeight ?? defaults.EnergyWeightPerKilowatt,
            MinTilt = minTilt is double lo ? Angle.FromDegrees(lo) : defaults.MinTilt,
            MaxTilt = maxTilt is double hi ? Angle.FromDegrees(hi) : defaults.MaxTilt,
            Seed = seed ?? defaults.Seed,
            Starts = starts ?? defaults.Starts,
        };
    }

    private static MountingRail? ReadRail(JsonElement element, string path, List<ValidationError> errors)
    {
        JsonObjectReader? o = JsonObjectReader.Open(element, path, errors);
        if (o is null)
        {
            return null;
        }

        string? id = o.Text("id");
        Vector3? start = ReadPoint(o, "start");
        Vector3? end = ReadPoint(o, "end");
        double? facing = o.Number("facingDeg", required: false);
        double? range = o.Number("yawRangeDeg", required: false);
        o.Finish();
        if (id is null || start is null || end is null)
        {
            return null;
        }

        var rail = new MountingRail(id, start.Value, end.Value) { Facing = facing is double f ? Angle.FromDegrees(f) : null };
        return range is double r ? rail with { YawHalfRange = Angle.FromDegrees(r) } : rail;
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
        return x is double xx && y is double yy && z is double zz ? new Vector3(xx, yy, zz) : null;
    }

    private static (ImmutableDictionary<string, double> ByCrop, ImmutableDictionary<string, double> ByBench, double? Default) ReadCeilings(JsonObjectReader root)
    {
        JsonObjectReader? o = root.Object("ppfdCeilings", required: false);
        if (o is null)
        {
            return (ImmutableDictionary<string, double>.Empty, ImmutableDictionary<string, double>.Empty, null);
        }

        double? fallback = o.Number("default", required: false);
        ImmutableDictionary<string, double> byCrop = Map(o, "byCrop");
        ImmutableDictionary<string, double> byBench = Map(o, "byBench");
        o.Finish();
        return (byCrop, byBench, fallback);
    }

    private static ImmutableDictionary<string, double> Map(JsonObjectReader parent, string name)
    {
        JsonObjectReader? o = parent.Object(name, required: false);
        var result = ImmutableDictionary.CreateBuilder<string, double>(StringComparer.Ordinal);
        if (o is null)
        {
            return result.ToImmutable();
        }

        foreach ((string key, _, _) in o.Entries())
        {
            if (o.Number(key) is double value)
            {
                result[key] = value;
            }
        }

        return result.ToImmutable();
    }

    private static LampSchedule? ReadSchedule(JsonObjectReader root)
    {
        JsonObjectReader? o = root.Object("schedule");
        if (o is null)
        {
            return null;
        }

        LocalTime? on = Time(o, "on");
        LocalTime? off = Time(o, "off");
        double? threshold = o.Number("offAboveOutsidePpfd", required: false);
        o.Finish();
        return on is LocalTime a && off is LocalTime b ? new LampSchedule(a, b, threshold) : null;
    }

    private static LocalTime? Time(JsonObjectReader o, string name)
    {
        string? text = o.Text(name);
        if (text is null)
        {
            return null;
        }

        ParseResult<LocalTime> parsed = TimePattern.Parse(text);
        if (!parsed.Success)
        {
            o.Error(name, $"must be a local time \"HH:mm\" (24 h clock), got \"{text}\"");
            return null;
        }

        return parsed.Value;
    }

    private static List<(string Value, string Path)> Strings(JsonObjectReader o, string name, bool required, List<ValidationError> errors)
    {
        var result = new List<(string Value, string Path)>();
        foreach ((JsonElement item, string path) in o.Array(name, required) ?? [])
        {
            if (item.ValueKind == JsonValueKind.String)
            {
                result.Add((item.GetString()!, path));
            }
            else
            {
                errors.Add(new(path, $"must be a string, got {JsonObjectReader.Describe(item)}"));
            }
        }

        return result;
    }
}
