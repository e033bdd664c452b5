using CanopyAdvisor.Core.Geometry;
using NodaTime;

namespace CanopyAdvisor.Core.Sky;

/// <summary>Sunrise, sun transit and sunset on one local date (Reda &amp; Andreas 2004, NREL/TP-560-34302, appendix A.2).</summary>
/// <remarks>
/// Hours are fractional local hours after midnight in the UTC offset in force at local noon (the report's
/// <c>sunrise</c>, <c>suntransit</c>, <c>sunset</c> outputs, wrapped into [0, 24) as the report does). Sunrise and sunset are
/// null when the sun never crosses h0′ that day (<see cref="Kind"/> says which way); transit always exists.
/// </remarks>
/// <param name="Date">The local date.</param>
/// <param name="Kind">Whether the sun rises and sets, or stays up or down all day.</param>
/// <param name="TransitHours">Local sun transit time, fractional hours.</param>
/// <param name="SunriseHours">Local sunrise time, fractional hours; null in polar day or night.</param>
/// <param name="SunsetHours">Local sunset time, fractional hours; null in polar day or night.</param>
/// <param name="Transit">Sun transit in the site's zone.</param>
/// <param name="Sunrise">Sunrise in the site's zone; null in polar day or night.</param>
/// <param name="Sunset">Sunset in the site's zone; null in polar day or night.</param>
/// <param name="TransitElevation">Geocentric sun elevation at transit, without refraction (report eq. A16 at transit).</param>
public sealed record SunTimes(
    LocalDate Date,
    SunDayKind Kind,
    double TransitHours,
    double? SunriseHours,
    double? SunsetHours,
    ZonedDateTime Transit,
    ZonedDateTime? Sunrise,
    ZonedDateTime? Sunset,
    Angle TransitElevation);
