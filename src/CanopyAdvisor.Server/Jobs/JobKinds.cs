namespace CanopyAdvisor.Server.Jobs;

/// <summary>The scheduled jobs' names, as stored in the job history and shown by the API.</summary>
internal static class JobKinds
{
    /// <summary>The nightly recompute of the site's bench forecast.</summary>
    public const string NightlyForecast = "nightly-forecast";

    /// <summary>The weekly outlook.</summary>
    public const string WeeklyOutlook = "weekly-outlook";

    /// <summary>The day's rotation task list, at the start of working hours.</summary>
    public const string TaskList = "task-list";

    /// <summary>How a run ended: it did its work.</summary>
    public const string Succeeded = "succeeded";

    /// <summary>How a run ended: it could not do its work (the message says why).</summary>
    public const string Failed = "failed";
}
