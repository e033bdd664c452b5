namespace CanopyAdvisor.Core.Sky;

/// <summary>The result of splitting a global horizontal irradiance into beam and diffuse.</summary>
/// <param name="ClearnessIndex">kt = GHI / (I₀ₙ cos z); zero when the sun is at or below the horizon.</param>
/// <param name="Irradiance">GHI, DNI and DHI, W m⁻².</param>
public readonly record struct DiffuseSplit(double ClearnessIndex, SolarIrradiance Irradiance);
