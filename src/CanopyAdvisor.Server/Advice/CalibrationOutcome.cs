using CanopyAdvisor.Core.Advice.Calibration;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Server.Contracts;

namespace CanopyAdvisor.Server.Advice;

/// <summary>A calibration's result, its view and the crop it was calibrated from.</summary>
/// <param name="Result">The fit.</param>
/// <param name="View">Its API view (not yet saved).</param>
/// <param name="BaseCrop">The crop calibrated (the variant's base).</param>
/// <param name="CommentLines">Header lines for the saved variant's crop file.</param>
internal sealed record CalibrationOutcome(CalibrationResult Result, CalibrationView View, Crop BaseCrop, IReadOnlyList<string> CommentLines);
