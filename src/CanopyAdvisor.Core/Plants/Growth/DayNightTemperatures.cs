using CanopyAdvisor.Core.Sky;
using NodaTime;

namespace CanopyAdvisor.Core.Plants.Growth;

/// <summary>Mean day and night air temperature of one local date and their difference, DIF.</summary>
/// <remarks>
/// The local date runs from local midnight to the next local midnight (23 or 25 h on DST changes). Day is sunrise to
/// sunset of that date (NREL SPA, Reda &amp; Andreas 2004), night the rest of the date. In polar day there is no night
/// (and in polar night no day): that mean is NaN and DIF is taken as 0, since no day/night contrast exists. When too
/// little of a period is known (a measured log with gaps), its mean is NaN and DIF is NaN: callers must flag the date,
/// not treat it as DIF 0.
/// </remarks>
/// <param name="Date">The local date.</param>
/// <param name="Kind">Whether the sun rises and sets that date.</param>
/// <param name="DayMeanC">Time-weighted mean temperature of the day period, °C; NaN if none or too little known.</param>
/// <param name="NightMeanC">Time-weighted mean temperature of the night period, °C; NaN if none or too little known.</param>
/// <param name="DifKelvin">Day mean minus night mean, K; 0 in polar day or night; NaN when a mean is unknown.</param>
/// <param name="DayHours">Length of the day period, h.</param>
/// <param name="NightHours">Length of the night period, h.</param>
/// <param name="DayCoverage">Fraction of the day period with a known temperature, in [0, 1] (1 for a setpoint schedule).</param>
/// <param name="NightCoverage">Fraction of the night period with a known temperature, in [0, 1].</param>
public sealed record DayNightTemperatures(
    LocalDate Date,
    SunDayKind Kind,
    double DayMeanC,
    double NightMeanC,
    double DifKelvin,
    double DayHours,
    double NightHours,
    double DayCoverage,
    double NightCoverage)
{
    /// <summary>Whether DIF is known (false when a log misses too much of the day or the night).</summary>
    public bool IsComplete => !double.IsNaN(DifKelvin);
}
