using NodaTime;

namespace CanopyAdvisor.Server.Contracts;

/// <summary>A rotation plan with its labour calendar (what <c>canopy plan --json</c> gives); times in the site's local time.</summary>
/// <param name="SiteId">The site's store id.</param>
/// <param name="TimeZone">The site's IANA zone.</param>
/// <param name="Now">The plan's start.</param>
/// <param name="CheckedUntil">How far the plan was forecast (the last sale, at most 366 days on).</param>
/// <param name="MarginPercent">The safety margin under each grade limit.</param>
/// <param name="WindowFraction">Each task's window half-width as a fraction of its interval.</param>
/// <param name="RotationsDone">How many stored rotations done the plan starts from.</param>
/// <param name="Benches">Per bench: the verdict and policy.</param>
/// <param name="Scheduled">The tasks placed on the crews.</param>
/// <param name="Unscheduled">The tasks that did not fit, with why.</param>
/// <param name="TotalLabourHours">The rotation labour of the scheduled tasks, hours.</param>
/// <param name="PeakDayLabourHours">The most rotation labour on one day, hours.</param>
/// <param name="Cautions">Safety notes (side lamps are electrical work, often at height).</param>
public sealed record PlanView(
    string SiteId,
    string TimeZone,
    OffsetDateTime Now,
    OffsetDateTime CheckedUntil,
    double MarginPercent,
    double WindowFraction,
    int RotationsDone,
    IReadOnlyList<BenchPlanView> Benches,
    IReadOnlyList<PlanTaskView> Scheduled,
    IReadOnlyList<UnscheduledTaskView> Unscheduled,
    double TotalLabourHours,
    double PeakDayLabourHours,
    IReadOnlyList<string> Cautions);
