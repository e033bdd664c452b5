using CanopyAdvisor.Core.Advice.Rotation;
using CanopyAdvisor.Core.Geometry;
using CsCheck;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Advice.Rotation;

/// <summary>A rotation policy: its turn times and how it is shown.</summary>
public class RotationPolicyTests
{
    [Theory]
    [InlineData(180, 72, "180° every 3 d")] // the wording of the task's CLI example
    [InlineData(90, 12, "90° every 12 h")]
    [InlineData(180, 36, "180° every 1.5 d")]
    [InlineData(90, 30, "90° every 30 h")]
    public void A_policy_is_shown_in_days_or_hours(double angleDeg, int hours, string expected) =>
        Assert.Equal(expected, RotationPolicy.Every(Angle.FromDegrees(angleDeg), Duration.FromHours(hours)).ToString());

    [Fact]
    public void No_rotation_has_no_turns()
    {
        Assert.Equal("none", RotationPolicy.None.ToString());
        Assert.True(RotationPolicy.None.IsNone);
        Assert.Empty(RotationPolicy.None.Times(Instant.FromUtc(2026, 12, 1, 8, 0), Instant.FromUtc(2026, 12, 31, 0, 0)));
    }

    [Fact]
    public void Turns_come_every_interval_from_the_first_and_stop_before_the_sale()
    {
        // Arithmetic: 8:00 on 1 Dec, every 3 days, before 10 Dec 0:00 → 1, 4 and 7 Dec (10 Dec 8:00 is after the sale).
        Instant first = Instant.FromUtc(2026, 12, 1, 8, 0);
        Instant[] times = [.. RotationPolicy.Every(Angle.FromDegrees(180), Duration.FromDays(3)).Times(first, Instant.FromUtc(2026, 12, 10, 0, 0))];
        Assert.Equal([first, first + Duration.FromDays(3), first + Duration.FromDays(6)], times);
    }

    [Theory]
    [InlineData(0, 24)]
    [InlineData(360, 24)]
    [InlineData(-90, 24)]
    [InlineData(180, 0)]
    public void A_policy_needs_a_turn_and_an_interval(double angleDeg, int hours) =>
        Assert.Throws<ArgumentOutOfRangeException>(() => RotationPolicy.Every(Angle.FromDegrees(angleDeg), Duration.FromHours(hours)));

    [Fact]
    public void A_longer_interval_never_needs_more_turns_before_the_sale()
    {
        // The property the planner's longest-first search rests on (RotationPolicyPlanner remarks): with the first turn at
        // the later of the allowed time and the last turn done + T, the count of turns first + kT before the sale is
        // non-increasing in T (the first turn never moves earlier and the spacing grows). Counting argument, checked here
        // over random sales, allowed times and last turns on the default grid.
        Instant now = Instant.FromUtc(2026, 12, 2, 7, 0);
        Duration[] grid = [.. RotationPolicyOptions.DefaultIntervals.OrderBy(d => d)];
        Gen.Select(Gen.Int[1, 24 * 120], Gen.Int[0, 24 * 10], Gen.Int[-1, 24 * 20])
            .Sample((saleHours, waitHours, doneHoursAgo) =>
            {
                Instant sale = now + Duration.FromHours(saleHours);
                Instant notBefore = now + Duration.FromHours(waitHours);
                Instant? lastDone = doneHoursAgo < 0 ? null : now - Duration.FromHours(doneHoursAgo);
                int previous = int.MaxValue;
                foreach (Duration interval in grid)
                {
                    var policy = RotationPolicy.Every(Angle.FromDegrees(180), interval);
                    int count = policy.Times(policy.FirstTurn(notBefore, lastDone), sale).Count();
                    if (count > previous)
                    {
                        return false;
                    }

                    previous = count;
                }

                return true;
            });
    }

    [Fact]
    public void The_first_turn_keeps_the_rhythm_of_the_last_one_done()
    {
        Instant now = Instant.FromUtc(2026, 12, 2, 7, 0);
        var every3 = RotationPolicy.Every(Angle.FromDegrees(180), Duration.FromDays(3));
        Assert.Equal(now, every3.FirstTurn(now, null));
        Assert.Equal(now + Duration.FromDays(2), every3.FirstTurn(now, now - Duration.FromDays(1)));
        Assert.Equal(now, every3.FirstTurn(now, now - Duration.FromDays(5))); // overdue: as soon as allowed
    }
}
