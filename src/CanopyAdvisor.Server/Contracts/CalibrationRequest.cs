using CanopyAdvisor.Server.Problems;

namespace CanopyAdvisor.Server.Contracts;

/// <summary>What to calibrate from the site's stored observations: every member optional, and the body may be left out.</summary>
/// <param name="Crop">The crop to calibrate (default: the one crop of the observed benches).</param>
/// <param name="Parameters">Parameters to fit: <c>M</c>, <c>gamma</c>, <c>B</c> (or their crop-file keys); default M and gamma.</param>
/// <param name="Now">Now, ISO-8601 with an offset, at or after the last observation (default: the last observation, or
/// noon of the observed lots' height measurement if later).</param>
/// <param name="MaxIterations">Most iterations of the fit, 1 to 100 (default 25).</param>
/// <param name="Save">Save the calibrated variant to the organisation's crops when the data identify it (growers, admins).</param>
/// <param name="VariantId">The saved variant's crop id (lower-case letters and digits joined by hyphens); default chosen by the fit.</param>
public sealed record CalibrationRequest(
    string? Crop = null,
    IReadOnlyList<string>? Parameters = null,
    string? Now = null,
    int? MaxIterations = null,
    bool? Save = null,
    string? VariantId = null) : IOptionalBody;
