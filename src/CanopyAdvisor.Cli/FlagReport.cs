namespace CanopyAdvisor.Cli;

/// <summary>A leggy or leaning flag with its cause and the number behind it.</summary>
internal sealed record FlagReport(string Kind, string Cause, double Value, double Limit, string Unit);
