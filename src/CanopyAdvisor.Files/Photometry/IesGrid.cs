namespace CanopyAdvisor.Files.Photometry;

/// <summary>The angle lists and intensity values of an IES LM-63 file, exactly as written (before any multiplier or expansion).</summary>
/// <param name="VerticalAnglesDeg">Vertical angles, degrees.</param>
/// <param name="HorizontalAnglesDeg">Horizontal angles, degrees.</param>
/// <param name="Values">Values per horizontal angle, each listing one value per vertical angle: <c>Values[h][v]</c>.</param>
public sealed record IesGrid(
    IReadOnlyList<double> VerticalAnglesDeg,
    IReadOnlyList<double> HorizontalAnglesDeg,
    IReadOnlyList<IReadOnlyList<double>> Values);
