namespace CanopyAdvisor.Core.Plants.Growth;

/// <summary>One active cause of leggy risk with the number behind it and the limit it crossed.</summary>
/// <param name="Kind">Which cause.</param>
/// <param name="Value">The lot's value (DLI, PSS, DIF or height).</param>
/// <param name="Limit">The limit crossed.</param>
/// <param name="Unit">Unit of value and limit: <c>mol m-2 d-1</c>, <c>1</c>, <c>K</c> or <c>mm</c>.</param>
public sealed record LegginessCause(LegginessCauseKind Kind, double Value, double Limit, string Unit);
