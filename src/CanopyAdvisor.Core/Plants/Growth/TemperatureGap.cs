using NodaTime;

namespace CanopyAdvisor.Core.Plants.Growth;

/// <summary>A stretch of a temperature log with no value: the readings around it are further apart than allowed.</summary>
/// <param name="Start">The last reading before the gap.</param>
/// <param name="End">The first reading after the gap.</param>
public sealed record TemperatureGap(Instant Start, Instant End)
{
    /// <summary>Length of the gap.</summary>
    public Duration Length => End - Start;
}
