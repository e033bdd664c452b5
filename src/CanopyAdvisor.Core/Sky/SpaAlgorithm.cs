using CanopyAdvisor.Core.Geometry;

namespace CanopyAdvisor.Core.Sky;

/// <summary>
/// The steps of the NREL Solar Position Algorithm (Reda &amp; Andreas 2004, NREL/TP-560-34302, revised 2008), §3.1–3.15,
/// numbered as in the report. Uncertainty ±0.0003° for the years −2000 to 6000.
/// </summary>
/// <remarks>
/// Angles are in degrees here, unlike the rest of Core, so that each line can be checked against the report's
/// equations and its worked example (equation and section numbers are cited from memory of the report's layout);
/// the public façade <see cref="SolarPosition"/> converts to <see cref="Geometry.Angle"/>.
/// </remarks>
internal static class SpaAlgorithm
{
    private const double J2000 = 2451545.0;
    private const double UnixEpochJulianDay = 2440587.5;
    private const double SecondsPerDay = ModelConstants.SecondsPerDay;
    private const double DegreesToRadians = Angle.RadiansPerDegree;
    private const double RadiansToDegrees = Angle.DegreesPerRadian;

    /// <summary>Julian day of an instant given as seconds since 1970-01-01T00:00Z (UTC) plus ΔUT1 (report eq. 4).</summary>
    /// <remarks>
    /// Counting days from the Unix epoch is the report's calendar formula (eq. 4) for Gregorian dates, without
    /// rounding the date to day and fraction first.
    /// </remarks>
    internal static double JulianDay(double unixSeconds, double deltaUt1Seconds) =>
        UnixEpochJulianDay + ((unixSeconds + deltaUt1Seconds) / SecondsPerDay);

    /// <summary>Steps 3.1–3.8: time scales, heliocentric and geocentric position, nutation, aberration, sidereal time, α and δ.</summary>
    internal static void Geocentric(double julianDay, double deltaTSeconds, ref SpaState s)
    {
        // 3.1 Julian day, ephemeris day, centuries and millennium (eq. 4–8).
        s.JulianDay = julianDay;
        s.JulianEphemerisDay = julianDay + (deltaTSeconds / SecondsPerDay);
        s.JulianCentury = (julianDay - J2000) / 36525.0;
        s.JulianEphemerisCentury = (s.JulianEphemerisDay - J2000) / 36525.0;
        s.JulianEphemerisMillennium = s.JulianEphemerisCentury / 10.0;
        double jme = s.JulianEphemerisMillennium;
        double jce = s.JulianEphemerisCentury;
        double jc = s.JulianCentury;

        // 3.2 Earth heliocentric longitude, latitude and radius vector (eq. 9–12).
        s.L = LimitDegrees(EarthValue(EarthPeriodicTerms.Longitude, jme) * RadiansToDegrees);
        s.B = EarthValue(EarthPeriodicTerms.Latitude, jme) * RadiansToDegrees;
        s.R = EarthValue(EarthPeriodicTerms.Radius, jme);

        // 3.3 Geocentric longitude and latitude (eq. 13–14).
        s.Theta = LimitDegrees(s.L + 180.0);
        s.Beta = -s.B;

        // 3.4 Nutation in longitude and obliquity (eq. 15–23).
        s.X0 = Polynomial3(jce, 297.85036, 445267.111480, -0.0019142, 1.0 / 189474.0);
        s.X1 = Polynomial3(jce, 357.52772, 35999.050340, -0.0001603, -1.0 / 300000.0);
        s.X2 = Polynomial3(jce, 134.96298, 477198.867398, 0.0086972, 1.0 / 56250.0);
        s.X3 = Polynomial3(jce, 93.27191, 483202.017538, -0.0036825, 1.0 / 327270.0);
        s.X4 = Polynomial3(jce, 125.04452, -1934.136261, 0.0020708, 1.0 / 450000.0);
        double sumPsi = 0, sumEpsilon = 0;
        sbyte[] y = NutationTerms.Multipliers;
        double[] c = NutationTerms.Coefficients;
        for (int i = 0; i < NutationTerms.Count; i++)
        {
            int k = 5 * i;
            double argument = ((s.X0 * y[k]) + (s.X1 * y[k + 1]) + (s.X2 * y[k + 2]) + (s.X3 * y[k + 3]) + (s.X4 * y[k + 4]))
                * DegreesToRadians;
            int m = 4 * i;
            sumPsi += (c[m] + (c[m + 1] * jce)) * Math.Sin(argument);
            sumEpsilon += (c[m + 2] + (c[m + 3] * jce)) * Math.Cos(argument);
        }

        s.DeltaPsi = sumPsi / 36000000.0;
        s.DeltaEpsilon = sumEpsilon / 36000000.0;

        // 3.5 True obliquity of the ecliptic (eq. 24–25).
        double u = jme / 10.0;
        s.Epsilon0ArcSeconds = Horner(MeanObliquityCoefficients, u);
        s.Epsilon = (s.Epsilon0ArcSeconds / 3600.0) + s.DeltaEpsilon;

        // 3.6 Aberration correction (eq. 26); 3.7 apparent sun longitude (eq. 27).
        s.DeltaTau = -20.4898 / (3600.0 * s.R);
        s.Lambda = s.Theta + s.DeltaPsi + s.DeltaTau;

        // 3.8 Apparent sidereal time at Greenwich (eq. 28–29).
        s.Nu0 = LimitDegrees(280.46061837 + (360.98564736629 * (julianDay - J2000)) + (0.000387933 * jc * jc)
            - (jc * jc * jc / 38710000.0));
        double epsilonRad = s.Epsilon * DegreesToRadians;
        s.Nu = s.Nu0 + (s.DeltaPsi * Math.Cos(epsilonRad));

        // 3.9 Geocentric sun right ascension (eq. 30); 3.10 declination (eq. 31).
        double lambdaRad = s.Lambda * DegreesToRadians;
        double betaRad = s.Beta * DegreesToRadians;
        s.Alpha = LimitDegrees(Math.Atan2(
            (Math.Sin(lambdaRad) * Math.Cos(epsilonRad)) - (Math.Tan(betaRad) * Math.Sin(epsilonRad)),
            Math.Cos(lambdaRad)) * RadiansToDegrees);
        s.Delta = Math.Asin((Math.Sin(betaRad) * Math.Cos(epsilonRad))
            + (Math.Cos(betaRad) * Math.Sin(epsilonRad) * Math.Sin(lambdaRad))) * RadiansToDegrees;
    }

    /// <summary>Steps 3.11–3.14: hour angle, parallax, topocentric position, refraction, zenith and azimuth.</summary>
    /// <param name="s">State after <see cref="Geocentric"/>.</param>
    /// <param name="latitudeDeg">Observer latitude, degrees north.</param>
    /// <param name="longitudeDeg">Observer longitude, degrees east.</param>
    /// <param name="elevationM">Observer elevation, metres.</param>
    /// <param name="pressureMillibars">Annual mean local pressure, mbar.</param>
    /// <param name="temperatureCelsius">Annual mean local temperature, °C.</param>
    /// <param name="refractionAtSunriseDeg">Atmospheric refraction at sunrise and sunset, degrees.</param>
    internal static void Topocentric(
        ref SpaState s,
        double latitudeDeg,
        double longitudeDeg,
        double elevationM,
        double pressureMillibars,
        double temperatureCelsius,
        double refractionAtSunriseDeg)
    {
        // 3.11 Observer local hour angle (eq. 32).
        s.H = LimitDegrees(s.Nu + longitudeDeg - s.Alpha);
        double hRad = s.H * DegreesToRadians;

        // 3.12 Topocentric sun right ascension and declination (eq. 33–38).
        s.Xi = 8.794 / (3600.0 * s.R);
        double xiRad = s.Xi * DegreesToRadians;
        double latRad = latitudeDeg * DegreesToRadians;
        double uTerm = Math.Atan(ModelConstants.EarthPolarToEquatorialRadius * Math.Tan(latRad));
        double heightRatio = elevationM / ModelConstants.EarthEquatorialRadiusM;
        double x = Math.Cos(uTerm) + (heightRatio * Math.Cos(latRad));
        double y = (ModelConstants.EarthPolarToEquatorialRadius * Math.Sin(uTerm)) + (heightRatio * Math.Sin(latRad));
        double deltaRad = s.Delta * DegreesToRadians;
        double denominator = Math.Cos(deltaRad) - (x * Math.Sin(xiRad) * Math.Cos(hRad));
        double deltaAlphaRad = Math.Atan2(-x * Math.Sin(xiRad) * Math.Sin(hRad), denominator);
        s.DeltaAlpha = deltaAlphaRad * RadiansToDegrees;
        s.AlphaPrime = s.Alpha + s.DeltaAlpha;
        double deltaPrimeRad = Math.Atan2(
            (Math.Sin(deltaRad) - (y * Math.Sin(xiRad))) * Math.Cos(deltaAlphaRad),
            denominator);
        s.DeltaPrime = deltaPrimeRad * RadiansToDegrees;

        // 3.13 Topocentric local hour angle (eq. 39).
        s.HPrime = s.H - s.DeltaAlpha;
        double hPrimeRad = s.HPrime * DegreesToRadians;

        // 3.14 Topocentric zenith angle with refraction (eq. 40–44).
        s.E0 = Math.Asin((Math.Sin(latRad) * Math.Sin(deltaPrimeRad))
            + (Math.Cos(latRad) * Math.Cos(deltaPrimeRad) * Math.Cos(hPrimeRad))) * RadiansToDegrees;
        s.DeltaE = RefractionCorrection(s.E0, pressureMillibars, temperatureCelsius, refractionAtSunriseDeg);
        s.E = s.E0 + s.DeltaE;
        s.Zenith = 90.0 - s.E;

        // 3.15 Topocentric azimuth angle (eq. 45–46).
        s.AstronomersAzimuth = LimitDegrees(Math.Atan2(
            Math.Sin(hPrimeRad),
            (Math.Cos(hPrimeRad) * Math.Sin(latRad)) - (Math.Tan(deltaPrimeRad) * Math.Cos(latRad))) * RadiansToDegrees);
        s.Azimuth = LimitDegrees(s.AstronomersAzimuth + 180.0);
    }

    /// <summary>
    /// Atmospheric refraction correction Δe (report eq. 42; Bennett's formula scaled by pressure and temperature),
    /// applied only while the sun's upper limb is above the refracted horizon, e0 ≥ −(sun radius + refraction at sunrise).
    /// </summary>
    internal static double RefractionCorrection(double e0, double pressureMillibars, double temperatureCelsius, double refractionAtSunriseDeg)
    {
        if (e0 < -(ModelConstants.SunRadiusDegrees + refractionAtSunriseDeg))
        {
            return 0.0;
        }

        return (pressureMillibars / ModelConstants.RefractionReferencePressureMillibars)
            * (283.0 / (273.0 + temperatureCelsius))
            * 1.02 / (60.0 * Math.Tan((e0 + (10.3 / (e0 + 5.11))) * DegreesToRadians));
    }

    /// <summary>Step 3.16: incidence angle on a surface of the given slope and azimuth rotation (eq. 47), degrees.</summary>
    /// <param name="s">State after <see cref="Topocentric"/>.</param>
    /// <param name="slopeDeg">Surface slope from the horizontal, degrees.</param>
    /// <param name="azimuthRotationDeg">Surface azimuth rotation, measured from south to the projection of the surface normal, positive westward (report's convention).</param>
    internal static double IncidenceAngle(in SpaState s, double slopeDeg, double azimuthRotationDeg)
    {
        double zenithRad = s.Zenith * DegreesToRadians;
        double slopeRad = slopeDeg * DegreesToRadians;
        double cosIncidence = (Math.Cos(zenithRad) * Math.Cos(slopeRad))
            + (Math.Sin(slopeRad) * Math.Sin(zenithRad) * Math.Cos((s.AstronomersAzimuth - azimuthRotationDeg) * DegreesToRadians));
        return Math.Acos(Math.Clamp(cosIncidence, -1.0, 1.0)) * RadiansToDegrees;
    }

    /// <summary>Equation of time E in minutes (report appendix A.1, eq. A1–A4): apparent minus mean solar time.</summary>
    internal static double EquationOfTimeMinutes(in SpaState s)
    {
        double jme = s.JulianEphemerisMillennium;
        double m = LimitDegrees(280.4664567 + (jme * (360007.6982779 + (jme * (0.03032028 + (jme * ((1.0 / 49931.0)
            + (jme * ((-1.0 / 15300.0) + (jme * (-1.0 / 2000000.0)))))))))));
        double e = 4.0 * (m - 0.0057183 - s.Alpha + (s.DeltaPsi * Math.Cos(s.Epsilon * DegreesToRadians)));
        return e switch
        {
            < -20.0 => e + 1440.0,
            > 20.0 => e - 1440.0,
            _ => e,
        };
    }

    /// <summary>An angle in degrees wrapped into [0, 360).</summary>
    internal static double LimitDegrees(double degrees)
    {
        double limited = degrees % 360.0;
        return limited < 0 ? limited + 360.0 : limited;
    }

    /// <summary>An angle in degrees wrapped into [−180, 180].</summary>
    internal static double LimitDegrees180PlusMinus(double degrees)
    {
        double limited = LimitDegrees(degrees);
        return limited > 180.0 ? limited - 360.0 : limited;
    }

    /// <summary>The fractional part of a day fraction, in [0, 1).</summary>
    internal static double LimitZeroToOne(double value)
    {
        double limited = value - Math.Floor(value);
        return limited >= 1.0 ? 0.0 : limited;
    }

    // ε0 = 84381.448 − 4680.93 U − 1.55 U² + 1999.25 U³ − … + 2.45 U¹⁰, arc seconds (eq. 24).
    private static readonly double[] MeanObliquityCoefficients =
        [84381.448, -4680.93, -1.55, 1999.25, -51.38, -249.67, -39.05, 7.12, 27.87, 5.79, 2.45];

    private static double Horner(double[] coefficients, double t)
    {
        double value = 0;
        for (int i = coefficients.Length - 1; i >= 0; i--)
        {
            value = (value * t) + coefficients[i];
        }

        return value;
    }

    private static double Polynomial3(double t, double a0, double a1, double a2, double a3) =>
        a0 + (t * (a1 + (t * (a2 + (t * a3)))));

    // Σ over series i of (Σ A cos(B + C·JME)) · JME^i, divided by 10⁸ (report eq. 9–10).
    private static double EarthValue(double[][] series, double jme)
    {
        double total = 0;
        double power = 1;
        for (int i = 0; i < series.Length; i++)
        {
            double[] terms = series[i];
            double sum = 0;
            for (int k = 0; k < terms.Length; k += 3)
            {
                sum += terms[k] * Math.Cos(terms[k + 1] + (terms[k + 2] * jme));
            }

            total += sum * power;
            power *= jme;
        }

        return total / 1e8;
    }
}
