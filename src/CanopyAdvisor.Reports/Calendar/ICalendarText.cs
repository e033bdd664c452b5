using System.Text;

namespace CanopyAdvisor.Reports.Calendar;

/// <summary>The text rules of iCalendar (RFC 5545): TEXT escaping (§3.3.11) and content-line folding (§3.1).</summary>
internal static class ICalendarText
{
    /// <summary>Longest content line, in octets, not counting the line break (RFC 5545 §3.1: "SHOULD NOT be longer than 75 octets").</summary>
    public const int MaxLineOctets = 75;

    /// <summary>The line break of iCalendar, CRLF (RFC 5545 §3.1).</summary>
    public const string LineBreak = "\r\n";

    /// <summary>
    /// Escapes a TEXT value (RFC 5545 §3.3.11): backslash, semicolon and comma get a backslash; a line break (CRLF, LF
    /// or CR) becomes <c>\n</c>. Other control characters, which TEXT does not allow, become spaces.
    /// </summary>
    public static string EscapeText(string value)
    {
        ArgumentNullException.ThrowIfNull(value);
        var sb = new StringBuilder(value.Length + 8);
        for (int i = 0; i < value.Length; i++)
        {
            char c = value[i];
            switch (c)
            {
                case '\\':
                    sb.Append(@"\\");
                    break;
                case ';':
                    sb.Append(@"\;");
                    break;
                case ',':
                    sb.Append(@"\,");
                    break;
                case '\r':
                    sb.Append(@"\n");
                    if (i + 1 < value.Length && value[i + 1] == '\n')
                    {
                        i++;
                    }

                    break;
                case '\n':
                    sb.Append(@"\n");
                    break;
                default:
                    sb.Append(char.IsControl(c) ? ' ' : c);
                    break;
            }
        }

        return sb.ToString();
    }

    /// <summary>
    /// Folds one content line (RFC 5545 §3.1): the first physical line holds at most 75 octets of UTF-8, each further one
    /// a single space and at most 74 octets; a multi-octet character is never split. The result ends with CRLF.
    /// </summary>
    public static void AppendFolded(StringBuilder output, string line)
    {
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(line);
        int octets = 0;
        foreach (Rune rune in line.EnumerateRunes())
        {
            int size = rune.Utf8SequenceLength;
            if (octets + size > MaxLineOctets)
            {
                output.Append(LineBreak).Append(' ');
                octets = 1;
            }

            output.Append(rune.ToString());
            octets += size;
        }

        output.Append(LineBreak);
    }
}
