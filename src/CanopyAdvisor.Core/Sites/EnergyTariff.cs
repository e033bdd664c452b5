namespace CanopyAdvisor.Core.Sites;

/// <summary>What the site pays for electricity: one flat price per kilowatt-hour and the currency it is quoted in.</summary>
/// <param name="PricePerKWh">Price of one kWh of electricity, in <paramref name="Currency"/> (≥ 0).</param>
/// <param name="Currency">ISO 4217 code of the currency, three capital letters (e.g. <c>EUR</c>).</param>
public sealed record EnergyTariff(double PricePerKWh, string Currency)
{
    /// <summary>No tariff given: a price of 0 in the placeholder currency <c>XXX</c> (ISO 4217's "no currency"), so costs
    /// show as unknown rather than as a guessed price.</summary>
    public static EnergyTariff Unknown { get; } = new(0, "XXX");

    /// <summary>Whether a real tariff was given.</summary>
    public bool IsKnown => Currency != Unknown.Currency;

    /// <summary>The cost of an amount of energy, in <see cref="Currency"/>.</summary>
    /// <param name="kilowattHours">Energy used, kWh.</param>
    public double CostOf(double kilowattHours) => kilowattHours * PricePerKWh;
}
