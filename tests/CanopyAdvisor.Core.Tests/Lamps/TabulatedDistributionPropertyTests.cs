using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CsCheck;

namespace CanopyAdvisor.Core.Tests.Lamps;

// Property: any valid grid (irregular angles, partial polar range, partial around range) normalises so that a
// quadrature of the lookups over the sphere gives 1 (definition of the normalisation), and every lookup is finite and
// ≥ 0. The quadrature is aligned with the grid cells: 5-point Gauss–Legendre in the polar angle (the integrand is
// linear × sin θ, smooth within a cell) and 2-point in the around angle (linear within a cell, so exact); the
// closed-form integral inside TabulatedDistribution is not used. Tolerance 1e-6.
public class TabulatedDistributionPropertyTests
{
    private static readonly Gen<TabulatedDistribution> Grids =
        Gen.Select(Gen.Double[0.05, 1].Array[2, 12], Gen.Double[0.05, 1].Array[1, 8], Gen.Double[0, 1].Array[96], Gen.Double[0, 180], Gen.Double[0, 360])
            .Select((polarSteps, aroundSteps, values, polarStartDeg, aroundStartDeg) =>
            {
                // Angles from cumulative positive steps, scaled into a random sub-range.
                double[] polar = Cumulative(polarSteps);
                double first = Math.Min(polarStartDeg, 170);
                double span = 180 - first;
                Angle[] polarAngles = [.. polar.Select(p => Angle.FromDegrees(first + (span * p)))];
                double[] around = Cumulative(aroundSteps);
                double aroundSpan = aroundSteps.Length == 1 ? 0 : 359;
                Angle[] aroundAngles = [.. around.Select(a => Angle.FromDegrees((aroundStartDeg * (aroundSteps.Length == 1 ? 0 : 0.001)) + (aroundSpan * a)))];
                var grid = new double[aroundAngles.Length, polarAngles.Length];
                for (int a = 0; a < aroundAngles.Length; a++)
                {
                    for (int p = 0; p < polarAngles.Length; p++)
                    {
                        grid[a, p] = values[((a * polarAngles.Length) + p) % values.Length] + (a == 0 && p == 0 ? 0.1 : 0);
                    }
                }

                return new TabulatedDistribution(polarAngles, aroundAngles, grid);
            });

    private static double[] Cumulative(double[] steps)
    {
        double[] x = new double[steps.Length];
        double total = 0;
        for (int i = 1; i < steps.Length; i++)
        {
            total += steps[i];
            x[i] = total;
        }

        return [.. x.Select(v => total > 0 ? v / total : 0)];
    }

    [Fact]
    public void Any_valid_grid_integrates_to_one()
    {
        Grids.Sample(
            d =>
            {
                Assert.Equal(1.0, CellAlignedIntegral(d), 6);
                for (int k = 0; k < 50; k++)
                {
                    double i = d.IntensityPerUnitFlux(k * 0.0641, (k * 0.77) - 10);
                    Assert.True(double.IsFinite(i) && i >= 0);
                }
            },
            iter: 300);
    }

    private static readonly double[] GaussNodes5 = [-0.9061798459386640, -0.5384693101056831, 0, 0.5384693101056831, 0.9061798459386640];
    private static readonly double[] GaussWeights5 = [0.2369268850561891, 0.4786286704993665, 0.5688888888888889, 0.4786286704993665, 0.2369268850561891];
    private static readonly double[] GaussNodes2 = [-0.5773502691896258, 0.5773502691896258];

    private static double CellAlignedIntegral(TabulatedDistribution d)
    {
        double[] polar = [.. d.PolarAngles.Select(a => a.Radians)];
        var around = d.AroundAngles.Select(a => a.Radians).ToList();
        around.Add(around[0] + (2 * Math.PI));
        double total = 0;
        for (int p = 0; p + 1 < polar.Length; p++)
        {
            double tMid = (polar[p] + polar[p + 1]) / 2;
            double tHalf = (polar[p + 1] - polar[p]) / 2;
            for (int a = 0; a + 1 < around.Count; a++)
            {
                double pMid = (around[a] + around[a + 1]) / 2;
                double pHalf = (around[a + 1] - around[a]) / 2;
                for (int i = 0; i < 5; i++)
                {
                    double t = tMid + (tHalf * GaussNodes5[i]);
                    foreach (double x in GaussNodes2)
                    {
                        total += GaussWeights5[i] * tHalf * pHalf * Math.Sin(t) * d.IntensityPerUnitFlux(t, pMid + (pHalf * x));
                    }
                }
            }
        }

        return total;
    }
}
