using NodaTime;

namespace CanopyAdvisor.Server.Contracts;

/// <summary>One run of a scheduled job, times in the site's zone.</summary>
/// <param name="Id">The run's id.</param>
/// <param name="Kind">The job: <c>nightly-forecast</c>, <c>weekly-outlook</c> or <c>task-list</c>.</param>
/// <param name="ScheduledFor">The fire time it stands for.</param>
/// <param name="StartedAt">When it started.</param>
/// <param name="FinishedAt">When it finished.</param>
/// <param name="Outcome"><c>succeeded</c> or <c>failed</c>.</param>
/// <param name="Message">What it did, or why it failed.</param>
/// <param name="CaughtUp">True when it ran on start for a fire time missed while the service was down.</param>
public sealed record JobRunView(
    string Id, string Kind, OffsetDateTime ScheduledFor, OffsetDateTime StartedAt, OffsetDateTime FinishedAt, string Outcome, string Message, bool CaughtUp);
