using System.Text;
using CanopyAdvisor.Reports.Calendar;
using CsCheck;

namespace CanopyAdvisor.Reports.Tests.Calendar;

/// <summary>iCalendar text rules, checked against RFC 5545's own text: §3.1 (content lines, folding) and §3.3.11 (TEXT escaping).</summary>
public class ICalendarTextTests
{
    public static TheoryData<string, string, string> Escapes => new()
    {
        // RFC 5545 §3.3.11: ESCAPED-CHAR = ("\\" / "\;" / "\," / "\N" / "\n"); a COLON is not escaped.
        { "backslash doubled", @"a\b", @"a\\b" },
        { "semicolon escaped", "a;b", @"a\;b" },
        { "comma escaped", "a,b", @"a\,b" },
        { "LF becomes \\n", "a\nb", @"a\nb" },
        { "CRLF becomes one \\n", "a\r\nb", @"a\nb" },
        { "lone CR becomes \\n", "a\rb", @"a\nb" },
        { "colon left alone", "a:b", "a:b" },
        { "double quote left alone (TEXT allows DQUOTE)", "a\"b", "a\"b" },
        { "all at once, in order", "x\\;,\ny", @"x\\\;\,\ny" },
        { "non-ASCII kept (TEXT allows NON-US-ASCII)", "180° über", "180° über" },
    };

    [Theory]
    [MemberData(nameof(Escapes))]
    public void Text_values_are_escaped_as_RFC_5545_says(string label, string value, string expected)
    {
        Assert.True(expected == ICalendarText.EscapeText(value), label);
    }

    [Fact]
    public void The_folding_example_of_RFC_5545_unfolds_to_one_line()
    {
        // RFC 5545 §3.1 example: the three physical lines unfold to "This is a long description that exists on a long line."
        string folded = "DESCRIPTION:This is a lo\r\n ng description\r\n  that exists on a long line.\r\n";
        Assert.Equal("DESCRIPTION:This is a long description that exists on a long line.\r\n", CalendarCases.Unfold(folded));
    }

    [Theory]
    [InlineData(75, 1, "75 octets is the limit, not folded (RFC 5545 §3.1)")]
    [InlineData(76, 2, "76 octets fold once")]
    [InlineData(75 + 74, 2, "the second line holds a space and 74 octets")]
    [InlineData(75 + 75, 3, "one more octet makes a third line")]
    public void Ascii_lines_fold_at_75_octets(int length, int physicalLines, string label)
    {
        string line = new('x', length);
        var sb = new StringBuilder();
        ICalendarText.AppendFolded(sb, line);

        string[] lines = sb.ToString().Split("\r\n")[..^1];
        Assert.True(physicalLines == lines.Length, label);
        Assert.All(lines, l => Assert.True(Encoding.UTF8.GetByteCount(l) <= 75, label));
        Assert.Equal(line + "\r\n", CalendarCases.Unfold(sb.ToString()));
    }

    [Theory]
    [InlineData("°", 2)] // U+00B0, two octets in UTF-8 (RFC 3629)
    [InlineData("€", 3)] // U+20AC, three octets
    [InlineData("🌱", 4)] // U+1F331, four octets (a surrogate pair in UTF-16)
    public void A_multi_octet_character_at_the_limit_moves_whole_to_the_next_line(string character, int octets)
    {
        // 74 ASCII octets, then the character: it does not fit in the 75th octet (unless it is one octet), so it starts line two.
        string line = new string('x', 74) + character + "tail";
        var sb = new StringBuilder();
        ICalendarText.AppendFolded(sb, line);

        string[] lines = sb.ToString().Split("\r\n")[..^1];
        Assert.Equal(2, lines.Length);
        Assert.Equal(new string('x', 74), lines[0]);
        Assert.Equal(" " + character + "tail", lines[1]);
        Assert.Equal(1 + octets + 4, Encoding.UTF8.GetByteCount(lines[1]));
    }

    [Fact]
    public void Any_text_folds_into_valid_utf8_lines_of_at_most_75_octets_and_unfolds_back()
    {
        var strict = new UTF8Encoding(false, throwOnInvalidBytes: true);
        Gen<string> text = Gen.OneOf(
            Gen.String[Gen.Char.AlphaNumeric, 0, 400],
            Gen.String[Gen.Char["aé°€中 ,;\\\n"], 0, 400],
            Gen.Select(Gen.Int[0, 120], Gen.Int[0, 120]).Select((a, b) => new string('x', a) + "🌱🌿" + new string('y', b)));
        text.Sample(value =>
        {
            string line = "DESCRIPTION:" + ICalendarText.EscapeText(value);
            var sb = new StringBuilder();
            ICalendarText.AppendFolded(sb, line);
            string folded = sb.ToString();

            Assert.EndsWith("\r\n", folded, StringComparison.Ordinal);
            foreach (string physical in folded.Split("\r\n")[..^1])
            {
                byte[] bytes = Encoding.UTF8.GetBytes(physical);
                Assert.True(bytes.Length <= 75);
                Assert.Equal(physical, strict.GetString(bytes)); // each physical line is whole UTF-8 on its own
            }

            Assert.Equal(line + "\r\n", CalendarCases.Unfold(folded));
        });
    }
}
