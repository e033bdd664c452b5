using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Plants.Growth;

namespace CanopyAdvisor.Core.Forecast;

/// <summary>
/// <see cref="ElongationModel"/> for one validated crop without the per-call validation, for the forecast's inner loop:
/// Ė = Ė_ref · r(T) · f_DIF · f_shade · f_lowlight, the same factor functions (Yan &amp; Hunt 1999; Erwin, Heins &amp;
/// Karlsson 1989; Smith 1982; Craver, Boldt &amp; Lopez 2019).
/// </summary>
internal sealed class ElongationRate(Crop crop)
{
    private const double HoursPerDay = ModelConstants.SecondsPerDay / ModelConstants.SecondsPerHour;
    private readonly double _referenceMetresPerHour = crop.ReferenceElongationMmPerDay.Value / ModelConstants.MillimetresPerMetre / HoursPerDay;
    private readonly double _base = crop.BaseTemperatureC.Value;
    private readonly double _optimum = crop.OptimumTemperatureC.Value;
    private readonly double _maximum = crop.MaximumTemperatureC.Value;
    private readonly double _dif = crop.DifSensitivityPerKelvin.Value;
    private readonly double _shade = crop.ShadeAvoidanceSensitivity.Value;
    private readonly double _dliMinimum = crop.DliMinimum.Value;
    private readonly double _lowLight = crop.LowLightStretchPerMole.Value;

    /// <summary>Ė in m h⁻¹; zero when the air temperature is missing (NaN).</summary>
    public double MetresPerHour(double airC, double difK, double phytochromeState, double recentDli)
    {
        if (double.IsNaN(airC))
        {
            return 0;
        }

        double r = CardinalTemperatureResponse.Evaluate(airC, _base, _optimum, _maximum);
        if (r <= 0)
        {
            return 0;
        }

        return _referenceMetresPerHour * r
            * DifResponse.Evaluate(difK, _dif)
            * ShadeAvoidanceResponse.Evaluate(phytochromeState, _shade)
            * LowLightResponse.Evaluate(recentDli, _dliMinimum, _lowLight);
    }
}
