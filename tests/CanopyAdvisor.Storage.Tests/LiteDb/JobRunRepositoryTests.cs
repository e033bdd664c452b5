using CanopyAdvisor.Storage.LiteDb;
using NodaTime;

namespace CanopyAdvisor.Storage.Tests.LiteDb;

/// <summary>The job history in the LiteDB store: newest first, the last run per kind, the latest output, organisation
/// scoping, removal with the site, and every site for the scheduler.</summary>
public sealed class JobRunRepositoryTests : IDisposable
{
    // Sub-millisecond parts, which a BSON date (milliseconds, bsonspec.org "UTC datetime") would drop.
    private static readonly Instant T0 = Instant.FromUtc(2026, 12, 3, 1, 0) + Duration.FromTicks(1_234);

    private readonly string _folder = Directory.CreateTempSubdirectory("canopy-jobruns-").FullName;
    private readonly LiteDbCanopyStore _store;

    public JobRunRepositoryTests()
    {
        _store = new LiteDbCanopyStore(Path.Combine(_folder, "canopy.db"));
    }

    public void Dispose()
    {
        _store.Dispose();
        Directory.Delete(_folder, recursive: true);
    }

    private static JobRunRecord Run(string id, string org, string site, string kind, int day, string? output = null) =>
        new(id, org, site, kind, T0 + Duration.FromDays(day), T0 + Duration.FromDays(day) + Duration.FromSeconds(3),
            T0 + Duration.FromDays(day) + Duration.FromSeconds(5), "succeeded", $"run {id}", day % 2 == 0, output);

    private async Task SeedAsync()
    {
        foreach (string org in new[] { "o1", "o2" })
        {
            var site = new SiteRecord(org + "-s", org, "site", "Site", """{"id":"site"}""", 1, T0, T0, "u");
            Assert.Equal(WriteOutcome.Written, await _store.AddOrganisationAsync(new OrganisationRecord(org, org, false, T0), [], [site]));
        }
    }

    [Fact]
    public async Task Runs_round_trip_and_list_newest_first_without_outputs()
    {
        await SeedAsync();
        await _store.JobRuns.AddAsync(Run("j1", "o1", "o1-s", "nightly", 0, output: "{}"));
        await _store.JobRuns.AddAsync(Run("j3", "o1", "o1-s", "nightly", 2));
        await _store.JobRuns.AddAsync(Run("j2", "o1", "o1-s", "outlook", 1));

        IReadOnlyList<JobRunRecord> runs = await _store.JobRuns.ListAsync("o1", "o1-s", 10);
        Assert.Equal(["j3", "j2", "j1"], runs.Select(r => r.Id));
        Assert.Equal(Run("j1", "o1", "o1-s", "nightly", 0), runs[2]); // exact, instants to the tick; the output left out
        Assert.Equal(["j3", "j2"], (await _store.JobRuns.ListAsync("o1", "o1-s", 2)).Select(r => r.Id));
    }

    [Fact]
    public async Task The_last_run_and_the_latest_output_are_per_kind()
    {
        await SeedAsync();
        Assert.Null(await _store.JobRuns.LastAsync("o1", "o1-s", "nightly"));
        await _store.JobRuns.AddAsync(Run("j1", "o1", "o1-s", "outlook", 0, output: "first"));
        await _store.JobRuns.AddAsync(Run("j2", "o1", "o1-s", "outlook", 7));
        await _store.JobRuns.AddAsync(Run("j3", "o1", "o1-s", "nightly", 3));

        Assert.Equal("j2", (await _store.JobRuns.LastAsync("o1", "o1-s", "outlook"))!.Id);
        Assert.Equal("j3", (await _store.JobRuns.LastAsync("o1", "o1-s", "nightly"))!.Id);
        JobRunRecord latest = (await _store.JobRuns.LatestWithOutputAsync("o1", "o1-s", "outlook"))!;
        Assert.Equal(("j1", "first"), (latest.Id, latest.Output));
        Assert.Null(await _store.JobRuns.LatestWithOutputAsync("o1", "o1-s", "nightly"));
    }

    [Fact]
    public async Task Another_organisations_runs_are_not_found_and_runs_go_with_their_site()
    {
        await SeedAsync();
        await _store.JobRuns.AddAsync(Run("j1", "o1", "o1-s", "nightly", 0));
        Assert.Empty(await _store.JobRuns.ListAsync("o2", "o1-s", 10));
        Assert.Null(await _store.JobRuns.LastAsync("o2", "o1-s", "nightly"));

        Assert.True(await _store.Sites.DeleteAsync("o1", "o1-s"));
        Assert.Empty(await _store.JobRuns.ListAsync("o1", "o1-s", 10));
        Assert.Null(await _store.JobRuns.LastAsync("o1", "o1-s", "nightly"));
    }

    [Fact]
    public async Task Every_site_of_every_organisation_is_listed_for_the_scheduler()
    {
        await SeedAsync();
        Assert.Equal(["o1-s", "o2-s"], (await _store.Sites.ListAllAsync()).Select(s => s.Id));
    }
}
