namespace CanopyAdvisor.Core.Forecast;

/// <summary>The running DLI of a bench, day by day, and the recent DLI that drives the low-light stretch.</summary>
/// <remarks>
/// The recent DLI is the DLI of the previous local day. The first day of a run is not complete, so until a whole day
/// has been summed the fallback (the crop's DLI target: no low-light stretch assumed) is used.
/// </remarks>
internal sealed class DailyLight(int firstDay, double fallback)
{
    private readonly int _firstDay = firstDay;
    private int _day = firstDay;
    private double _sum;
    private double _recent = fallback;

    /// <summary>Adds one step's PPFD·seconds to its local day; returns the recent DLI for the step, mol m⁻² d⁻¹.</summary>
    public double Add(int day, double ppfdSeconds)
    {
        if (day != _day)
        {
            // The first day was only partly simulated: keep the fallback until a whole day is known.
            if (_day != _firstDay)
            {
                _recent = _sum / ModelConstants.MicromolesPerMole;
            }

            _day = day;
            _sum = 0;
        }

        _sum += ppfdSeconds;
        return _recent;
    }
}
