using NodaTime;

namespace CanopyAdvisor.Files.Temperature;

/// <summary>A reading rejected as a spike: it differs from both neighbours, in the same direction, by more than the spike threshold.</summary>
/// <param name="Where">File and line, e.g. <c>house.csv:14</c>.</param>
/// <param name="Time">The reading's time.</param>
/// <param name="AirC">The rejected value, °C.</param>
/// <param name="PreviousAirC">The reading before it, °C.</param>
/// <param name="NextAirC">The reading after it, °C.</param>
public sealed record TemperatureSpike(string Where, Instant Time, double AirC, double PreviousAirC, double NextAirC)
{
    /// <inheritdoc />
    public override string ToString() =>
        FormattableString.Invariant($"{Where}: airC: spike {AirC} °C between {PreviousAirC} and {NextAirC} °C, treated as missing");
}
