using System.Globalization;
using CanopyAdvisor.Reports.Outlook;
using Microsoft.VisualBasic.FileIO;

namespace CanopyAdvisor.Reports.Tests.Outlook;

/// <summary>The outlook CSV against RFC 4180 (§2: CRLF line breaks; fields with commas, double quotes or line breaks
/// enclosed in double quotes, inner quotes doubled; the same number of fields in every record), read back with the
/// .NET base library's own CSV reader (Microsoft.VisualBasic.FileIO.TextFieldParser) as the reference.</summary>
public class OutlookCsvTests
{
    private static OutlookReport Report() => OutlookReport.Build(OutlookFixture.Input(OutlookFixture.Eight()) with
    {
        Advice =
        [
            new BenchAdviceSummary("south-3", "turn 180°, then 90° \"left\"\r\nevery 2 days", 3, 1.25),
            new BenchAdviceSummary("north-1", "=HYPERLINK(\"x\")", 1, 0.5),
        ],
    });

    private static List<string[]> ReadBack(string csv)
    {
        using var parser = new TextFieldParser(new StringReader(csv)) { TextFieldType = FieldType.Delimited, HasFieldsEnclosedInQuotes = true, TrimWhiteSpace = false };
        parser.SetDelimiters(",");
        var records = new List<string[]>();
        while (!parser.EndOfData)
        {
            records.Add(parser.ReadFields()!);
        }

        return records;
    }

    [Theory]
    // RFC 4180 §2 rules 5–7, worked by hand.
    [InlineData("plain", "plain")]
    [InlineData("a,b", "\"a,b\"")]
    [InlineData("say \"hi\"", "\"say \"\"hi\"\"\"")]
    [InlineData("two\r\nlines", "\"two\r\nlines\"")]
    [InlineData("", "")]
    public void Field_is_quoted_as_rfc_4180_says(string value, string expected) =>
        Assert.Equal(expected, OutlookCsv.Field(value));

    [Fact]
    public void Every_line_ends_in_crlf_and_no_bare_lf_is_outside_quotes()
    {
        string csv = OutlookCsv.Write(Report());
        Assert.EndsWith("\r\n", csv, StringComparison.Ordinal);
        bool quoted = false;
        for (int i = 0; i < csv.Length; i++)
        {
            if (csv[i] == '"')
            {
                quoted = !quoted;
            }
            else if (csv[i] == '\n' && !quoted)
            {
                Assert.True(i > 0 && csv[i - 1] == '\r', $"bare LF at {i}");
            }
        }

        Assert.False(quoted);
    }

    [Fact]
    public void Reads_back_a_record_per_bench_in_rank_order_with_the_header()
    {
        List<string[]> records = ReadBack(OutlookCsv.Write(Report()));
        Assert.Equal(OutlookCsv.Header, records[0]);
        Assert.Equal(9, records.Count);
        Assert.All(records, r => Assert.Equal(OutlookCsv.Header.Count, r.Length));
        int bench = IndexOf("benchId"), rank = IndexOf("rank");
        Assert.Equal(OutlookFixture.EightRanked, records.Skip(1).Select(r => r[bench]));
        Assert.Equal(Enumerable.Range(1, 8).Select(i => i.ToString(CultureInfo.InvariantCulture)), records.Skip(1).Select(r => r[rank]));
    }

    [Fact]
    public void Text_with_commas_quotes_and_line_breaks_survives_and_formulas_are_defused()
    {
        List<string[]> records = ReadBack(OutlookCsv.Write(Report()));
        string[] south3 = records.Single(r => r[IndexOf("benchId")] == "south-3");
        Assert.Equal("turn 180°, then 90° \"left\"\r\nevery 2 days", south3[IndexOf("recommendation")]);
        Assert.Equal("3", south3[IndexOf("rotationsThisWeek")]);
        Assert.Equal("1.25", south3[IndexOf("labourHoursThisWeek")]);
        Assert.Equal("leavesGrade", south3[IndexOf("risk")]);
        Assert.Equal("135", south3[IndexOf("leanAtWeekEndAzimuthDeg")]);
        Assert.Equal("SE", south3[IndexOf("leanAtWeekEndDirection")]);
        Assert.Equal("2026-12-05T08:00+01:00", south3[IndexOf("leavesGradeAt")]); // 07:00 UTC + 3 days in Europe/Amsterdam (CET, +01:00)

        // OWASP's CSV-injection advice (common practice): a text field starting with '=' gets a leading apostrophe.
        string[] north1 = records.Single(r => r[IndexOf("benchId")] == "north-1");
        Assert.Equal("'=HYPERLINK(\"x\")", north1[IndexOf("recommendation")]);

        // Numbers stay numbers, with a decimal point.
        string[] south4 = records.Single(r => r[IndexOf("benchId")] == "south-4");
        Assert.Equal("0.75", south4[IndexOf("shareOfLimit")]);
        Assert.Equal(1.142857, double.Parse(south4[IndexOf("leanRateDegPerDay")], CultureInfo.InvariantCulture), 3); // (9 − 1) / 7
    }

    private static int IndexOf(string name) => OutlookCsv.Header.ToList().IndexOf(name);
}
