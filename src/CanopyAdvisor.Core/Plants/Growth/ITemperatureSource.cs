using NodaTime;

namespace CanopyAdvisor.Core.Plants.Growth;

/// <summary>Air temperature at a site over time: a setpoint schedule or a measured log.</summary>
public interface ITemperatureSource
{
    /// <summary>Air temperature at an instant, °C; NaN where it is not known (a gap in a log, outside its coverage).</summary>
    double AirTemperatureC(Instant time);

    /// <summary>Mean day and night temperature and DIF for a local date, day and night from the site's sunrise and sunset.</summary>
    DayNightTemperatures DayNightMeans(LocalDate date);
}
