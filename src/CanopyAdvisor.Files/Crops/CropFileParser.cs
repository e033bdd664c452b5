using System.Globalization;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Validation;
using Tomlyn.Parsing;
using Tomlyn.Syntax;

namespace CanopyAdvisor.Files.Crops;

/// <summary>Reads one crop file (TOML, schema in crops/README.md) into a <see cref="CropFileContent"/>, collecting
/// every problem with its file and line; the single-parameter rules of <see cref="CropValidator"/> run here so
/// that each error points at the file and line that holds the field.</summary>
internal static class CropFileParser
{
    private static readonly string[] HeaderKeys = ["name", "group", "base"];
    private static readonly string[] FieldKeys = ["value", "unit", "range", "source"];

    private static readonly Dictionary<string, CropGroup> Groups = new(StringComparer.Ordinal)
    {
        ["beddingPlant"] = CropGroup.BeddingPlant,
        ["potPlant"] = CropGroup.PotPlant,
        ["herb"] = CropGroup.Herb,
        ["vegetableTransplant"] = CropGroup.VegetableTransplant,
        ["microgreen"] = CropGroup.Microgreen,
    };

    /// <summary>The <c>group</c> strings a crop file may use.</summary>
    public static IEnumerable<string> GroupNames => Groups.Keys;

    /// <summary>Parses a file; problems are added to <paramref name="errors"/>.</summary>
    public static CropFileContent Parse(CropSourceFile file, List<ValidationError> errors)
    {
        int before = errors.Count;
        var headerLines = new Dictionary<string, int>(StringComparer.Ordinal);
        var parameters = new Dictionary<string, ParsedParameter>(StringComparer.Ordinal);
        string? name = null;
        string? baseId = null;
        CropGroup? group = null;

        void Error(int line, string message) => errors.Add(new ValidationError($"{file.Path}:{line}", message));

        if (!CropValidator.IsValidId(file.Id))
        {
            errors.Add(new ValidationError(file.Path, $"file name '{file.Id}' is not a crop id: use lower-case letters and digits joined by hyphens, e.g. pot-chrysanthemum.toml"));
        }

        DocumentSyntax document;
        try
        {
            document = SyntaxParser.Parse(file.Text, file.Path, validate: true);
        }
#pragma warning disable CA1031 // a parser failure of any kind is reported as malformed input, never a crash
        catch (Exception ex)
#pragma warning restore CA1031
        {
            errors.Add(new ValidationError(file.Path, $"malformed TOML: {ex.Message}"));
            return new CropFileContent(file, null, null, null, headerLines, parameters, HasErrors: true);
        }

        if (document.HasErrors)
        {
            foreach (DiagnosticMessage d in document.Diagnostics)
            {
                if (d.Kind == DiagnosticMessageKind.Error)
                {
                    Error(d.Span.Start.Line + 1, $"malformed TOML: {d.Message}");
                }
            }

            return new CropFileContent(file, null, null, null, headerLines, parameters, HasErrors: true);
        }

        foreach (KeyValueSyntax kv in document.KeyValues)
        {
            int line = LineOf(kv);
            string key = KeyText(kv.Key);
            switch (key)
            {
                case "name":
                    headerLines[key] = line;
                    name = ReadString(kv, "name", Error);
                    if (name is not null && string.IsNullOrWhiteSpace(name))
                    {
                        Error(line, "name: must not be empty");
                        name = null;
                    }

                    break;
                case "group":
                    headerLines[key] = line;
                    string? g = ReadString(kv, "group", Error);
                    if (g is not null)
                    {
                        if (Groups.TryGetValue(g, out CropGroup parsed))
                        {
                            group = parsed;
                        }
                        else
                        {
                            Error(line, $"group: '{g}' is not a crop group (one of {string.Join(", ", Groups.Keys)}){Suggestions.Hint(g, Groups.Keys)}");
                        }
                    }

                    break;
                case "base":
                    headerLines[key] = line;
                    baseId = ReadString(kv, "base", Error);
                    if (baseId is not null && !CropValidator.IsValidId(baseId))
                    {
                        Error(line, $"base: '{baseId}' is not a crop id");
                        baseId = null;
                    }
                    else if (baseId == file.Id)
                    {
                        Error(line, "base: a crop cannot be its own base");
                        baseId = null;
                    }

                    break;
                default:
                    if (CropConversions.IsParameterKey(key))
                    {
                        Error(line, $"{key}: write it as a table [{key}] with value, unit, range and source");
                    }
                    else
                    {
                        Error(line, $"unknown key '{key}'{Suggestions.Hint(key, HeaderKeys.Concat(CropConversions.ParameterKeys))}");
                    }

                    break;
            }
        }

        foreach (TableSyntaxBase table in document.Tables)
        {
            int line = LineOf(table);
            string key = KeyText(table.Name);
            if (table is TableArraySyntax)
            {
                Error(line, $"[[{key}]]: arrays of tables are not part of a crop file");
                continue;
            }

            if (!CropConversions.IsParameterKey(key))
            {
                Error(line, $"unknown parameter [{key}]{Suggestions.Hint(key, CropConversions.ParameterKeys)}");
                continue;
            }

            ParsedParameter? p = ReadParameter(key, table, line, Error);
            if (p is not null)
            {
                parameters[key] = p;
                foreach (ValidationError e in CropValidator.ValidateParameter(key, p.Parameter))
                {
                    string field = e.Path.Contains('.', StringComparison.Ordinal) ? e.Path[(e.Path.IndexOf('.', StringComparison.Ordinal) + 1)..] : "value";
                    Error(p.LineOf(field), $"{e.Path}: {e.Message}");
                }
            }
        }

        if (baseId is null && !headerLines.ContainsKey("base"))
        {
            if (name is null && !headerLines.ContainsKey("name"))
            {
                Error(1, "name: missing (every crop file needs name = \"...\")");
            }

            if (group is null && !headerLines.ContainsKey("group"))
            {
                Error(1, $"group: missing (a crop without base needs group = one of {string.Join(", ", Groups.Keys)})");
            }

            foreach (string key in CropConversions.ParameterKeys)
            {
                if (!parameters.ContainsKey(key) && !HasTable(document, key))
                {
                    errors.Add(new ValidationError(file.Path, $"{key}: missing (a crop without base needs every parameter; add a table [{key}])"));
                }
            }
        }
        else if (name is null && !headerLines.ContainsKey("name"))
        {
            Error(1, "name: missing (every crop file needs name = \"...\")");
        }

        return new CropFileContent(file, name, group, baseId, headerLines, parameters, HasErrors: errors.Count > before);
    }

    private static bool HasTable(DocumentSyntax document, string key)
    {
        foreach (TableSyntaxBase t in document.Tables)
        {
            if (KeyText(t.Name) == key)
            {
                return true;
            }
        }

        return false;
    }

    private static ParsedParameter? ReadParameter(string key, TableSyntaxBase table, int tableLine, Action<int, string> error)
    {
        var lines = new Dictionary<string, int>(StringComparer.Ordinal);
        double? value = null;
        string? unit = null;
        string? source = null;
        (double Min, double Max)? range = null;
        bool ok = true;
        foreach (KeyValueSyntax kv in table.Items)
        {
            int line = LineOf(kv);
            string field = KeyText(kv.Key);
            switch (field)
            {
                case "value":
                    lines[field] = line;
                    value = ReadNumber(kv.Value, $"{key}.value", line, error);
                    ok &= value is not null;
                    break;
                case "unit":
                    lines[field] = line;
                    unit = ReadString(kv, $"{key}.unit", error);
                    ok &= unit is not null;
                    break;
                case "source":
                    lines[field] = line;
                    source = ReadString(kv, $"{key}.source", error);
                    ok &= source is not null;
                    break;
                case "range":
                    lines[field] = line;
                    range = ReadRange(kv.Value, $"{key}.range", line, error);
                    ok &= range is not null;
                    break;
                default:
                    error(line, $"{key}: unknown field '{field}'{Suggestions.Hint(field, FieldKeys)} (a parameter has value, unit, range and source)");
                    ok = false;
                    break;
            }
        }

        foreach (string field in FieldKeys)
        {
            if (!lines.ContainsKey(field))
            {
                error(tableLine, $"{key}.{field}: missing");
                ok = false;
            }
        }

        return ok && value is { } v && unit is not null && source is not null && range is { } r
            ? new ParsedParameter(new CropParameter(v, unit, r.Min, r.Max, source), tableLine, lines)
            : null;
    }

    private static double? ReadNumber(ValueSyntax? syntax, string path, int line, Action<int, string> error)
    {
        switch (syntax)
        {
            case FloatValueSyntax f:
                return f.Value;
            case IntegerValueSyntax i:
                return i.Value;
            default:
                error(line, $"{path}: expected a number, found {Describe(syntax)}");
                return null;
        }
    }

    private static (double, double)? ReadRange(ValueSyntax? syntax, string path, int line, Action<int, string> error)
    {
        if (syntax is not ArraySyntax array || array.Items.ChildrenCount != 2)
        {
            error(line, $"{path}: expected [minimum, maximum], found {Describe(syntax)}");
            return null;
        }

        double? min = ReadNumber(array.Items.GetChild(0)?.Value, $"{path} minimum", line, error);
        double? max = ReadNumber(array.Items.GetChild(1)?.Value, $"{path} maximum", line, error);
        return min is { } a && max is { } b ? (a, b) : null;
    }

    private static string? ReadString(KeyValueSyntax kv, string path, Action<int, string> error)
    {
        if (kv.Value is StringValueSyntax s && s.Value is not null)
        {
            return s.Value;
        }

        error(LineOf(kv), $"{path}: expected a string in quotes, found {Describe(kv.Value)}");
        return null;
    }

    private static string Describe(ValueSyntax? syntax) => syntax switch
    {
        null => "nothing",
        StringValueSyntax s => $"the string \"{s.Value}\"",
        ArraySyntax a => $"an array of {a.Items.ChildrenCount}",
        InlineTableSyntax => "an inline table",
        BooleanValueSyntax b => $"the boolean {(b.Value ? "true" : "false")}",
        DateTimeValueSyntax => "a date",
        FloatValueSyntax f => $"the number {f.Value.ToString(CultureInfo.InvariantCulture)}",
        IntegerValueSyntax i => $"the number {i.Value.ToString(CultureInfo.InvariantCulture)}",
        _ => syntax.ToString()?.Trim() ?? "a value",
    };

    private static string KeyText(KeySyntax? key)
    {
        if (key is null)
        {
            return string.Empty;
        }

        var parts = new List<string> { SimpleKeyText(key.Key) };
        for (int i = 0; i < key.DotKeys.ChildrenCount; i++)
        {
            parts.Add(SimpleKeyText(key.DotKeys.GetChild(i)?.Key));
        }

        return string.Join('.', parts);
    }

    private static string SimpleKeyText(BareKeyOrStringValueSyntax? key) => key switch
    {
        BareKeySyntax b => b.Key?.Text ?? string.Empty,
        StringValueSyntax s => s.Value ?? string.Empty,
        _ => key?.ToString()?.Trim() ?? string.Empty,
    };

    private static int LineOf(SyntaxNode node) => node.Span.Start.Line + 1;
}
