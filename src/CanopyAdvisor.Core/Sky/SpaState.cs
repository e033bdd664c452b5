namespace CanopyAdvisor.Core.Sky;

/// <summary>
/// Every intermediate quantity of one NREL SPA evaluation (Reda &amp; Andreas 2004, NREL/TP-560-34302, §3),
/// in the report's units: degrees, except where the field name says otherwise.
/// </summary>
/// <remarks>
/// A mutable value type filled step by step by <see cref="SpaAlgorithm"/>, so that one evaluation allocates nothing.
/// Field names follow the report's symbols.
/// </remarks>
internal struct SpaState
{
    /// <summary>Julian day (UT), JD.</summary>
    public double JulianDay;

    /// <summary>Julian century, JC.</summary>
    public double JulianCentury;

    /// <summary>Julian ephemeris day (TT), JDE.</summary>
    public double JulianEphemerisDay;

    /// <summary>Julian ephemeris century, JCE.</summary>
    public double JulianEphemerisCentury;

    /// <summary>Julian ephemeris millennium, JME.</summary>
    public double JulianEphemerisMillennium;

    /// <summary>Heliocentric longitude L.</summary>
    public double L;

    /// <summary>Heliocentric latitude B.</summary>
    public double B;

    /// <summary>Earth radius vector R, AU.</summary>
    public double R;

    /// <summary>Geocentric longitude Θ.</summary>
    public double Theta;

    /// <summary>Geocentric latitude β.</summary>
    public double Beta;

    /// <summary>Mean elongation of the moon from the sun, X0.</summary>
    public double X0;

    /// <summary>Mean anomaly of the sun, X1.</summary>
    public double X1;

    /// <summary>Mean anomaly of the moon, X2.</summary>
    public double X2;

    /// <summary>Moon's argument of latitude, X3.</summary>
    public double X3;

    /// <summary>Longitude of the ascending node of the moon's mean orbit, X4.</summary>
    public double X4;

    /// <summary>Nutation in longitude Δψ.</summary>
    public double DeltaPsi;

    /// <summary>Nutation in obliquity Δε.</summary>
    public double DeltaEpsilon;

    /// <summary>Mean obliquity of the ecliptic ε0, arc seconds.</summary>
    public double Epsilon0ArcSeconds;

    /// <summary>True obliquity of the ecliptic ε.</summary>
    public double Epsilon;

    /// <summary>Aberration correction Δτ.</summary>
    public double DeltaTau;

    /// <summary>Apparent sun longitude λ.</summary>
    public double Lambda;

    /// <summary>Mean sidereal time at Greenwich ν0.</summary>
    public double Nu0;

    /// <summary>Apparent sidereal time at Greenwich ν.</summary>
    public double Nu;

    /// <summary>Geocentric sun right ascension α.</summary>
    public double Alpha;

    /// <summary>Geocentric sun declination δ.</summary>
    public double Delta;

    /// <summary>Observer local hour angle H, [0, 360).</summary>
    public double H;

    /// <summary>Equatorial horizontal parallax of the sun ξ.</summary>
    public double Xi;

    /// <summary>Parallax in the sun right ascension Δα.</summary>
    public double DeltaAlpha;

    /// <summary>Topocentric sun right ascension α′.</summary>
    public double AlphaPrime;

    /// <summary>Topocentric sun declination δ′.</summary>
    public double DeltaPrime;

    /// <summary>Topocentric local hour angle H′.</summary>
    public double HPrime;

    /// <summary>Topocentric elevation angle without refraction e0.</summary>
    public double E0;

    /// <summary>Atmospheric refraction correction Δe.</summary>
    public double DeltaE;

    /// <summary>Topocentric elevation angle e (refraction-corrected).</summary>
    public double E;

    /// <summary>Topocentric zenith angle θ (refraction-corrected).</summary>
    public double Zenith;

    /// <summary>Topocentric astronomers' azimuth Γ (from south, westward).</summary>
    public double AstronomersAzimuth;

    /// <summary>Topocentric azimuth Φ (from north, eastward).</summary>
    public double Azimuth;
}
