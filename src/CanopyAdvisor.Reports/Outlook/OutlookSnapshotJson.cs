using System.Collections.Immutable;
using System.Diagnostics.CodeAnalysis;
using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Json.Nodes;
using NodaTime;
using NodaTime.Text;

namespace CanopyAdvisor.Reports.Outlook;

/// <summary>Writes and reads <c>outlook.json</c>, the gist of an outlook (<see cref="OutlookSnapshot"/>) kept for next
/// week's comparison (RFC 8259 JSON, UTF-8).</summary>
/// <remarks>
/// Shape: <c>{"format": "canopy-outlook", "version": 1, "siteId", "siteName", "now", "weekEnd", "week", "benches": [
/// {"rank", "benchId", "lotId", "cropId", "risk" ("low" | "watch" | "leavesGrade"), "leanNowDeg", "leanAtWeekEndDeg",
/// "leanAzimuthDeg", "gradeLimitDeg", "leanRateDegPerDay", "leavesGradeAt" (or null), "flags": [cause, …]}, …]}</c>.
/// Instants are ISO 8601 UTC (<c>2026-12-02T07:00:00Z</c>); angles in degrees.
/// </remarks>
public static class OutlookSnapshotJson
{
    /// <summary>The value of the <c>format</c> member that marks the file as ours.</summary>
    public const string Format = "canopy-outlook";

    /// <summary>The version of the shape written.</summary>
    public const int Version = 1;

    private static readonly InstantPattern Iso = InstantPattern.ExtendedIso;

    private static readonly JsonSerializerOptions Options = new()
    {
        WriteIndented = true,
        Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
    };

    /// <summary>The JSON text of a snapshot.</summary>
    public static string Write(OutlookSnapshot snapshot)
    {
        ArgumentNullException.ThrowIfNull(snapshot);
        var benches = new JsonArray();
        foreach (SnapshotBench b in snapshot.Benches)
        {
            benches.Add(new JsonObject
            {
                ["rank"] = b.Rank,
                ["benchId"] = b.BenchId,
                ["lotId"] = b.LotId,
                ["cropId"] = b.CropId,
                ["risk"] = RiskName(b.Risk),
                ["leanNowDeg"] = b.LeanNowDeg,
                ["leanAtWeekEndDeg"] = b.LeanAtWeekEndDeg,
                ["leanAzimuthDeg"] = b.LeanAzimuthDeg,
                ["gradeLimitDeg"] = b.GradeLimitDeg,
                ["leanRateDegPerDay"] = b.LeanRateDegPerDay,
                ["leavesGradeAt"] = b.LeavesGradeAt is Instant at ? Iso.Format(at) : null,
                ["flags"] = new JsonArray([.. b.Flags.Select(f => (JsonNode?)JsonValue.Create(f))]),
            });
        }

        var root = new JsonObject
        {
            ["format"] = Format,
            ["version"] = Version,
            ["siteId"] = snapshot.SiteId,
            ["siteName"] = snapshot.SiteName,
            ["now"] = Iso.Format(snapshot.Now),
            ["weekEnd"] = Iso.Format(snapshot.WeekEnd),
            ["week"] = snapshot.WeekLabel,
            ["benches"] = benches,
        };
        return root.ToJsonString(Options) + "\n";
    }

    /// <summary>Reads a snapshot; on any problem (not JSON, not ours, a member missing or of the wrong type) returns
    /// false with the problem in words and never throws for bad text.</summary>
    public static bool TryRead(string text, [NotNullWhen(true)] out OutlookSnapshot? snapshot, [NotNullWhen(false)] out string? problem)
    {
        ArgumentNullException.ThrowIfNull(text);
        snapshot = null;
        try
        {
            JsonNode? node = JsonNode.Parse(text);
            if (node is not JsonObject root)
            {
                problem = "not a JSON object";
                return false;
            }

            if ((string?)root["format"] != Format)
            {
                problem = $"not an outlook file (its \"format\" is not \"{Format}\")";
                return false;
            }

            int version = (int?)root["version"] ?? 0;
            if (version != Version)
            {
                problem = $"outlook file version {version} is not known (this program reads version {Version})";
                return false;
            }

            var benches = ImmutableArray.CreateBuilder<SnapshotBench>();
            foreach (JsonNode? item in Required<JsonArray>(root, "benches"))
            {
                if (item is not JsonObject b)
                {
                    throw new FormatException("a bench is not a JSON object");
                }

                string? leaves = (string?)b["leavesGradeAt"];
                benches.Add(new SnapshotBench(
                    Value<int>(b, "rank"),
                    Text(b, "benchId"),
                    Text(b, "lotId"),
                    Text(b, "cropId"),
                    ParseRisk(Text(b, "risk")),
                    Number(b, "leanNowDeg"),
                    Number(b, "leanAtWeekEndDeg"),
                    Number(b, "leanAzimuthDeg"),
                    Number(b, "gradeLimitDeg"),
                    Number(b, "leanRateDegPerDay"),
                    leaves is null ? null : ParseInstant(leaves, "leavesGradeAt"),
                    [.. Required<JsonArray>(b, "flags").Select(f => (string?)f ?? throw new FormatException("a flag is not a string"))]));
            }

            snapshot = new OutlookSnapshot(
                Text(root, "siteId"),
                Text(root, "siteName"),
                ParseInstant(Text(root, "now"), "now"),
                ParseInstant(Text(root, "weekEnd"), "weekEnd"),
                Text(root, "week"),
                benches.ToImmutable());
            problem = null;
            return true;
        }
        catch (Exception ex) when (ex is JsonException or FormatException or InvalidOperationException or ArgumentException)
        {
            problem = ex.Message;
            return false;
        }
    }

    /// <summary>The word a risk class is written as: <c>low</c>, <c>watch</c> or <c>leavesGrade</c>.</summary>
    public static string RiskName(OutlookRisk risk) => risk switch
    {
        OutlookRisk.LeavesGrade => "leavesGrade",
        OutlookRisk.Watch => "watch",
        _ => "low",
    };

    private static OutlookRisk ParseRisk(string text) => text switch
    {
        "leavesGrade" => OutlookRisk.LeavesGrade,
        "watch" => OutlookRisk.Watch,
        "low" => OutlookRisk.Low,
        _ => throw new FormatException($"unknown risk '{text}'"),
    };

    private static Instant ParseInstant(string text, string name)
    {
        ParseResult<Instant> r = Iso.Parse(text);
        return r.Success ? r.Value : throw new FormatException($"\"{name}\": '{text}' is not an ISO 8601 UTC instant");
    }

    private static T Required<T>(JsonObject o, string name)
        where T : JsonNode =>
        o[name] as T ?? throw new FormatException($"\"{name}\" is missing or of the wrong type");

    private static string Text(JsonObject o, string name) => Value<string>(o, name);

    private static double Number(JsonObject o, string name)
    {
        double v = Value<double>(o, name);
        return double.IsFinite(v) ? v : throw new FormatException($"\"{name}\" is not a finite number");
    }

    private static T Value<T>(JsonObject o, string name) =>
        o[name] is JsonValue v && v.TryGetValue(out T? value) && value is not null
            ? value
            : throw new FormatException($"\"{name}\" is missing or of the wrong type");
}
