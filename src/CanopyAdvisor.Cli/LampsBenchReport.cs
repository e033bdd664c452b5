namespace CanopyAdvisor.Cli;

/// <summary>One bench in <see cref="LampsReport"/>: before and after the proposed lamps, and its limits
/// (<c>notSet</c>, <c>met</c>, <c>unmetBefore</c>: already unmet and not made worse, <c>unmet</c>).</summary>
internal sealed record LampsBenchReport(
    string BenchId,
    string Crop,
    bool AtRisk,
    LampsBenchStateReport Before,
    LampsBenchStateReport After,
    double? PpfdCeiling,
    string Ceiling,
    string UniformityFloor);
