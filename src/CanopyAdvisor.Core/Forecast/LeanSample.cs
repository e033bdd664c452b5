using NodaTime;

namespace CanopyAdvisor.Core.Forecast;

/// <summary>The bench lean at one instant of a forecast's lean track.</summary>
/// <param name="At">When.</param>
/// <param name="Lean">The bench-mean lean there, averaged over the nutation period before it.</param>
public sealed record LeanSample(Instant At, LeanReading Lean);
