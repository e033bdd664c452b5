using CanopyAdvisor.Storage.LiteDb;
using NodaTime;

namespace CanopyAdvisor.Storage.Tests.LiteDb;

/// <summary>Crop variants in the LiteDB store: exact round trip, one crop id per organisation (the same id in two
/// organisations is fine), lists scoped to the organisation.</summary>
public sealed class CropVariantRepositoryTests : IDisposable
{
    private static readonly Instant T0 = Instant.FromUtc(2026, 12, 1, 15, 0) + Duration.FromTicks(77);

    private readonly string _folder = Directory.CreateTempSubdirectory("canopy-variants-").FullName;
    private readonly LiteDbCanopyStore _store;

    public CropVariantRepositoryTests() => _store = new LiteDbCanopyStore(Path.Combine(_folder, "canopy.db"));

    public void Dispose()
    {
        _store.Dispose();
        Directory.Delete(_folder, recursive: true);
    }

    private static CropVariantRecord Variant(string org, string id, string? site = "s1") =>
        new(org, id, "petunia", $"Petunia ({id})", "name = \"x\"\nbase = \"petunia\"\n", site, T0, "u1");

    [Fact]
    public async Task Variants_round_trip_and_a_crop_id_is_unique_per_organisation()
    {
        Assert.Equal(WriteOutcome.Written, await _store.CropVariants.AddAsync(Variant("a", "petunia-b")));
        Assert.Equal(WriteOutcome.Written, await _store.CropVariants.AddAsync(Variant("a", "petunia-a", site: null)));
        Assert.Equal(WriteOutcome.Written, await _store.CropVariants.AddAsync(Variant("b", "petunia-a")));
        Assert.Equal(WriteOutcome.KeyTaken, await _store.CropVariants.AddAsync(Variant("a", "petunia-a") with { Name = "again" }));

        Assert.Equal([Variant("a", "petunia-a", site: null), Variant("a", "petunia-b")], await _store.CropVariants.ListAsync("a"));
        Assert.Equal([Variant("b", "petunia-a")], await _store.CropVariants.ListAsync("b"));
        Assert.Empty(await _store.CropVariants.ListAsync("c"));
    }
}
