namespace CanopyAdvisor.Server.Contracts;

/// <summary>The band of a bench's lean at the horizon over the crop parameters' ranges.</summary>
/// <param name="LowDeg">Lowest lean, degrees.</param>
/// <param name="HighDeg">Highest lean, degrees.</param>
/// <param name="Drivers">The parameters behind it, largest swing first.</param>
public sealed record LeanBandView(double LowDeg, double HighDeg, IReadOnlyList<string> Drivers);
