using NodaTime;

namespace CanopyAdvisor.Storage;

/// <summary>One run of a scheduled job for a site: when it was due, when it ran, and how it ended.</summary>
/// <param name="Id">Opaque id (unique).</param>
/// <param name="OrganisationId">The owning organisation.</param>
/// <param name="SiteId">The site the job ran for.</param>
/// <param name="Kind">The job kind (the service's name for it, e.g. <c>nightly-forecast</c>).</param>
/// <param name="ScheduledFor">The fire time the run stands for (a run caught up on start keeps the missed time).</param>
/// <param name="StartedAt">When the run started.</param>
/// <param name="FinishedAt">When the run finished.</param>
/// <param name="Outcome">How it ended (the service's word, e.g. <c>succeeded</c>, <c>failed</c>).</param>
/// <param name="Message">A short account for people (what was stored, or what went wrong).</param>
/// <param name="CaughtUp">True when the run was made on start for a fire time missed while the service was down.</param>
/// <param name="Output">What the run produced, as the service stores it (a JSON document), or null.</param>
public sealed record JobRunRecord(
    string Id,
    string OrganisationId,
    string SiteId,
    string Kind,
    Instant ScheduledFor,
    Instant StartedAt,
    Instant FinishedAt,
    string Outcome,
    string Message,
    bool CaughtUp,
    string? Output = null);
