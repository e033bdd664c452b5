using System.Collections.Immutable;
using NodaTime;

namespace CanopyAdvisor.Core.Advice.Labour;

/// <summary>How long rotations take at a site and who does them: hand time per pot, set-up per bench, crews and holidays.</summary>
/// <remarks>
/// <para>
/// A rotation task's labour is <c>pots × SecondsPerPot + SetUpMinutesPerBench</c> (MODEL.md §6), in person-time; see
/// <see cref="LabourFor"/>. Holidays are local dates in the site's time zone on which no crew works.
/// </para>
/// <para>
/// <see cref="Default"/> is a placeholder for a site that gives no labour section: the default hand and set-up times of
/// <see cref="ModelConstants"/> (estimates, from memory) and one person working Monday to Friday 07:00–16:00 (a common
/// working day, common practice). Immutable.
/// </para>
/// </remarks>
/// <param name="SecondsPerPot">Hand time to turn one pot, s (&gt; 0).</param>
/// <param name="SetUpMinutesPerBench">Time to get to a bench and set up, per task, min (≥ 0).</param>
/// <param name="Crews">The crews that turn pots (at least one).</param>
/// <param name="Holidays">Local dates on which nobody works.</param>
public sealed record LabourSettings(
    double SecondsPerPot,
    double SetUpMinutesPerBench,
    ImmutableArray<Crew> Crews,
    ImmutableArray<LocalDate> Holidays)
{
    /// <summary>
    /// 3 s per pot, 10 min set-up per bench (<see cref="ModelConstants.DefaultSecondsPerPot"/>,
    /// <see cref="ModelConstants.DefaultSetUpMinutesPerBench"/>; estimates, from memory), one crew <c>crew</c> of one person
    /// Monday–Friday 07:00–16:00 (common practice), no holidays.
    /// </summary>
    public static LabourSettings Default { get; } = new(
        ModelConstants.DefaultSecondsPerPot,
        ModelConstants.DefaultSetUpMinutesPerBench,
        [new Crew("crew", "crew", 1, Crew.Weekdays, new LocalTime(7, 0), new LocalTime(16, 0))],
        []);

    /// <summary>The labour (person-time) of one rotation task: <c>pots × SecondsPerPot + SetUpMinutesPerBench</c>.</summary>
    /// <param name="pots">Pots on the bench (≥ 0).</param>
    /// <exception cref="Validation.InvalidInputException">The pot count or the times are out of range.</exception>
    public Duration LabourFor(int pots)
    {
        var errors = new List<Validation.ValidationError>(LabourValidator.CheckTimes(this, "labour"));
        if (pots < 0)
        {
            errors.Add(new("pots", $"must be ≥ 0, got {pots}"));
        }

        if (errors.Count > 0)
        {
            throw new Validation.InvalidInputException(errors);
        }

        return Duration.FromSeconds(pots * SecondsPerPot) + Duration.FromMinutes(SetUpMinutesPerBench);
    }

    /// <summary>Whether the local date is a site holiday.</summary>
    public bool IsHoliday(LocalDate date) => !Holidays.IsDefault && Holidays.Contains(date);
}
