namespace CanopyAdvisor.Server.Contracts;

/// <summary>The proposed lamps' energy.</summary>
/// <param name="AddedWatts">Power while on, W.</param>
/// <param name="OnHoursPerWeek">Hours on per week.</param>
/// <param name="KWhPerWeek">Energy per week, kWh.</param>
/// <param name="CostPerWeek">Cost per week at the site's tariff, or null without one.</param>
/// <param name="Currency">The tariff's currency, or null.</param>
public sealed record LampsEnergyView(double AddedWatts, double OnHoursPerWeek, double KWhPerWeek, double? CostPerWeek, string? Currency);
