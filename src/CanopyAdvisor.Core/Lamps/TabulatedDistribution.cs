using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Core.Lamps;

/// <summary>
/// A measured distribution: intensities on a grid of polar × around angles, bilinearly interpolated, periodic in the
/// around angle and normalised by integrating the interpolant over the sphere. IES LM-63 files become this.
/// </summary>
/// <remarks>
/// <para>
/// The polar grid need not span 0–180°: directions outside [first, last] polar angle get zero intensity (an IES file
/// measured 0–90° says nothing is emitted upward). The around grid is taken as periodic: between the last angle and the
/// first angle + 360° the values are interpolated across the wrap; a single around angle means axial symmetry.
/// </para>
/// <para>
/// Normalisation integrates the bilinear interpolant exactly: within a cell the around-average is linear in θ, and
/// ∫ sin θ (θ₁ − θ) dθ and ∫ sin θ (θ − θ₀) dθ have closed forms, so <see cref="InputIntegral"/> is the exact solid-angle
/// integral of what <see cref="IntensityPerUnitFlux"/> returns (times the normalisation).
/// </para>
/// <para>
/// Lookup allocates nothing; for uniformly spaced grids the cell index is found in O(1), otherwise by binary search.
/// Immutable and thread safe.
/// </para>
/// </remarks>
public sealed class TabulatedDistribution : BeamDistribution
{
    private const double TwoPi = 2.0 * Math.PI;

    // Closer nodes would make 1/width overflow or lose all precision.
    private const double MinimumStepRadians = 1e-9;

    private readonly double[] polar;
    private readonly double[] polarInverseWidth;
    private readonly bool polarUniform;
    private readonly double polarInverseStep;

    private readonly double[] aroundOffset; // around angles minus the first one, so aroundOffset[0] = 0
    private readonly double[] aroundInverseWidth; // per cell; the last entry is the wrap cell
    private readonly bool aroundUniform;
    private readonly double aroundInverseStep;
    private readonly double aroundStart;

    private readonly double[] normalised; // [around * polarCount + polar]
    private readonly int polarCount;
    private readonly int aroundCount;

    /// <summary>Creates the distribution from a grid of intensities in any unit (they are normalised).</summary>
    /// <param name="polarAngles">Polar angles from the axis, strictly increasing (steps ≥ 1e-9 rad), within [0°, 180°], at least two.</param>
    /// <param name="aroundAngles">
    /// Angles about the axis, strictly increasing (steps ≥ 1e-9 rad), within [0°, 360°], spanning at most 360°; one angle means axially symmetric.
    /// </param>
    /// <param name="values">Intensities, finite and ≥ 0, indexed [around index, polar index], not all zero.</param>
    /// <exception cref="InvalidInputException">When any of the above does not hold (every problem is listed).</exception>
    public TabulatedDistribution(IReadOnlyList<Angle> polarAngles, IReadOnlyList<Angle> aroundAngles, double[,] values)
    {
        ArgumentNullException.ThrowIfNull(polarAngles);
        ArgumentNullException.ThrowIfNull(aroundAngles);
        ArgumentNullException.ThrowIfNull(values);

        var errors = new List<ValidationError>();
        polarCount = polarAngles.Count;
        aroundCount = aroundAngles.Count;
        if (polarCount < 2)
        {
            errors.Add(new("polarAngles", $"needs at least 2 angles, got {polarCount}"));
        }

        if (aroundCount < 1)
        {
            errors.Add(new("aroundAngles", "needs at least 1 angle"));
        }

        CheckIncreasing(polarAngles, "polarAngles", Math.PI, errors);
        CheckIncreasing(aroundAngles, "aroundAngles", TwoPi, errors);
        if (aroundCount > 1 && aroundAngles[aroundCount - 1].Radians - aroundAngles[0].Radians > TwoPi + 1e-12)
        {
            errors.Add(new("aroundAngles", "must span at most 360°"));
        }

        if (values.GetLength(0) != aroundCount || values.GetLength(1) != polarCount)
        {
            errors.Add(new(
                "values",
                $"must be [{aroundCount} around, {polarCount} polar], got [{values.GetLength(0)}, {values.GetLength(1)}]"));
        }

        if (errors.Count == 0)
        {
            for (int a = 0; a < aroundCount && errors.Count < 20; a++)
            {
                for (int p = 0; p < polarCount && errors.Count < 20; p++)
                {
                    double v = values[a, p];
                    if (!double.IsFinite(v) || v < 0)
                    {
                        errors.Add(new($"values[{a},{p}]", $"must be finite and ≥ 0, got {v}"));
                    }
                }
            }
        }

        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        polar = new double[polarCount];
        for (int p = 0; p < polarCount; p++)
        {
            polar[p] = polarAngles[p].Radians;
        }

        polarInverseWidth = new double[polarCount - 1];
        for (int p = 0; p < polarCount - 1; p++)
        {
            polarInverseWidth[p] = 1.0 / (polar[p + 1] - polar[p]);
        }

        polarUniform = IsUniform(polar, polarCount);
        polarInverseStep = (polarCount - 1) / (polar[polarCount - 1] - polar[0]);

        aroundStart = aroundAngles[0].Radians;
        aroundOffset = new double[aroundCount];
        for (int a = 0; a < aroundCount; a++)
        {
            aroundOffset[a] = aroundAngles[a].Radians - aroundStart;
        }

        aroundInverseWidth = new double[aroundCount];
        for (int a = 0; a < aroundCount; a++)
        {
            double next = a + 1 < aroundCount ? aroundOffset[a + 1] : TwoPi;
            double width = next - aroundOffset[a];
            aroundInverseWidth[a] = width > 1e-12 ? 1.0 / width : 0.0;
        }

        aroundUniform = aroundCount > 1 && IsUniform(aroundOffset, aroundCount);
        aroundInverseStep = aroundCount > 1 ? (aroundCount - 1) / aroundOffset[aroundCount - 1] : 0.0;

        double[] raw = new double[aroundCount * polarCount];
        for (int a = 0; a < aroundCount; a++)
        {
            for (int p = 0; p < polarCount; p++)
            {
                raw[(a * polarCount) + p] = values[a, p];
            }
        }

        // Work relative to the peak so that tiny (even subnormal) or huge inputs normalise without overflow.
        double peak = 0.0;
        foreach (double v in raw)
        {
            peak = Math.Max(peak, v);
        }

        if (!(peak > 0))
        {
            throw new InvalidInputException("values", "are all zero: no light is emitted");
        }

        double[] relative = new double[raw.Length];
        for (int i = 0; i < raw.Length; i++)
        {
            relative[i] = raw[i] / peak;
        }

        double relativeIntegral = IntegrateInterpolant(relative);
        InputIntegral = relativeIntegral * peak;
        if (!(relativeIntegral > 0) || !double.IsFinite(InputIntegral))
        {
            throw new InvalidInputException("values", "integrate to zero or overflow: no usable light distribution");
        }

        normalised = new double[raw.Length];
        for (int i = 0; i < raw.Length; i++)
        {
            normalised[i] = relative[i] / relativeIntegral;
        }

        IsAxiallySymmetric = aroundCount == 1 || AllRowsEqual(raw);
        PolarAngles = [.. polarAngles];
        AroundAngles = [.. aroundAngles];
    }

    /// <summary>
    /// ∫ I dω over the sphere of the interpolated input values, in the input's unit × sr: for intensities in
    /// µmol s⁻¹ sr⁻¹ it is the total photon flux in µmol s⁻¹.
    /// </summary>
    public double InputIntegral { get; }

    /// <summary>The polar grid.</summary>
    public IReadOnlyList<Angle> PolarAngles { get; }

    /// <summary>The around grid.</summary>
    public IReadOnlyList<Angle> AroundAngles { get; }

    /// <inheritdoc />
    public override bool IsAxiallySymmetric { get; }

    /// <summary>The normalised grid value (sr⁻¹) at a node, indexed like the constructor's values.</summary>
    public double NodeIntensityPerUnitFlux(int aroundIndex, int polarIndex)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(aroundIndex);
        ArgumentOutOfRangeException.ThrowIfNegative(polarIndex);
        ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual(aroundIndex, aroundCount);
        ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual(polarIndex, polarCount);
        return normalised[(aroundIndex * polarCount) + polarIndex];
    }

    /// <inheritdoc />
    public override double IntensityPerUnitFlux(double polarRadians, double aroundRadians)
    {
        // Written as a negated range test so that NaN falls out as "no light".
        if (!(polarRadians >= polar[0] && polarRadians <= polar[polarCount - 1]))
        {
            return 0.0;
        }

        int p = FindPolarCell(polarRadians);
        double t = (polarRadians - polar[p]) * polarInverseWidth[p];
        if (aroundCount == 1)
        {
            return normalised[p] + (t * (normalised[p + 1] - normalised[p]));
        }

        double x = aroundRadians - aroundStart;
        if (!double.IsFinite(x))
        {
            return 0.0;
        }

        if (x < 0 || x >= TwoPi)
        {
            x -= TwoPi * Math.Floor(x / TwoPi);
            if (x >= TwoPi)
            {
                x = 0.0;
            }
        }

        int a = FindAroundCell(x);
        int a1 = a + 1 < aroundCount ? a + 1 : 0;
        double u = (x - aroundOffset[a]) * aroundInverseWidth[a];
        int row0 = a * polarCount;
        int row1 = a1 * polarCount;
        double v0 = normalised[row0 + p] + (t * (normalised[row0 + p + 1] - normalised[row0 + p]));
        double v1 = normalised[row1 + p] + (t * (normalised[row1 + p + 1] - normalised[row1 + p]));
        return v0 + (u * (v1 - v0));
    }

    private int FindPolarCell(double x)
    {
        int last = polarCount - 2;
        int i;
        if (polarUniform)
        {
            i = (int)((x - polar[0]) * polarInverseStep);
            if (i > last)
            {
                i = last;
            }
            else if (i < 0)
            {
                i = 0;
            }

            // Rounding in a "uniform" grid can put x one cell off; one step each way fixes it.
            if (i < last && x > polar[i + 1])
            {
                i++;
            }
            else if (i > 0 && x < polar[i])
            {
                i--;
            }

            return i;
        }

        int found = Array.BinarySearch(polar, x);
        i = found >= 0 ? found : ~found - 1;
        return Math.Clamp(i, 0, last);
    }

    // Returns the cell whose lower node is at or below x (x in [0, 2π)); cell aroundCount − 1 is the wrap cell.
    private int FindAroundCell(double x)
    {
        int last = aroundCount - 1;
        if (x >= aroundOffset[last])
        {
            return last;
        }

        int i;
        if (aroundUniform)
        {
            i = (int)(x * aroundInverseStep);
            if (i > last - 1)
            {
                i = last - 1;
            }

            if (i < last - 1 && x >= aroundOffset[i + 1])
            {
                i++;
            }
            else if (i > 0 && x < aroundOffset[i])
            {
                i--;
            }

            return i;
        }

        int found = Array.BinarySearch(aroundOffset, x);
        i = found >= 0 ? found : ~found - 1;
        return Math.Clamp(i, 0, last - 1);
    }

    private double IntegrateInterpolant(double[] raw)
    {
        double total = 0.0;
        for (int a = 0; a < aroundCount; a++)
        {
            double width;
            int a1;
            if (aroundCount == 1)
            {
                width = TwoPi;
                a1 = 0;
            }
            else
            {
                double next = a + 1 < aroundCount ? aroundOffset[a + 1] : TwoPi;
                width = next - aroundOffset[a];
                a1 = a + 1 < aroundCount ? a + 1 : 0;
            }

            if (width <= 0)
            {
                continue;
            }

            for (int p = 0; p < polarCount - 1; p++)
            {
                double th0 = polar[p];
                double th1 = polar[p + 1];
                double h = th1 - th0;

                // Around-average at each polar node (the bilinear interpolant is linear in the around angle).
                double m0 = 0.5 * (raw[(a * polarCount) + p] + raw[(a1 * polarCount) + p]);
                double m1 = 0.5 * (raw[(a * polarCount) + p + 1] + raw[(a1 * polarCount) + p + 1]);

                // ∫ sin θ (θ₁ − θ) dθ = h cos θ₀ + sin θ₀ − sin θ₁ ; ∫ sin θ (θ − θ₀) dθ = −h cos θ₁ + sin θ₁ − sin θ₀.
                double fa = (h * Math.Cos(th0)) + Math.Sin(th0) - Math.Sin(th1);
                double fb = (-h * Math.Cos(th1)) + Math.Sin(th1) - Math.Sin(th0);
                total += width * ((m0 * fa) + (m1 * fb)) / h;
            }
        }

        return total;
    }

    private bool AllRowsEqual(double[] raw)
    {
        for (int a = 1; a < aroundCount; a++)
        {
            for (int p = 0; p < polarCount; p++)
            {
                if (raw[(a * polarCount) + p] != raw[p])
                {
                    return false;
                }
            }
        }

        return true;
    }

    private static bool IsUniform(double[] grid, int count)
    {
        double step = (grid[count - 1] - grid[0]) / (count - 1);
        for (int i = 1; i < count; i++)
        {
            if (Math.Abs(grid[i] - grid[i - 1] - step) > 1e-9 * step)
            {
                return false;
            }
        }

        return true;
    }

    private static void CheckIncreasing(IReadOnlyList<Angle> angles, string path, double max, List<ValidationError> errors)
    {
        for (int i = 0; i < angles.Count; i++)
        {
            double r = angles[i].Radians;
            if (!double.IsFinite(r) || r < 0 || r > max + 1e-12)
            {
                errors.Add(new($"{path}[{i}]", $"must be within [0°, {max * 180 / Math.PI:0}°], got {angles[i]}"));
                return;
            }

            if (i > 0 && !(r - angles[i - 1].Radians >= MinimumStepRadians))
            {
                errors.Add(new($"{path}[{i}]", $"must exceed the angle before it ({angles[i - 1]}) by at least 1e-9 rad, got {angles[i]}"));
                return;
            }
        }
    }
}
