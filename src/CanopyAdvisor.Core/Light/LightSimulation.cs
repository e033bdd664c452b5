using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sky;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Core.Light;

/// <summary>Runs a compiled light field over a range of local days and sums the light per bench and day.</summary>
/// <remarks>
/// <para>
/// Each local day (start of the date to start of the next, in the site's time zone, so 23 or 25 hours on a
/// daylight-saving change) is cut into steps of <see cref="DefaultStep"/> (15 min) or the given step from its start;
/// the last step is shortened if the day is not a whole number of steps. Each step is evaluated at its midpoint
/// (midpoint rule) and weighted by its length: DLI = Σ PPFD·Δt / 10⁶ mol m⁻² d⁻¹ (MODEL.md §0). Lamp schedules are
/// read at the midpoint's local time, so photoperiod edges on the step grid (whole quarter hours by default) are
/// integrated exactly and other edges to within half a step. At 15 min the sun moves about 3.75° per step, small
/// against the daily integrals; use a shorter step for hour-by-hour detail.
/// </para>
/// <para>
/// Missing outside light: a step whose <see cref="OutsideLight"/> has a NaN or infinite number is skipped and counted
/// (<see cref="BenchDayLight.MissingSteps"/>); nothing is invented for it. Exceptions thrown by the
/// <see cref="IOutsideLightSource"/> are not caught.
/// </para>
/// </remarks>
public static class LightSimulation
{
    /// <summary>The default time step, 15 minutes.</summary>
    public static Duration DefaultStep { get; } = Duration.FromMinutes(15);

    /// <summary>Below this many points a step is evaluated on one thread.</summary>
    private const int ParallelThreshold = 2048;

    /// <summary>Accumulators per point: Σh·Δt, Σv·Δt (3), Σb·Δt (3), Σ660·Δt, Σ730·Δt.</summary>
    private const int Sums = 9;

    /// <summary>Simulates the light on every bench for each local day from <paramref name="firstDay"/> to <paramref name="lastDay"/>.</summary>
    /// <param name="field">The compiled light field of the site.</param>
    /// <param name="outside">The outside light (clear sky or measured log).</param>
    /// <param name="firstDay">First local date.</param>
    /// <param name="lastDay">Last local date (inclusive).</param>
    /// <param name="step">Time step, more than zero and at most a day; <see cref="DefaultStep"/> when null.</param>
    /// <param name="progress">Receives the fraction done, in (0, 1], after each day.</param>
    /// <param name="cancellationToken">Stops the run between steps.</param>
    /// <exception cref="InvalidInputException">The dates or step are not usable.</exception>
    public static LightPeriodSummary Run(
        CompiledLightField field,
        IOutsideLightSource outside,
        LocalDate firstDay,
        LocalDate lastDay,
        Duration? step = null,
        IProgress<double>? progress = null,
        CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(field);
        ArgumentNullException.ThrowIfNull(outside);
        Duration dt = step ?? DefaultStep;
        var errors = new List<ValidationError>();
        if (dt <= Duration.Zero || dt > Duration.FromDays(1))
        {
            errors.Add(new ValidationError("step", "must be more than zero and at most one day"));
        }

        if (lastDay < firstDay)
        {
            errors.Add(new ValidationError("lastDay", "must not be before firstDay"));
        }
        else if (Period.Between(firstDay, lastDay, PeriodUnits.Days).Days > 3660)
        {
            errors.Add(new ValidationError("lastDay", "the period must be at most 3660 days"));
        }

        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        DateTimeZone zone = field.Zone;
        int n = field.Points.Length;
        var light = new PointLight[n];
        double[] sums = new double[n * Sums];
        int dayCount = Period.Between(firstDay, lastDay, PeriodUnits.Days).Days + 1;
        var days = ImmutableArray.CreateBuilder<BenchDayLight>(dayCount * field.Benches.Length);
        int chunkCount = n < ParallelThreshold ? 1 : Math.Max(1, Environment.ProcessorCount * 4);
        int chunkSize = (n + chunkCount - 1) / Math.Max(1, chunkCount);

        int missingTotal = 0;
        LocalDate date = firstDay;
        for (int day = 0; day < dayCount; day++, date = date.PlusDays(1))
        {
            Array.Clear(sums);
            Instant start = zone.AtStartOfDay(date).ToInstant();
            Instant end = zone.AtStartOfDay(date.PlusDays(1)).ToInstant();
            int steps = 0, missing = 0;
            double usableSeconds = 0;
            for (Instant t0 = start; t0 < end; t0 += dt)
            {
                cancellationToken.ThrowIfCancellationRequested();
                Instant t1 = t0 + dt < end ? t0 + dt : end;
                Instant middle = t0 + ((t1 - t0) / 2);
                steps++;
                OutsideLight now = outside.At(middle);
                if (!CompiledLightField.IsUsable(now))
                {
                    missing++;
                    continue;
                }

                double seconds = (t1 - t0).TotalSeconds;
                usableSeconds += seconds;
                LocalTime localTime = middle.InZone(zone).TimeOfDay;
                if (chunkCount == 1)
                {
                    StepChunk(field, now, localTime, 0, n, seconds, light, sums);
                }
                else
                {
                    Parallel.For(0, chunkCount, c =>
                    {
                        int first = c * chunkSize;
                        int count = Math.Min(chunkSize, n - first);
                        if (count > 0)
                        {
                            StepChunk(field, now, localTime, first, count, seconds, light, sums);
                        }
                    });
                }
            }

            missingTotal += missing;
            for (int b = 0; b < field.Benches.Length; b++)
            {
                days.Add(Summarise(field, b, date, end - start, steps, missing, usableSeconds, sums));
            }

            progress?.Report((day + 1) / (double)dayCount);
        }

        return new LightPeriodSummary(firstDay, lastDay, dt, days.MoveToImmutable(), missingTotal);
    }

    private static void StepChunk(
        CompiledLightField field, OutsideLight outside, LocalTime localTime, int first, int count, double seconds,
        PointLight[] light, double[] sums)
    {
        Span<PointLight> span = light.AsSpan(first, count);
        field.Step(outside, localTime, first, span);
        for (int i = 0; i < count; i++)
        {
            ref readonly PointLight l = ref span[i];
            int k = (first + i) * Sums;
            sums[k] += l.HorizontalPpfd * seconds;
            sums[k + 1] += l.LightVector.X * seconds;
            sums[k + 2] += l.LightVector.Y * seconds;
            sums[k + 3] += l.LightVector.Z * seconds;
            sums[k + 4] += l.BlueVector.X * seconds;
            sums[k + 5] += l.BlueVector.Y * seconds;
            sums[k + 6] += l.BlueVector.Z * seconds;
            sums[k + 7] += l.Red660 * seconds;
            sums[k + 8] += l.FarRed730 * seconds;
        }
    }

    private static BenchDayLight Summarise(
        CompiledLightField field, int benchIndex, LocalDate date, Duration dayLength, int steps, int missing,
        double usableSeconds, double[] sums)
    {
        (int start, int count) = field.PointsOfBench(benchIndex);
        var points = ImmutableArray.CreateBuilder<PointDayLight>(count);
        double inverseTime = usableSeconds > 0 ? 1 / usableSeconds : 0;
        double dliSum = 0, dliMin = double.PositiveInfinity, red = 0, farRed = 0;
        Vector3 lightSum = Vector3.Zero, blueSum = Vector3.Zero;
        for (int p = start; p < start + count; p++)
        {
            int k = p * Sums;
            double dli = sums[k] / ModelConstants.MicromolesPerMole;
            var meanLight = new Vector3(sums[k + 1], sums[k + 2], sums[k + 3]) * inverseTime;
            var meanBlue = new Vector3(sums[k + 4], sums[k + 5], sums[k + 6]) * inverseTime;
            double? ratio = sums[k + 8] > 0 ? sums[k + 7] / sums[k + 8] : null;
            points.Add(new PointDayLight(dli, meanLight, meanBlue, ratio));
            dliSum += dli;
            dliMin = Math.Min(dliMin, dli);
            lightSum += meanLight;
            blueSum += meanBlue;
            red += sums[k + 7];
            farRed += sums[k + 8];
        }

        double dliMean = count > 0 ? dliSum / count : 0;
        Vector3 meanLightVector = count > 0 ? lightSum / count : Vector3.Zero;
        Vector3 meanBlueVector = count > 0 ? blueSum / count : Vector3.Zero;
        double meanPpfd = usableSeconds > 0 ? dliMean * ModelConstants.MicromolesPerMole / usableSeconds : 0;
        return new BenchDayLight(
            benchIndex,
            field.Benches[benchIndex].Id,
            date,
            dayLength,
            steps,
            missing,
            meanPpfd,
            dliMean,
            dliMean > 0 ? dliMin / dliMean : null,
            meanLightVector,
            Direction.Zenith(meanLightVector),
            Direction.Azimuth(meanLightVector),
            meanBlueVector,
            Direction.Zenith(meanBlueVector),
            Direction.Azimuth(meanBlueVector),
            farRed > 0 ? red / farRed : null,
            count > 0 ? red / count : 0,
            count > 0 ? farRed / count : 0,
            points.MoveToImmutable());
    }
}
