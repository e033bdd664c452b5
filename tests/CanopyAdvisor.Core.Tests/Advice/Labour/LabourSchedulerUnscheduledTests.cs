using CanopyAdvisor.Core.Advice.Labour;
using NodaTime;
using static CanopyAdvisor.Core.Tests.Advice.Labour.LabourCases;

namespace CanopyAdvisor.Core.Tests.Advice.Labour;

/// <summary>
/// Tasks that cannot fit: the reason and the extra labour reported, worked by hand (invented test data; labour by
/// MODEL.md §6 with 4 s per pot and 10 min set-up: 600 pots = 50 min). 2026-12-07 is a Monday, 2026-12-12 a Saturday.
/// </summary>
public class LabourSchedulerUnscheduledTests
{
    [Fact]
    public void A_full_day_reports_the_shortfall_of_its_longest_free_stretch()
    {
        // One person, Mondays 07:00–08:00. Two 50 min tasks on Monday: the first takes 07:00–07:50, leaving 10 min;
        // the second needs 50 − 10 = 40 more minutes of that crew's time on Monday.
        LabourSettings settings = Settings(4, 10, Crew("a", 1, [IsoDayOfWeek.Monday], 7, 0, 8, 0));
        RotationTask[] tasks =
        [
            Task("u1", 600, settings, Amsterdam, At(2026, 12, 7), At(2026, 12, 7, 23, 0)),
            Task("u2", 600, settings, Amsterdam, At(2026, 12, 7), At(2026, 12, 7, 23, 0)),
        ];

        LabourSchedule s = LabourScheduler.Schedule(tasks, settings, Amsterdam);

        Assert.Equal("u1", Assert.Single(s.Scheduled).Task.Id);
        UnscheduledTask u = Assert.Single(s.Unscheduled);
        Assert.Equal("u2", u.Task.Id);
        Assert.Equal(UnscheduledReason.CrewsFullyBooked, u.Reason);
        Assert.Equal([new ExtraLabour(new LocalDate(2026, 12, 7), "a", Duration.FromMinutes(40))], u.Options.AsEnumerable());
    }

    [Fact]
    public void Extra_labour_counts_every_person_of_the_crew()
    {
        // Two people, Mondays 07:00–07:30 (60 person-minutes): three 50 min tasks take 25 min of clock time each. The first
        // fits (07:00–07:25), leaving 5 min; the others need 25 − 5 = 20 more clock minutes, i.e. 40 person-minutes.
        LabourSettings settings = Settings(4, 10, Crew("pair", 2, [IsoDayOfWeek.Monday], 7, 0, 7, 30));
        RotationTask[] tasks =
        [
            Task("u1", 600, settings, Amsterdam, At(2026, 12, 7), At(2026, 12, 7, 23, 0)),
            Task("u2", 600, settings, Amsterdam, At(2026, 12, 7), At(2026, 12, 7, 23, 0)),
            Task("u3", 600, settings, Amsterdam, At(2026, 12, 7), At(2026, 12, 7, 23, 0)),
        ];

        LabourSchedule s = LabourScheduler.Schedule(tasks, settings, Amsterdam);

        Assert.Single(s.Scheduled);
        Assert.Equal(2, s.Unscheduled.Length);
        Assert.All(s.Unscheduled, u => Assert.Equal(Duration.FromMinutes(40), Assert.Single(u.Options).Labour));
        Assert.Equal(Duration.FromMinutes(60), Assert.Single(s.Days).Capacity);
    }

    [Fact]
    public void A_window_on_a_day_off_has_no_working_time()
    {
        // A Saturday window with a Monday–Friday crew: a whole extra shift (the task's 50 min) on the Saturday would do it.
        LabourSettings settings = Settings(4, 10, Crew("a", 1, Core.Advice.Labour.Crew.Weekdays, 7, 0, 15, 0));
        RotationTask task = Task("sat", 600, settings, Amsterdam, At(2026, 12, 12), At(2026, 12, 12, 23, 0));

        UnscheduledTask u = Assert.Single(LabourScheduler.Schedule([task], settings, Amsterdam).Unscheduled);

        Assert.Equal(UnscheduledReason.NoWorkingTimeInWindow, u.Reason);
        Assert.Equal([new ExtraLabour(new LocalDate(2026, 12, 12), null, Duration.FromMinutes(50))], u.Options.AsEnumerable());
    }

    [Fact]
    public void A_window_on_a_holiday_has_no_working_time()
    {
        LabourSettings settings = Settings(4, 10, Crew("a", 1, Core.Advice.Labour.Crew.Weekdays, 7, 0, 15, 0)) with
        {
            Holidays = [new LocalDate(2026, 12, 25)],
        };
        RotationTask task = Task("xmas", 600, settings, Amsterdam, At(2026, 12, 25), At(2026, 12, 25, 23, 0));

        Assert.Equal(UnscheduledReason.NoWorkingTimeInWindow, Assert.Single(LabourScheduler.Schedule([task], settings, Amsterdam).Unscheduled).Reason);
    }

    [Fact]
    public void A_window_outside_working_hours_has_no_working_time()
    {
        // Monday 16:00–18:00 with a crew that stops at 15:00.
        LabourSettings settings = Settings(4, 10, Crew("a", 1, Core.Advice.Labour.Crew.Weekdays, 7, 0, 15, 0));
        RotationTask task = Task("late", 600, settings, Amsterdam, At(2026, 12, 7, 16, 0), At(2026, 12, 7, 18, 0));

        Assert.Equal(UnscheduledReason.NoWorkingTimeInWindow, Assert.Single(LabourScheduler.Schedule([task], settings, Amsterdam).Unscheduled).Reason);
    }

    [Fact]
    public void A_task_longer_than_a_working_day_is_not_split()
    {
        // 10,000 pots × 4 s = 40,000 s = 666.67 min, + 10 = 676.67 min, rounded up to 677 min of one person's time; an
        // 8 h (480 min) day is 197 min short, on each of the three days of the window (Monday–Wednesday).
        LabourSettings settings = Settings(4, 10, Crew("a", 1, Core.Advice.Labour.Crew.Weekdays, 7, 0, 15, 0));
        RotationTask task = Task("big", 10_000, settings, Amsterdam, At(2026, 12, 7), At(2026, 12, 9, 23, 0));

        LabourSchedule s = LabourScheduler.Schedule([task], settings, Amsterdam);

        UnscheduledTask u = Assert.Single(s.Unscheduled);
        Assert.Empty(s.Scheduled);
        Assert.Equal(UnscheduledReason.LongerThanWorkingTimeInWindow, u.Reason);
        Assert.Equal(
            [new LocalDate(2026, 12, 7), new LocalDate(2026, 12, 8), new LocalDate(2026, 12, 9)],
            u.Options.Select(o => o.Date));
        Assert.All(u.Options, o => Assert.Equal(Duration.FromMinutes(197), o.Labour));
    }

    [Fact]
    public void A_window_shorter_than_the_task_cannot_hold_it()
    {
        // Window 07:00–07:30 on Monday for a 50 min task: 20 min short.
        LabourSettings settings = Settings(4, 10, Crew("a", 1, Core.Advice.Labour.Crew.Weekdays, 7, 0, 15, 0));
        RotationTask task = Task("tight", 600, settings, Amsterdam, At(2026, 12, 7, 7, 0), At(2026, 12, 7, 7, 30));

        UnscheduledTask u = Assert.Single(LabourScheduler.Schedule([task], settings, Amsterdam).Unscheduled);

        Assert.Equal(UnscheduledReason.LongerThanWorkingTimeInWindow, u.Reason);
        Assert.Equal(Duration.FromMinutes(20), Assert.Single(u.Options).Labour);
    }

    [Fact]
    public void The_options_are_cheapest_first_and_at_most_three()
    {
        // Four days Monday–Thursday, one person 07:00–08:00, each day already holding a task of its own (50, 50, 30, 50 min)
        // with a one-day window; a fifth 50 min task over the four days is short by 40, 40, 20, 40 min: Wednesday first,
        // then Monday and Tuesday by date; Thursday is left off (at most three).
        LabourSettings settings = Settings(4, 10, Crew("a", 1, Core.Advice.Labour.Crew.Weekdays, 7, 0, 8, 0));
        RotationTask[] tasks =
        [
            Task("mon", 600, settings, Amsterdam, At(2026, 12, 7), At(2026, 12, 7, 23, 0)),
            Task("tue", 600, settings, Amsterdam, At(2026, 12, 8), At(2026, 12, 8, 23, 0)),
            Task("wed", 300, settings, Amsterdam, At(2026, 12, 9), At(2026, 12, 9, 23, 0)),
            Task("thu", 600, settings, Amsterdam, At(2026, 12, 10), At(2026, 12, 10, 23, 0)),
            Task("any", 600, settings, Amsterdam, At(2026, 12, 7), At(2026, 12, 10, 23, 0)),
        ];

        LabourSchedule s = LabourScheduler.Schedule(tasks, settings, Amsterdam);

        UnscheduledTask u = Assert.Single(s.Unscheduled);
        Assert.Equal("any", u.Task.Id);
        Assert.Equal(
            [
                new ExtraLabour(new LocalDate(2026, 12, 9), "a", Duration.FromMinutes(20)),
                new ExtraLabour(new LocalDate(2026, 12, 7), "a", Duration.FromMinutes(40)),
                new ExtraLabour(new LocalDate(2026, 12, 8), "a", Duration.FromMinutes(40)),
            ],
            u.Options.AsEnumerable());
    }
}
