using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Sky;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Sky;

/// <summary>
/// The worked example of the NREL SPA report (Reda &amp; Andreas 2004, NREL/TP-560-34302, rev. 2008, appendix A.5):
/// 2003-10-17 12:30:30 local time, UTC−7, 39.742476° N, 105.1786° W, 1830.14 m, 820 mbar, 11 °C, ΔT = 67 s,
/// ΔUT1 = 0, slope 30°, azimuth rotation −10°, refraction at sunrise 0.5667° (MODEL.md §1.1).
/// </summary>
internal static class SpaWorkedExample
{
    public static readonly GeoLocation Location =
        new(Angle.FromDegrees(39.742476), Angle.FromDegrees(-105.1786), 1830.14);

    public static readonly DateTimeZone Zone = DateTimeZone.ForOffset(Offset.FromHours(-7));

    public static readonly LocalDate Date = new(2003, 10, 17);

    public static readonly Instant Time =
        new LocalDateTime(2003, 10, 17, 12, 30, 30).InZoneStrictly(Zone).ToInstant();

    public static SolarPositionInput Input => new(Time, Location)
    {
        DeltaTSeconds = 67.0,
        DeltaUt1Seconds = 0.0,
        PressureMillibars = 820.0,
        TemperatureCelsius = 11.0,
        AtmosphericRefractionAtSunrise = Angle.FromDegrees(0.5667),
        SurfaceSlope = Angle.FromDegrees(30.0),
        SurfaceAzimuthRotation = Angle.FromDegrees(-10.0),
    };

    public static SunTimesInput SunTimesInput => new(Date, Zone, Location)
    {
        DeltaTSeconds = 67.0,
        AtmosphericRefractionAtSunrise = Angle.FromDegrees(0.5667),
        Method = SunTimesMethod.ReportAppendixA2,
    };
}
