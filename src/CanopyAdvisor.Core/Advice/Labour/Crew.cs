using System.Collections.Immutable;
using NodaTime;

namespace CanopyAdvisor.Core.Advice.Labour;

/// <summary>People who do rotation tasks together: how many, on which days of the week, and from when to when.</summary>
/// <remarks>
/// <para>
/// The crew works as one team on one bench at a time: a task of <c>L</c> person-hours takes the crew <c>L / People</c> of
/// clock time (pot turning splits well between people working from both ends of a bench; a simplification of this
/// project). Its daily capacity is <c>People × (End − Start)</c> person-hours, on the working days that are not site
/// holidays. Working hours are local times in the site's time zone and do not run past midnight (<see cref="End"/> after
/// <see cref="Start"/>); on a day with a daylight-saving change the real length of the day is used (see
/// <see cref="LabourScheduler"/>). Breaks are not modelled: give the hours the crew can spend on rotations.
/// </para>
/// <para>Immutable; build a changed copy with <c>with</c>.</para>
/// </remarks>
/// <param name="Id">Short identifier, unique among the site's crews (e.g. <c>bench-team</c>).</param>
/// <param name="Name">Display name (e.g. <c>bench team</c>).</param>
/// <param name="People">How many people work in the crew (≥ 1).</param>
/// <param name="WorkingDays">The days of the week the crew works (at least one, no repeats).</param>
/// <param name="Start">Local time the crew starts, in the site's time zone.</param>
/// <param name="End">Local time the crew stops, in the site's time zone; after <paramref name="Start"/>.</param>
public sealed record Crew(
    string Id,
    string Name,
    int People,
    ImmutableArray<IsoDayOfWeek> WorkingDays,
    LocalTime Start,
    LocalTime End)
{
    /// <summary>Monday to Friday, the common five-day working week (common practice).</summary>
    public static ImmutableArray<IsoDayOfWeek> Weekdays { get; } =
        [IsoDayOfWeek.Monday, IsoDayOfWeek.Tuesday, IsoDayOfWeek.Wednesday, IsoDayOfWeek.Thursday, IsoDayOfWeek.Friday];

    /// <summary>The clock time from <see cref="Start"/> to <see cref="End"/> on a day without a daylight-saving change.</summary>
    public Duration ShiftLength => Duration.FromNanoseconds(End.NanosecondOfDay - Start.NanosecondOfDay);

    /// <summary>Whether the crew works on this day of the week (holidays aside).</summary>
    public bool WorksOn(IsoDayOfWeek day) => !WorkingDays.IsDefault && WorkingDays.Contains(day);
}
