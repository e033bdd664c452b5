using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Core.Advice.SideLamps;

/// <summary>The light already at each sample point over the planning period, summed once for the planner.</summary>
/// <remarks>
/// The same day and step grid as <see cref="LightSimulation"/> (local days, midpoint rule, steps with missing outside
/// light skipped). Per point: the period-mean horizontal blue vector, the mean DLI, and the highest horizontal PPFD
/// in steps when the added lamps' schedule is on and when it is off, so the peak with added lamps is exactly
/// max(peak off, peak on + added PPFD): the added light is the same in every step it is on.
/// </remarks>
internal sealed class ExistingLight
{
    private ExistingLight(int n)
    {
        BlueX = new double[n];
        BlueY = new double[n];
        Dli = new double[n];
        PeakOn = new double[n];
        PeakOff = new double[n];
    }

    /// <summary>Period-mean east component of the blue light vector per point, µmol m⁻² s⁻¹.</summary>
    public double[] BlueX { get; }

    /// <summary>Period-mean north component of the blue light vector per point, µmol m⁻² s⁻¹.</summary>
    public double[] BlueY { get; }

    /// <summary>Mean DLI per point over the period's days, mol m⁻² d⁻¹.</summary>
    public double[] Dli { get; }

    /// <summary>Highest horizontal PPFD per point in steps with the added schedule on, µmol m⁻² s⁻¹ (0 if never on).</summary>
    public double[] PeakOn { get; }

    /// <summary>Highest horizontal PPFD per point in steps with the added schedule off, µmol m⁻² s⁻¹.</summary>
    public double[] PeakOff { get; }

    /// <summary>Share of the usable time the added schedule is on.</summary>
    public double OnFraction { get; private set; }

    /// <summary>Seconds per day the added schedule is on, period mean.</summary>
    public double OnSecondsPerDay { get; private set; }

    /// <summary>Sums the light of a compiled field over whole local days for every point.</summary>
    public static ExistingLight Measure(
        CompiledLightField field, IOutsideLightSource outside, LampSchedule addedSchedule, LocalDate firstDay, LocalDate lastDay,
        CancellationToken cancellationToken)
    {
        int n = field.Points.Length;
        var result = new ExistingLight(n);
        var light = new PointLight[n];
        double[] sumH = new double[n], sumBx = new double[n], sumBy = new double[n];
        Duration dt = LightSimulation.DefaultStep;
        DateTimeZone zone = field.Zone;
        double usable = 0, on = 0;
        int days = 0;
        for (LocalDate date = firstDay; date <= lastDay; date = date.PlusDays(1), days++)
        {
            Instant start = zone.AtStartOfDay(date).ToInstant();
            Instant end = zone.AtStartOfDay(date.PlusDays(1)).ToInstant();
            for (Instant t0 = start; t0 < end; t0 += dt)
            {
                cancellationToken.ThrowIfCancellationRequested();
                Instant t1 = t0 + dt < end ? t0 + dt : end;
                Instant middle = t0 + ((t1 - t0) / 2);
                OutsideLight now = outside.At(middle);
                if (!CompiledLightField.IsUsable(now))
                {
                    continue;
                }

                double seconds = (t1 - t0).TotalSeconds;
                LocalTime localTime = middle.InZone(zone).TimeOfDay;
                bool isOn = addedSchedule.IsOn(localTime, now.GlobalHorizontalPpfd);
                field.Step(now, localTime, light);
                usable += seconds;
                on += isOn ? seconds : 0;
                double[] peak = isOn ? result.PeakOn : result.PeakOff;
                for (int p = 0; p < n; p++)
                {
                    ref readonly PointLight l = ref light[p];
                    sumH[p] += l.HorizontalPpfd * seconds;
                    sumBx[p] += l.BlueVector.X * seconds;
                    sumBy[p] += l.BlueVector.Y * seconds;
                    peak[p] = Math.Max(peak[p], l.HorizontalPpfd);
                }
            }
        }

        if (!(usable > 0))
        {
            throw new InvalidInputException("outsideLight", "has no usable value in the planning period: nothing to plan against");
        }

        for (int p = 0; p < n; p++)
        {
            result.BlueX[p] = sumBx[p] / usable;
            result.BlueY[p] = sumBy[p] / usable;
            result.Dli[p] = sumH[p] / ModelConstants.MicromolesPerMole / days;
        }

        result.OnFraction = on / usable;
        result.OnSecondsPerDay = on / days;
        return result;
    }
}
