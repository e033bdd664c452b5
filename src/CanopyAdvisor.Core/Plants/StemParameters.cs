using CanopyAdvisor.Core.Geometry;
using NodaTime;

namespace CanopyAdvisor.Core.Plants;

/// <summary>The parameters of the stem-bending model (the AC model family; MODEL.md §4), in model units.</summary>
/// <param name="BalanceNumber">B = β/γ, dimensionless (Bastien et al. 2013, PNAS 110:755).</param>
/// <param name="ProprioceptiveSensitivity">γ, dimensionless; the bending time scale is 1/(ε̇γ) with ε̇ = Ė/L_gz.</param>
/// <param name="PhotoCoefficient">a in M(I) = a·I^b, I the blue flux magnitude in µmol m⁻² s⁻¹ (Bastien, Douady &amp; Moulia 2015).</param>
/// <param name="PhotoExponent">b in M(I) = a·I^b.</param>
/// <param name="GrowthZoneLengthM">Length of the apical growth zone that still bends, m.</param>
/// <param name="NutationPeriod">Period of the endogenous circumnutation.</param>
/// <param name="NutationAmplitude">Amplitude of circumnutation as apex tilt.</param>
/// <param name="NutationSense">+1 counter-clockwise seen from above, −1 clockwise.</param>
/// <param name="GravitropicDelay">Delay τ_g between graviception and the bending response.</param>
public sealed record StemParameters(
    double BalanceNumber,
    double ProprioceptiveSensitivity,
    double PhotoCoefficient,
    double PhotoExponent,
    double GrowthZoneLengthM,
    Duration NutationPeriod,
    Angle NutationAmplitude,
    int NutationSense,
    Duration GravitropicDelay);
