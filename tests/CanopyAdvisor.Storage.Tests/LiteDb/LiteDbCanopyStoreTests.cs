using CanopyAdvisor.Storage.LiteDb;
using NodaTime;

namespace CanopyAdvisor.Storage.Tests.LiteDb;

/// <summary>The LiteDB store against the <see cref="ICanopyStore"/> contract: round trips, unique keys, organisation
/// scoping, atomic multi-document writes, and reopening the file.</summary>
public sealed class LiteDbCanopyStoreTests : IDisposable
{
    // An instant with a sub-millisecond part: the BSON specification's UTC datetime is an int64 of milliseconds
    // (bsonspec.org, "UTC datetime"), so storing it as a BSON date would drop the last 4 digits; the store keeps ticks.
    private static readonly Instant T0 = Instant.FromUtc(2026, 12, 1, 8, 30, 15) + Duration.FromTicks(1_234_567);

    private readonly string _folder = Directory.CreateTempSubdirectory("canopy-store-").FullName;
    private readonly string _path;
    private LiteDbCanopyStore _store;

    public LiteDbCanopyStoreTests()
    {
        _path = Path.Combine(_folder, "canopy.db");
        _store = new LiteDbCanopyStore(_path);
    }

    public void Dispose()
    {
        _store.Dispose();
        Directory.Delete(_folder, recursive: true);
    }

    private static OrganisationRecord Org(string id) => new(id, $"Org {id}", false, T0);

    private static UserRecord User(string org, string id, string email, UserRole role = UserRole.Grower) =>
        new(id, org, email, $"User {id}", role, "hash-" + id, "stamp-" + id, T0);

    private static SiteRecord Site(string org, string id, string key, int version = 1) =>
        new(id, org, key, $"Site {key}", $$"""{"id":"{{key}}"}""", version, T0, T0, "u1");

    private static ForecastRecord Forecast(string org, string site, string id, string hash) =>
        new(id, org, site, 1, hash, T0, "u1", """{"benches":[]}""");

    private async Task SeedTwoOrganisations()
    {
        Assert.Equal(WriteOutcome.Written, await _store.AddOrganisationAsync(Org("a"), [User("a", "u1", "Grower@A.example")], [Site("a", "s1", "glasshouse")]));
        Assert.Equal(WriteOutcome.Written, await _store.AddOrganisationAsync(Org("b"), [User("b", "u2", "grower@b.example")], [Site("b", "s2", "glasshouse")]));
    }

    [Fact]
    public async Task Records_round_trip_exactly_including_sub_millisecond_instants()
    {
        await SeedTwoOrganisations();
        var token = new ApiTokenRecord("t1", "a", "u1", "export", new string('a', 64), T0, T0 + Duration.FromDays(90), null);
        Assert.Equal(WriteOutcome.Written, await _store.ApiTokens.AddAsync(token));

        Assert.Equal(Org("a"), await _store.Organisations.GetAsync("a"));
        // E-mail is kept lower-case so sign-in is case-insensitive.
        Assert.Equal(User("a", "u1", "grower@a.example"), await _store.Users.GetAsync("a", "u1"));
        Assert.Equal(Site("a", "s1", "glasshouse"), await _store.Sites.GetAsync("a", "s1"));
        Assert.Equal(token, await _store.ApiTokens.FindByHashAsync(token.TokenHash));
        Assert.Equal(2, await _store.Organisations.CountAsync());
    }

    [Fact]
    public async Task Another_organisations_ids_are_not_found()
    {
        await SeedTwoOrganisations();
        Assert.Null(await _store.Sites.GetAsync("b", "s1"));
        Assert.Null(await _store.Users.GetAsync("b", "u1"));
        Assert.Equal(["s2"], (await _store.Sites.ListAsync("b")).Select(s => s.Id));
        Assert.False(await _store.Sites.DeleteAsync("b", "s1"));
        Assert.False(await _store.Users.DeleteAsync("b", "u1"));
        Assert.Equal(WriteOutcome.NotFound, await _store.Sites.ReplaceAsync(Site("b", "s1", "other", 2), 1));
        Assert.NotNull(await _store.Sites.GetAsync("a", "s1"));
    }

    [Fact]
    public async Task Unique_keys_are_refused_and_nothing_is_written()
    {
        await SeedTwoOrganisations();
        // Same e-mail in another case: e-mails are unique over all organisations.
        Assert.Equal(WriteOutcome.KeyTaken, await _store.Users.AddAsync(User("b", "u3", "GROWER@a.example")));
        // Same site key in the same organisation; the same key in another organisation is fine (s2 above).
        Assert.Equal(WriteOutcome.KeyTaken, await _store.Sites.AddAsync(Site("a", "s3", "glasshouse")));
        Assert.Equal(WriteOutcome.Written, await _store.Sites.AddAsync(Site("a", "s4", "indoor-farm")));
        Assert.Equal(WriteOutcome.KeyTaken, await _store.Sites.ReplaceAsync(Site("a", "s4", "glasshouse", 2), 1));
        Assert.Equal(1, (await _store.Sites.GetAsync("a", "s4"))!.Version);
        Assert.Null(await _store.Users.FindAsync("u3"));
    }

    [Fact]
    public async Task Adding_an_organisation_is_all_or_nothing()
    {
        await SeedTwoOrganisations();
        // The second user's e-mail is taken: the organisation, its first user and its site must not be written either.
        WriteOutcome outcome = await _store.AddOrganisationAsync(
            Org("c"), [User("c", "u5", "new@c.example"), User("c", "u6", "grower@b.example")], [Site("c", "s5", "x")]);
        Assert.Equal(WriteOutcome.KeyTaken, outcome);
        Assert.Null(await _store.Organisations.GetAsync("c"));
        Assert.Null(await _store.Users.FindAsync("u5"));
        Assert.Null(await _store.Sites.GetAsync("c", "s5"));
    }

    [Fact]
    public async Task Replace_checks_the_version_it_was_read_at()
    {
        await SeedTwoOrganisations();
        Assert.Equal(WriteOutcome.Written, await _store.Sites.ReplaceAsync(Site("a", "s1", "glasshouse", 2), 1));
        // A second writer that also read version 1 loses (optimistic concurrency).
        Assert.Equal(WriteOutcome.VersionMismatch, await _store.Sites.ReplaceAsync(Site("a", "s1", "glasshouse", 2), 1));
        Assert.Equal(2, (await _store.Sites.GetAsync("a", "s1"))!.Version);
    }

    [Fact]
    public async Task Deleting_a_site_deletes_its_forecasts_and_deleting_a_user_their_tokens()
    {
        await SeedTwoOrganisations();
        await _store.Forecasts.AddAsync(Forecast("a", "s1", "f1", "h1"));
        await _store.Forecasts.AddAsync(Forecast("b", "s2", "f2", "h1"));
        await _store.ApiTokens.AddAsync(new ApiTokenRecord("t1", "a", "u1", "x", "h-t1", T0, T0 + Duration.FromDays(1), null));

        Assert.True(await _store.Sites.DeleteAsync("a", "s1"));
        Assert.Empty(await _store.Forecasts.ListAsync("a", "s1"));
        Assert.Single(await _store.Forecasts.ListAsync("b", "s2"));

        Assert.True(await _store.Users.DeleteAsync("a", "u1"));
        Assert.Null(await _store.ApiTokens.FindByHashAsync("h-t1"));
    }

    [Fact]
    public async Task A_forecast_with_the_same_inputs_is_kept_once()
    {
        await SeedTwoOrganisations();
        ForecastRecord first = await _store.Forecasts.AddAsync(Forecast("a", "s1", "f1", "h1"));
        ForecastRecord second = await _store.Forecasts.AddAsync(Forecast("a", "s1", "f9", "h1"));
        Assert.Equal("f1", first.Id);
        Assert.Equal("f1", second.Id);
        Assert.Equal("f1", (await _store.Forecasts.FindByHashAsync("a", "s1", "h1"))!.Id);
        Assert.Null(await _store.Forecasts.FindByHashAsync("b", "s1", "h1"));
        Assert.Null(await _store.Forecasts.GetAsync("a", "s2", "f1"));
    }

    [Fact]
    public async Task Revoking_keeps_the_first_time_and_only_the_owner_can()
    {
        await SeedTwoOrganisations();
        await _store.ApiTokens.AddAsync(new ApiTokenRecord("t1", "a", "u1", "x", "h-t1", T0, T0 + Duration.FromDays(1), null));
        Assert.False(await _store.ApiTokens.RevokeAsync("b", "u2", "t1", T0));
        Assert.True(await _store.ApiTokens.RevokeAsync("a", "u1", "t1", T0 + Duration.FromHours(1)));
        Assert.True(await _store.ApiTokens.RevokeAsync("a", "u1", "t1", T0 + Duration.FromHours(2)));
        Assert.Equal(T0 + Duration.FromHours(1), (await _store.ApiTokens.FindByHashAsync("h-t1"))!.RevokedAt);
    }

    [Fact]
    public async Task Committed_writes_are_there_after_reopening_the_file()
    {
        await SeedTwoOrganisations();
        await _store.Sites.ReplaceAsync(Site("a", "s1", "glasshouse", 2), 1);
        _store.Dispose();
        _store = new LiteDbCanopyStore(_path);
        Assert.Equal(2, (await _store.Sites.GetAsync("a", "s1"))!.Version);
        Assert.Equal(2, await _store.Organisations.CountAsync());
        // The unique indexes still hold after reopening.
        Assert.Equal(WriteOutcome.KeyTaken, await _store.Users.AddAsync(User("b", "u9", "grower@a.example")));
    }

    [Fact]
    public async Task Parallel_writers_each_get_their_own_transaction()
    {
        await SeedTwoOrganisations();
        // 16 writers at once, each adding a site: every one is written exactly once (LiteDB transactions are per thread).
        WriteOutcome[] outcomes = await Task.WhenAll(Enumerable.Range(0, 16).Select(i =>
            Task.Run(() => _store.Sites.AddAsync(Site("a", $"p{i}", $"key-{i}")))));
        Assert.All(outcomes, o => Assert.Equal(WriteOutcome.Written, o));
        Assert.Equal(17, (await _store.Sites.ListAsync("a")).Count);
    }

    [Fact]
    public async Task Disposing_twice_and_from_several_threads_is_safe_and_ends_use()
    {
        await SeedTwoOrganisations();
        await Task.WhenAll(Enumerable.Range(0, 4).Select(_ => Task.Run(_store.Dispose)));
        _store.Dispose();
        await Assert.ThrowsAnyAsync<ObjectDisposedException>(() => _store.Organisations.CountAsync());
        _store = new LiteDbCanopyStore(_path);
        Assert.Equal(2, await _store.Organisations.CountAsync());
    }

    [Fact]
    public async Task A_second_instance_on_the_same_file_is_refused_until_the_first_is_closed()
    {
        await SeedTwoOrganisations();
        // LiteDB direct mode alone would let it open (and two instances corrupt the file): the store's lock refuses it.
        Assert.Throws<StoreInUseException>(() => new LiteDbCanopyStore(_path).Dispose());
        Assert.Equal(2, await _store.Organisations.CountAsync());
        _store.Dispose();
        _store = new LiteDbCanopyStore(_path);
        Assert.Equal(2, await _store.Organisations.CountAsync());
    }
}
