using System.Text;
using System.Text.RegularExpressions;
using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Reports.Calendar;
using Ical.Net.CalendarComponents;
using NodaTime;
using IcalCalendar = Ical.Net.Calendar;

namespace CanopyAdvisor.Reports.Tests.Calendar;

/// <summary>
/// The iCalendar export against RFC 5545 (§3.1 content lines, §3.4 and §3.6.1 the calendar and its events, §3.7 calendar
/// properties) and read back by the reference parser Ical.Net 5.2.4 (NuGet). Site and crews: the demo glasshouse
/// (invented demo data).
/// </summary>
public partial class RotationCalendarIcsTests
{
    private static readonly Instant Stamp = Instant.FromUtc(2026, 12, 2, 8, 0);

    [Fact]
    public void The_file_is_a_well_formed_calendar_with_crlf_lines_of_at_most_75_octets()
    {
        Site site = CalendarCases.Glasshouse();
        LabourSchedule schedule = CalendarCases.December(site);
        string ics = RotationCalendarIcs.Write(site, schedule, Stamp);

        // §3.1: every line ends in CRLF and no bare CR or LF is left; no line is longer than 75 octets.
        Assert.EndsWith("\r\n", ics, StringComparison.Ordinal);
        Assert.DoesNotMatch(BareLineFeed(), ics);
        string[] physical = ics.Split("\r\n")[..^1];
        Assert.All(physical, l => Assert.True(Encoding.UTF8.GetByteCount(l) <= 75, l));

        // §3.4 / §3.7: BEGIN:VCALENDAR … END:VCALENDAR, with VERSION:2.0 and PRODID (both required, once).
        string[] lines = CalendarCases.Unfold(ics).Split("\r\n")[..^1];
        Assert.Equal("BEGIN:VCALENDAR", lines[0]);
        Assert.Equal("END:VCALENDAR", lines[^1]);
        Assert.Single(lines, l => l == "VERSION:2.0");
        Assert.Single(lines, l => l == "PRODID:" + RotationCalendarIcs.ProductId);
        Assert.Single(lines, l => l == "NAME:Rotation calendar: " + site.Name.Replace(",", "\\,", StringComparison.Ordinal)); // RFC 7986 §5.1

        // §3.6.1: in each VEVENT, UID and DTSTAMP are required and occur once; DTSTART is required as well (METHOD is set,
        // and RFC 5546 §3.2.1 PUBLISH asks for DTSTART); DTEND at most once.
        List<string[]> events = Events(lines);
        Assert.Equal(schedule.Scheduled.Length, events.Count);
        Assert.Equal(site.Lots.Length, events.Count);
        foreach (string[] e in events)
        {
            foreach (string required in new[] { "UID:", "DTSTAMP:", "DTSTART:", "DTEND:", "SUMMARY:", "DESCRIPTION:", "SEQUENCE:" })
            {
                Assert.Single(e, l => l.StartsWith(required, StringComparison.Ordinal));
            }

            // §3.3.5 form #2: UTC date-times end in Z.
            Assert.Matches(UtcDateTime(), e.Single(l => l.StartsWith("DTSTART:", StringComparison.Ordinal))["DTSTART:".Length..]);
        }
    }

    [Fact]
    public void The_reference_parser_reads_back_the_same_uids_times_and_text()
    {
        Site site = CalendarCases.Glasshouse() with { Name = "Range A; north, \"demo\" \\ data" };
        LabourSchedule schedule = CalendarCases.December(site);
        string ics = RotationCalendarIcs.Write(site, schedule, Stamp, sequence: 2);

        IcalCalendar calendar = IcalCalendar.Load(ics)!;

        Assert.Equal(schedule.Scheduled.Length, calendar.Events.Count);
        foreach (ScheduledTask s in schedule.Scheduled)
        {
            string uid = RotationCalendarIcs.Uid(site.Id, s.Task.LotId, s.Task.Id);
            CalendarEvent e = Assert.Single(calendar.Events, x => x.Uid == uid);
            Assert.Equal(s.Start.ToInstant().ToDateTimeUtc(), e.DtStart!.AsUtc);
            Assert.Equal(s.End.ToInstant().ToDateTimeUtc(), e.DtEnd!.AsUtc);
            Assert.Equal(Stamp.ToDateTimeUtc(), e.DtStamp!.AsUtc);
            Assert.Equal(2, e.Sequence);
            string crop = site.Lots.Single(l => l.Id == s.Task.LotId).CropId;
            Assert.Equal($"Turn pots 180° clockwise: bench {s.Task.BenchId} ({crop})", e.Summary);

            // Escaped on the way out, unescaped by the parser: the same text comes back (RFC 5545 §3.3.11).
            Assert.Equal($"Range A; north, \"demo\" \\ data, bench {s.Task.BenchId}", e.Location);
            Assert.Contains($"Pots: {s.Task.Pots}\n", e.Description, StringComparison.Ordinal);
            Assert.Contains("Crew: " + site.Labour.Crews.Single(c => c.Id == s.CrewId).Name, e.Description, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void A_worked_event_reads_as_expected()
    {
        // Demo glasshouse: 3 s per pot and 10 min set-up (demo values), a bench team of three from 07:00. The first event is
        // Monday 2026-12-07 at 07:00 CET = 06:00Z (IANA tz: UTC+1 in December). Lot south-1, 1,500 pots: 1,500 × 3 s =
        // 75 min + 10 = 85 min of labour (MODEL.md §6), 85 / 3 = 28.3 → 29 min of crew time.
        Site site = CalendarCases.Glasshouse();
        RotationTask task = CalendarCases.DecemberTasks(site).Single(t => t.LotId == "lot-south-1");
        LabourSchedule schedule = LabourScheduler.Schedule(site, [task]);
        string ics = CalendarCases.Unfold(RotationCalendarIcs.Write(site, schedule, Stamp));

        Assert.Contains("\r\nDTSTART:20261207T060000Z\r\n", ics, StringComparison.Ordinal);
        Assert.Contains("\r\nDTEND:20261207T062900Z\r\n", ics, StringComparison.Ordinal);
        Assert.Contains("\r\nDTSTAMP:20261202T080000Z\r\n", ics, StringComparison.Ordinal);
        Assert.Contains("\r\nSUMMARY:Turn pots 180° clockwise: bench south-1 (petunia)\r\n", ics, StringComparison.Ordinal);
        Assert.Contains(
            @"\nLabour: 85 min (crew time 29 min)\nLocal time: 2026-12-07 07:00 +01:00 to 2026-12-07 07:29 +01:00\nWindow: 2026-12-07 00:00 +01:00 to 2026-12-09 23:59 +01:00",
            ics,
            StringComparison.Ordinal);
    }

    [Fact]
    public void Exporting_again_after_a_reschedule_keeps_every_uid_and_moves_the_times()
    {
        Site site = CalendarCases.Glasshouse();
        RotationTask[] tasks = CalendarCases.DecemberTasks(site);
        LabourSchedule before = LabourScheduler.Schedule(site, tasks);

        // The team now starts at 09:00: every task moves, no task changes its id.
        Site later = site with
        {
            Labour = site.Labour with { Crews = [site.Labour.Crews[0] with { Start = new LocalTime(9, 0) }, site.Labour.Crews[1]] },
        };
        LabourSchedule after = LabourScheduler.Schedule(later, tasks);

        IcalCalendar a = IcalCalendar.Load(RotationCalendarIcs.Write(site, before, Stamp, sequence: 0))!;
        IcalCalendar b = IcalCalendar.Load(RotationCalendarIcs.Write(later, after, Stamp + Duration.FromHours(1), sequence: 1))!;

        Assert.Equal(a.Events.Select(e => e.Uid).Order(StringComparer.Ordinal), b.Events.Select(e => e.Uid).Order(StringComparer.Ordinal));
        foreach (CalendarEvent e in a.Events)
        {
            CalendarEvent moved = b.Events.Single(x => x.Uid == e.Uid);
            Assert.NotEqual(e.DtStart!.AsUtc, moved.DtStart!.AsUtc);
            Assert.True(moved.Sequence > e.Sequence); // RFC 5545 §3.8.7.4: a revision carries a higher sequence
        }
    }

    [Fact]
    public void Uids_are_stable_distinct_and_not_fooled_by_where_ids_split()
    {
        string uid = RotationCalendarIcs.Uid("site", "lot-1", "lot-1/r1");

        Assert.Equal(uid, RotationCalendarIcs.Uid("site", "lot-1", "lot-1/r1"));
        Assert.Matches(UidForm(), uid);
        Assert.NotEqual(uid, RotationCalendarIcs.Uid("site", "lot-1", "lot-1/r2"));
        Assert.NotEqual(uid, RotationCalendarIcs.Uid("site2", "lot-1", "lot-1/r1"));
        Assert.NotEqual(RotationCalendarIcs.Uid("a", "bc", "d"), RotationCalendarIcs.Uid("ab", "c", "d"));
        Assert.NotEqual(RotationCalendarIcs.Uid("a|b", "c", "d"), RotationCalendarIcs.Uid("a", "b|c", "d"));
    }

    [Fact]
    public void The_same_schedule_gives_the_same_text()
    {
        Site site = CalendarCases.Glasshouse();
        Assert.Equal(
            RotationCalendarIcs.Write(site, CalendarCases.December(site), Stamp),
            RotationCalendarIcs.Write(site, CalendarCases.December(site), Stamp));
    }

    private static List<string[]> Events(string[] lines)
    {
        var events = new List<string[]>();
        List<string>? current = null;
        foreach (string l in lines)
        {
            if (l == "BEGIN:VEVENT")
            {
                current = [];
            }
            else if (l == "END:VEVENT")
            {
                events.Add([.. current!]);
                current = null;
            }
            else
            {
                current?.Add(l);
            }
        }

        return events;
    }

    [GeneratedRegex("(?<!\r)\n|\r(?!\n)")]
    private static partial Regex BareLineFeed();

    [GeneratedRegex(@"^\d{8}T\d{6}Z$")]
    private static partial Regex UtcDateTime();

    [GeneratedRegex("^[0-9a-f]{32}@rotation\\.canopyadvisor$")]
    private static partial Regex UidForm();
}
