using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Reports.Outlook;
using NodaTime;

namespace CanopyAdvisor.Reports.Tests.Outlook;

/// <summary>The ranking rule and risk classes of <see cref="OutlookRanking"/>, against orders worked by hand from the
/// rule as documented (leaves grade first by time; then lean at week end as a share of the limit in whole percent;
/// then stretch flags; then site order).</summary>
public class OutlookRankingTests
{
    [Fact]
    public void Eight_hand_made_benches_rank_in_the_order_worked_by_hand()
    {
        // Hand-worked: north-1 is over now, south-3 leaves on day 3; then 75 %, 46.7 %, 40 %; north-3 and north-2 both
        // 15 % of their limits, north-3 has two stretch flags to north-2's one; south-2 8 %.
        OutlookReport report = OutlookReport.Build(OutlookFixture.Input(OutlookFixture.Eight()));
        Assert.Equal(OutlookFixture.EightRanked, report.Benches.Select(b => b.BenchId));
        Assert.Equal(Enumerable.Range(1, 8), report.Benches.Select(b => b.Rank));
    }

    [Theory]
    // bench, expected class: hand-worked from the numbers in OutlookFixture.Eight
    [InlineData("north-1", OutlookRisk.LeavesGrade)] // already over grade now
    [InlineData("south-3", OutlookRisk.LeavesGrade)] // crosses on day 3
    [InlineData("south-4", OutlookRisk.Watch)]       // 9° of 12° = 75 % ≥ 50 %
    [InlineData("north-4", OutlookRisk.Watch)]       // 7° of 15° = 47 %, but the band's top 15.5° reaches the 15° limit
    [InlineData("south-1", OutlookRisk.Low)]         // 6° of 15° = 40 %, band top 9° under the limit
    [InlineData("north-3", OutlookRisk.Low)]         // stretch flags do not raise the lean class
    public void Risk_class_follows_the_rule(string bench, OutlookRisk expected)
    {
        OutlookReport report = OutlookReport.Build(OutlookFixture.Input(OutlookFixture.Eight()));
        Assert.Equal(expected, report.Benches.Single(b => b.BenchId == bench).Risk);
    }

    [Fact]
    public void Equal_benches_keep_the_site_order()
    {
        var a = OutlookFixture.Bench("south-2", 1, 3, 90);
        var b = OutlookFixture.Bench("south-1", 1, 3, 90);
        Assert.Equal(["south-2", "south-1"], OutlookRanking.Rank([a, b]).Select(f => f.BenchId));
        Assert.Equal(["south-1", "south-2"], OutlookRanking.Rank([b, a]).Select(f => f.BenchId));
    }

    [Fact]
    public void A_difference_under_one_percent_of_the_limit_gives_way_to_stretch_flags()
    {
        // 6.00° and 6.05° of 15° are 40.0 % and 40.3 %: both round to 40 %, so the bench with a flag ranks first.
        var plain = OutlookFixture.Bench("south-1", 1, 6.05, 90);
        var flagged = OutlookFixture.Bench("south-2", 1, 6.0, 90, flags: [new(Core.Forecast.ForecastFlagKind.Leggy, "lowDli", 8, 10, "mol m-2 d-1")]);
        Assert.Equal(["south-2", "south-1"], OutlookRanking.Rank([plain, flagged]).Select(f => f.BenchId));
    }

    [Fact]
    public void Advice_and_light_for_unknown_benches_are_rejected_with_paths()
    {
        var input = OutlookFixture.Input(OutlookFixture.Eight()) with
        {
            DailyDli = [new BenchDayDli("nowhere", new LocalDate(2026, 12, 2), 10), new BenchDayDli("south-1", new LocalDate(2026, 12, 2), double.NaN)],
        };
        input = input with
        {
            Advice = [new BenchAdviceSummary("bench-x", "turn 180° every 3 days", 2, 0.5), new BenchAdviceSummary("south-1", "", -1, -2)],
            RotationHoursThisWeek = -1,
        };
        var ex = Assert.Throws<InvalidInputException>(() => OutlookReport.Build(input));
        string[] paths = [.. ex.Errors.Select(e => e.Path)];
        Assert.Contains("advice[0].benchId", paths);
        Assert.Contains("advice[1].recommendation", paths);
        Assert.Contains("advice[1].rotationsThisWeek", paths);
        Assert.Contains("advice[1].labourHoursThisWeek", paths);
        Assert.Contains("dailyDli[0].benchId", paths);
        Assert.Contains("dailyDli[1].dliMolPerM2Day", paths);
        Assert.Contains("rotationHoursThisWeek", paths);
    }

    [Theory]
    // ISO 8601 week dates: 2026-12-02 is a Wednesday of week 49; 2027-01-01 (Friday) belongs to 2026-W53, since
    // 2026 starts on a Thursday and so has 53 weeks; 2024-12-30 (Monday) is 2025-W01.
    [InlineData(2026, 12, 2, "2026-W49")]
    [InlineData(2027, 1, 1, "2026-W53")]
    [InlineData(2024, 12, 30, "2025-W01")]
    public void Week_label_is_the_iso_8601_week(int y, int m, int d, string expected) =>
        Assert.Equal(expected, OutlookReport.WeekLabelOf(new LocalDate(y, m, d)));
}
