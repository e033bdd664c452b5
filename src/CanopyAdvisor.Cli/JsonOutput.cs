using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Json.Serialization;

namespace CanopyAdvisor.Cli;

/// <summary>The one JSON style of the command line: camelCase, indented, nulls written, invariant numbers.</summary>
internal static class JsonOutput
{
    private static readonly JsonSerializerOptions Options = new()
    {
        PropertyNamingPolicy = JsonNamingPolicy.CamelCase,
        WriteIndented = true,
        DefaultIgnoreCondition = JsonIgnoreCondition.Never,
        NumberHandling = JsonNumberHandling.AllowNamedFloatingPointLiterals,
        Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
    };

    public static void Write<T>(TextWriter output, T value) => output.WriteLine(JsonSerializer.Serialize(value, Options));

    /// <summary>Writes a report as JSON when asked, else as the command's own text.</summary>
    public static void WriteReport<T>(TextWriter output, T report, bool json, Action<TextWriter, T> writeText)
    {
        if (json)
        {
            Write(output, report);
        }
        else
        {
            writeText(output, report);
        }
    }
}
