using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Core.Sky;

/// <summary>
/// The sun's position by the NREL Solar Position Algorithm (Reda &amp; Andreas 2004, "Solar position algorithm for solar
/// radiation applications", NREL/TP-560-34302, revised January 2008; Solar Energy 76:577), uncertainty ±0.0003°
/// for the years −2000 to 6000, and sunrise, transit and sunset by the report's appendix A.2.
/// </summary>
/// <remarks>Thread-safe and pure: no state, no clock.</remarks>
public static class SolarPosition
{
    /// <summary>Computes every SPA output for one instant and observer.</summary>
    /// <exception cref="InvalidInputException">An input is outside the report's valid range; every problem is listed.</exception>
    public static SolarPositionResult Calculate(SolarPositionInput input)
    {
        ArgumentNullException.ThrowIfNull(input);
        Validate(input);
        SpaState s = Evaluate(
            input.Time,
            input.Location,
            input.DeltaTSeconds,
            input.DeltaUt1Seconds,
            input.PressureMillibars,
            input.TemperatureCelsius,
            input.AtmosphericRefractionAtSunrise.Degrees);
        double incidence = SpaAlgorithm.IncidenceAngle(s, input.SurfaceSlope.Degrees, input.SurfaceAzimuthRotation.Degrees);
        return new SolarPositionResult
        {
            Time = input.Time,
            JulianDay = s.JulianDay,
            JulianCentury = s.JulianCentury,
            JulianEphemerisDay = s.JulianEphemerisDay,
            JulianEphemerisCentury = s.JulianEphemerisCentury,
            JulianEphemerisMillennium = s.JulianEphemerisMillennium,
            HeliocentricLongitude = Angle.FromDegrees(s.L),
            HeliocentricLatitude = Angle.FromDegrees(s.B),
            EarthRadiusVectorAu = s.R,
            GeocentricLongitude = Angle.FromDegrees(s.Theta),
            GeocentricLatitude = Angle.FromDegrees(s.Beta),
            NutationInLongitude = Angle.FromDegrees(s.DeltaPsi),
            NutationInObliquity = Angle.FromDegrees(s.DeltaEpsilon),
            MeanObliquity = Angle.FromDegrees(s.Epsilon0ArcSeconds / 3600.0),
            TrueObliquity = Angle.FromDegrees(s.Epsilon),
            AberrationCorrection = Angle.FromDegrees(s.DeltaTau),
            ApparentSunLongitude = Angle.FromDegrees(s.Lambda),
            MeanSiderealTime = Angle.FromDegrees(s.Nu0),
            ApparentSiderealTime = Angle.FromDegrees(s.Nu),
            GeocentricRightAscension = Angle.FromDegrees(s.Alpha),
            GeocentricDeclination = Angle.FromDegrees(s.Delta),
            LocalHourAngle = Angle.FromDegrees(s.H),
            EquatorialHorizontalParallax = Angle.FromDegrees(s.Xi),
            ParallaxInRightAscension = Angle.FromDegrees(s.DeltaAlpha),
            TopocentricRightAscension = Angle.FromDegrees(s.AlphaPrime),
            TopocentricDeclination = Angle.FromDegrees(s.DeltaPrime),
            TopocentricLocalHourAngle = Angle.FromDegrees(s.HPrime),
            ElevationWithoutRefraction = Angle.FromDegrees(s.E0),
            RefractionCorrection = Angle.FromDegrees(s.DeltaE),
            Elevation = Angle.FromDegrees(s.E),
            Zenith = Angle.FromDegrees(s.Zenith),
            ZenithWithoutRefraction = Angle.FromDegrees(90.0 - s.E0),
            AstronomersAzimuth = Angle.FromDegrees(s.AstronomersAzimuth),
            Azimuth = Angle.FromDegrees(s.Azimuth),
            IncidenceAngle = Angle.FromDegrees(incidence),
            EquationOfTimeMinutes = SpaAlgorithm.EquationOfTimeMinutes(s),
            SunDirection = ToDirection(s),
        };
    }

    /// <summary>
    /// The unit vector toward the sun (x east, y north, z up): topocentric, refraction-corrected for the standard
    /// atmosphere of the refraction formula (1010 mbar, 10 °C), ΔT = <see cref="ModelConstants.DefaultDeltaTSeconds"/>.
    /// </summary>
    /// <remarks>For the light field, once per time step; allocates nothing. Below the horizon the vector has z &lt; 0.</remarks>
    /// <exception cref="InvalidInputException">The location is out of range.</exception>
    public static Vector3 SunDirection(Instant time, GeoLocation location) =>
        SunDirection(time, location, ModelConstants.DefaultDeltaTSeconds);

    /// <summary>As <see cref="SunDirection(Instant, GeoLocation)"/> with a given ΔT = TT − UT1, seconds.</summary>
    /// <exception cref="InvalidInputException">The location or ΔT is out of range.</exception>
    public static Vector3 SunDirection(Instant time, GeoLocation location, double deltaTSeconds)
    {
        ArgumentNullException.ThrowIfNull(location);
        if (!IsValidLocation(location) || !(Math.Abs(deltaTSeconds) <= 8000.0))
        {
            var errors = new List<ValidationError>();
            AddLocationErrors(errors, location);
            AddRangeError(errors, "deltaTSeconds", deltaTSeconds, -8000, 8000);
            throw new InvalidInputException(errors);
        }

        SpaState s = Evaluate(
            time,
            location,
            deltaTSeconds,
            0.0,
            ModelConstants.RefractionReferencePressureMillibars,
            ModelConstants.RefractionReferenceTemperatureCelsius,
            ModelConstants.RefractionAtSunriseDegrees);
        return ToDirection(s);
    }

    /// <summary>Sunrise, sun transit and sunset for a local date (report appendix A.2), or the polar day/night flag.</summary>
    /// <exception cref="InvalidInputException">An input is out of range; every problem is listed.</exception>
    public static SunTimes CalculateSunTimes(SunTimesInput input)
    {
        ArgumentNullException.ThrowIfNull(input);
        var errors = new List<ValidationError>();
        AddLocationErrors(errors, input.Location);
        AddRangeError(errors, "deltaTSeconds", input.DeltaTSeconds, -8000, 8000);
        AddRangeError(errors, "atmosphericRefractionAtSunriseDeg", input.AtmosphericRefractionAtSunrise.Degrees, -5, 5);
        if (input.Date.Year is < -2000 or > 6000)
        {
            errors.Add(new ValidationError("date", "year must be in [-2000, 6000] (SPA validity)"));
        }

        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        return SunTimesAlgorithm.Calculate(input);
    }

    private static SpaState Evaluate(
        Instant time,
        GeoLocation location,
        double deltaTSeconds,
        double deltaUt1Seconds,
        double pressureMillibars,
        double temperatureCelsius,
        double refractionAtSunriseDeg)
    {
        double unixSeconds = time.ToUnixTimeTicks() / (double)NodaConstants.TicksPerSecond;
        SpaState s = default;
        SpaAlgorithm.Geocentric(SpaAlgorithm.JulianDay(unixSeconds, deltaUt1Seconds), deltaTSeconds, ref s);
        SpaAlgorithm.Topocentric(
            ref s,
            location.Latitude.Degrees,
            location.Longitude.Degrees,
            location.ElevationM,
            pressureMillibars,
            temperatureCelsius,
            refractionAtSunriseDeg);
        return s;
    }

    private static Vector3 ToDirection(in SpaState s) =>
        Direction.FromAzimuthZenith(Angle.FromDegrees(s.Azimuth), Angle.FromDegrees(s.Zenith));

    private static void Validate(SolarPositionInput input)
    {
        var errors = new List<ValidationError>();
        AddLocationErrors(errors, input.Location);
        int year = input.Time.InUtc().Year;
        if (year is < -2000 or > 6000)
        {
            errors.Add(new ValidationError("time", "year must be in [-2000, 6000] (SPA validity)"));
        }

        AddRangeError(errors, "deltaTSeconds", input.DeltaTSeconds, -8000, 8000);
        AddRangeError(errors, "deltaUt1Seconds", input.DeltaUt1Seconds, -1, 1);
        AddRangeError(errors, "pressureMillibars", input.PressureMillibars, 0, 5000);
        AddRangeError(errors, "temperatureCelsius", input.TemperatureCelsius, -273, 6000);
        AddRangeError(errors, "atmosphericRefractionAtSunriseDeg", input.AtmosphericRefractionAtSunrise.Degrees, -5, 5);
        AddRangeError(errors, "surfaceSlopeDeg", input.SurfaceSlope.Degrees, -360, 360);
        AddRangeError(errors, "surfaceAzimuthRotationDeg", input.SurfaceAzimuthRotation.Degrees, -360, 360);
        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }
    }

    private static bool IsValidLocation(GeoLocation location) =>
        Math.Abs(location.Latitude.Degrees) <= 90.0
        && Math.Abs(location.Longitude.Degrees) <= 180.0
        && location.ElevationM >= -6500000.0
        && double.IsFinite(location.ElevationM);

    /// <summary>Adds a problem for each of latitude, longitude and elevation outside the SPA's valid range.</summary>
    internal static void AddLocationErrors(List<ValidationError> errors, GeoLocation location)
    {
        AddRangeError(errors, "location.latitudeDeg", location.Latitude.Degrees, -90, 90);
        AddRangeError(errors, "location.longitudeDeg", location.Longitude.Degrees, -180, 180);
        AddRangeError(errors, "location.elevationM", location.ElevationM, -6500000, 1e7);
    }

    private static void AddRangeError(List<ValidationError> errors, string path, double value, double min, double max)
    {
        // The negated comparison also rejects NaN.
        if (!(value >= min && value <= max))
        {
            errors.Add(new ValidationError(path, FormattableString.Invariant($"must be in [{min}, {max}], got {value}")));
        }
    }
}
