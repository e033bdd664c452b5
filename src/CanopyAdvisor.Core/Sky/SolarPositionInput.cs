using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using NodaTime;

namespace CanopyAdvisor.Core.Sky;

/// <summary>Inputs of one NREL SPA evaluation (Reda &amp; Andreas 2004, NREL/TP-560-34302, §3 and Table 1 of the report's code).</summary>
/// <remarks>
/// Defaults: ΔT = <see cref="ModelConstants.DefaultDeltaTSeconds"/> (69 s, from memory, for the 2020s), ΔUT1 = 0,
/// pressure 1010 mbar and temperature 10 °C (the reference conditions of the refraction formula), refraction at
/// sunrise 0.5667°, a horizontal surface. Valid ranges (checked, as in the report): year −2000…6000, pressure 0…5000 mbar,
/// temperature −273…6000 °C, |ΔT| ≤ 8000 s, |ΔUT1| &lt; 1 s, |slope| and |azimuth rotation| ≤ 360°, |refraction| ≤ 5°.
/// </remarks>
/// <param name="Time">The instant.</param>
/// <param name="Location">The observer: latitude, longitude (east positive) and elevation.</param>
public sealed record SolarPositionInput(Instant Time, GeoLocation Location)
{
    /// <summary>ΔT = TT − UT1, seconds.</summary>
    public double DeltaTSeconds { get; init; } = ModelConstants.DefaultDeltaTSeconds;

    /// <summary>ΔUT1 = UT1 − UTC, seconds (|ΔUT1| &lt; 0.9 s by definition; 0 if unknown).</summary>
    public double DeltaUt1Seconds { get; init; }

    /// <summary>Annual mean local pressure, millibars (hPa), for the refraction correction.</summary>
    public double PressureMillibars { get; init; } = ModelConstants.RefractionReferencePressureMillibars;

    /// <summary>Annual mean local temperature, °C, for the refraction correction.</summary>
    public double TemperatureCelsius { get; init; } = ModelConstants.RefractionReferenceTemperatureCelsius;

    /// <summary>Atmospheric refraction at sunrise and sunset (0.5667° by default); below −(sun radius + this) no refraction is applied.</summary>
    public Angle AtmosphericRefractionAtSunrise { get; init; } = Angle.FromDegrees(ModelConstants.RefractionAtSunriseDegrees);

    /// <summary>Slope of the surface for the incidence angle, from the horizontal.</summary>
    public Angle SurfaceSlope { get; init; }

    /// <summary>
    /// Azimuth rotation of the surface for the incidence angle: measured from south to the horizontal projection of
    /// the surface normal, positive westward (the report's convention; a surface facing compass azimuth a has rotation a − 180°).
    /// </summary>
    public Angle SurfaceAzimuthRotation { get; init; }
}
