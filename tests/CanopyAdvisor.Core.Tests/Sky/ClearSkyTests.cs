using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Sky;

public class ClearSkyTests
{
    // Haurwitz (1945): GHI = 1098 cos z exp(−0.059/cos z); values computed from the formula (MODEL.md §1.2).
    [Theory]
    [InlineData(0.0, 1035.09)]
    [InlineData(30.0, 888.27)]
    [InlineData(60.0, 487.89)]
    public void Haurwitz_MatchesModelValues(double zenithDeg, double expected) =>
        Assert.Equal(expected, HaurwitzClearSky.GlobalHorizontalWm2(Angle.FromDegrees(zenithDeg)), 2);

    [Theory]
    [InlineData(90.0)]
    [InlineData(120.0)]
    public void Haurwitz_IsZeroBelowHorizon(double zenithDeg) =>
        Assert.Equal(0.0, HaurwitzClearSky.GlobalHorizontalWm2(Angle.FromDegrees(zenithDeg)));

    // Kasten & Young (1989) at z = 30°: 1.15399 (MODEL.md §1.2, computed); at z = 0 the formula gives
    // 1/(1 + 0.50572·96.07995^−1.6364) = 0.99971 (computed), and 1 at sea level is the definition it approximates.
    [Theory]
    [InlineData(30.0, 1.15399, 5)]
    [InlineData(0.0, 0.99971, 5)]
    public void KastenYoung_MatchesModelValues(double zenithDeg, double expected, int decimals) =>
        Assert.Equal(expected, AirMass.KastenYoung(Angle.FromDegrees(zenithDeg)), decimals);

    // ISO 2533 standard atmosphere: 89 874.6 Pa at 1000 m and 101 325 Pa at sea level (ISO 2533 table, from memory).
    [Theory]
    [InlineData(0.0, 101325.0)]
    [InlineData(1000.0, 89874.6)]
    public void StandardPressure_MatchesStandardAtmosphere(double elevationM, double expectedPa) =>
        Assert.Equal(expectedPa, AirMass.StandardPressurePascals(elevationM), 0);

    // Ineichen & Perez (2002) check of MODEL.md §1.2 (computed with the pvlib-documented form): z = 30°, sea level,
    // T_L = 3, I0 = 1367 W m⁻² → GHI 898.74, DNI 918.47, DHI 103.32 W m⁻².
    [Fact]
    public void IneichenPerez_MatchesModelValues()
    {
        SolarIrradiance clear = IneichenPerezClearSky.Calculate(Angle.FromDegrees(30), 3.0, 0.0, 1367.0);
        Assert.Equal(898.74, clear.GlobalHorizontalWm2, 2);
        Assert.Equal(918.47, clear.DirectNormalWm2, 2);
        Assert.Equal(103.32, clear.DiffuseHorizontalWm2, 2);
    }

    // Closure GHI = DNI cos z + DHI (definition), more turbidity → less beam, more elevation → more light
    // (Ineichen & Perez 2002, the model's intent); none below the horizon.
    [Fact]
    public void IneichenPerez_BehavesPhysically()
    {
        var z = Angle.FromDegrees(50);
        SolarIrradiance clean = IneichenPerezClearSky.Calculate(z, 2.0, 0.0, 1367.0);
        SolarIrradiance hazy = IneichenPerezClearSky.Calculate(z, 5.0, 0.0, 1367.0);
        SolarIrradiance high = IneichenPerezClearSky.Calculate(z, 2.0, 2000.0, 1367.0);
        Assert.Equal(clean.GlobalHorizontalWm2, (clean.DirectNormalWm2 * z.Cos()) + clean.DiffuseHorizontalWm2, 9);
        Assert.True(hazy.DirectNormalWm2 < clean.DirectNormalWm2);
        Assert.True(hazy.DiffuseHorizontalWm2 > clean.DiffuseHorizontalWm2);
        Assert.True(high.GlobalHorizontalWm2 > clean.GlobalHorizontalWm2);
        Assert.Equal(SolarIrradiance.None, IneichenPerezClearSky.Calculate(Angle.FromDegrees(95), 3.0, 0.0, 1367.0));
    }

    // Spencer (1971) against an independent orbit: I_sc / R² with R from the SPA's VSOP87 terms (Reda & Andreas 2004).
    // Spencer's series fits the orbit to about 0.01 %; the day-of-year sampling (R changes up to 0.03 %/day) is covered
    // by a 0.1 % tolerance.
    [Theory]
    [InlineData(1)]
    [InlineData(3)]
    [InlineData(80)]
    [InlineData(185)]
    [InlineData(266)]
    [InlineData(355)]
    public void Spencer_AgreesWithSpaEarthSunDistance(int dayOfYear)
    {
        Instant noon = new LocalDate(2026, 1, 1).PlusDays(dayOfYear - 1).At(new LocalTime(12, 0)).InUtc().ToInstant();
        var result = SolarPosition.Calculate(new SolarPositionInput(noon, new GeoLocation(Angle.Zero, Angle.Zero, 0)));
        double fromOrbit = ExtraterrestrialIrradiance.FromDistance(result.EarthRadiusVectorAu);
        Assert.InRange(ExtraterrestrialIrradiance.Spencer(dayOfYear) / fromOrbit, 0.999, 1.001);
    }
}
