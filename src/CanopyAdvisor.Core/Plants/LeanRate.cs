using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Core.Plants;

/// <summary>Lean rate in degrees per day with circumnutation averaged out over whole periods (MODEL.md §4, GLOSSARY "lean").</summary>
/// <remarks>
/// Method: the lean vector of each sample is the horizontal part of the unit base-to-apex direction (sin of the tilt
/// toward the lean azimuth), which stays well defined up to 90°. The series is taken as piecewise linear in time and
/// averaged exactly over the first whole nutation period and over the last one (a rotating disturbance of that period
/// averages to zero over a whole period). The rate is the difference of the tilts of the two mean vectors
/// (asin of their lengths) divided by the time between the windows' centres. With a series shorter than two periods
/// the windows overlap, which still cancels the nutation but shortens the baseline.
/// </remarks>
public static class LeanRate
{
    /// <summary>The period-averaged lean rate, degrees per day (positive when the lean grows).</summary>
    /// <param name="times">Sample instants, strictly increasing.</param>
    /// <param name="apexOffsets">Apex position relative to the base at each instant, m (e.g. <see cref="Stem.ApexOffset"/>).</param>
    /// <param name="nutationPeriod">Circumnutation period: the averaging window; must be shorter than the series.</param>
    /// <exception cref="InvalidInputException">Mismatched, unordered or too-short series, or a non-positive period.</exception>
    public static double DegreesPerDay(IReadOnlyList<Instant> times, IReadOnlyList<Vector3> apexOffsets, Duration nutationPeriod)
    {
        ArgumentNullException.ThrowIfNull(times);
        ArgumentNullException.ThrowIfNull(apexOffsets);
        var errors = new List<ValidationError>();
        if (times.Count != apexOffsets.Count)
        {
            errors.Add(new ValidationError("apexOffsets", "must have one offset per time"));
        }

        if (times.Count < 2)
        {
            errors.Add(new ValidationError("times", "needs at least two samples"));
        }

        for (int i = 1; i < times.Count; i++)
        {
            if (times[i] <= times[i - 1])
            {
                errors.Add(new ValidationError($"times[{i}]", "must be later than the sample before"));
                break;
            }
        }

        if (nutationPeriod <= Duration.Zero)
        {
            errors.Add(new ValidationError("nutationPeriod", "must be > 0"));
        }
        else if (times.Count >= 2 && times[^1] - times[0] <= nutationPeriod)
        {
            errors.Add(new ValidationError("times", "must span more than one nutation period"));
        }

        for (int i = 0; i < apexOffsets.Count; i++)
        {
            Vector3 o = apexOffsets[i];
            if (!double.IsFinite(o.X) || !double.IsFinite(o.Y) || !double.IsFinite(o.Z) || o.LengthSquared == 0)
            {
                errors.Add(new ValidationError($"apexOffsets[{i}]", "must be finite and non-zero"));
                break;
            }
        }

        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        double Hours(Instant t) => (t - times[0]).TotalHours;
        double period = nutationPeriod.TotalHours;
        double end = Hours(times[^1]);
        (double ex, double ny) first = WindowMean(times, apexOffsets, 0, period, Hours);
        (double ex, double ny) last = WindowMean(times, apexOffsets, end - period, end, Hours);
        double tiltFirst = Math.Asin(Math.Min(1, Math.Sqrt((first.ex * first.ex) + (first.ny * first.ny))));
        double tiltLast = Math.Asin(Math.Min(1, Math.Sqrt((last.ex * last.ex) + (last.ny * last.ny))));
        double days = (end - period) / 24.0; // distance between the window centres
        return (tiltLast - tiltFirst) * Angle.DegreesPerRadian / days;
    }

    /// <summary>Exact mean of the piecewise-linear lean vector over [from, to] hours.</summary>
    private static (double East, double North) WindowMean(
        IReadOnlyList<Instant> times, IReadOnlyList<Vector3> offsets, double from, double to, Func<Instant, double> hours)
    {
        double sumE = 0, sumN = 0;
        for (int i = 1; i < times.Count; i++)
        {
            double t0 = hours(times[i - 1]), t1 = hours(times[i]);
            double a = Math.Max(t0, from), b = Math.Min(t1, to);
            if (b <= a)
            {
                continue;
            }

            (double e0, double n0) = Horizontal(offsets[i - 1]);
            (double e1, double n1) = Horizontal(offsets[i]);
            double fa = (a - t0) / (t1 - t0), fb = (b - t0) / (t1 - t0);
            double fm = 0.5 * (fa + fb); // the mean of a linear piece over [a, b] is its value at the midpoint
            sumE += (e0 + ((e1 - e0) * fm)) * (b - a);
            sumN += (n0 + ((n1 - n0) * fm)) * (b - a);
        }

        double span = to - from;
        return (sumE / span, sumN / span);
    }

    private static (double East, double North) Horizontal(Vector3 offset)
    {
        double length = offset.Length;
        return (offset.X / length, offset.Y / length);
    }
}
