using MathNet.Numerics.LinearAlgebra;

namespace CanopyAdvisor.Core.Advice.Calibration;

/// <summary>The outcome of <see cref="LevenbergMarquardt.Minimize"/>: the point, its residuals and Jacobian, and how the
/// search ended.</summary>
/// <param name="Point">The minimising point.</param>
/// <param name="Residuals">The residuals there.</param>
/// <param name="Jacobian">The Jacobian there (rows = residuals, columns = parameters).</param>
/// <param name="SumOfSquares">‖r‖² at the point.</param>
/// <param name="InitialSumOfSquares">‖r‖² at the start.</param>
/// <param name="Iterations">Jacobians evaluated in the search.</param>
/// <param name="Evaluations">Residual evaluations (not counting Jacobian columns).</param>
/// <param name="Converged">Whether a stopping test held before the iteration limit.</param>
internal sealed record LevenbergMarquardtResult(
    double[] Point, double[] Residuals, double[,] Jacobian, double SumOfSquares, double InitialSumOfSquares, int Iterations,
    int Evaluations, bool Converged)
{
    /// <summary>Degrees of freedom: residuals minus parameters.</summary>
    public int DegreesOfFreedom => Residuals.Length - Point.Length;

    /// <summary>The residual variance σ² = ‖r‖² / (m − n), NaN without degrees of freedom.</summary>
    public double ResidualVariance => DegreesOfFreedom > 0 ? SumOfSquares / DegreesOfFreedom : double.NaN;

    /// <summary>The covariance of the parameters, σ²(JᵀJ)⁻¹ (the usual linearised estimate at the optimum, e.g. Seber
    /// &amp; Wild 1989, Nonlinear Regression, §2.1, from memory). Computed on JᵀJ scaled to unit diagonal for
    /// conditioning; null when JᵀJ is singular to working precision (reciprocal condition number below 10⁻¹²) or a
    /// parameter has no effect at all.</summary>
    public Matrix<double>? Covariance()
    {
        Matrix<double> jm = Matrix<double>.Build.DenseOfArray(Jacobian);
        Matrix<double> a = jm.TransposeThisAndMultiply(jm);
        int n = a.RowCount;
        var scale = new double[n];
        for (int k = 0; k < n; k++)
        {
            if (!(a[k, k] > 0) || !double.IsFinite(a[k, k]))
            {
                return null;
            }

            scale[k] = 1 / Math.Sqrt(a[k, k]);
        }

        Matrix<double> d = Matrix<double>.Build.DenseOfDiagonalArray(scale);
        Matrix<double> scaled = d * a * d;
        if (scaled.ConditionNumber() > 1e12)
        {
            return null;
        }

        double variance = ResidualVariance;
        return d * scaled.Inverse() * d * (double.IsNaN(variance) ? double.NaN : variance);
    }
}
