namespace CanopyAdvisor.Server.Contracts;

/// <summary>One fitted parameter.</summary>
/// <param name="Key">The crop-file key.</param>
/// <param name="Symbol">Its symbol (M, γ, B).</param>
/// <param name="Value">The estimate (4 significant digits).</param>
/// <param name="StandardError">Its standard error, or null when it cannot be estimated.</param>
/// <param name="PreviousValue">The value it replaces.</param>
/// <param name="Minimum">The crop's range, low end.</param>
/// <param name="Maximum">The crop's range, high end.</param>
/// <param name="Unit">The crop-file unit.</param>
/// <param name="AtBound">Whether the estimate stopped at an end of the range.</param>
public sealed record CalibrationEstimateView(string Key, string Symbol, double Value, double? StandardError, double PreviousValue, double Minimum, double Maximum, string Unit, bool AtBound);
