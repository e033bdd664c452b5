using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;

namespace CanopyAdvisor.Files.Photometry;

/// <summary>Turns a validated IES grid into a lamp-frame <see cref="TabulatedDistribution"/> (conventions in <see cref="IesReader"/>).</summary>
internal static class IesDistributionBuilder
{
    private const double DegreesToRadians = Angle.RadiansPerDegree;

    /// <summary>Builds the distribution of absolute intensities (file value × scale) and returns their integral as the flux.</summary>
    public static TabulatedDistribution Build(IesPhotometricType type, IesGrid grid, double scale, out double flux)
    {
        TabulatedDistribution d = type == IesPhotometricType.TypeC ? BuildTypeC(grid, scale) : BuildTypeAOrB(type, grid, scale);
        flux = d.InputIntegral;
        return d;
    }

    private static TabulatedDistribution BuildTypeC(IesGrid grid, double scale)
    {
        var (around, source) = ExpandHorizontal(grid.HorizontalAnglesDeg);
        int np = grid.VerticalAnglesDeg.Count;
        var values = new double[around.Length, np];
        for (int a = 0; a < around.Length; a++)
        {
            IReadOnlyList<double> column = grid.Values[source[a]];
            for (int p = 0; p < np; p++)
            {
                values[a, p] = column[p] * scale;
            }
        }

        return new TabulatedDistribution(
            [.. grid.VerticalAnglesDeg.Select(Angle.FromDegrees)],
            [.. around.Select(Angle.FromDegrees)],
            values);
    }

    /// <summary>
    /// The full set of around angles (degrees, increasing, within [0, 360]) and, for each, the file's horizontal angle index
    /// whose values it takes, applying the symmetry a type C file's horizontal range declares (LM-63-2002 §5, LM-63-19).
    /// </summary>
    internal static (double[] Angles, int[] Source) ExpandHorizontal(IReadOnlyList<double> horizontal)
    {
        int n = horizontal.Count;
        if (n == 1)
        {
            return ([0.0], [0]);
        }

        double first = horizontal[0];
        double last = horizontal[n - 1];
        var items = new List<(double Angle, int Source)>();
        bool full = Math.Abs(first) < 1e-6 && Math.Abs(last - 360) < 1e-6;
        for (int k = 0; k < n; k++)
        {
            double h = horizontal[k];
            items.Add((h, k));
            if (full)
            {
                continue;
            }

            if (Math.Abs(last - 90) < 1e-6)
            {
                // Symmetric in each quadrant: mirror about the 0–180° plane and the 90–270° plane.
                items.Add((180 - h, k));
                items.Add((180 + h, k));
                items.Add((360 - h, k));
            }
            else if (Math.Abs(last - 180) < 1e-6)
            {
                // Symmetric about the 0–180° plane: H and 360° − H match.
                items.Add((360 - h, k));
            }
            else
            {
                // 90–270°: symmetric about the 90–270° plane, so H and 180° − H match.
                items.Add((180 - h, k));
            }
        }

        var wrapped = items
            .Select(x => (Angle: full ? x.Angle : Wrap(x.Angle), x.Source))
            .OrderBy(x => x.Angle)
            .ToList();
        var angles = new List<double>(wrapped.Count);
        var sources = new List<int>(wrapped.Count);
        foreach (var (angle, src) in wrapped)
        {
            if (angles.Count > 0 && angle - angles[^1] < 1e-9)
            {
                continue;
            }

            angles.Add(angle);
            sources.Add(src);
        }

        return ([.. angles], [.. sources]);
    }

    private static double Wrap(double deg)
    {
        double w = deg % 360.0;
        if (w < 0)
        {
            w += 360.0;
        }

        return Math.Abs(w - 360.0) < 1e-9 ? 0.0 : w;
    }

    private static TabulatedDistribution BuildTypeAOrB(IesPhotometricType type, IesGrid grid, double scale)
    {
        var (h, hSource) = MirrorHalf(grid.HorizontalAnglesDeg);
        var (v, vSource) = MirrorHalf(grid.VerticalAnglesDeg);
        double finest = Math.Min(SmallestStep(h), SmallestStep(v));
        double step = finest < 2 ? 0.5 : finest < 4 ? 1.0 : 2.0;
        int np = (int)Math.Round(180 / step) + 1;
        int na = (int)Math.Round(360 / step);
        var values = new double[na, np];
        for (int a = 0; a < na; a++)
        {
            double c = a * step * DegreesToRadians;
            for (int p = 0; p < np; p++)
            {
                double g = p * step * DegreesToRadians;
                double x = Math.Sin(g) * Math.Cos(c);
                double y = Math.Sin(g) * Math.Sin(c);
                double z = Math.Cos(g);
                double hDeg;
                double vDeg;
                if (type == IesPhotometricType.TypeB)
                {
                    // d = cos H (sin V R + cos V A) − sin H L
                    hDeg = Math.Asin(Math.Clamp(-y, -1, 1)) / DegreesToRadians;
                    vDeg = Math.Atan2(x, z) / DegreesToRadians;
                }
                else
                {
                    // d = cos V (cos H R − sin H L) − sin V A
                    vDeg = Math.Asin(Math.Clamp(-z, -1, 1)) / DegreesToRadians;
                    hDeg = Math.Atan2(-y, x) / DegreesToRadians;
                }

                values[a, p] = Bilinear(h, hSource, v, vSource, grid.Values, hDeg, vDeg) * scale;
            }
        }

        return new TabulatedDistribution(
            [.. Enumerable.Range(0, np).Select(i => Angle.FromDegrees(i * step))],
            [.. Enumerable.Range(0, na).Select(i => Angle.FromDegrees(i * step))],
            values);
    }

    // A type A/B list starting at 0° gives one half; the other half is its mirror image (LM-63: symmetric files).
    private static (double[] Angles, int[] Source) MirrorHalf(IReadOnlyList<double> angles)
    {
        int n = angles.Count;
        if (Math.Abs(angles[0]) > 1e-6)
        {
            return ([.. angles], [.. Enumerable.Range(0, n)]);
        }

        var a = new double[(2 * n) - 1];
        var s = new int[(2 * n) - 1];
        for (int k = 0; k < n; k++)
        {
            a[n - 1 - k] = -angles[k];
            s[n - 1 - k] = k;
            a[n - 1 + k] = angles[k];
            s[n - 1 + k] = k;
        }

        return (a, s);
    }

    private static double SmallestStep(double[] grid)
    {
        double smallest = double.PositiveInfinity;
        for (int k = 1; k < grid.Length; k++)
        {
            smallest = Math.Min(smallest, grid[k] - grid[k - 1]);
        }

        return smallest;
    }

    private static double Bilinear(
        double[] h,
        int[] hSource,
        double[] v,
        int[] vSource,
        IReadOnlyList<IReadOnlyList<double>> values,
        double hDeg,
        double vDeg)
    {
        const double Slack = 1e-9;
        if (hDeg < h[0] - Slack || hDeg > h[^1] + Slack || vDeg < v[0] - Slack || vDeg > v[^1] + Slack)
        {
            return 0.0;
        }

        int i = Cell(h, hDeg);
        int j = Cell(v, vDeg);
        double t = Math.Clamp((hDeg - h[i]) / (h[i + 1] - h[i]), 0, 1);
        double u = Math.Clamp((vDeg - v[j]) / (v[j + 1] - v[j]), 0, 1);
        double q00 = values[hSource[i]][vSource[j]];
        double q01 = values[hSource[i]][vSource[j + 1]];
        double q10 = values[hSource[i + 1]][vSource[j]];
        double q11 = values[hSource[i + 1]][vSource[j + 1]];
        return ((1 - t) * ((1 - u) * q00 + (u * q01))) + (t * (((1 - u) * q10) + (u * q11)));
    }

    private static int Cell(double[] grid, double x)
    {
        int found = Array.BinarySearch(grid, x);
        int i = found >= 0 ? found : ~found - 1;
        return Math.Clamp(i, 0, grid.Length - 2);
    }
}
