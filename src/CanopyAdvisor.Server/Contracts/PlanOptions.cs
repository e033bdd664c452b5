using CanopyAdvisor.Server.Problems;

namespace CanopyAdvisor.Server.Contracts;

/// <summary>What to plan: every member optional, and the body may be left out.</summary>
/// <param name="Now">Plan start, ISO-8601 with an offset; default the start of the current hour.</param>
/// <param name="MarginPercent">Keep the lean this many percent under the crop's grade limit, in [0, 100); default 20 (an estimate).</param>
public sealed record PlanOptions(string? Now = null, double? MarginPercent = null) : IOptionalBody;
