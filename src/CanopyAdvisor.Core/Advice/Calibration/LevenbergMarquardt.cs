using MathNet.Numerics.LinearAlgebra;

namespace CanopyAdvisor.Core.Advice.Calibration;

/// <summary>A bounded Levenberg–Marquardt least-squares minimiser for a few parameters and a costly model.</summary>
/// <remarks>
/// <para>Method: Levenberg (1944, Q. Appl. Math. 2:164) and Marquardt (1963, J. SIAM 11:431): each iteration solves
/// (JᵀJ + μ·D) δ = −Jᵀr for the step δ, with D the diagonal of JᵀJ (Marquardt's scaling, so parameters of different
/// magnitudes are treated alike), each element kept at the largest value seen so far (Moré 1978, "The
/// Levenberg–Marquardt algorithm: implementation and theory", in Numerical Analysis, ed. G. A. Watson, Springer, pp. 105–116, from memory). The
/// dimensionless damping μ starts at 10⁻³ and is updated by the gain ratio ρ = actual / predicted reduction of the
/// cost, as in Madsen, Nielsen &amp; Tingleff (2004), <i>Methods for non-linear least squares problems</i>, DTU,
/// algorithm 3.16 (from memory): accepted steps shrink μ by max(1/3, 1 − (2ρ − 1)³), rejected ones grow it by ν, which
/// doubles after each rejection.</para>
/// <para>Bounds: parameters on a bound that the step would push outward are held for that step (their rows and
/// columns leave the system), and what remains of the step is clipped to the box [lower, upper] (a projected step);
/// the predicted reduction is computed for the final step, so the gain ratio stays honest at a bound.</para>
/// <para>Stopping: after an accepted step whose relative reduction of the cost, actual and predicted, are both below the
/// tolerance (MINPACK's <c>ftol</c> test), or a step that moves every parameter by at most tolerance × (|u_k| + tolerance), or a cost of zero, or a
/// zero gradient; otherwise after the maximum number of Jacobians. Deterministic: no randomness, no threads of its own.</para>
/// <para>Checked against NIST StRD Misra1a (both starts) and MGH10 (start 2). Limitation: from MGH10's far start 1 the
/// first, nearly Gauss–Newton step sends b1 towards 0 where the model is flat, and the search stops there; a
/// trust-region bound on the first step (as in MINPACK) would be needed for such starts. The calibration starts from
/// the crop's own values in a bounded box searched in log space, where this does not arise in the tests.</para>
/// </remarks>
internal static class LevenbergMarquardt
{
    private const double InitialDampingFactor = 1e-3;

    /// <summary>Minimises ½‖r(u)‖² within a box.</summary>
    /// <param name="residuals">The residual vector at a point.</param>
    /// <param name="jacobian">The Jacobian (rows = residuals, columns = parameters) at a point, given its residuals.</param>
    /// <param name="start">The starting point (clipped into the box).</param>
    /// <param name="lower">Lower bounds (−∞ for none).</param>
    /// <param name="upper">Upper bounds (+∞ for none).</param>
    /// <param name="maxIterations">The most Jacobians to evaluate.</param>
    /// <param name="tolerance">The relative tolerance of the stopping tests.</param>
    /// <param name="iterationDone">Called with the iteration count after each Jacobian.</param>
    /// <param name="cancellationToken">Checked before every model evaluation.</param>
    public static LevenbergMarquardtResult Minimize(
        Func<double[], double[]> residuals,
        Func<double[], double[], double[,]> jacobian,
        double[] start,
        double[] lower,
        double[] upper,
        int maxIterations,
        double tolerance,
        Action<int>? iterationDone = null,
        CancellationToken cancellationToken = default)
    {
        int n = start.Length;
        double[] u = new double[n];
        for (int k = 0; k < n; k++)
        {
            u[k] = Math.Clamp(start[k], lower[k], upper[k]);
        }

        cancellationToken.ThrowIfCancellationRequested();
        double[] r = residuals(u);
        double cost = HalfSquare(r);
        double initialCost = cost;
        double mu = -1;
        double nu = 2;
        int iterations = 0;
        int evaluations = 1;
        bool converged = false;
        double[,]? j = null;
        Vector<double>? diagonal = null;
        bool stale = true;
        while (iterations < maxIterations && !converged)
        {
            cancellationToken.ThrowIfCancellationRequested();
            j = jacobian(u, r);
            stale = false;
            iterations++;
            (Matrix<double> a, Vector<double> g) = Normal(j, r);
            iterationDone?.Invoke(iterations);
            if (cost == 0 || g.InfinityNorm() == 0)
            {
                converged = true;
                break;
            }

            // Moré's (1978) scaling: each parameter's damping weight is the largest diagonal element of JᵀJ seen so far,
            // so a column that is small at one point does not leave its parameter undamped.
            Vector<double> current = a.Diagonal();
            diagonal = diagonal is null ? current.Map(d => d > 0 ? d : 1.0) : diagonal.MapIndexed((k, d) => Math.Max(d, current[k]));
            if (mu < 0)
            {
                mu = InitialDampingFactor;
            }

            // Inner loop: raise the damping until a step lowers the cost (or the step becomes negligible).
            while (true)
            {
                Vector<double> step = BoundedStep(a, g, diagonal * mu, u, lower, upper);
                double[] trial = new double[n];
                bool negligible = true;
                for (int k = 0; k < n; k++)
                {
                    trial[k] = Math.Clamp(u[k] + step[k], lower[k], upper[k]);
                    step[k] = trial[k] - u[k];
                    negligible &= Math.Abs(step[k]) <= tolerance * (Math.Abs(u[k]) + tolerance);
                }

                if (!step.All(double.IsFinite) || negligible)
                {
                    converged = true;
                    break;
                }

                // Predicted reduction of the linear model for the (clipped) step: −(gᵀδ + ½ δᵀAδ).
                double predicted = -(g.DotProduct(step) + (0.5 * step.DotProduct(a * step)));
                cancellationToken.ThrowIfCancellationRequested();
                double[] trialResiduals = residuals(trial);
                evaluations++;
                double trialCost = HalfSquare(trialResiduals);
                double actual = cost - trialCost;
                double rho = predicted > 0 ? actual / predicted : -1;
                if (actual > 0 && rho > 0)
                {
                    u = trial;
                    r = trialResiduals;
                    stale = true;
                    double before = cost;
                    cost = trialCost;
                    mu *= Math.Max(1.0 / 3.0, 1 - Math.Pow((2 * rho) - 1, 3));
                    nu = 2;
                    if (actual <= tolerance * before && predicted <= tolerance * before)
                    {
                        converged = true;
                    }

                    break;
                }

                mu *= nu;
                nu *= 2;
                if (!double.IsFinite(mu) || mu > 1e30)
                {
                    // No step lowers the cost any more: a minimum to the precision of the model.
                    converged = true;
                    break;
                }
            }
        }

        if (stale || j is null)
        {
            j = jacobian(u, r);
        }

        return new LevenbergMarquardtResult(u, r, j, 2 * cost, 2 * initialCost, iterations, evaluations, converged);
    }

    /// <summary>The damped Gauss–Newton step with parameters held that sit on a bound and would be pushed out of the box
    /// (a simple active set): their rows and columns leave the system, so the free parameters get the step that is best
    /// for the held ones' values rather than a joint step cut short by clipping.</summary>
    private static Vector<double> BoundedStep(Matrix<double> a, Vector<double> g, Vector<double> damping, double[] u, double[] lower, double[] upper)
    {
        int n = u.Length;
        bool[] held = new bool[n];
        while (true)
        {
            int[] free = [.. Enumerable.Range(0, n).Where(k => !held[k])];
            Vector<double> step = Vector<double>.Build.Dense(n);
            if (free.Length > 0)
            {
                Matrix<double> reduced = Matrix<double>.Build.Dense(free.Length, free.Length, (r, c) => a[free[r], free[c]] + (r == c ? damping[free[r]] : 0));
                Vector<double> rhs = Vector<double>.Build.Dense(free.Length, r => -g[free[r]]);
                Vector<double> solved = reduced.Solve(rhs);
                for (int r = 0; r < free.Length; r++)
                {
                    step[free[r]] = solved[r];
                }
            }

            bool changed = false;
            foreach (int k in free)
            {
                if ((u[k] <= lower[k] && step[k] < 0) || (u[k] >= upper[k] && step[k] > 0))
                {
                    held[k] = true;
                    changed = true;
                }
            }

            if (!changed)
            {
                return step;
            }
        }
    }

    /// <summary>A forward-difference Jacobian: column k from one model run at u + h_k e_k (or u − h_k e_k when the upper
    /// bound is closer than h_k).</summary>
    /// <param name="residuals">The residual vector at a point.</param>
    /// <param name="u">The point.</param>
    /// <param name="r">The residuals at the point.</param>
    /// <param name="steps">The difference step of each parameter.</param>
    /// <param name="upper">Upper bounds.</param>
    public static double[,] ForwardDifference(Func<double[], double[]> residuals, double[] u, double[] r, double[] steps, double[] upper)
    {
        int n = u.Length;
        var columns = new double[n][];
        var h = new double[n];
        for (int k = 0; k < n; k++)
        {
            h[k] = u[k] + steps[k] > upper[k] ? -steps[k] : steps[k];
            double[] shifted = (double[])u.Clone();
            shifted[k] += h[k];
            columns[k] = residuals(shifted);
        }

        return Assemble(columns, r, h);
    }

    /// <summary>The Jacobian from the residuals of shifted points: column k = (r(u + h_k e_k) − r(u)) / h_k.</summary>
    public static double[,] Assemble(double[][] shiftedResiduals, double[] r, double[] h)
    {
        int m = r.Length;
        int n = h.Length;
        var j = new double[m, n];
        for (int k = 0; k < n; k++)
        {
            for (int i = 0; i < m; i++)
            {
                j[i, k] = (shiftedResiduals[k][i] - r[i]) / h[k];
            }
        }

        return j;
    }

    private static (Matrix<double> A, Vector<double> G) Normal(double[,] j, double[] r)
    {
        Matrix<double> jm = Matrix<double>.Build.DenseOfArray(j);
        Vector<double> rv = Vector<double>.Build.DenseOfArray(r);
        return (jm.TransposeThisAndMultiply(jm), jm.TransposeThisAndMultiply(rv));
    }

    private static double HalfSquare(double[] r)
    {
        double sum = 0;
        foreach (double x in r)
        {
            sum += x * x;
        }

        return 0.5 * sum;
    }
}
