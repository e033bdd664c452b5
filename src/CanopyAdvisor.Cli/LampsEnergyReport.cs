namespace CanopyAdvisor.Cli;

/// <summary>Energy of the added lamps in <see cref="LampsReport"/>; cost and currency are null when the site has no tariff.</summary>
internal sealed record LampsEnergyReport(
    double AddedWatts,
    double OnHoursPerWeek,
    double KWhPerWeek,
    double? CostPerWeek,
    string? Currency);
