namespace CanopyAdvisor.Server.Jobs;

/// <summary>What a job run did.</summary>
/// <param name="Message">A short account for people.</param>
/// <param name="Output">A JSON document to keep with the run (or null).</param>
internal sealed record JobResult(string Message, string? Output = null);
