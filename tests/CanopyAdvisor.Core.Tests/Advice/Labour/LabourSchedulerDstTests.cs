using CanopyAdvisor.Core.Advice.Labour;
using NodaTime;
using static CanopyAdvisor.Core.Tests.Advice.Labour.LabourCases;

namespace CanopyAdvisor.Core.Tests.Advice.Labour;

/// <summary>
/// Working hours across daylight-saving changes. Offsets from the IANA tz database (EU rule: last Sunday of March at
/// 01:00 UTC, last Sunday of October at 01:00 UTC; US rule: second Sunday of March and first Sunday of November at
/// 02:00 local), checked with Python's zoneinfo: Amsterdam is UTC+1 on 2027-03-27 and UTC+2 from 2027-03-28;
/// Chicago is UTC−6 on 2027-03-13 and UTC−5 from 2027-03-14. Gaps move forward by the gap and ambiguous times take
/// the earlier instant (MODEL.md §0).
/// </summary>
public class LabourSchedulerDstTests
{
    private static LabourSettings Daily(int startHour, int startMinute, int endHour, int endMinute) =>
        Settings(4, 10, Crew("a", 1, EveryDay, startHour, startMinute, endHour, endMinute));

    public static TheoryData<string, string, int, int, int, int, int, string> SevenOClockStarts => new()
    {
        // zone, date (y, m, d), expected UTC start hour, label
        { "Amsterdam, Saturday before the spring change: 07:00 CET = 06:00Z", "Europe/Amsterdam", 2027, 3, 27, 6, 0, "+01" },
        { "Amsterdam, the spring change day: 07:00 CEST = 05:00Z", "Europe/Amsterdam", 2027, 3, 28, 5, 0, "+02" },
        { "Amsterdam, Monday after: 07:00 CEST = 05:00Z", "Europe/Amsterdam", 2027, 3, 29, 5, 0, "+02" },
        { "Amsterdam, the autumn change day: 07:00 CET = 06:00Z", "Europe/Amsterdam", 2027, 10, 31, 6, 0, "+01" },
        { "Chicago, Saturday before the spring change: 07:00 CST = 13:00Z", "America/Chicago", 2027, 3, 13, 13, 0, "-06" },
        { "Chicago, the spring change day: 07:00 CDT = 12:00Z", "America/Chicago", 2027, 3, 14, 12, 0, "-05" },
        { "Chicago, Monday after: 07:00 CDT = 12:00Z", "America/Chicago", 2027, 3, 15, 12, 0, "-05" },
        { "Chicago, the autumn change day: 07:00 CST = 13:00Z", "America/Chicago", 2027, 11, 7, 13, 0, "-06" },
    };

    [Theory]
    [MemberData(nameof(SevenOClockStarts))]
    public void A_seven_oclock_crew_starts_at_seven_local_time_on_each_side_of_a_change(
        string label, string zoneId, int year, int month, int day, int utcHour, int utcMinute, string offset)
    {
        DateTimeZone zone = DateTimeZoneProviders.Tzdb[zoneId];
        LabourSettings settings = Daily(7, 0, 15, 30);
        RotationTask task = Task("t", 600, settings, zone, At(year, month, day), At(year, month, day, 23, 0));

        ScheduledTask placed = Assert.Single(LabourScheduler.Schedule([task], settings, zone).Scheduled);

        Assert.True(new LocalTime(7, 0) == placed.Start.TimeOfDay, label);
        Assert.Equal(Instant.FromUtc(year, month, day, utcHour, utcMinute), placed.Start.ToInstant());
        Assert.Equal(offset, placed.Start.Offset.ToString("+HH", null));
        Assert.Equal(Duration.FromMinutes(50), placed.CrewTime);
    }

    [Theory]
    // Capacity is the real length of the working day (MODEL.md §0, lenient resolution); the day is flagged when a change touches it.
    [InlineData("Europe/Amsterdam", 2027, 3, 27, 0, 0, 8, 0, 8.0, false)] // an ordinary day
    [InlineData("Europe/Amsterdam", 2027, 3, 28, 0, 0, 8, 0, 7.0, true)] // 00:00 CET (23:00Z) to 08:00 CEST (06:00Z): an hour lost
    [InlineData("Europe/Amsterdam", 2027, 3, 28, 7, 0, 15, 0, 8.0, false)] // the change is at 02:00, before the crew starts
    [InlineData("Europe/Amsterdam", 2027, 10, 31, 0, 0, 8, 0, 9.0, true)] // 00:00 CEST (22:00Z) to 08:00 CET (07:00Z): an hour gained
    [InlineData("Europe/Amsterdam", 2027, 3, 28, 2, 30, 8, 0, 4.5, true)] // 02:30 is in the gap, moves to 03:30 CEST (01:30Z); to 06:00Z
    [InlineData("Europe/Amsterdam", 2027, 10, 31, 2, 30, 6, 0, 4.5, true)] // 02:30 is ambiguous, earlier = CEST (00:30Z); 06:00 CET = 05:00Z
    [InlineData("America/Chicago", 2027, 3, 14, 0, 0, 8, 0, 7.0, true)] // 00:00 CST (06:00Z) to 08:00 CDT (13:00Z)
    [InlineData("America/Chicago", 2027, 11, 7, 0, 0, 8, 0, 9.0, true)] // 00:00 CDT (05:00Z) to 08:00 CST (14:00Z)
    public void Capacity_is_the_real_length_of_the_working_day(string zoneId, int year, int month, int day, int sh, int sm, int eh, int em, double hours, bool clockChange)
    {
        DateTimeZone zone = DateTimeZoneProviders.Tzdb[zoneId];
        LabourSettings settings = Daily(sh, sm, eh, em);
        RotationTask task = Task("t", 10, settings, zone, At(year, month, day), At(year, month, day, 23, 0));

        LabourSchedule s = LabourScheduler.Schedule([task], settings, zone);

        DailyLoad load = Assert.Single(s.Days);
        Assert.Equal(Duration.FromHours(hours), load.Capacity);
        Assert.Equal(clockChange, load.ClockChange);
    }

    [Fact]
    public void A_start_in_the_spring_gap_moves_forward_by_the_gap()
    {
        // Crew from 02:30 on 2027-03-28 in Amsterdam: 02:00–03:00 does not exist that night, so work starts 03:30 CEST = 01:30Z.
        LabourSettings settings = Daily(2, 30, 8, 0);
        RotationTask task = Task("t", 600, settings, Amsterdam, At(2027, 3, 28), At(2027, 3, 28, 23, 0));

        ScheduledTask placed = Assert.Single(LabourScheduler.Schedule([task], settings, Amsterdam).Scheduled);

        Assert.Equal(Instant.FromUtc(2027, 3, 28, 1, 30), placed.Start.ToInstant());
        Assert.Equal(new LocalTime(3, 30), placed.Start.TimeOfDay);
    }

    [Fact]
    public void An_ambiguous_start_takes_the_earlier_instant()
    {
        // Crew from 02:30 on 2027-10-31 in Amsterdam: 02:30 happens twice; the earlier (CEST, 00:30Z) is used.
        LabourSettings settings = Daily(2, 30, 6, 0);
        RotationTask task = Task("t", 600, settings, Amsterdam, At(2027, 10, 31), At(2027, 10, 31, 23, 0));

        ScheduledTask placed = Assert.Single(LabourScheduler.Schedule([task], settings, Amsterdam).Scheduled);

        Assert.Equal(Instant.FromUtc(2027, 10, 31, 0, 30), placed.Start.ToInstant());
        Assert.Equal(Offset.FromHours(2), placed.Start.Offset);
    }

    [Fact]
    public void Tasks_spanning_the_ambiguous_hour_keep_their_real_length()
    {
        // Crew 01:30–06:00 on the autumn change day: two 50 min tasks back to back from 01:30 CEST (23:30Z) end 100 real
        // minutes later at 01:10Z, which the wall clock shows as 02:10 CET (the second 02:10 of that night, after the
        // change at 01:00Z). Each task takes 50 real minutes whatever the wall clock shows.
        LabourSettings settings = Daily(1, 30, 6, 0);
        RotationTask[] tasks =
        [
            Task("t1", 600, settings, Amsterdam, At(2027, 10, 31), At(2027, 10, 31, 23, 0)),
            Task("t2", 600, settings, Amsterdam, At(2027, 10, 31), At(2027, 10, 31, 23, 0)),
        ];

        LabourSchedule s = LabourScheduler.Schedule(tasks, settings, Amsterdam);

        Assert.Equal(2, s.Scheduled.Length);
        Assert.Equal(Instant.FromUtc(2027, 10, 30, 23, 30), s.Scheduled[0].Start.ToInstant());
        Assert.Equal(Instant.FromUtc(2027, 10, 31, 1, 10), s.Scheduled[1].End.ToInstant());
        Assert.Equal(new LocalTime(2, 10), s.Scheduled[1].End.TimeOfDay);
        Assert.Equal(Offset.FromHours(1), s.Scheduled[1].End.Offset);
        Assert.All(s.Scheduled, t => Assert.Equal(Duration.FromMinutes(50), t.CrewTime));
    }
}
