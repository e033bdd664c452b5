using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Reports.Calendar;
using Microsoft.VisualBasic.FileIO;
using NodaTime;

namespace CanopyAdvisor.Reports.Tests.Calendar;

/// <summary>
/// The CSV export against RFC 4180 §2 (rules 1–7), read back with an independent CSV reader (.NET's
/// Microsoft.VisualBasic.FileIO.TextFieldParser). Site and crews: the demo glasshouse (invented demo data).
/// </summary>
public class RotationCalendarCsvTests
{
    public static TheoryData<string, string, string> Fields => new()
    {
        { "plain text as is (RFC 4180 §2 rule 5: quotes optional)", "south-1", "south-1" },
        { "a comma needs quotes (rule 6)", "bench 1, north", "\"bench 1, north\"" },
        { "a quote needs quotes and is doubled (rule 7)", "the \"big\" bench", "\"the \"\"big\"\" bench\"" },
        { "CRLF inside needs quotes (rule 6)", "line 1\r\nline 2", "\"line 1\r\nline 2\"" },
        { "a bare LF needs quotes too", "a\nb", "\"a\nb\"" },
        { "spaces are part of the field (rule 4)", "  padded ", "  padded " },
        { "empty field stays empty", "", "" },
    };

    [Theory]
    [MemberData(nameof(Fields))]
    public void Fields_are_written_as_RFC_4180_says(string label, string value, string expected)
    {
        Assert.True(expected == RotationCalendarCsv.Field(value), label);
    }

    [Fact]
    public void The_file_has_a_header_crlf_rows_and_reads_back_field_for_field()
    {
        Site site = CalendarCases.Glasshouse();
        site = site with { Labour = site.Labour with { Crews = [site.Labour.Crews[0] with { Name = "bench team, \"A\"\nshift" }, site.Labour.Crews[1]] } };
        LabourSchedule schedule = CalendarCases.December(site);
        string csv = RotationCalendarCsv.Write(site, schedule);

        // RFC 4180 §2 rules 1–3: each record ends in CRLF (the last one too), a header line first with the same fields.
        Assert.StartsWith(string.Join(',', RotationCalendarCsv.Columns) + "\r\n", csv, StringComparison.Ordinal);
        Assert.EndsWith("\r\n", csv, StringComparison.Ordinal);

        List<string[]> rows = Parse(csv);
        Assert.Equal(schedule.Scheduled.Length + 1, rows.Count);
        Assert.All(rows, r => Assert.Equal(RotationCalendarCsv.Columns.Count, r.Length));
        for (int i = 0; i < schedule.Scheduled.Length; i++)
        {
            ScheduledTask s = schedule.Scheduled[i];
            Dictionary<string, string> row = RotationCalendarCsv.Columns.Zip(rows[i + 1]).ToDictionary(p => p.First, p => p.Second);
            Assert.Equal(s.Task.Id, row["taskId"]);
            Assert.Equal(s.Task.BenchId, row["bench"]);
            Assert.Equal(s.Task.Pots.ToString(System.Globalization.CultureInfo.InvariantCulture), row["pots"]);
            Assert.Equal("180", row["angleDeg"]);
            Assert.Equal(site.Lots.Single(l => l.Id == s.Task.LotId).CropId, row["crop"]);
            Assert.Equal(site.Labour.Crews.Single(c => c.Id == s.CrewId).Name, row["crewName"]); // comma, quotes and LF survive
            Assert.Equal(s.Date.ToString("yyyy'-'MM'-'dd", null), row["date"]);
        }
    }

    [Fact]
    public void A_worked_row_reads_as_expected()
    {
        // Lot south-1, 1,500 pots: 85 min of labour, 29 min for the bench team of three from 07:00 CET (see the iCalendar
        // worked event); times in local time with the offset (ISO 8601).
        Site site = CalendarCases.Glasshouse();
        RotationTask task = CalendarCases.DecemberTasks(site).Single(t => t.LotId == "lot-south-1");
        string csv = RotationCalendarCsv.Write(site, LabourScheduler.Schedule(site, [task]));

        Assert.Equal(
            "2026-12-07,2026-12-07T07:00:00+01:00,2026-12-07T07:29:00+01:00,bench-team,bench team,lot-south-1/r1,south-1,lot-south-1,petunia,1500,180,85,29,"
            + "2026-12-07T00:00:00+01:00,2026-12-09T23:59:00+01:00\r\n",
            csv.Split("\r\n", 2)[1]);
    }

    [Fact]
    public void Offsets_change_across_the_spring_change()
    {
        // Saturday 2027-03-27 (Saturday crew, 08:00 CET, +01:00) and Monday 2027-03-29 (bench team, 07:00 CEST, +02:00);
        // the EU change is on Sunday 2027-03-28 (IANA tz database).
        Site site = CalendarCases.Glasshouse();
        RotationTask[] saturday = CalendarCases.Tasks(site, new LocalDateTime(2027, 3, 27, 0, 0), new LocalDateTime(2027, 3, 27, 23, 0))[..1];
        RotationTask[] monday = [.. CalendarCases.Tasks(site, new LocalDateTime(2027, 3, 29, 0, 0), new LocalDateTime(2027, 3, 29, 23, 0))[1..2]];
        LabourSchedule schedule = LabourScheduler.Schedule(site, [.. saturday, .. monday]);

        List<string[]> rows = Parse(RotationCalendarCsv.Write(site, schedule));

        Assert.Equal("2027-03-27T08:00:00+01:00", rows[1][1]);
        Assert.Equal("saturday-crew", rows[1][3]);
        Assert.Equal("2027-03-29T07:00:00+02:00", rows[2][1]);
        Assert.Equal("bench-team", rows[2][3]);
    }

    [Theory]
    [InlineData("=1+2", "'=1+2")] // OWASP CSV injection: formula triggers get an apostrophe
    [InlineData("+1", "'+1")]
    [InlineData("-north", "'-north")]
    [InlineData("@cmd", "'@cmd")]
    [InlineData("team", "team")]
    public void Text_that_a_spreadsheet_would_run_is_guarded(string value, string expected)
    {
        Assert.Equal(expected, RotationCalendarCsv.Text(value));
    }

    [Fact]
    public void Tasks_that_did_not_fit_are_listed_with_the_reason_and_extra_labour()
    {
        // A window on Sunday 2026-12-13: neither demo crew works on Sundays, so a whole extra shift (85 min) is needed.
        Site site = CalendarCases.Glasshouse();
        RotationTask task = CalendarCases.Tasks(site, new LocalDateTime(2026, 12, 13, 0, 0), new LocalDateTime(2026, 12, 13, 23, 0))[0];
        LabourSchedule schedule = LabourScheduler.Schedule(site, [task]);

        List<string[]> rows = Parse(RotationCalendarCsv.WriteUnscheduled(site, schedule));

        Assert.Equal(RotationCalendarCsv.UnscheduledColumns, rows[0]);
        string[] row = Assert.Single(rows.Skip(1));
        Assert.Equal("no-working-time-in-window", row[9]);
        Assert.Equal("2026-12-13 any crew +85 min", row[10]);
        Assert.Empty(Parse(RotationCalendarCsv.Write(site, schedule)).Skip(1));
    }

    private static List<string[]> Parse(string csv)
    {
        using var parser = new TextFieldParser(new StringReader(csv))
        {
            TextFieldType = FieldType.Delimited,
            HasFieldsEnclosedInQuotes = true,
            TrimWhiteSpace = false,
        };
        parser.SetDelimiters(",");
        var rows = new List<string[]>();
        while (!parser.EndOfData)
        {
            rows.Add(parser.ReadFields()!);
        }

        return rows;
    }
}
