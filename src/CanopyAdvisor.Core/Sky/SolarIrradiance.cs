namespace CanopyAdvisor.Core.Sky;

/// <summary>Broadband solar irradiance outside (shortwave, W m⁻²): global and diffuse on the horizontal, direct on the normal.</summary>
/// <remarks>The three are tied by GHI = DNI·cos z + DHI for the zenith angle z they were computed for.</remarks>
/// <param name="GlobalHorizontalWm2">Global horizontal irradiance, GHI.</param>
/// <param name="DirectNormalWm2">Direct (beam) normal irradiance, DNI.</param>
/// <param name="DiffuseHorizontalWm2">Diffuse horizontal irradiance, DHI.</param>
public readonly record struct SolarIrradiance(double GlobalHorizontalWm2, double DirectNormalWm2, double DiffuseHorizontalWm2)
{
    /// <summary>No light.</summary>
    public static SolarIrradiance None => default;
}
