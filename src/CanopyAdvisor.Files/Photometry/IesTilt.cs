namespace CanopyAdvisor.Files.Photometry;

/// <summary>A TILT=INCLUDE block: how the lamp's output varies with the luminaire's tilt (ANSI/IES LM-63-19, TILT section).</summary>
/// <remarks>
/// Kept as read. The factors describe lamps whose output depends on burning position (e.g. metal halide); the reader
/// does not apply them, because the distribution describes the luminaire as photometered.
/// </remarks>
/// <param name="LampToLuminaireGeometry">1 = lamp vertical base up or down, 2 = horizontal lamp tilting along its axis, 3 = horizontal lamp tilting across it.</param>
/// <param name="AnglesDeg">Tilt angles, degrees, increasing.</param>
/// <param name="MultiplyingFactors">Output factor at each angle, ≥ 0.</param>
public sealed record IesTilt(int LampToLuminaireGeometry, IReadOnlyList<double> AnglesDeg, IReadOnlyList<double> MultiplyingFactors);
