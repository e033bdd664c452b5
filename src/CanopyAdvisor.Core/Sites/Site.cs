using System.Collections.Immutable;
using CanopyAdvisor.Core.Advice.Labour;
using NodaTime;

namespace CanopyAdvisor.Core.Sites;

/// <summary>One location a grower runs: where it is, its time zone, its structure, benches, lamps and obstructions.</summary>
/// <remarks>
/// All positions are in the site frame (x east, y north, z up, metres, origin chosen by the user at ground level).
/// A site is immutable; build a changed copy with <c>with</c>.
/// </remarks>
/// <param name="Id">Short identifier, unique among the user's sites.</param>
/// <param name="Name">Display name.</param>
/// <param name="Location">Latitude, longitude and elevation.</param>
/// <param name="Zone">The site's IANA time zone; photoperiods and working hours are local to it.</param>
/// <param name="Structure">The glasshouse range or indoor room.</param>
/// <param name="Benches">Growing surfaces with their sample grids.</param>
/// <param name="Lamps">Fixtures, overhead and side.</param>
/// <param name="Obstructions">Opaque boxes that cast shade.</param>
/// <param name="Weather">Where outside light comes from.</param>
public sealed record Site(
    string Id,
    string Name,
    GeoLocation Location,
    DateTimeZone Zone,
    Structure Structure,
    ImmutableArray<Bench> Benches,
    ImmutableArray<Lamp> Lamps,
    ImmutableArray<Obstruction> Obstructions,
    WeatherSettings Weather)
{
    /// <summary>The crop lots on the benches (none for a site that describes only light).</summary>
    public ImmutableArray<Lot> Lots { get; init; } = [];

    /// <summary>The air temperature setpoints used when no measured temperature log is given.</summary>
    public TemperatureSetpoints Temperatures { get; init; } = TemperatureSetpoints.Default;

    /// <summary>The electricity price, for the cost of added lamp energy; <see cref="EnergyTariff.Unknown"/> when not given.</summary>
    public EnergyTariff Tariff { get; init; } = EnergyTariff.Unknown;

    /// <summary>Who turns pots and how long it takes, for the rotation calendar; <see cref="LabourSettings.Default"/> when not given.</summary>
    public LabourSettings Labour { get; init; } = LabourSettings.Default;

    /// <summary>When the service runs the site's nightly forecast and weekly outlook; <see cref="JobScheduleSettings.Default"/> when not given.</summary>
    public JobScheduleSettings Schedule { get; init; } = JobScheduleSettings.Default;
}
