using NodaTime;

namespace CanopyAdvisor.Core.Lamps;

/// <summary>When a lamp is on: a daily photoperiod in the site's local time, optionally switched off in bright daylight.</summary>
/// <remarks>
/// The lamp is on from <see cref="On"/> to <see cref="Off"/> local time each day; when <see cref="Off"/> is earlier
/// than <see cref="On"/> the window runs past midnight. Equal times mean always on. When
/// <see cref="OffAboveOutsidePpfd"/> is set, the lamp is off while the outside global PPFD is above it.
/// </remarks>
/// <param name="On">Local time the photoperiod starts.</param>
/// <param name="Off">Local time the photoperiod ends.</param>
/// <param name="OffAboveOutsidePpfd">Outside global PPFD (µmol m⁻² s⁻¹) above which the lamp is off; null = never.</param>
public sealed record LampSchedule(LocalTime On, LocalTime Off, double? OffAboveOutsidePpfd)
{
    /// <summary>A lamp that is always on.</summary>
    public static LampSchedule AlwaysOn { get; } = new(LocalTime.Midnight, LocalTime.Midnight, null);

    /// <summary>Whether the lamp is on at a local time of day with the given outside global PPFD.</summary>
    public bool IsOn(LocalTime localTime, double outsideGlobalPpfd)
    {
        if (OffAboveOutsidePpfd is double threshold && outsideGlobalPpfd > threshold)
        {
            return false;
        }

        if (On == Off)
        {
            return true;
        }

        return On < Off
            ? localTime >= On && localTime < Off
            : localTime >= On || localTime < Off;
    }
}
