namespace CanopyAdvisor.Core.Light;

/// <summary>Settings of the light-field compile step.</summary>
/// <param name="SkyZenithBands">
/// Zenith bands of the <see cref="HemisphereQuadrature"/> used to integrate the sky view of each point
/// (<see cref="HemisphereQuadrature.DefaultZenithBands"/> by default; its doc comment gives the accuracy). More bands
/// resolve walls and ridges better at a cost proportional to bands².
/// </param>
public sealed record LightFieldOptions(int SkyZenithBands = HemisphereQuadrature.DefaultZenithBands)
{
    /// <summary>The default settings.</summary>
    public static LightFieldOptions Default { get; } = new();
}
