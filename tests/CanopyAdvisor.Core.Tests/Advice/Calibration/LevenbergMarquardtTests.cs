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

    // NIST StRD MGH10 (Meyer 1970; Moré, Garbow & Hillstrom 1981, problem 10; higher difficulty, generated data):
    // y = b1·exp(b2 / (x + b3)), 16 observations. Certified b1 = 5.6096364710E-03 (sd 1.5687892471E-04),
    // b2 = 6.1813463463E+03 (2.3309021107E+01), b3 = 3.4522363462E+02 (7.8486103508E-01), residual sum of squares
    // 8.7945855171E+01 (the NIST data file as reproduced in several public test suites).
    private static readonly double[] MghX = [50, 55, 60, 65, 70, 75, 80, 85, 90, 95, 100, 105, 110, 115, 120, 125];
    private static readonly double[] MghY = [34780, 28610, 23650, 19630, 16370, 13720, 11540, 9744, 8261, 7030, 6005, 5147, 4427, 3820, 3307, 2872];

    private static double[] MghResiduals(double[] b) => [.. MghX.Select((x, i) => (b[0] * Math.Exp(b[1] / (x + b[2]))) - MghY[i])];

    private static double[,] MghJacobian(double[] b, double[] r)
    {
        var j = new double[MghX.Length, 3];
        for (int i = 0; i < MghX.Length; i++)
        {
            double d = MghX[i] + b[2];
            double e = Math.Exp(b[1] / d);
            j[i, 0] = e;
            j[i, 1] = b[0] * e / d;
            j[i, 2] = -b[0] * b[1] * e / (d * d);
        }

        return j;
    }

    // From NIST start 1 (2, 400000, 25000) this minimiser does not reach the solution: its first near Gauss–Newton step
    // takes b1 towards 0, where the model is flat, and it stops there (a trust-region method with a bounded first step,
    // as in MINPACK, gets through). The calibration always starts from the crop's own values inside a bounded box, so
    // only start 2 is a check here; the limitation is recorded in the minimiser's remarks.
    [Theory]
    [InlineData(0.02, 4000, 250)] // NIST start 2
    public void Mgh10_a_hard_problem_reaches_the_certified_values_from_the_nearer_start(double b1, double b2, double b3)
    {
        double[] low = [double.NegativeInfinity, double.NegativeInfinity, double.NegativeInfinity];
        double[] high = [double.PositiveInfinity, double.PositiveInfinity, double.PositiveInfinity];
        LevenbergMarquardtResult fit = LevenbergMarquardt.Minimize(MghResiduals, MghJacobian, [b1, b2, b3], low, high, 2000, 1e-14);

        Assert.Equal(5.6096364710E-03, fit.Point[0], 5.6096364710E-03 * 1e-6);
        Assert.Equal(6.1813463463E+03, fit.Point[1], 6.1813463463E+03 * 1e-6);
        Assert.Equal(3.4522363462E+02, fit.Point[2], 3.4522363462E+02 * 1e-6);
        Assert.Equal(8.7945855171E+01, fit.SumOfSquares, 8.7945855171E+01 * 1e-7);
        Matrix<double> covariance = fit.Covariance()!;
        Assert.Equal(1.5687892471E-04, Math.Sqrt(covariance[0, 0]), 1.5687892471E-04 * 1e-4);
        Assert.Equal(2.3309021107E+01, Math.Sqrt(covariance[1, 1]), 2.3309021107E+01 * 1e-4);
        Assert.Equal(7.8486103508E-01, Math.Sqrt(covariance[2, 2]), 7.8486103508E-01 * 1e-4);
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
