using NodaTime;

namespace CanopyAdvisor.Storage;

/// <summary>A measured lean of sample plants on a bench (an observation), as stored; the service validates it first.</summary>
/// <param name="Id">Opaque id (unique).</param>
/// <param name="OrganisationId">The owning organisation.</param>
/// <param name="SiteId">The site (its store id).</param>
/// <param name="BenchId">The bench measured (its id in the site file).</param>
/// <param name="At">When it was measured.</param>
/// <param name="TiltDeg">Mean tilt from the vertical, degrees.</param>
/// <param name="AzimuthDeg">Compass bearing the tops point to, degrees.</param>
/// <param name="HeightMm">Mean height, mm, or null when not measured.</param>
/// <param name="Plants">How many plants the lean is the mean of.</param>
/// <param name="CreatedAt">When it was recorded.</param>
/// <param name="CreatedBy">The id of the user who recorded it.</param>
public sealed record ObservationRecord(
    string Id,
    string OrganisationId,
    string SiteId,
    string BenchId,
    Instant At,
    double TiltDeg,
    double AzimuthDeg,
    double? HeightMm,
    int Plants,
    Instant CreatedAt,
    string CreatedBy);
