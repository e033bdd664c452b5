using CanopyAdvisor.Core.Geometry;
using NodaTime;

namespace CanopyAdvisor.Core.Sky;

/// <summary>Every output of one NREL SPA evaluation (Reda &amp; Andreas 2004, NREL/TP-560-34302, §3 and appendix A.1).</summary>
/// <remarks>
/// Angles follow the report's conventions: hour angles westward from the meridian; the astronomers' azimuth from
/// south, westward; <see cref="Azimuth"/> from north, clockwise (the site convention). Sunrise, transit and sunset are
/// computed per local date by <see cref="SolarPosition.CalculateSunTimes"/>.
/// </remarks>
public sealed record SolarPositionResult
{
    /// <summary>The instant.</summary>
    public required Instant Time { get; init; }

    /// <summary>Julian day (UT1), JD.</summary>
    public required double JulianDay { get; init; }

    /// <summary>Julian century, JC.</summary>
    public required double JulianCentury { get; init; }

    /// <summary>Julian ephemeris day (TT), JDE.</summary>
    public required double JulianEphemerisDay { get; init; }

    /// <summary>Julian ephemeris century, JCE.</summary>
    public required double JulianEphemerisCentury { get; init; }

    /// <summary>Julian ephemeris millennium, JME.</summary>
    public required double JulianEphemerisMillennium { get; init; }

    /// <summary>Earth heliocentric longitude L, [0, 360°).</summary>
    public required Angle HeliocentricLongitude { get; init; }

    /// <summary>Earth heliocentric latitude B.</summary>
    public required Angle HeliocentricLatitude { get; init; }

    /// <summary>Earth radius vector R, astronomical units.</summary>
    public required double EarthRadiusVectorAu { get; init; }

    /// <summary>Geocentric longitude Θ.</summary>
    public required Angle GeocentricLongitude { get; init; }

    /// <summary>Geocentric latitude β.</summary>
    public required Angle GeocentricLatitude { get; init; }

    /// <summary>Nutation in longitude Δψ.</summary>
    public required Angle NutationInLongitude { get; init; }

    /// <summary>Nutation in obliquity Δε.</summary>
    public required Angle NutationInObliquity { get; init; }

    /// <summary>Mean obliquity of the ecliptic ε0 (the report prints it in arc seconds).</summary>
    public required Angle MeanObliquity { get; init; }

    /// <summary>True obliquity of the ecliptic ε.</summary>
    public required Angle TrueObliquity { get; init; }

    /// <summary>Aberration correction Δτ.</summary>
    public required Angle AberrationCorrection { get; init; }

    /// <summary>Apparent sun longitude λ.</summary>
    public required Angle ApparentSunLongitude { get; init; }

    /// <summary>Mean sidereal time at Greenwich ν0.</summary>
    public required Angle MeanSiderealTime { get; init; }

    /// <summary>Apparent sidereal time at Greenwich ν.</summary>
    public required Angle ApparentSiderealTime { get; init; }

    /// <summary>Geocentric sun right ascension α.</summary>
    public required Angle GeocentricRightAscension { get; init; }

    /// <summary>Geocentric sun declination δ.</summary>
    public required Angle GeocentricDeclination { get; init; }

    /// <summary>Observer local hour angle H, [0, 360°).</summary>
    public required Angle LocalHourAngle { get; init; }

    /// <summary>Equatorial horizontal parallax of the sun ξ.</summary>
    public required Angle EquatorialHorizontalParallax { get; init; }

    /// <summary>Parallax in the sun right ascension Δα.</summary>
    public required Angle ParallaxInRightAscension { get; init; }

    /// <summary>Topocentric sun right ascension α′.</summary>
    public required Angle TopocentricRightAscension { get; init; }

    /// <summary>Topocentric sun declination δ′.</summary>
    public required Angle TopocentricDeclination { get; init; }

    /// <summary>Topocentric local hour angle H′.</summary>
    public required Angle TopocentricLocalHourAngle { get; init; }

    /// <summary>Topocentric elevation angle without refraction, e0.</summary>
    public required Angle ElevationWithoutRefraction { get; init; }

    /// <summary>Atmospheric refraction correction Δe (zero once the sun is well below the horizon).</summary>
    public required Angle RefractionCorrection { get; init; }

    /// <summary>Topocentric elevation angle e, refraction-corrected.</summary>
    public required Angle Elevation { get; init; }

    /// <summary>Topocentric zenith angle θ, refraction-corrected.</summary>
    public required Angle Zenith { get; init; }

    /// <summary>Topocentric zenith angle without refraction, 90° − e0.</summary>
    public required Angle ZenithWithoutRefraction { get; init; }

    /// <summary>Topocentric astronomers' azimuth Γ, from south, westward, [0, 360°).</summary>
    public required Angle AstronomersAzimuth { get; init; }

    /// <summary>Topocentric azimuth Φ, from north, clockwise (eastward), [0, 360°).</summary>
    public required Angle Azimuth { get; init; }

    /// <summary>Incidence angle on the surface given by the input's slope and azimuth rotation.</summary>
    public required Angle IncidenceAngle { get; init; }

    /// <summary>Equation of time E, minutes (apparent minus mean solar time; report appendix A.1).</summary>
    public required double EquationOfTimeMinutes { get; init; }

    /// <summary>Unit vector toward the sun in the site frame (x east, y north, z up), refraction-corrected.</summary>
    public required Vector3 SunDirection { get; init; }
}
