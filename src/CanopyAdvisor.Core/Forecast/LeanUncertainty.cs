using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Forecast;

/// <summary>The band of a bench's lean at the horizon over the crop parameters' ranges (MODEL.md §7).</summary>
/// <remarks>
/// One parameter at a time is set to the minimum and to the maximum of its range, the others at their values
/// (a one-at-a-time sensitivity band, not a joint confidence interval: parameters that act together can give a wider
/// spread). See <see cref="BenchForecaster"/> for how the reruns are done.
/// </remarks>
/// <param name="Low">Lowest lean at the horizon over the reruns (and the forecast itself).</param>
/// <param name="High">Highest lean at the horizon over the reruns (and the forecast itself).</param>
/// <param name="Drivers">The parameters rerun, largest swing first (ties in the order of the request's keys).</param>
public sealed record LeanUncertainty(Angle Low, Angle High, ImmutableArray<ParameterSwing> Drivers);
