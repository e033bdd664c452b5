using NodaTime;

namespace CanopyAdvisor.Storage;

/// <summary>A pot rotation that was done on a lot, as stored; the service validates it first.</summary>
/// <param name="Id">Opaque id (unique).</param>
/// <param name="OrganisationId">The owning organisation.</param>
/// <param name="SiteId">The site (its store id).</param>
/// <param name="LotId">The lot turned (its id in the site file).</param>
/// <param name="BenchId">The bench the lot stands on.</param>
/// <param name="At">When the pots were turned.</param>
/// <param name="AngleDeg">How far, degrees (positive = clockwise seen from above).</param>
/// <param name="CreatedAt">When it was recorded.</param>
/// <param name="CreatedBy">The id of the user who recorded it.</param>
public sealed record RotationDoneRecord(
    string Id,
    string OrganisationId,
    string SiteId,
    string LotId,
    string BenchId,
    Instant At,
    double AngleDeg,
    Instant CreatedAt,
    string CreatedBy);
