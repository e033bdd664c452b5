using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Plants.Growth;
using NodaTime;

namespace CanopyAdvisor.Core.Forecast;

/// <summary>The cumulative stem elongation of one bench on an hourly <see cref="ForecastTimeline"/>, from the light at
/// the bench's centre point and the air temperature, with no stem: used to carry the measured height back to the
/// spin-up start and forward to now, the horizon end and the sale date.</summary>
internal sealed class HeightProjection
{
    private readonly ForecastTimeline _hours;
    private readonly double[] _cumulativeM;

    public HeightProjection(CompiledLightField field, ForecastTimeline hours, int point, ElongationRate rate, double dliFallback)
    {
        _hours = hours;
        _cumulativeM = new double[hours.Count + 1];
        var light = new PointLight[1];
        var days = new DailyLight(hours.Day[0], dliFallback);
        double pss = PhytochromeState.FullSun;
        for (int s = 0; s < hours.Count; s++)
        {
            field.Step(hours.Outside[s], hours.LocalTimes[s], point, light);
            double recent = days.Add(hours.Day[s], light[0].HorizontalPpfd * hours.Hours[s] * ModelConstants.SecondsPerHour);
            if (light[0].FarRed730 > 0)
            {
                pss = PhytochromeState.Evaluate(light[0].Red660 / light[0].FarRed730);
            }

            _cumulativeM[s + 1] = _cumulativeM[s] + (rate.MetresPerHour(hours.AirC[s], hours.DifK[s], pss, recent) * hours.Hours[s]);
        }
    }

    /// <summary>Elongation from <paramref name="from"/> to <paramref name="to"/>, m (negative when to is earlier).</summary>
    public double GrowthM(Instant from, Instant to) => At(to) - At(from);

    private double At(Instant t)
    {
        Instant[] edges = _hours.Edges;
        if (t <= edges[0])
        {
            return _cumulativeM[0];
        }

        if (t >= edges[^1])
        {
            return _cumulativeM[^1];
        }

        int i = Array.BinarySearch(edges, t);
        if (i >= 0)
        {
            return _cumulativeM[i];
        }

        int hi = ~i, lo = hi - 1;
        double f = (t - edges[lo]).TotalTicks / (edges[hi] - edges[lo]).TotalTicks;
        return _cumulativeM[lo] + (f * (_cumulativeM[hi] - _cumulativeM[lo]));
    }
}
