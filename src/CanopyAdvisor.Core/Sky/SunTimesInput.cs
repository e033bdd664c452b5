using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;
using NodaTime;

namespace CanopyAdvisor.Core.Sky;

/// <summary>Inputs for sunrise, transit and sunset on one local date (Reda &amp; Andreas 2004, appendix A.2).</summary>
/// <param name="Date">The local date in <paramref name="Zone"/>.</param>
/// <param name="Zone">The site's time zone; the UTC offset in force at local noon of the date is used, as the report's fixed time zone.</param>
/// <param name="Location">Latitude, longitude (east positive) and elevation (elevation is not used by appendix A.2).</param>
public sealed record SunTimesInput(LocalDate Date, DateTimeZone Zone, GeoLocation Location)
{
    /// <summary>ΔT = TT − UT1, seconds (default 69 s, from memory, for the 2020s).</summary>
    public double DeltaTSeconds { get; init; } = ModelConstants.DefaultDeltaTSeconds;

    /// <summary>Atmospheric refraction at sunrise and sunset; h0′ = −(sun radius 0.26667° + this) = −0.8333° by default.</summary>
    public Angle AtmosphericRefractionAtSunrise { get; init; } = Angle.FromDegrees(ModelConstants.RefractionAtSunriseDegrees);

    /// <summary>
    /// The method: the events of the local date, iterated (default), or the report's appendix A.2 exactly (which
    /// reproduces its worked example); see <see cref="SunTimesMethod"/>.
    /// </summary>
    public SunTimesMethod Method { get; init; } = SunTimesMethod.LocalDayIterated;
}
