using CanopyAdvisor.Storage.LiteDb;
using NodaTime;

namespace CanopyAdvisor.Storage.Tests.LiteDb;

/// <summary>Observations and rotations done in the LiteDB store: exact round trips (incl. a null height and sub-millisecond
/// instants), time order, organisation and site scoping, and removal with their site.</summary>
public sealed class GrowerRecordRepositoryTests : IDisposable
{
    // Sub-millisecond part: BSON dates are milliseconds (bsonspec.org, "UTC datetime"); the store keeps 100-ns ticks.
    private static readonly Instant T0 = Instant.FromUtc(2026, 11, 30, 9, 0, 0) + Duration.FromTicks(4_321);

    private readonly string _folder = Directory.CreateTempSubdirectory("canopy-records-").FullName;
    private readonly LiteDbCanopyStore _store;

    public GrowerRecordRepositoryTests() => _store = new LiteDbCanopyStore(Path.Combine(_folder, "canopy.db"));

    public void Dispose()
    {
        _store.Dispose();
        Directory.Delete(_folder, recursive: true);
    }

    private async Task SeedAsync()
    {
        SiteRecord Site(string org, string id) => new(id, org, "farm", "Farm", """{"id":"farm"}""", 1, T0, T0, "u");
        Assert.Equal(WriteOutcome.Written, await _store.AddOrganisationAsync(new OrganisationRecord("a", "A", false, T0), [], [Site("a", "s1"), Site("a", "s3") with { SiteKey = "farm-2" }]));
        Assert.Equal(WriteOutcome.Written, await _store.AddOrganisationAsync(new OrganisationRecord("b", "B", false, T0), [], [Site("b", "s2")]));
    }

    private static ObservationRecord Obs(string id, string org, string site, Instant at, double? height) =>
        new(id, org, site, "bench-1", at, 7.5, 183.25, height, 12, T0, "u");

    private static RotationDoneRecord Rot(string id, string org, string site, Instant at) =>
        new(id, org, site, "lot-1", "bench-1", at, 180, T0, "u");

    [Fact]
    public async Task Observations_round_trip_in_time_order_and_stay_in_their_organisation_and_site()
    {
        await SeedAsync();
        ObservationRecord late = Obs("o1", "a", "s1", T0 + Duration.FromHours(2), null);
        ObservationRecord early = Obs("o2", "a", "s1", T0, 41.5);
        await _store.Observations.AddAsync([late, early]);
        await _store.Observations.AddAsync([Obs("o3", "b", "s2", T0, null), Obs("o4", "a", "s3", T0, null)]);

        Assert.Equal([early, late], await _store.Observations.ListAsync("a", "s1"));
        Assert.Empty(await _store.Observations.ListAsync("b", "s1"));
        Assert.False(await _store.Observations.DeleteAsync("b", "s1", "o1"));
        Assert.False(await _store.Observations.DeleteAsync("a", "s3", "o1"));
        Assert.True(await _store.Observations.DeleteAsync("a", "s1", "o1"));
        Assert.Equal([early], await _store.Observations.ListAsync("a", "s1"));
    }

    [Fact]
    public async Task Rotations_done_round_trip_in_time_order_and_stay_in_their_organisation_and_site()
    {
        await SeedAsync();
        RotationDoneRecord second = Rot("r1", "a", "s1", T0 + Duration.FromDays(1));
        RotationDoneRecord first = Rot("r2", "a", "s1", T0);
        await _store.RotationsDone.AddAsync([second, first]);
        await _store.RotationsDone.AddAsync([Rot("r3", "b", "s2", T0)]);

        Assert.Equal([first, second], await _store.RotationsDone.ListAsync("a", "s1"));
        Assert.Empty(await _store.RotationsDone.ListAsync("a", "s2"));
        Assert.False(await _store.RotationsDone.DeleteAsync("a", "s2", "r3"));
        Assert.True(await _store.RotationsDone.DeleteAsync("b", "s2", "r3"));
        Assert.Empty(await _store.RotationsDone.ListAsync("b", "s2"));
    }

    [Fact]
    public async Task A_batch_with_a_duplicate_id_stores_nothing()
    {
        await SeedAsync();
        await _store.RotationsDone.AddAsync([Rot("r1", "a", "s1", T0)]);
        Assert.Equal(WriteOutcome.KeyTaken, await _store.RotationsDone.AddAsync([Rot("r9", "a", "s1", T0), Rot("r1", "a", "s1", T0)]));
        Assert.Single(await _store.RotationsDone.ListAsync("a", "s1"));
    }

    [Fact]
    public async Task Deleting_a_site_removes_its_observations_and_rotations_done_only()
    {
        await SeedAsync();
        await _store.Observations.AddAsync([Obs("o1", "a", "s1", T0, null), Obs("o2", "a", "s3", T0, null)]);
        await _store.RotationsDone.AddAsync([Rot("r1", "a", "s1", T0), Rot("r2", "a", "s3", T0)]);

        Assert.True(await _store.Sites.DeleteAsync("a", "s1"));
        Assert.Empty(await _store.Observations.ListAsync("a", "s1"));
        Assert.Empty(await _store.RotationsDone.ListAsync("a", "s1"));
        Assert.Single(await _store.Observations.ListAsync("a", "s3"));
        Assert.Single(await _store.RotationsDone.ListAsync("a", "s3"));
    }
}
