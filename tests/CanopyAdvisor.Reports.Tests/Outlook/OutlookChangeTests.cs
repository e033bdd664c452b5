using CanopyAdvisor.Reports.Outlook;
using NodaTime;

namespace CanopyAdvisor.Reports.Tests.Outlook;

/// <summary>The change against last week's outlook, from hand-made earlier <c>outlook.json</c> files: absent, corrupt,
/// of another site, of the same week, and a real earlier week with numbers worked by hand.</summary>
public class OutlookChangeTests
{
    private static readonly Instant LastWeek = OutlookFixture.Now - Duration.FromDays(7);

    private static SnapshotBench Old(int rank, string bench, double leanEnd, params string[] flags) =>
        new(rank, bench, "lot-" + bench, "x", OutlookRisk.Low, 1, leanEnd, 90, 15, 0.1, null, [.. flags]);

    /// <summary>Last week: south-3 was 2nd at 10°, north-3 1st with a lowDli flag, south-1 3rd at 7° with heightOverGrade,
    /// south-2 held another lot, and a bench "west-9" that has no forecast now.</summary>
    private static OutlookSnapshot Earlier(string siteId = "demo-glasshouse") => new(
        siteId,
        "Demo glasshouse",
        LastWeek,
        OutlookFixture.Now,
        "2026-W48",
        [
            Old(1, "north-3", 4, "lowDli"),
            Old(2, "south-3", 10),
            Old(3, "south-1", 7, "heightOverGrade"),
            Old(4, "south-2", 1) with { LotId = "an-earlier-lot" },
            Old(5, "west-9", 2),
        ]);

    private static OutlookReport Build(OutlookSnapshot? previous) =>
        OutlookReport.Build(OutlookFixture.Input(OutlookFixture.Eight()) with { Previous = previous });

    [Fact]
    public void Changes_are_worked_per_bench()
    {
        OutlookReport report = Build(PreviousOutlook.Resolve(OutlookSnapshotJson.Write(Earlier()), "outlook.json", "demo-glasshouse", OutlookFixture.Now).Snapshot);
        Assert.NotNull(report.Change);
        Assert.Equal("2026-W48", report.Change.PreviousWeekLabel);
        BenchChange Of(string id) => report.Benches.Single(b => b.BenchId == id).Change!;

        // south-3: rank 2 → 2 (same), lean at week end 10° → 16° (+6°).
        Assert.Equal(0, Of("south-3").RankChange);
        Assert.Equal(6, Of("south-3").LeanAtWeekEndChangeDeg!.Value, 9);

        // north-3: rank 1 → 6 (down 5), 4° → 2.25° (−1.75°); lowDli kept, highDif new.
        Assert.Equal(-5, Of("north-3").RankChange);
        Assert.Equal(-1.75, Of("north-3").LeanAtWeekEndChangeDeg!.Value, 9);
        Assert.Equal(["highDif"], Of("north-3").NewFlags.ToArray());
        Assert.Empty(Of("north-3").ClearedFlags);

        // south-1: rank 3 → 5 (down 2), 7° → 6°; heightOverGrade cleared.
        Assert.Equal(-2, Of("south-1").RankChange);
        Assert.Equal(["heightOverGrade"], Of("south-1").ClearedFlags.ToArray());

        // south-2 carries another lot now: new. north-1 was not there: new.
        Assert.True(Of("south-2").IsNew);
        Assert.True(Of("north-1").IsNew);
        Assert.Null(Of("north-1").RankChange);

        // Gone: the old south-2 lot and west-9, in their old rank order.
        Assert.Equal(["south-2", "west-9"], report.Change.Gone.Select(g => g.BenchId));

        string page = OutlookPage.Render(report);
        Assert.Contains("+6.0°, same rank", page, StringComparison.Ordinal);
        Assert.Contains("−1.8°, down 5", page, StringComparison.Ordinal);
        Assert.Contains("west-9 (lot lot-west-9, was #5)", page, StringComparison.Ordinal);
    }

    [Fact]
    public void Absent_file_means_no_comparison_and_says_so()
    {
        PreviousOutlook p = PreviousOutlook.Resolve(null, "outlook.json", "demo-glasshouse", OutlookFixture.Now);
        Assert.Null(p.Snapshot);
        Assert.False(p.IsWarning);
        OutlookReport report = Build(p.Snapshot);
        Assert.Null(report.Change);
        Assert.All(report.Benches, b => Assert.Null(b.Change));
        Assert.Contains("No earlier outlook of this site to compare with.", OutlookPage.Render(report), StringComparison.Ordinal);
    }

    [Theory]
    // Hand-made broken files: not JSON, cut short, not ours, a wrong version, a bench without its lean, a bad instant.
    [InlineData("this is not json")]
    [InlineData("{\"format\": \"canopy-outlook\", \"version\": 1, \"siteId\": \"demo-gl")]
    [InlineData("{\"format\": \"something-else\", \"version\": 1}")]
    [InlineData("{\"format\": \"canopy-outlook\", \"version\": 99}")]
    [InlineData("[1, 2, 3]")]
    [InlineData("{\"format\": \"canopy-outlook\", \"version\": 1, \"siteId\": \"demo-glasshouse\", \"siteName\": \"x\", \"now\": \"2026-11-25T07:00:00Z\", \"weekEnd\": \"2026-12-02T07:00:00Z\", \"week\": \"2026-W48\", \"benches\": [{\"rank\": 1, \"benchId\": \"south-1\"}]}")]
    [InlineData("{\"format\": \"canopy-outlook\", \"version\": 1, \"siteId\": \"demo-glasshouse\", \"siteName\": \"x\", \"now\": \"last tuesday\", \"weekEnd\": \"2026-12-02T07:00:00Z\", \"week\": \"2026-W48\", \"benches\": []}")]
    public void Corrupt_file_is_a_warning_not_a_failure(string text)
    {
        PreviousOutlook p = PreviousOutlook.Resolve(text, "old/outlook.json", "demo-glasshouse", OutlookFixture.Now);
        Assert.Null(p.Snapshot);
        Assert.True(p.IsWarning);
        Assert.StartsWith("old/outlook.json could not be read as an outlook", p.Note, StringComparison.Ordinal);
        Assert.Null(Build(p.Snapshot).Change);
    }

    [Fact]
    public void File_of_another_site_is_ignored_with_a_note()
    {
        PreviousOutlook p = PreviousOutlook.Resolve(OutlookSnapshotJson.Write(Earlier("demo-indoor-farm")), "outlook.json", "demo-glasshouse", OutlookFixture.Now);
        Assert.Null(p.Snapshot);
        Assert.False(p.IsWarning);
        Assert.Contains("another site ('demo-indoor-farm')", p.Note, StringComparison.Ordinal);
    }

    [Fact]
    public void File_that_does_not_start_earlier_is_ignored_with_a_note()
    {
        OutlookSnapshot same = Earlier() with { Now = OutlookFixture.Now };
        PreviousOutlook p = PreviousOutlook.Resolve(OutlookSnapshotJson.Write(same), "outlook.json", "demo-glasshouse", OutlookFixture.Now);
        Assert.Null(p.Snapshot);
        Assert.Contains("starts at or after this outlook", p.Note, StringComparison.Ordinal);
    }

    [Fact]
    public void Snapshot_round_trips_through_its_json()
    {
        OutlookSnapshot written = OutlookSnapshot.From(Build(null));
        Assert.True(OutlookSnapshotJson.TryRead(OutlookSnapshotJson.Write(written), out OutlookSnapshot? read, out string? problem), problem);
        Assert.Equal(written with { Benches = [] }, read with { Benches = [] });
        Assert.Equal(written.Benches.Length, read.Benches.Length);
        for (int i = 0; i < written.Benches.Length; i++)
        {
            Assert.Equal(written.Benches[i] with { Flags = [] }, read.Benches[i] with { Flags = [] });
            Assert.Equal(written.Benches[i].Flags.ToArray(), read.Benches[i].Flags.ToArray());
        }

        Assert.Equal(OutlookFixture.Now + Duration.FromDays(3), read.Benches[1].LeavesGradeAt); // south-3, rank 2
    }

    [Fact]
    public void Build_rejects_a_previous_outlook_of_another_site()
    {
        var ex = Assert.Throws<Core.Validation.InvalidInputException>(() => Build(Earlier("elsewhere")));
        Assert.Contains(ex.Errors, e => e.Path == "previous.siteId");
    }

    [Fact]
    public void Flags_are_compared_by_cause()
    {
        OutlookSnapshot now = new("s", "s", OutlookFixture.Now, OutlookFixture.Now, "w", [Old(1, "a", 3, "lowDli", "highDif")]);
        OutlookSnapshot before = new("s", "s", LastWeek, OutlookFixture.Now, "v", [Old(1, "a", 2, "highDif", "heightOverGrade")]);
        BenchChange c = OutlookComparison.Compare(now, before).Benches.Single();
        Assert.Equal(["lowDli"], c.NewFlags.ToArray());
        Assert.Equal(["heightOverGrade"], c.ClearedFlags.ToArray());
        Assert.Equal(1, c.LeanAtWeekEndChangeDeg);
    }
}
