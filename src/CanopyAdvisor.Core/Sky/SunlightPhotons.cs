using CanopyAdvisor.Core.Geometry;
using NodaTime;

namespace CanopyAdvisor.Core.Sky;

/// <summary>
/// Conversions between sunlight energy, photon flux and illuminance (Thimijan &amp; Heins 1983, "Photometric, radiometric
/// and quantum light units of measure: a review of procedures for interconversion", HortScience 18:818–822).
/// </summary>
/// <remarks>
/// PAR is taken as <see cref="ModelConstants.ParFractionOfGlobal"/> (0.47) of global shortwave irradiance;
/// daylight PAR carries <see cref="ModelConstants.DaylightMicromolesPerJoulePar"/> (4.57 µmol J⁻¹) and
/// <see cref="ModelConstants.DaylightLuxPerMicromolePerSquareMetreSecond"/> (54 lux per µmol m⁻² s⁻¹).
/// These hold for daylight only, not for lamps.
/// </remarks>
public static class SunlightPhotons
{
    /// <summary>PPFD (µmol m⁻² s⁻¹) from global shortwave irradiance (W m⁻²): × 0.47 × 4.57.</summary>
    public static double PpfdFromGlobal(double globalWm2) =>
        globalWm2 * ModelConstants.ParFractionOfGlobal * ModelConstants.DaylightMicromolesPerJoulePar;

    /// <summary>Global shortwave irradiance (W m⁻²) from PPFD (µmol m⁻² s⁻¹): ÷ (0.47 × 4.57).</summary>
    public static double GlobalFromPpfd(double ppfd) =>
        ppfd / (ModelConstants.ParFractionOfGlobal * ModelConstants.DaylightMicromolesPerJoulePar);

    /// <summary>PPFD (µmol m⁻² s⁻¹) from PAR irradiance (W m⁻², 400–700 nm): × 4.57.</summary>
    public static double PpfdFromPar(double parWm2) => parWm2 * ModelConstants.DaylightMicromolesPerJoulePar;

    /// <summary>Illuminance (lux) of daylight from its PPFD (µmol m⁻² s⁻¹): × 54.</summary>
    public static double LuxFromPpfd(double ppfd) => ppfd * ModelConstants.DaylightLuxPerMicromolePerSquareMetreSecond;

    /// <summary>PPFD (µmol m⁻² s⁻¹) of daylight from its illuminance (lux): ÷ 54.</summary>
    public static double PpfdFromLux(double lux) => lux / ModelConstants.DaylightLuxPerMicromolePerSquareMetreSecond;

    /// <summary>Converts a broadband irradiance split to the photon units of <see cref="OutsideLight"/>.</summary>
    public static OutsideLight ToOutsideLight(Instant time, Vector3 sunDirection, SolarIrradiance irradiance) =>
        new(
            time,
            sunDirection,
            PpfdFromGlobal(irradiance.DirectNormalWm2),
            PpfdFromGlobal(irradiance.DiffuseHorizontalWm2),
            PpfdFromGlobal(irradiance.GlobalHorizontalWm2));
}
