namespace CanopyAdvisor.Core.Forecast;

/// <summary>One leggy or leaning risk of a bench, with its cause and the number behind it (GLOSSARY "flag").</summary>
/// <param name="Kind">Leggy or leaning.</param>
/// <param name="Cause">
/// What triggers it, a camelCase word: <c>lowDli</c>, <c>lowPhytochromeState</c> (low R:FR), <c>highDif</c>,
/// <c>heightOverGrade</c> (leggy) or <c>leanOverGrade</c> (leaning).
/// </param>
/// <param name="Value">The bench's value (DLI, PSS, DIF, height at sale, or the lean when it crosses the limit).</param>
/// <param name="Limit">The limit it crosses.</param>
/// <param name="Unit">Unit of value and limit: <c>mol m-2 d-1</c>, <c>1</c>, <c>K</c>, <c>mm</c> or <c>deg</c>.</param>
public sealed record ForecastFlag(ForecastFlagKind Kind, string Cause, double Value, double Limit, string Unit);
