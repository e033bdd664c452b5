namespace CanopyAdvisor.Cli;

/// <summary>One policy the search simulated, in <c>canopy plan --json</c>.</summary>
internal sealed record RotationCandidateReport(
    string Policy, double? AngleDeg, double? IntervalHours, int Rotations, double PeakLeanDeg, double? LatePeakLeanDeg, double WindowFraction, bool Holds);
