using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Sky;

public class SolarPositionTests
{
    private static readonly SolarPositionResult Example = SolarPosition.Calculate(SpaWorkedExample.Input);

    // Final outputs of the report's worked example (Reda & Andreas 2004, appendix A.5; MODEL.md §1.1),
    // to the printed precision (6 decimals).
    [Fact]
    public void WorkedExample_JulianDay() => Assert.Equal(2452930.312847, Example.JulianDay, 6);

    [Fact]
    public void WorkedExample_TopocentricZenith() => Assert.Equal(50.111622, Example.Zenith.Degrees, 6);

    [Fact]
    public void WorkedExample_TopocentricAzimuth() => Assert.Equal(194.340241, Example.Azimuth.Degrees, 6);

    [Fact]
    public void WorkedExample_IncidenceOnSurface() => Assert.Equal(25.187000, Example.IncidenceAngle.Degrees, 6);

    // Intermediate values of the worked example as printed in the report (Reda & Andreas 2004, appendix A.5),
    // as transcribed in the test suite of pvlib-python (pvlib/tests/test_spa.py), a reference implementation;
    // tolerance = the decimals printed.
    public static TheoryData<string, double, int> Intermediates => new()
    {
        { "JC", 0.0379277986858, 10 },
        { "JDE", 2452930.313623, 6 },
        { "JCE", 0.037927819916852, 10 },
        { "JME", 0.003792781991685, 10 },
        { "L", 24.0182616917, 6 },
        { "B", -0.0001011219, 6 },
        { "R", 0.9965422974, 6 },
        { "Theta", 204.0182616917, 6 },
        { "beta", 0.0001011219, 6 },
        { "deltaPsi", -0.00399840, 6 },
        { "deltaEpsilon", 0.00166657, 6 },
        { "epsilon0ArcSeconds", 84379.672625, 5 },
        { "epsilon", 23.440465, 6 },
        { "deltaTau", -0.005711, 6 },
        { "lambda", 204.0085519281, 6 },
        { "nu0", 318.515579, 5 },
        { "nu", 318.511910, 5 },
        { "alpha", 202.227408, 6 },
        { "delta", -9.31434, 5 },
        { "H", 11.10590, 4 },
        { "xi", 0.002451, 6 },
        { "deltaAlpha", -0.000369, 6 },
        { "alphaPrime", 202.22704, 5 },
        { "deltaPrime", -9.316179, 6 },
        { "HPrime", 11.10627, 5 },
        { "e0", 39.872046, 6 },
        { "deltaE", 0.016332, 6 },
        { "e", 39.888378, 6 },
        { "Gamma", 14.340241, 6 },
    };

    [Theory]
    [MemberData(nameof(Intermediates))]
    public void WorkedExample_Intermediates(string symbol, double expected, int decimals)
    {
        double actual = symbol switch
        {
            "JC" => Example.JulianCentury,
            "JDE" => Example.JulianEphemerisDay,
            "JCE" => Example.JulianEphemerisCentury,
            "JME" => Example.JulianEphemerisMillennium,
            "L" => Example.HeliocentricLongitude.Degrees,
            "B" => Example.HeliocentricLatitude.Degrees,
            "R" => Example.EarthRadiusVectorAu,
            "Theta" => Example.GeocentricLongitude.Degrees,
            "beta" => Example.GeocentricLatitude.Degrees,
            "deltaPsi" => Example.NutationInLongitude.Degrees,
            "deltaEpsilon" => Example.NutationInObliquity.Degrees,
            "epsilon0ArcSeconds" => Example.MeanObliquity.Degrees * 3600.0,
            "epsilon" => Example.TrueObliquity.Degrees,
            "deltaTau" => Example.AberrationCorrection.Degrees,
            "lambda" => Example.ApparentSunLongitude.Degrees,
            "nu0" => Example.MeanSiderealTime.Degrees,
            "nu" => Example.ApparentSiderealTime.Degrees,
            "alpha" => Example.GeocentricRightAscension.Degrees,
            "delta" => Example.GeocentricDeclination.Degrees,
            "H" => Example.LocalHourAngle.Degrees,
            "xi" => Example.EquatorialHorizontalParallax.Degrees,
            "deltaAlpha" => Example.ParallaxInRightAscension.Degrees,
            "alphaPrime" => Example.TopocentricRightAscension.Degrees,
            "deltaPrime" => Example.TopocentricDeclination.Degrees,
            "HPrime" => Example.TopocentricLocalHourAngle.Degrees,
            "e0" => Example.ElevationWithoutRefraction.Degrees,
            "deltaE" => Example.RefractionCorrection.Degrees,
            "e" => Example.Elevation.Degrees,
            "Gamma" => Example.AstronomersAzimuth.Degrees,
            _ => throw new ArgumentOutOfRangeException(nameof(symbol)),
        };
        Assert.Equal(expected, actual, decimals);
    }

    // Arguments X0…X4 of the nutation series for the worked example, as given in pvlib's test suite
    // (pvlib/tests/test_spa.py; not verified against the printed report).
    [Theory]
    [InlineData(0, 17185.861179)]
    [InlineData(1, 1722.893218)]
    [InlineData(2, 18234.075703)]
    [InlineData(3, 18420.071012)]
    [InlineData(4, 51.686951)]
    public void WorkedExample_NutationArguments(int index, double expected)
    {
        double unixSeconds = SpaWorkedExample.Time.ToUnixTimeTicks() / (double)NodaConstants.TicksPerSecond;
        SpaState s = default;
        SpaAlgorithm.Geocentric(SpaAlgorithm.JulianDay(unixSeconds, 0), 67.0, ref s);
        double actual = index switch { 0 => s.X0, 1 => s.X1, 2 => s.X2, 3 => s.X3, _ => s.X4 };
        Assert.Equal(expected, actual, 5);
    }

    // Equation of time for the worked example, 14.64 min: pvlib's test suite (test_equation_of_time),
    // a reference implementation; 2 decimals as given there.
    [Fact]
    public void WorkedExample_EquationOfTime() => Assert.Equal(14.64, Example.EquationOfTimeMinutes, 2);

    // Zenith without refraction is 90° − e0 (report eq. 44 with Δe = 0).
    [Fact]
    public void WorkedExample_ZenithWithoutRefraction() =>
        Assert.Equal(90.0 - 39.872046, Example.ZenithWithoutRefraction.Degrees, 6);

    // Size of the periodic-term tables: Reda & Andreas 2004, the Earth periodic terms table (L0 64 rows, L1 34, L2 20, L3 7, L4 3, L5 1;
    // B0 5, B1 2; R0 40, R1 10, R2 6, R3 2, R4 1) and the nutation table (63 rows); row counts as transcribed from pvlib/spa.py.
    [Fact]
    public void PeriodicTermTables_HaveTheReportsRowCounts()
    {
        Assert.Equal([64, 34, 20, 7, 3, 1], EarthPeriodicTerms.Longitude.Select(t => t.Length / 3));
        Assert.Equal([5, 2], EarthPeriodicTerms.Latitude.Select(t => t.Length / 3));
        Assert.Equal([40, 10, 6, 2, 1], EarthPeriodicTerms.Radius.Select(t => t.Length / 3));
        Assert.Equal(63 * 5, NutationTerms.Multipliers.Length);
        Assert.Equal(63 * 4, NutationTerms.Coefficients.Length);
    }

    // The unit vector agrees with the zenith and azimuth of the full result (site convention, MODEL.md §0).
    [Fact]
    public void SunDirection_MatchesZenithAndAzimuth()
    {
        Vector3 v = Example.SunDirection;
        Assert.Equal(1.0, v.Length, 12);
        Assert.Equal(Example.Zenith.Degrees, Direction.Zenith(v).Degrees, 9);
        Assert.Equal(Example.Azimuth.Degrees, Direction.Azimuth(v).Degrees, 9);
    }

    // The cheap overload uses the refraction formula's reference atmosphere (1010 mbar, 10 °C); at 820 mbar and 11 °C
    // the worked example's refraction is 0.016332° (report), so the two differ by Δe·(1 − (1010/820)(284/283)) in zenith.
    [Fact]
    public void SunDirectionOverload_UsesStandardAtmosphere()
    {
        Vector3 v = SolarPosition.SunDirection(SpaWorkedExample.Time, SpaWorkedExample.Location, 67.0);
        double standardRefraction = 0.016332 * (1010.0 / 820.0) * (284.0 / 283.0);
        Assert.Equal(90.0 - 39.872046 - standardRefraction, Direction.Zenith(v).Degrees, 5);
        Assert.Equal(194.340241, Direction.Azimuth(v).Degrees, 5);
    }

    [Fact]
    public void Calculate_RejectsEveryOutOfRangeInput()
    {
        var input = SpaWorkedExample.Input with
        {
            Location = new GeoLocation(Angle.FromDegrees(91), Angle.FromDegrees(200), 0),
            PressureMillibars = -1,
            DeltaTSeconds = double.NaN,
        };
        var ex = Assert.Throws<InvalidInputException>(() => SolarPosition.Calculate(input));
        Assert.Equal(
            ["location.latitudeDeg", "location.longitudeDeg", "deltaTSeconds", "pressureMillibars"],
            ex.Errors.Select(e => e.Path));
    }
}
