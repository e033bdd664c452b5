namespace CanopyAdvisor.Core.Advice.Calibration;

/// <summary>One fitted crop parameter, in the crop file's unit.</summary>
/// <param name="Key">The crop-file key, e.g. <c>photoCoefficient</c>.</param>
/// <param name="Symbol">The model symbol: M, γ or B.</param>
/// <param name="Value">The estimate.</param>
/// <param name="StandardError">Its standard error from σ²(JᵀJ)⁻¹ at the optimum, in the same unit (delta method from the
/// search coordinates); +∞ when the data do not determine it, NaN without degrees of freedom.</param>
/// <param name="PreviousValue">The crop's value before the fit (the starting point).</param>
/// <param name="Minimum">Lower end of the crop's range, the lower bound of the fit.</param>
/// <param name="Maximum">Upper end of the crop's range, the upper bound of the fit.</param>
/// <param name="Unit">The crop-file unit.</param>
/// <param name="AtBound">Whether the estimate stopped at an end of the range.</param>
public sealed record ParameterEstimate(
    string Key, string Symbol, double Value, double StandardError, double PreviousValue, double Minimum, double Maximum,
    string Unit, bool AtBound);
