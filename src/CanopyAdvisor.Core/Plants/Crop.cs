namespace CanopyAdvisor.Core.Plants;

/// <summary>An entry of the crop library: the parameters of the lean and stretch model for one crop or variant.</summary>
/// <remarks>
/// Symbols follow MODEL.md §4–5 (the AC model of Bastien et al. 2013, 2015; cardinal temperatures of Yan &amp; Hunt
/// 1999). Every parameter carries its unit, range and provenance (<see cref="CropParameter"/>). The photograviceptive
/// ratio is a power law of the blue flux magnitude I (µmol m⁻² s⁻¹): M(I) = <see cref="PhotoCoefficient"/> ·
/// I^<see cref="PhotoExponent"/>.
/// </remarks>
/// <param name="Id">File name without extension, e.g. <c>petunia</c>, or <c>petunia-compact</c> for a variant of it.</param>
/// <param name="Name">Display name.</param>
/// <param name="Group">Trade group.</param>
/// <param name="BaseId">The crop a variant overrides, or null for a base crop.</param>
/// <param name="BalanceNumber">B = β/γ, dimensionless; organs with B &gt; 2.8 overshoot the vertical (Bastien et al. 2018).</param>
/// <param name="ProprioceptiveSensitivity">γ, dimensionless; sets the bending time scale 1/(ε̇γ).</param>
/// <param name="PhotoCoefficient">Coefficient a of M(I) = a·I^b, per (µmol m⁻² s⁻¹)^b.</param>
/// <param name="PhotoExponent">Exponent b of M(I) = a·I^b, dimensionless.</param>
/// <param name="GrowthZoneLengthMm">Length of the apical growth zone that still bends, mm.</param>
/// <param name="ReferenceElongationMmPerDay">Stem elongation at the optimum temperature, mm d⁻¹.</param>
/// <param name="BaseTemperatureC">Cardinal base temperature (no growth at or below), °C.</param>
/// <param name="OptimumTemperatureC">Cardinal optimum temperature, °C.</param>
/// <param name="MaximumTemperatureC">Cardinal maximum temperature (no growth at or above), °C.</param>
/// <param name="DifSensitivityPerKelvin">Relative change of elongation per °C of DIF (day minus night mean), K⁻¹.</param>
/// <param name="ShadeAvoidanceSensitivity">Relative increase of elongation per unit drop of PSS below full sun's, dimensionless.</param>
/// <param name="DliMinimum">DLI below which plants stretch and finish slowly, mol m⁻² d⁻¹.</param>
/// <param name="DliTarget">DLI for good quality, mol m⁻² d⁻¹.</param>
/// <param name="LowLightStretchPerMole">Relative increase of elongation per mol m⁻² d⁻¹ of DLI below the minimum, (mol m⁻² d⁻¹)⁻¹.</param>
/// <param name="NutationPeriodHours">Circumnutation period, h.</param>
/// <param name="NutationAmplitudeDeg">Circumnutation amplitude as apex tilt, degrees.</param>
/// <param name="NutationSense">+1 counter-clockwise seen from above, −1 clockwise.</param>
/// <param name="GravitropicDelayHours">Delay τ between graviception and bending response, h.</param>
/// <param name="LeafAreaDensityM2PerM3">Leaf area density of the canopy at spacing reference, m² m⁻³.</param>
/// <param name="LeanGradeLimitDeg">Largest lean that still sells at grade, degrees.</param>
/// <param name="HeightGradeLimitMm">Largest height that still sells at grade, mm.</param>
public sealed record Crop(
    string Id,
    string Name,
    CropGroup Group,
    string? BaseId,
    CropParameter BalanceNumber,
    CropParameter ProprioceptiveSensitivity,
    CropParameter PhotoCoefficient,
    CropParameter PhotoExponent,
    CropParameter GrowthZoneLengthMm,
    CropParameter ReferenceElongationMmPerDay,
    CropParameter BaseTemperatureC,
    CropParameter OptimumTemperatureC,
    CropParameter MaximumTemperatureC,
    CropParameter DifSensitivityPerKelvin,
    CropParameter ShadeAvoidanceSensitivity,
    CropParameter DliMinimum,
    CropParameter DliTarget,
    CropParameter LowLightStretchPerMole,
    CropParameter NutationPeriodHours,
    CropParameter NutationAmplitudeDeg,
    CropParameter NutationSense,
    CropParameter GravitropicDelayHours,
    CropParameter LeafAreaDensityM2PerM3,
    CropParameter LeanGradeLimitDeg,
    CropParameter HeightGradeLimitMm);
