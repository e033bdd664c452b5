namespace CanopyAdvisor.Core.Plants;

/// <summary>One crop parameter: its value, unit, plausible range and where the value comes from.</summary>
/// <remarks>
/// Crop parameters are rarely published per crop (MODEL.md §7), so every value carries its range (used for the
/// forecast's uncertainty band) and its provenance, e.g. <c>published: Bastien et al. 2013</c>, <c>common practice</c>,
/// <c>estimate (from memory)</c>, <c>calibrated: site, dates, n = 12</c>.
/// </remarks>
/// <param name="Value">The value used by the model, in <paramref name="Unit"/>.</param>
/// <param name="Unit">The unit as written in the crop file ("1" for dimensionless).</param>
/// <param name="Minimum">Lower end of the plausible range (≤ Value).</param>
/// <param name="Maximum">Upper end of the plausible range (≥ Value).</param>
/// <param name="Provenance">Where the value comes from.</param>
public sealed record CropParameter(double Value, string Unit, double Minimum, double Maximum, string Provenance)
{
    /// <summary>This parameter with another value (kept inside its range by the caller), same unit and provenance.</summary>
    public CropParameter WithValue(double value) => this with { Value = value };
}
