using NodaTime;

namespace CanopyAdvisor.Server.Contracts;

/// <summary>A stored forecast of a site: its inputs' hash and every bench's forecast.</summary>
/// <param name="Id">The forecast id.</param>
/// <param name="SiteId">The site.</param>
/// <param name="SiteVersion">The site's version it was computed from.</param>
/// <param name="InputHash">Lower-case hex SHA-256 of its inputs (site file, crop library version, model build, start, options).</param>
/// <param name="CreatedAt">When it was computed.</param>
/// <param name="CreatedBy">The user who asked for it.</param>
/// <param name="TimeZone">The site's IANA time zone.</param>
/// <param name="Now">Forecast start in the site's local time.</param>
/// <param name="HorizonEnd">Forecast end in the site's local time.</param>
/// <param name="StepMinutes">Time step, minutes.</param>
/// <param name="IncludesBand">Whether the lean bands were computed.</param>
/// <param name="Daylight">Where the daylight came from.</param>
/// <param name="MissingLightSteps">Steps without outside light.</param>
/// <param name="MissingTemperatureSteps">Steps without air temperature.</param>
/// <param name="Benches">One forecast per bench with a lot.</param>
public sealed record ForecastView(
    string Id,
    string SiteId,
    int SiteVersion,
    string InputHash,
    Instant CreatedAt,
    string CreatedBy,
    string TimeZone,
    OffsetDateTime Now,
    OffsetDateTime HorizonEnd,
    double StepMinutes,
    bool IncludesBand,
    string Daylight,
    int MissingLightSteps,
    int MissingTemperatureSteps,
    IReadOnlyList<BenchForecastView> Benches);
