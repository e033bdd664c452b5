namespace CanopyAdvisor.Cli;

/// <summary>The uncertainty band of the lean at the horizon, and the crop parameters that drive it (largest swing first).</summary>
internal sealed record LeanBandReport(double LowDeg, double HighDeg, IReadOnlyList<string> DrivenBy);
