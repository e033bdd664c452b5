using System.Globalization;
using System.Text.Json;
using System.Text.RegularExpressions;
using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Files.Sites;

/// <summary>Reads the properties of one JSON object, recording every problem with its path in the file's own names.</summary>
/// <remarks>
/// Each property the caller asks for is marked known; <see cref="Finish"/> then reports the properties nobody asked
/// for as unknown, so a misspelt name is never silently ignored. A JSON <c>null</c> counts as absent. Not thread-safe.
/// </remarks>
internal sealed partial class JsonObjectReader
{
    /// <summary>Parses a JSON file's text strictly (no comments, no trailing commas; a leading byte-order mark, left by
    /// some editors, is skipped).</summary>
    /// <param name="json">The text.</param>
    /// <param name="sourceName">Name of the text's origin for the malformed-JSON message (e.g. the file name).</param>
    /// <exception cref="InvalidInputException">The text is not JSON: the message names the line and byte.</exception>
    public static JsonDocument ParseDocument(string json, string sourceName)
    {
        try
        {
            return JsonDocument.Parse(json.AsMemory(json.StartsWith('\uFEFF') ? 1 : 0), new JsonDocumentOptions { CommentHandling = JsonCommentHandling.Disallow, AllowTrailingCommas = false });
        }
        catch (JsonException e)
        {
            long line = (e.LineNumber ?? 0) + 1;
            long column = (e.BytePositionInLine ?? 0) + 1;
            string message = e.Message;
            int cut = message.IndexOf(" LineNumber:", StringComparison.Ordinal);
            if (cut > 0)
            {
                message = message[..cut];
            }

            throw new InvalidInputException($"{sourceName}:{line}", $"malformed JSON at line {line}, byte {column}: {message}");
        }
    }

    private readonly Dictionary<string, JsonElement> properties = new(StringComparer.Ordinal);
    private readonly List<string> order = [];
    private readonly HashSet<string> known = new(StringComparer.Ordinal);
    private readonly List<ValidationError> errors;

    private JsonObjectReader(JsonElement element, string path, List<ValidationError> errors)
    {
        Path = path;
        this.errors = errors;
        foreach (JsonProperty property in element.EnumerateObject())
        {
            if (properties.ContainsKey(property.Name))
            {
                errors.Add(new(Child(path, property.Name), "duplicate property"));
                continue;
            }

            properties[property.Name] = property.Value;
            order.Add(property.Name);
        }
    }

    /// <summary>Path of this object; empty for the root.</summary>
    public string Path { get; }

    /// <summary>Opens an element as an object, or records that it is not one and returns null.</summary>
    public static JsonObjectReader? Open(JsonElement element, string path, List<ValidationError> errors)
    {
        if (element.ValueKind != JsonValueKind.Object)
        {
            errors.Add(new(path.Length == 0 ? "$" : path, $"must be an object, got {Describe(element)}"));
            return null;
        }

        return new JsonObjectReader(element, path, errors);
    }

    /// <summary>The path of a property below a parent path: <c>a.b</c>, or <c>a["odd name"]</c> for names that are not plain words.</summary>
    public static string Child(string parent, string name)
    {
        if (!PlainName().IsMatch(name))
        {
            return $"{parent}[{JsonSerializer.Serialize(name)}]";
        }

        return parent.Length == 0 ? name : $"{parent}.{name}";
    }

    /// <summary>The path of an array item.</summary>
    public static string Item(string parent, int index) => string.Create(CultureInfo.InvariantCulture, $"{parent}[{index}]");

    /// <summary>The path of one of this object's properties.</summary>
    public string PathOf(string name) => Child(Path, name);

    /// <summary>Whether the property is present and not null (marks it known).</summary>
    public bool Has(string name)
    {
        known.Add(name);
        return properties.TryGetValue(name, out JsonElement e) && e.ValueKind != JsonValueKind.Null;
    }

    /// <summary>Records an error at one of this object's properties.</summary>
    public void Error(string name, string message) => errors.Add(new(PathOf(name), message));

    /// <summary>The raw value of a property; records a missing required one.</summary>
    public JsonElement? Get(string name, bool required)
    {
        known.Add(name);
        if (properties.TryGetValue(name, out JsonElement e) && e.ValueKind != JsonValueKind.Null)
        {
            return e;
        }

        if (required)
        {
            errors.Add(new(PathOf(name), "is required"));
        }

        return null;
    }

    /// <summary>A finite number.</summary>
    public double? Number(string name, bool required = true)
    {
        if (Get(name, required) is not JsonElement e)
        {
            return null;
        }

        if (e.ValueKind != JsonValueKind.Number)
        {
            Error(name, $"must be a number, got {Describe(e)}");
            return null;
        }

        if (!e.TryGetDouble(out double value) || !double.IsFinite(value))
        {
            Error(name, "must be a finite number");
            return null;
        }

        return value;
    }

    /// <summary>A whole number that fits in 32 bits.</summary>
    public int? Integer(string name, bool required = true)
    {
        if (Get(name, required) is not JsonElement e)
        {
            return null;
        }

        if (e.ValueKind != JsonValueKind.Number)
        {
            Error(name, $"must be an integer, got {Describe(e)}");
            return null;
        }

        if (e.TryGetInt32(out int value))
        {
            return value;
        }

        // 3.0 is a whole number written with a fraction: accept it, as JSON Schema's "integer" does.
        if (e.TryGetDouble(out double d) && Math.Abs(d) <= int.MaxValue && d == Math.Floor(d))
        {
            return (int)d;
        }

        Error(name, $"must be an integer, got {e.GetRawText()}");
        return null;
    }

    /// <summary>A string.</summary>
    public string? Text(string name, bool required = true)
    {
        if (Get(name, required) is not JsonElement e)
        {
            return null;
        }

        if (e.ValueKind != JsonValueKind.String)
        {
            Error(name, $"must be a string, got {Describe(e)}");
            return null;
        }

        return e.GetString();
    }

    /// <summary>A true or false.</summary>
    public bool? Boolean(string name, bool required = true)
    {
        if (Get(name, required) is not JsonElement e)
        {
            return null;
        }

        if (e.ValueKind is not (JsonValueKind.True or JsonValueKind.False))
        {
            Error(name, $"must be true or false, got {Describe(e)}");
            return null;
        }

        return e.GetBoolean();
    }

    /// <summary>A nested object.</summary>
    public JsonObjectReader? Object(string name, bool required = true) =>
        Get(name, required) is JsonElement e ? Open(e, PathOf(name), errors) : null;

    /// <summary>The items of an array with their paths; null when absent or not an array.</summary>
    public IReadOnlyList<(JsonElement Item, string Path)>? Array(string name, bool required = true)
    {
        if (Get(name, required) is not JsonElement e)
        {
            return null;
        }

        if (e.ValueKind != JsonValueKind.Array)
        {
            Error(name, $"must be an array, got {Describe(e)}");
            return null;
        }

        return e.EnumerateArray().Select((item, i) => (item, Item(PathOf(name), i))).ToList();
    }

    /// <summary>Records every property that no caller asked for as unknown.</summary>
    public void Finish()
    {
        foreach (string name in order.Where(n => !known.Contains(n)))
        {
            string? near = known
                .Select(k => (Name: k, Distance: EditDistance(name.ToUpperInvariant(), k.ToUpperInvariant())))
                .Where(k => k.Distance <= 2)
                .OrderBy(k => k.Distance)
                .ThenBy(k => k.Name, StringComparer.Ordinal)
                .Select(k => k.Name)
                .FirstOrDefault();
            string expected = string.Join(", ", known.Order(StringComparer.Ordinal));
            errors.Add(new(
                PathOf(name),
                near is null ? $"unknown property (expected one of: {expected})" : $"unknown property; did you mean '{near}'? (expected one of: {expected})"));
        }
    }

    /// <summary>The properties of this object in file order, as a map of user-chosen names (marks all known).</summary>
    public IReadOnlyList<(string Name, JsonElement Value, string Path)> Entries()
    {
        foreach (string name in order)
        {
            known.Add(name);
        }

        return order.Select(n => (n, properties[n], PathOf(n))).ToList();
    }

    /// <summary>A short description of a JSON value's kind for messages.</summary>
    public static string Describe(JsonElement e) => e.ValueKind switch
    {
        JsonValueKind.Object => "an object",
        JsonValueKind.Array => "an array",
        JsonValueKind.String => $"the string {e.GetRawText()}",
        JsonValueKind.Number => $"the number {e.GetRawText()}",
        JsonValueKind.True => "true",
        JsonValueKind.False => "false",
        _ => "null",
    };

    /// <summary>Levenshtein distance (insertions, deletions, substitutions), for "did you mean" hints.</summary>
    private static int EditDistance(string a, string b)
    {
        int[] previous = Enumerable.Range(0, b.Length + 1).ToArray();
        int[] current = new int[b.Length + 1];
        for (int i = 1; i <= a.Length; i++)
        {
            current[0] = i;
            for (int j = 1; j <= b.Length; j++)
            {
                int substitution = previous[j - 1] + (a[i - 1] == b[j - 1] ? 0 : 1);
                current[j] = Math.Min(substitution, Math.Min(previous[j], current[j - 1]) + 1);
            }

            (previous, current) = (current, previous);
        }

        return previous[b.Length];
    }

    [GeneratedRegex("^[A-Za-z0-9_-]+$")]
    private static partial Regex PlainName();
}
