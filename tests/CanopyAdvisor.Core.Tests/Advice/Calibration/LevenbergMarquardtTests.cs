using CanopyAdvisor.Core.Advice.Calibration;
using MathNet.Numerics.LinearAlgebra;

namespace CanopyAdvisor.Core.Tests.Advice.Calibration;

/// <summary>The minimiser against a published nonlinear least-squares problem with certified values.</summary>
/// <remarks>
/// Source: NIST Statistical Reference Datasets, nonlinear regression, Misra1a (Misra, D., NIST 1978, dental research
/// monomolecular adsorption; lower difficulty): y = b1·(1 − exp(−b2·x)), 14 observations, two starting points.
/// Certified b1 = 2.3894212918E+02 (standard deviation 2.7070075241E+00), b2 = 5.5015643181E-04 (7.2668688436E-06),
/// residual sum of squares 1.2455138894E-01, residual standard deviation 1.0187876330E-01 (12 degrees of freedom).
/// Data and certified values as reproduced in several public test suites (itl.nist.gov/div898/strd/nls/data/misra1a.shtml).
/// </remarks>
public class LevenbergMarquardtTests
{
    private static readonly double[] Y = [10.07, 14.73, 17.94, 23.93, 29.61, 35.18, 40.02, 44.82, 50.76, 55.05, 61.01, 66.40, 75.47, 81.78];
    private static readonly double[] X = [77.6, 114.9, 141.1, 190.8, 239.9, 289.0, 332.8, 378.4, 434.8, 477.3, 536.8, 593.1, 689.1, 760.0];

    private const double CertifiedB1 = 2.3894212918E+02;
    private const double CertifiedB2 = 5.5015643181E-04;
    private const double CertifiedSe1 = 2.7070075241E+00;
    private const double CertifiedSe2 = 7.2668688436E-06;
    private const double CertifiedSsr = 1.2455138894E-01;
    private const double CertifiedResidualSd = 1.0187876330E-01;

    private static double[] Residuals(double[] b) => [.. X.Select((x, i) => (b[0] * (1 - Math.Exp(-b[1] * x))) - Y[i])];

    private static double[,] AnalyticJacobian(double[] b, double[] r)
    {
        var j = new double[X.Length, 2];
        for (int i = 0; i < X.Length; i++)
        {
            double e = Math.Exp(-b[1] * X[i]);
            j[i, 0] = 1 - e;
            j[i, 1] = b[0] * X[i] * e;
        }

        return j;
    }

    private static readonly double[] None = [double.NegativeInfinity, double.NegativeInfinity];
    private static readonly double[] NoneAbove = [double.PositiveInfinity, double.PositiveInfinity];

    [Theory]
    [InlineData(500, 1e-4)] // NIST start 1
    [InlineData(250, 5e-4)] // NIST start 2
    public void Misra1a_reaches_the_certified_values_with_an_analytic_jacobian(double b1, double b2)
    {
        LevenbergMarquardtResult fit = LevenbergMarquardt.Minimize(Residuals, AnalyticJacobian, [b1, b2], None, NoneAbove, 200, 1e-12);

        Assert.True(fit.Converged);
        // NIST asks for agreement to about 6 significant digits or better; these hold to 1e-7 relative.
        Assert.Equal(CertifiedB1, fit.Point[0], CertifiedB1 * 1e-7);
        Assert.Equal(CertifiedB2, fit.Point[1], CertifiedB2 * 1e-7);
        Assert.Equal(CertifiedSsr, fit.SumOfSquares, CertifiedSsr * 1e-7);
        Assert.Equal(CertifiedResidualSd, Math.Sqrt(fit.ResidualVariance), CertifiedResidualSd * 1e-7);
        Matrix<double> covariance = fit.Covariance()!;
        Assert.Equal(CertifiedSe1, Math.Sqrt(covariance[0, 0]), CertifiedSe1 * 1e-5);
        Assert.Equal(CertifiedSe2, Math.Sqrt(covariance[1, 1]), CertifiedSe2 * 1e-5);
    }

    [Fact]
    public void Misra1a_reaches_the_certified_values_with_forward_differences()
    {
        // The calibration's own Jacobian path: one shifted evaluation per parameter. Steps about 1e-7 of each value.
        double[] steps = [1e-5, 1e-10];
        LevenbergMarquardtResult fit = LevenbergMarquardt.Minimize(
            Residuals, (b, r) => LevenbergMarquardt.ForwardDifference(Residuals, b, r, steps, NoneAbove), [500, 1e-4], None, NoneAbove, 200, 1e-12);

        Assert.Equal(CertifiedB1, fit.Point[0], CertifiedB1 * 1e-6);
        Assert.Equal(CertifiedB2, fit.Point[1], CertifiedB2 * 1e-6);
        Matrix<double> covariance = fit.Covariance()!;
        Assert.Equal(CertifiedSe1, Math.Sqrt(covariance[0, 0]), CertifiedSe1 * 1e-3);
        Assert.Equal(CertifiedSe2, Math.Sqrt(covariance[1, 1]), CertifiedSe2 * 1e-3);
    }

    [Fact]
    public void A_bound_holds_and_the_other_parameter_is_then_optimal_for_it()
    {
        // With b1 held at most 230 (below the certified 238.94), the fit ends on the bound; b2 is then the 1-D
        // least-squares optimum for b1 = 230, where the derivative of the sum of squares in b2 vanishes.
        LevenbergMarquardtResult fit = LevenbergMarquardt.Minimize(
            Residuals, AnalyticJacobian, [200, 5e-4], [double.NegativeInfinity, double.NegativeInfinity], [230, double.PositiveInfinity], 200, 1e-12);

        Assert.Equal(230, fit.Point[0]);
        double[,] j = AnalyticJacobian(fit.Point, fit.Residuals);
        double gradientB2 = Enumerable.Range(0, X.Length).Sum(i => j[i, 1] * fit.Residuals[i]);
        double scale = Math.Sqrt(Enumerable.Range(0, X.Length).Sum(i => j[i, 1] * j[i, 1]) * fit.SumOfSquares);
        Assert.True(Math.Abs(gradientB2) < 1e-6 * scale, $"gradient in b2 {gradientB2} (scale {scale})");
        Assert.True(fit.SumOfSquares > CertifiedSsr);
    }

    [Fact]
    public void A_parameter_without_effect_gives_no_covariance()
    {
        // y = b1·x with a second parameter that does not enter: JᵀJ is singular (a closed-form case).
        double[] Model(double[] b) => [.. X.Select((x, i) => (b[0] * x) - Y[i])];
        LevenbergMarquardtResult fit = LevenbergMarquardt.Minimize(
            Model, (b, r) => LevenbergMarquardt.ForwardDifference(Model, b, r, [1e-6, 1e-6], NoneAbove), [0.1, 1], None, NoneAbove, 50, 1e-10);

        // Linear least squares through the origin: b1 = Σxy / Σx² (closed form).
        double expected = X.Select((x, i) => x * Y[i]).Sum() / X.Sum(x => x * x);
        Assert.Equal(expected, fit.Point[0], 1e-8);
        Assert.Null(fit.Covariance());
    }
}
