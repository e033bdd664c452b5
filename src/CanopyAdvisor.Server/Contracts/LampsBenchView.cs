namespace CanopyAdvisor.Server.Contracts;

/// <summary>A bench before and after the proposed lamps.</summary>
/// <param name="BenchId">The bench.</param>
/// <param name="CropId">Its lot's crop.</param>
/// <param name="AtRisk">Whether the lamps are for it.</param>
/// <param name="Before">Without the lamps.</param>
/// <param name="After">With the lamps.</param>
/// <param name="PpfdCeiling">The brief's PPFD ceiling for it, or null.</param>
/// <param name="Ceiling"><c>met</c>, <c>unmet</c>, <c>unmetBefore</c> or <c>notSet</c>.</param>
/// <param name="UniformityFloor"><c>met</c>, <c>unmet</c>, <c>unmetBefore</c> or <c>notSet</c>.</param>
public sealed record LampsBenchView(string BenchId, string CropId, bool AtRisk, LampsBenchStateView Before, LampsBenchStateView After, double? PpfdCeiling, string Ceiling, string UniformityFloor);
