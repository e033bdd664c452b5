using System.Globalization;
using System.Security;

namespace CanopyAdvisor.Reports;

/// <summary>Text helpers shared by the SVG and HTML writers: XML escaping and culture-free formatting.</summary>
internal static class Markup
{
    /// <summary>Escapes text for XML content and attribute values (&amp;, &lt;, &gt;, quotes).</summary>
    public static string Escape(string? text) => SecurityElement.Escape(text ?? string.Empty) ?? string.Empty;

    /// <summary>Formats with the invariant culture (decimal point, no grouping), whatever the machine's culture.</summary>
    public static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
