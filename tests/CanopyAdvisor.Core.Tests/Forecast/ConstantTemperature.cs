using CanopyAdvisor.Core.Plants.Growth;
using CanopyAdvisor.Core.Sky;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Forecast;

/// <summary>A temperature source that holds one air temperature day and night (DIF 0).</summary>
internal sealed class ConstantTemperature(double airC) : ITemperatureSource
{
    public double AirTemperatureC(Instant time) => airC;

    public DayNightTemperatures DayNightMeans(LocalDate date) =>
        new(date, SunDayKind.RisesAndSets, airC, airC, 0, 12, 12, 1, 1);
}
