#pragma warning disable CA1812 // Instantiated by the BsonMapper through reflection.
using NodaTime;

namespace CanopyAdvisor.Storage.LiteDb;

/// <summary>A rotation done as stored.</summary>
internal sealed class RotationDoneDocument
{
    public string Id { get; set; } = "";

    public string OrganisationId { get; set; } = "";

    public string SiteId { get; set; } = "";

    public string LotId { get; set; } = "";

    public string BenchId { get; set; } = "";

    public Instant At { get; set; }

    public double AngleDeg { get; set; }

    public Instant CreatedAt { get; set; }

    public string CreatedBy { get; set; } = "";

    public static RotationDoneDocument From(RotationDoneRecord r) => new()
    {
        Id = r.Id,
        OrganisationId = r.OrganisationId,
        SiteId = r.SiteId,
        LotId = r.LotId,
        BenchId = r.BenchId,
        At = r.At,
        AngleDeg = r.AngleDeg,
        CreatedAt = r.CreatedAt,
        CreatedBy = r.CreatedBy,
    };

    public RotationDoneRecord ToRecord() => new(Id, OrganisationId, SiteId, LotId, BenchId, At, AngleDeg, CreatedAt, CreatedBy);
}
