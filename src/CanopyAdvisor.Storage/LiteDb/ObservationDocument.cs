#pragma warning disable CA1812 // Instantiated by the BsonMapper through reflection.
using NodaTime;

namespace CanopyAdvisor.Storage.LiteDb;

/// <summary>An observation as stored.</summary>
internal sealed class ObservationDocument
{
    public string Id { get; set; } = "";

    public string OrganisationId { get; set; } = "";

    public string SiteId { get; set; } = "";

    public string BenchId { get; set; } = "";

    public Instant At { get; set; }

    public double TiltDeg { get; set; }

    public double AzimuthDeg { get; set; }

    public double? HeightMm { get; set; }

    public int Plants { get; set; }

    public Instant CreatedAt { get; set; }

    public string CreatedBy { get; set; } = "";

    public static ObservationDocument From(ObservationRecord r) => new()
    {
        Id = r.Id,
        OrganisationId = r.OrganisationId,
        SiteId = r.SiteId,
        BenchId = r.BenchId,
        At = r.At,
        TiltDeg = r.TiltDeg,
        AzimuthDeg = r.AzimuthDeg,
        HeightMm = r.HeightMm,
        Plants = r.Plants,
        CreatedAt = r.CreatedAt,
        CreatedBy = r.CreatedBy,
    };

    public ObservationRecord ToRecord() => new(Id, OrganisationId, SiteId, BenchId, At, TiltDeg, AzimuthDeg, HeightMm, Plants, CreatedAt, CreatedBy);
}
