using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Reports.Calendar;
using NodaTime;
using IcalCalendar = Ical.Net.Calendar;

namespace CanopyAdvisor.Reports.Tests.Calendar;

/// <summary>
/// End to end on the demo glasshouse (invented demo data): every lot turned 180° every third day from 2026-12-02 to its
/// sale date, each within a day either side of its due date; scheduled with the demo crews and holidays, then exported.
/// </summary>
public class SeasonCalendarTests
{
    private static (Site Site, RotationTask[] Tasks) Season()
    {
        Site site = CalendarCases.Glasshouse();
        var tasks = new List<RotationTask>();
        foreach (Lot lot in site.Lots)
        {
            int n = 0;
            for (LocalDate due = new(2026, 12, 2); due < lot.SaleOn; due = due.PlusDays(3))
            {
                n++;
                Instant from = due.PlusDays(-1).AtStartOfDayInZone(site.Zone).ToInstant();
                Instant to = due.PlusDays(2).AtStartOfDayInZone(site.Zone).ToInstant();
                tasks.Add(RotationTask.Create(RotationTask.IdFor(lot.Id, n), site.Id, lot.BenchId, lot.Id, Angle.FromDegrees(180), from, to, lot.Pots, site.Labour));
            }
        }

        return (site, [.. tasks]);
    }

    [Fact]
    public void A_season_keeps_holidays_free_and_adds_up_by_day_and_week()
    {
        (Site site, RotationTask[] tasks) = Season();

        LabourSchedule s = LabourScheduler.Schedule(site, tasks);

        // Demo holidays (site file): 25 and 26 December 2026 and 1 January 2027; nobody works on Sundays.
        LocalDate[] holidays = [new(2026, 12, 25), new(2026, 12, 26), new(2027, 1, 1)];
        Assert.DoesNotContain(s.Scheduled, t => holidays.Contains(t.Date) || t.Date.DayOfWeek == IsoDayOfWeek.Sunday);
        Assert.Equal(tasks.Length, s.Scheduled.Length + s.Unscheduled.Length);
        Assert.Equal(s.TotalLabour, s.Days.Aggregate(Duration.Zero, (sum, d) => sum + d.Labour));
        Assert.Equal(s.TotalLabour, s.Weeks.Aggregate(Duration.Zero, (sum, w) => sum + w.Labour));
        Assert.All(s.Weeks, w => Assert.True(w.Labour <= w.Capacity));

        // The rotations due on Saturday 26 December have the window 25–27 December: two holidays and a Sunday. They are
        // reported, not dropped, each with an extra shift of its own labour on one of those days as the way out.
        Assert.NotEmpty(s.Unscheduled);
        Assert.All(s.Unscheduled, u =>
        {
            Assert.Equal(UnscheduledReason.NoWorkingTimeInWindow, u.Reason);
            Assert.Equal(new LocalDate(2026, 12, 25), u.Task.Earliest.InZone(site.Zone).Date);
            Assert.Equal([new LocalDate(2026, 12, 25), new LocalDate(2026, 12, 26), new LocalDate(2026, 12, 27)], u.Options.Select(o => o.Date));
            Assert.All(u.Options, o => Assert.Equal(u.Task.Labour, o.Labour));
        });
    }

    [Fact]
    public void A_season_exports_one_event_and_one_row_per_placed_task()
    {
        (Site site, RotationTask[] tasks) = Season();
        LabourSchedule s = LabourScheduler.Schedule(site, tasks);

        IcalCalendar calendar = IcalCalendar.Load(RotationCalendarIcs.Write(site, s, Instant.FromUtc(2026, 12, 2, 7, 0)))!;
        string csv = RotationCalendarCsv.Write(site, s);

        Assert.Equal(s.Scheduled.Length, calendar.Events.Count);
        Assert.Equal(s.Scheduled.Length, calendar.Events.Select(e => e.Uid).Distinct().Count());
        Assert.Equal(s.Scheduled.Length + 1, csv.Split("\r\n").Length - 1);
    }
}
