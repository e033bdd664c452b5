namespace CanopyAdvisor.Core.Light;

/// <summary>Settings of the light-field compile step.</summary>
/// <param name="SkyZenithRings">
/// Number of zenith-angle rings of the hemisphere grid used to integrate the sky view of each point (each ring
/// has four times as many azimuth cells). 9 rings (10° by 10° cells, 324 directions) by default; more rings resolve
/// walls and ridges better at a cost proportional to rings² (at most 360).
/// </param>
public sealed record LightFieldOptions(int SkyZenithRings = 9)
{
    /// <summary>The default settings.</summary>
    public static LightFieldOptions Default { get; } = new();
}
