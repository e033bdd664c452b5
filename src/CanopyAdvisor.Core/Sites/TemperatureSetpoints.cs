namespace CanopyAdvisor.Core.Sites;

/// <summary>The air temperature a site's climate computer holds: a day and a night setpoint and a pre-dawn drop.</summary>
/// <remarks>
/// Day runs from sunrise to sunset at the site (NREL SPA sunrise/sunset); night from sunset to sunrise. The pre-dawn
/// drop lowers the night setpoint by <see cref="PreDawnDropC"/> for the last <see cref="PreDawnDropHours"/> before
/// sunrise, the height-control practice of a 2.8–8.3 °C drop for 2–3 h (common practice, extension literature).
/// </remarks>
/// <param name="DayC">Day setpoint, °C.</param>
/// <param name="NightC">Night setpoint, °C.</param>
/// <param name="PreDawnDropC">Drop below the night setpoint before sunrise, °C (0 = none).</param>
/// <param name="PreDawnDropHours">Length of the drop before sunrise, h.</param>
public sealed record TemperatureSetpoints(double DayC, double NightC, double PreDawnDropC, double PreDawnDropHours)
{
    /// <summary>20 °C day, 18 °C night, no drop: a neutral default (common practice for many bedding crops).</summary>
    public static TemperatureSetpoints Default { get; } = new(20, 18, 0, 0);
}
