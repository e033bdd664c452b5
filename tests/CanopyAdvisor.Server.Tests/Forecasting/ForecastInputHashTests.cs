using CanopyAdvisor.Server.Forecasting;
using NodaTime;

namespace CanopyAdvisor.Server.Tests.Forecasting;

/// <summary>The forecast's store key: the same inputs give the same hash, and any one input changed gives another.</summary>
public sealed class ForecastInputHashTests
{
    private static readonly Instant Now = Instant.FromUtc(2026, 12, 2, 9, 0);

    private static string Hash(string site = "{\"id\":\"a\"}", string crops = "c1", Instant? now = null, double days = 7, bool band = true) =>
        ForecastRunner.HashInputs(site, crops, now ?? Now, days, band);

    public static TheoryData<string, string> ChangedInputs => new()
    {
        { "site text", Hash(site: "{\"id\":\"b\"}") },
        { "crop library version", Hash(crops: "c2") },
        { "start, one tick later", Hash(now: Now + Duration.FromTicks(1)) },
        { "horizon", Hash(days: 7.000001) },
        { "band", Hash(band: false) },
        // Length-prefixed site text: moving characters between the crop version and the site cannot collide.
        { "boundary shift", ForecastRunner.HashInputs("1{\"id\":\"a\"}", "c", Now, 7, true) },
    };

    [Theory]
    [MemberData(nameof(ChangedInputs))]
    public void Any_changed_input_changes_the_hash(string label, string changed)
    {
        Assert.NotEqual(Hash(), changed);
        _ = label;
    }

    [Fact]
    public void The_same_inputs_give_the_same_SHA256_hex()
    {
        string hash = Hash();
        Assert.Equal(hash, Hash());
        // SHA-256 digests are 256 bits (FIPS 180-4 §6.2), 64 hex digits.
        Assert.Matches("^[0-9a-f]{64}$", hash);
    }
}
