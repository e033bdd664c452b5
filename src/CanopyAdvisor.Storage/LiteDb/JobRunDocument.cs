#pragma warning disable CA1812 // Instantiated by the BsonMapper through reflection.
using NodaTime;

namespace CanopyAdvisor.Storage.LiteDb;

/// <summary>A job run as stored; <see cref="SiteKind"/> (organisation, site, kind) is indexed for the last run.</summary>
internal sealed class JobRunDocument
{
    public string Id { get; set; } = "";

    public string OrganisationId { get; set; } = "";

    public string SiteId { get; set; } = "";

    public string SiteKind { get; set; } = "";

    public string Kind { get; set; } = "";

    public Instant ScheduledFor { get; set; }

    public Instant StartedAt { get; set; }

    public Instant FinishedAt { get; set; }

    public string Outcome { get; set; } = "";

    public string Message { get; set; } = "";

    public bool CaughtUp { get; set; }

    public string? Output { get; set; }

    public static JobRunDocument From(JobRunRecord r) => new()
    {
        Id = r.Id,
        OrganisationId = r.OrganisationId,
        SiteId = r.SiteId,
        SiteKind = Keys.Join(r.OrganisationId, r.SiteId, r.Kind),
        Kind = r.Kind,
        ScheduledFor = r.ScheduledFor,
        StartedAt = r.StartedAt,
        FinishedAt = r.FinishedAt,
        Outcome = r.Outcome,
        Message = r.Message,
        CaughtUp = r.CaughtUp,
        Output = r.Output,
    };

    public JobRunRecord ToRecord(bool withOutput = true) => new(Id, OrganisationId, SiteId, Kind, ScheduledFor, StartedAt, FinishedAt, Outcome, Message, CaughtUp, withOutput ? Output : null);
}
