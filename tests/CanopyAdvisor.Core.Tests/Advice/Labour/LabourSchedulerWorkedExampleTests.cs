using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using NodaTime;
using static CanopyAdvisor.Core.Tests.Advice.Labour.LabourCases;

namespace CanopyAdvisor.Core.Tests.Advice.Labour;

/// <summary>
/// A small calendar worked by hand (invented test data). One person, Monday–Friday 07:00–15:00 in Europe/Amsterdam
/// (UTC+1 in December, IANA tz database); 4 s per pot and 10 min set-up, so by MODEL.md §6 (pots × s per pot + set-up):
/// 600 pots → 2,400 s + 10 min = 50 min; 900 pots → 70 min; 1,200 pots → 90 min. 2026-12-07 is a Monday (ISO week 50).
/// </summary>
public class LabourSchedulerWorkedExampleTests
{
    private static readonly LabourSettings Settings = LabourCases.Settings(4, 10, Crew("a", 1, Core.Advice.Labour.Crew.Weekdays, 7, 0, 15, 0));

    private static RotationTask[] Tasks() =>
    [
        Task("t1", 900, Settings, Amsterdam, At(2026, 12, 7), At(2026, 12, 9, 23, 59)),
        Task("t2", 1200, Settings, Amsterdam, At(2026, 12, 7), At(2026, 12, 9, 23, 59)),
        Task("t3", 600, Settings, Amsterdam, At(2026, 12, 7), At(2026, 12, 7, 23, 59)),
    ];

    [Theory]
    [InlineData(600, 50)] // 600 × 4 s = 40 min, + 10 min (MODEL.md §6)
    [InlineData(900, 70)]
    [InlineData(1200, 90)]
    public void Labour_is_pots_times_seconds_per_pot_plus_set_up(int pots, double minutes)
    {
        Assert.Equal(Duration.FromMinutes(minutes), Settings.LabourFor(pots));
    }

    [Fact]
    public void Levelled_schedule_matches_the_hand_worked_calendar()
    {
        // By hand: t3 has one feasible day (Monday) so goes first, 07:00–07:50. t2 and t1 have three days each; the longer
        // (t2, 90 min; LPT rule) goes next to the least-loaded day, Tuesday (0 < Monday's 50; Tuesday before Wednesday),
        // then t1 to Wednesday (0). Loads 50 / 90 / 70 min; no move lowers them (t2 alone is 90), so the peak is 90 min.
        LabourSchedule s = LabourScheduler.Schedule(Tasks(), Settings, Amsterdam);

        Assert.Empty(s.Unscheduled);
        (string Id, LocalDate Date, string Start, string End, Instant StartUtc)[] expected =
        [
            ("t3", new LocalDate(2026, 12, 7), "07:00", "07:50", Instant.FromUtc(2026, 12, 7, 6, 0)),
            ("t2", new LocalDate(2026, 12, 8), "07:00", "08:30", Instant.FromUtc(2026, 12, 8, 6, 0)),
            ("t1", new LocalDate(2026, 12, 9), "07:00", "08:10", Instant.FromUtc(2026, 12, 9, 6, 0)),
        ];
        Assert.Equal(expected.Length, s.Scheduled.Length);
        for (int i = 0; i < expected.Length; i++)
        {
            ScheduledTask t = s.Scheduled[i];
            Assert.Equal(expected[i].Id, t.Task.Id);
            Assert.Equal("a", t.CrewId);
            Assert.Equal(expected[i].Date, t.Date);
            Assert.Equal(expected[i].Start, t.Start.TimeOfDay.ToString("HH:mm", null));
            Assert.Equal(expected[i].End, t.End.TimeOfDay.ToString("HH:mm", null));
            Assert.Equal(expected[i].StartUtc, t.Start.ToInstant());
            Assert.Equal(Offset.FromHours(1), t.Start.Offset);
        }

        Assert.Equal(Duration.FromMinutes(90), s.PeakDailyLabour);
        Assert.Equal([50.0, 90.0, 70.0], s.Days.Select(d => d.Labour.TotalMinutes));
        Assert.All(s.Days, d => Assert.Equal(Duration.FromHours(8), d.Capacity));

        // ISO 8601 week of 2026-12-07 to 09: 2026-W50 (checked with Python's date.isocalendar()).
        WeeklyLoad week = Assert.Single(s.Weeks);
        Assert.Equal((2026, 50, "a"), (week.WeekYear, week.Week, week.CrewId));
        Assert.Equal(Duration.FromMinutes(210), week.Labour);
        Assert.Equal(Duration.FromHours(24), week.Capacity);
        Assert.Equal(3, week.Tasks);
    }

    [Fact]
    public void Earliest_first_baseline_piles_everything_on_monday()
    {
        // By hand: all three windows open on Monday 00:00, so by id t1 07:00–08:10, t2 08:10–09:40, t3 09:40–10:30: 210 min on Monday.
        LabourSchedule s = LabourScheduler.ScheduleEarliestFirst(Tasks(), Settings, Amsterdam);

        Assert.Equal(["t1", "t2", "t3"], s.Scheduled.Select(t => t.Task.Id));
        Assert.Equal(["07:00", "08:10", "09:40"], s.Scheduled.Select(t => t.Start.TimeOfDay.ToString("HH:mm", null)));
        Assert.Equal("10:30", s.Scheduled[2].End.TimeOfDay.ToString("HH:mm", null));
        Assert.Equal(Duration.FromMinutes(210), s.PeakDailyLabour);
        Assert.True(LabourScheduler.Schedule(Tasks(), Settings, Amsterdam).PeakDailyLabour < s.PeakDailyLabour);
    }

    [Theory]
    [InlineData(1, 50)] // one person: the whole 50 min
    [InlineData(2, 25)] // two people share it: 50 / 2
    [InlineData(3, 17)] // 50 / 3 = 16.7 min, rounded up to whole minutes (LabourScheduler remarks)
    public void A_crew_of_several_people_takes_the_labour_divided_among_them(int people, int minutes)
    {
        LabourSettings settings = LabourCases.Settings(4, 10, Crew("a", people, Core.Advice.Labour.Crew.Weekdays, 7, 0, 15, 0));
        RotationTask task = Task("t", 600, settings, Amsterdam, At(2026, 12, 7), At(2026, 12, 7, 23, 59));

        ScheduledTask placed = Assert.Single(LabourScheduler.Schedule([task], settings, Amsterdam).Scheduled);

        Assert.Equal(Duration.FromMinutes(minutes), placed.CrewTime);
        Assert.Equal(Duration.FromMinutes(50), placed.Task.Labour);
    }

    [Fact]
    public void Holidays_and_days_off_are_skipped()
    {
        // 2026-12-25 is a Friday (site holiday here), 26 and 27 a weekend; the first working day in the window is Monday 28.
        LabourSettings settings = LabourCases.Settings(4, 10, Crew("a", 1, Core.Advice.Labour.Crew.Weekdays, 7, 0, 15, 0)) with
        {
            Holidays = [new LocalDate(2026, 12, 25)],
        };
        RotationTask task = Task("t", 600, settings, Amsterdam, At(2026, 12, 25), At(2026, 12, 28, 23, 59));

        LabourSchedule s = LabourScheduler.Schedule([task], settings, Amsterdam);

        Assert.Equal(new LocalDate(2026, 12, 28), Assert.Single(s.Scheduled).Date);
        Assert.DoesNotContain(s.Days, d => d.Date == new LocalDate(2026, 12, 25));
        Assert.Equal([new LocalDate(2026, 12, 28)], s.Days.Select(d => d.Date));
    }

    [Fact]
    public void A_window_that_opens_mid_morning_starts_the_task_then()
    {
        // Window from 09:20 to 10:30: the 50 min task runs 09:20–10:10 even though the crew starts at 07:00.
        RotationTask task = Task("t", 600, Settings, Amsterdam, At(2026, 12, 7, 9, 20), At(2026, 12, 7, 10, 30));

        ScheduledTask placed = Assert.Single(LabourScheduler.Schedule([task], Settings, Amsterdam).Scheduled);

        Assert.Equal(new LocalTime(9, 20), placed.Start.TimeOfDay);
        Assert.Equal(new LocalTime(10, 10), placed.End.TimeOfDay);
    }

    [Fact]
    public void The_site_overload_uses_the_sites_labour_and_zone_and_checks_benches_and_lots()
    {
        Site site = SiteWithLot() with { Labour = Settings };
        Lot lot = site.Lots[0];
        RotationTask good = RotationTask.Create("r1", site.Id, lot.BenchId, lot.Id, Angle.FromDegrees(90),
            site.Zone.AtLeniently(At(2026, 12, 7)).ToInstant(), site.Zone.AtLeniently(At(2026, 12, 7, 23, 59)).ToInstant(), 600, Settings);
        RotationTask wrongLot = good with { Id = "r2", LotId = "nope" };
        RotationTask wrongSite = good with { Id = "r3", SiteId = "other" };

        ScheduledTask placed = Assert.Single(LabourScheduler.Schedule(site, [good]).Scheduled);
        var e = Assert.Throws<InvalidInputException>(() => LabourScheduler.Schedule(site, [good, wrongLot, wrongSite]));

        Assert.Equal(site.Zone, placed.Start.Zone);
        Assert.Contains(e.Errors, x => x.Path == "tasks[1].lotId" && x.Message.Contains("no lot 'nope'", StringComparison.Ordinal));
        Assert.Contains(e.Errors, x => x.Path == "tasks[2].siteId");
    }
}
