namespace CanopyAdvisor.Server.Jobs;

/// <summary>Scheduled job settings, bound from <c>Canopy:Jobs</c>.</summary>
public sealed class JobOptions
{
    /// <summary>The configuration section name.</summary>
    public const string Section = "Canopy:Jobs";

    /// <summary>Whether sites' jobs are scheduled and missed ones caught up on start (default true).</summary>
    public bool Enabled { get; set; } = true;
}
