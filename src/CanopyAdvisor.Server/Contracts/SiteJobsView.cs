namespace CanopyAdvisor.Server.Contracts;

/// <summary>A site's scheduled jobs and its recent runs.</summary>
/// <param name="Schedule">The jobs with their next fire times.</param>
/// <param name="Runs">The most recent runs, newest first.</param>
public sealed record SiteJobsView(IReadOnlyList<JobScheduleView> Schedule, IReadOnlyList<JobRunView> Runs);
