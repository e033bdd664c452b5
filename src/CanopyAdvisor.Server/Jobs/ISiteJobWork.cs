using CanopyAdvisor.Storage;
using NodaTime;

namespace CanopyAdvisor.Server.Jobs;

/// <summary>The work of one kind of scheduled job, for one site and one fire time.</summary>
internal interface ISiteJobWork
{
    /// <summary>The job kind (one of <see cref="JobKinds"/>).</summary>
    string Kind { get; }

    /// <summary>Does the work and stores what it makes.</summary>
    /// <param name="site">The stored site.</param>
    /// <param name="scheduledFor">The fire time the run stands for.</param>
    /// <param name="cancellationToken">Stops the work (the service is stopping).</param>
    /// <returns>A short account and the output to keep with the run (or null).</returns>
    /// <exception cref="Core.Validation.InvalidInputException">The site cannot be worked on (e.g. no lots); recorded as failed.</exception>
    Task<JobResult> RunAsync(SiteRecord site, Instant scheduledFor, CancellationToken cancellationToken);
}
