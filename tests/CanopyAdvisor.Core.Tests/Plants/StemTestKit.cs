using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Plants;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Plants;

/// <summary>Parameter sets and measurements shared by the stem tests.</summary>
internal static class StemTestKit
{
    /// <summary>Parameters with M(I) = a (b = 0, so M does not depend on the flux), no nutation and no delay unless given.</summary>
    public static StemParameters Parameters(
        double balance,
        double gamma,
        double photoRatio = 0,
        double growthZoneM = 0.03,
        double delayHours = 0,
        double nutationDeg = 0,
        double nutationHours = 2,
        int sense = 1) =>
        new(balance, gamma, photoRatio, 0, growthZoneM, Duration.FromMinutes(nutationHours * 60), Angle.FromDegrees(nutationDeg), sense,
            Duration.FromMinutes(delayHours * 60));

    /// <summary>Signed tilt (degrees) of a vector in the vertical east–north plane at the given azimuth: positive toward it.</summary>
    public static double SignedTiltDeg(Vector3 v, double azimuthDeg)
    {
        Vector3 toward = Direction.FromAzimuthZenith(Angle.FromDegrees(azimuthDeg), Angle.RightAngle);
        return Math.Atan2(Vector3.Dot(v, toward), v.Z) * Angle.DegreesPerRadian;
    }

    /// <summary>A horizontal blue flux vector coming from the given azimuth and zenith, µmol m⁻² s⁻¹.</summary>
    public static Vector3 LightFrom(double azimuthDeg, double zenithDeg, double magnitude = 50) =>
        Direction.FromAzimuthZenith(Angle.FromDegrees(azimuthDeg), Angle.FromDegrees(zenithDeg)) * magnitude;
}
