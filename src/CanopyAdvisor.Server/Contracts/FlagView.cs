namespace CanopyAdvisor.Server.Contracts;

/// <summary>A leggy or leaning flag of a bench.</summary>
/// <param name="Kind"><c>leggy</c> or <c>leaning</c>.</param>
/// <param name="Cause">What triggers it (<c>lowDli</c>, <c>leanOverGrade</c>, …).</param>
/// <param name="Value">The bench's value.</param>
/// <param name="Limit">The limit it crosses.</param>
/// <param name="Unit">Unit of value and limit.</param>
public sealed record FlagView(string Kind, string Cause, double Value, double Limit, string Unit);
