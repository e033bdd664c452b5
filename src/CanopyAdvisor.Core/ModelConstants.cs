namespace CanopyAdvisor.Core;

/// <summary>Every physical and conventional constant of the model, in one place, each with value, unit and source.</summary>
/// <remarks>Add a constant here rather than writing a number twice. Values marked "from memory" were not verified.</remarks>
public static class ModelConstants
{
    /// <summary>Solar constant, 1367 W m⁻²: the value used by Ineichen &amp; Perez (2002) and by Duffie &amp; Beckman (WRC 1981 value).</summary>
    public const double SolarConstantWattsPerSquareMetre = 1367.0;

    /// <summary>Photon content of daylight PAR, 4.57 µmol J⁻¹ (Thimijan &amp; Heins 1983, HortScience 18:818, table for sunlight).</summary>
    public const double DaylightMicromolesPerJoulePar = 4.57;

    /// <summary>Illuminance of daylight per unit PPFD, 54 lux per µmol m⁻² s⁻¹ (Thimijan &amp; Heins 1983).</summary>
    public const double DaylightLuxPerMicromolePerSquareMetreSecond = 54.0;

    /// <summary>
    /// Fraction of global shortwave irradiance that is PAR (400–700 nm), 0.47 (measured ratios of 0.454 and 0.473
    /// are published, MODEL.md §1.4; 0.47 is a rounded mid value, common practice).
    /// </summary>
    public const double ParFractionOfGlobal = 0.47;

    /// <summary>R:FR of direct sunlight, 1.14 (Smith 1982 definition; common practice quote for direct sun).</summary>
    public const double SunlightRedToFarRed = 1.14;

    /// <summary>Millimetres per metre.</summary>
    public const double MillimetresPerMetre = 1000.0;

    /// <summary>Seconds per hour.</summary>
    public const double SecondsPerHour = 3600.0;

    /// <summary>Seconds per day of 24 hours (86 400; a Julian day, Reda &amp; Andreas 2004).</summary>
    public const double SecondsPerDay = 86400.0;

    /// <summary>
    /// Default hand time to turn one pot on a bench, 3 s (estimate, from memory: a worker turning small pots in place
    /// manages roughly 1,000–1,500 pots an hour; unverified). Sites set their own in the site file's <c>labour</c> section.
    /// </summary>
    public const double DefaultSecondsPerPot = 3.0;

    /// <summary>
    /// Default set-up time per bench rotation task, 10 min (estimate, from memory: walking to the bench, opening the aisle of
    /// rolling benches and closing it again; unverified). Sites set their own in the site file's <c>labour</c> section.
    /// </summary>
    public const double DefaultSetUpMinutesPerBench = 10.0;

    /// <summary>Micromoles per mole.</summary>
    public const double MicromolesPerMole = 1e6;

    /// <summary>Watt-hours per kilowatt-hour, 1000 (SI: 1 kWh = 1000 W for 1 h = 3.6 MJ).</summary>
    public const double WattHoursPerKilowattHour = 1000.0;

    /// <summary>G-function of a spherical leaf-angle distribution, 0.5 (Ross 1981; Monsi &amp; Saeki 1953 extinction).</summary>
    public const double SphericalLeafProjection = 0.5;

    /// <summary>
    /// Fraction of the axial intensity that defines a beam's edge, 0.5: the beam angle is the full angle between the
    /// two directions where intensity falls to 50 % of the maximum (IES definition, common practice for lamp data sheets).
    /// </summary>
    public const double BeamAngleIntensityFraction = 0.5;

    /// <summary>Metres per international foot, 0.3048 exactly (international yard and pound agreement, 1959).</summary>
    public const double MetresPerFoot = 0.3048;

    /// <summary>
    /// Default ΔT = TT − UT1 for the 2020s, 69 s (from memory: IERS values were about 69.2 s in 2020–2024;
    /// unverified here). Used when the caller gives no ΔT; 1 s of ΔT moves the sun by about 0.004°.
    /// </summary>
    public const double DefaultDeltaTSeconds = 69.0;

    /// <summary>
    /// Atmospheric refraction at sunrise and sunset, 0.5667° (Reda &amp; Andreas 2004, NREL/TP-560-34302, the SPA default;
    /// the conventional 34′).
    /// </summary>
    public const double RefractionAtSunriseDegrees = 0.5667;

    /// <summary>Apparent angular radius of the sun, 0.26667° (Reda &amp; Andreas 2004, NREL/TP-560-34302, §3.14 and appendix A.2).</summary>
    public const double SunRadiusDegrees = 0.26667;

    /// <summary>
    /// Reference pressure of the SPA refraction formula, 1010 mbar (Reda &amp; Andreas 2004, §3.14, after Bennett 1982);
    /// used as the "standard atmosphere" when no local pressure is given.
    /// </summary>
    public const double RefractionReferencePressureMillibars = 1010.0;

    /// <summary>
    /// Reference temperature of the SPA refraction formula, 10 °C (Reda &amp; Andreas 2004, §3.14: the factor 283/(273 + T));
    /// used as the "standard atmosphere" when no local temperature is given.
    /// </summary>
    public const double RefractionReferenceTemperatureCelsius = 10.0;

    /// <summary>Equatorial radius of the Earth, 6 378 140 m (Reda &amp; Andreas 2004, §3.12, IAU 1976 value).</summary>
    public const double EarthEquatorialRadiusM = 6378140.0;

    /// <summary>Ratio of the Earth's polar to equatorial radius, 0.99664719 (Reda &amp; Andreas 2004, §3.12).</summary>
    public const double EarthPolarToEquatorialRadius = 0.99664719;

    /// <summary>Standard sea-level pressure, 101 325 Pa (ISO 2533 standard atmosphere); scales air mass with site pressure.</summary>
    public const double StandardPressurePascals = 101325.0;

    /// <summary>
    /// Blue (400–500 nm) share of daylight PAR photons, 0.29 (from memory: typical clear-day daylight spectra;
    /// not verified). With <see cref="DaylightGreenFraction"/> and <see cref="DaylightRedFraction"/> it sums to 1.
    /// </summary>
    public const double DaylightBlueFraction = 0.29;

    /// <summary>Green (500–600 nm) share of daylight PAR photons, 0.36 (from memory; not verified).</summary>
    public const double DaylightGreenFraction = 0.36;

    /// <summary>Red (600–700 nm) share of daylight PAR photons, 0.35 (from memory; not verified).</summary>
    public const double DaylightRedFraction = 0.35;

    /// <summary>Width of the red band, 100 nm (600–700 nm, MODEL.md §0 band definition).</summary>
    public const double RedBandWidthNm = 100.0;

    /// <summary>Width of the far-red band, 50 nm (700–750 nm, MODEL.md §0 band definition).</summary>
    public const double FarRedBandWidthNm = 50.0;

    /// <summary>Width of each R:FR window, 10 nm (655–665 nm and 725–735 nm; Smith 1982 definition of R:FR).</summary>
    public const double RedToFarRedWindowNm = 10.0;

    /// <summary>
    /// Relative photoconversion cross-section of Pr at 660 nm, 1.00 (normalising value; the four phytochrome
    /// cross-sections are ratios rounded from memory after Mancinelli 1994, in Kendrick &amp; Kronenberg, Photomorphogenesis
    /// in Plants, 2nd ed., pp. 211–269; not verified against the table).
    /// </summary>
    public const double PhytochromeSigmaRedAt660 = 1.00;

    /// <summary>Relative photoconversion cross-section of Pfr at 660 nm, 0.13 (from memory after Mancinelli 1994; gives PSS 0.885 under pure 660 nm).</summary>
    public const double PhytochromeSigmaFarRedAt660 = 0.13;

    /// <summary>Relative photoconversion cross-section of Pr at 730 nm, 0.01 (from memory after Mancinelli 1994).</summary>
    public const double PhytochromeSigmaRedAt730 = 0.01;

    /// <summary>Relative photoconversion cross-section of Pfr at 730 nm, 0.40 (from memory after Mancinelli 1994; gives PSS 0.024 under pure 730 nm).</summary>
    public const double PhytochromeSigmaFarRedAt730 = 0.40;

    /// <summary>
    /// Smallest DIF elongation factor, 0.2: the linear DIF response 1 + s·DIF is clamped here so that a large negative DIF
    /// slows but never stops or reverses elongation (a choice of this project; Erwin, Heins &amp; Karlsson 1989 measured
    /// DIF only over about −12…+12 K).
    /// </summary>
    public const double DifFactorFloor = 0.2;

    /// <summary>
    /// PSS below which shade avoidance counts as a leggy cause, 0.55 (a choice of this project: about 0.13 below the
    /// two-window PSS of direct sunlight, where canopy shade begins; see PhytochromeState).
    /// </summary>
    public const double LegginessPhytochromeStateLimit = 0.55;

    /// <summary>DIF above which positive DIF counts as a leggy cause, +2 K (a choice of this project; common practice aims at DIF ≤ 0 for height control).</summary>
    public const double LegginessDifLimitKelvin = 2.0;

    /// <summary>
    /// Lowest accepted air temperature from files and setpoints, −40 °C (a choice of this project: wider than any crop's
    /// cardinal range, narrow enough to catch unit mix-ups such as °F or K and sensor faults).
    /// </summary>
    public const double AirTemperatureMinimumC = -40.0;

    /// <summary>Highest accepted air temperature from files and setpoints, 60 °C (a choice of this project; see <see cref="AirTemperatureMinimumC"/>).</summary>
    public const double AirTemperatureMaximumC = 60.0;

    /// <summary>
    /// Default safety margin of a rotation policy, 0.2: the planned bench lean must stay at or below (1 − 0.2) × the
    /// crop's lean grade limit to the sale date (an estimate of this project, not a measured value: it covers the
    /// spread of crop parameters and of plants about the bench mean, which the forecast's band shows is wide).
    /// </summary>
    public const double RotationGradeMargin = 0.2;

    /// <summary>
    /// Default half-width of a rotation task's window as a fraction of the rotation interval, 0.25 (a choice of this
    /// project: ± a quarter interval leaves a crew a whole working day at intervals of 4 days and more, and keeps
    /// neighbouring windows apart by half an interval).
    /// </summary>
    public const double RotationWindowFraction = 0.25;
}
