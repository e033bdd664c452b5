namespace CanopyAdvisor.Server.Contracts;

/// <summary>One crop parameter with unit, plausible range and provenance.</summary>
/// <param name="Value">The value the model uses.</param>
/// <param name="Unit">Its unit ("1" for dimensionless).</param>
/// <param name="Minimum">Lower end of the plausible range.</param>
/// <param name="Maximum">Upper end of the plausible range.</param>
/// <param name="Provenance">Where the value comes from.</param>
public sealed record CropParameterView(double Value, string Unit, double Minimum, double Maximum, string Provenance);
