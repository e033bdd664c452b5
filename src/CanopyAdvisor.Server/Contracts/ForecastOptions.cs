using CanopyAdvisor.Server.Problems;

namespace CanopyAdvisor.Server.Contracts;

/// <summary>What to forecast: every member is optional, and the body may be left out.</summary>
/// <param name="Now">Forecast start, ISO-8601 with an offset (<c>2026-12-02T09:00:00+01:00</c>); default: the start of
/// the current hour (so repeats within the hour are served from the store).</param>
/// <param name="Days">Horizon in days, more than 0 and at most 366 (default 7).</param>
/// <param name="IncludeBand">Whether to compute the lean band over the crop parameters' ranges (default true; slower).</param>
public sealed record ForecastOptions(string? Now = null, double? Days = null, bool? IncludeBand = null) : IOptionalBody;
