using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Core.Advice.SideLamps;

/// <summary>The electricity the added lamps use per week, and what it costs at the site's tariff.</summary>
/// <remarks>
/// Energy is power × time: kWh = W × h / 1000 (the SI definition of the kilowatt-hour, 3.6 MJ). A lamp's power is
/// taken as its full-output watts × dimming: electrical input falling in proportion to output is an approximation
/// (LED drivers come close over most of their range; common practice, from memory). On-hours follow the added lamps'
/// schedule over the planning period, daylight switch-off included, scaled to 7 days.
/// </remarks>
/// <param name="AddedWatts">Electrical power of the added lamps while on (watts × dimming, summed), W.</param>
/// <param name="OnHoursPerWeek">Hours per week the added lamps are on, h.</param>
/// <param name="KilowattHoursPerWeek">Energy per week, kWh.</param>
/// <param name="CostPerWeek">Cost per week in <paramref name="Currency"/>, or null when the site's tariff is unknown.</param>
/// <param name="Currency">ISO 4217 currency of the cost, or null when the tariff is unknown.</param>
public sealed record SideLampEnergy(
    double AddedWatts,
    double OnHoursPerWeek,
    double KilowattHoursPerWeek,
    double? CostPerWeek,
    string? Currency)
{
    /// <summary>The weekly energy and cost of lamps drawing <paramref name="addedWatts"/> for <paramref name="onHoursPerWeek"/>.</summary>
    /// <param name="addedWatts">Power while on, W (≥ 0).</param>
    /// <param name="onHoursPerWeek">Hours on per week, h (≥ 0).</param>
    /// <param name="tariff">The site's tariff; an unknown tariff gives no cost.</param>
    public static SideLampEnergy From(double addedWatts, double onHoursPerWeek, EnergyTariff tariff)
    {
        ArgumentNullException.ThrowIfNull(tariff);
        double kWh = addedWatts * onHoursPerWeek / ModelConstants.WattHoursPerKilowattHour;
        return tariff.IsKnown
            ? new SideLampEnergy(addedWatts, onHoursPerWeek, kWh, tariff.CostOf(kWh), tariff.Currency)
            : new SideLampEnergy(addedWatts, onHoursPerWeek, kWh, null, null);
    }
}
