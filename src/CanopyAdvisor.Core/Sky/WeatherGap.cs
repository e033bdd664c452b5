using NodaTime;

namespace CanopyAdvisor.Core.Sky;

/// <summary>A stretch of a light log with no usable reading: the two readings around it are further apart than allowed.</summary>
/// <param name="Start">The last reading before the gap; times after it and before <paramref name="End"/> have no value.</param>
/// <param name="End">The first reading after the gap.</param>
public sealed record WeatherGap(Instant Start, Instant End)
{
    /// <summary>Length of the gap.</summary>
    public Duration Length => End - Start;

    /// <summary>Whether an instant lies strictly inside the gap.</summary>
    public bool Contains(Instant time) => time > Start && time < End;
}
