namespace CanopyAdvisor.Cli;

/// <summary>One planned turn in <c>canopy plan</c>: a rotation task for the labour calendar, with its window in the
/// site's local time.</summary>
internal sealed record RotationTaskReport(string LotId, string BenchId, int Pots, double AngleDeg, string At, string Earliest, string Latest);
