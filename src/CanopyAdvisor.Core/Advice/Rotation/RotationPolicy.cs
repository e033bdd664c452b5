using System.Globalization;
using CanopyAdvisor.Core.Geometry;
using NodaTime;

namespace CanopyAdvisor.Core.Advice.Rotation;

/// <summary>How a bench's pots are turned: not at all, or by a fixed angle every fixed interval.</summary>
/// <remarks>
/// <para>Turns are clockwise seen from above (positive, like a compass). For 180° the sense does not matter. For 90°
/// always turning the same way cycles the four sides of every pot toward the light in turn (N, E, S, W faces), so over
/// four turns the light falls on each side for one interval; alternating +90° and −90° would only swap two faces and
/// leave the lean across the other axis uncorrected.</para>
/// <para>Immutable.</para>
/// </remarks>
public sealed record RotationPolicy
{
    private RotationPolicy(Angle angle, Duration interval)
    {
        Angle = angle;
        Interval = interval;
    }

    /// <summary>No rotation.</summary>
    public static RotationPolicy None { get; } = new(Angle.Zero, Duration.Zero);

    /// <summary>The turn each time (zero for <see cref="None"/>); positive = clockwise from above.</summary>
    public Angle Angle { get; }

    /// <summary>The time between turns (zero for <see cref="None"/>).</summary>
    public Duration Interval { get; }

    /// <summary>Whether this is <see cref="None"/>.</summary>
    public bool IsNone => Interval == Duration.Zero;

    /// <summary>A turn by <paramref name="angle"/> every <paramref name="interval"/>.</summary>
    /// <param name="angle">The turn, in (0°, 360°); 90° or 180° in practice.</param>
    /// <param name="interval">The time between turns, more than zero.</param>
    /// <exception cref="ArgumentOutOfRangeException">The angle or the interval is out of range.</exception>
    public static RotationPolicy Every(Angle angle, Duration interval)
    {
        if (!(angle.Degrees > 0 && angle.Degrees < 360))
        {
            throw new ArgumentOutOfRangeException(nameof(angle), angle, "must be within (0°, 360°)");
        }

        if (interval <= Duration.Zero)
        {
            throw new ArgumentOutOfRangeException(nameof(interval), interval, "must be more than zero");
        }

        return new RotationPolicy(angle, interval);
    }

    /// <summary>The first turn of a plan: the later of the first time a turn may be made and the last turn already done
    /// plus the interval (keeping the bench's rhythm).</summary>
    /// <param name="notBefore">The first time a turn may be made (now, or the next working time).</param>
    /// <param name="lastDone">The last turn already done, if any.</param>
    /// <remarks>It never moves earlier as the interval grows, so the number of turns before a sale never rises with the
    /// interval: the property the planner's longest-first search rests on.</remarks>
    public Instant FirstTurn(Instant notBefore, Instant? lastDone) =>
        lastDone is Instant last && last + Interval > notBefore ? last + Interval : notBefore;

    /// <summary>The nominal turn times from <paramref name="first"/> every interval while before <paramref name="before"/>.</summary>
    /// <param name="first">The first turn.</param>
    /// <param name="before">The turns end before this instant (the sale).</param>
    /// <returns>The instants in time order; none for <see cref="None"/>.</returns>
    public IEnumerable<Instant> Times(Instant first, Instant before)
    {
        if (IsNone)
        {
            yield break;
        }

        for (Instant t = first; t < before; t += Interval)
        {
            yield return t;
        }
    }

    /// <summary>A short description: <c>none</c>, or e.g. <c>180° every 3 d</c>, <c>90° every 12 h</c>.</summary>
    public override string ToString()
    {
        if (IsNone)
        {
            return "none";
        }

        double hours = Interval.TotalHours;
        string every = hours < 24 || Math.Abs((hours / 24) - Math.Round(hours / 24 * 2) / 2) > 1e-9
            ? string.Create(CultureInfo.InvariantCulture, $"{hours:0.##} h")
            : string.Create(CultureInfo.InvariantCulture, $"{hours / 24:0.#} d");
        return string.Create(CultureInfo.InvariantCulture, $"{Angle.Degrees:0}° every {every}");
    }
}
