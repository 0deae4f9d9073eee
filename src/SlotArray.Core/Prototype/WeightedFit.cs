using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.LinearAlgebra.Factorization;
using MathNet.Numerics.Optimization;

namespace SlotArray.Core.Prototype;

/// <summary>One fitted parameter: value, standard error, 95 % confidence interval.</summary>
/// <param name="Name">What it is, in words.</param>
/// <param name="Value">Fitted value.</param>
/// <param name="StandardError">1σ from the Jacobian and the noise estimated from the residual.</param>
internal sealed record FittedValue(string Name, double Value, double StandardError)
{
    /// <summary>Half-width of the 95 % confidence interval (1.96σ, normal approximation).</summary>
    public double Interval95 => 1.96 * StandardError;

    /// <summary>Whether <paramref name="x"/> lies inside the 95 % interval.</summary>
    public bool Contains(double x) => Math.Abs(x - Value) <= Interval95;
}

/// <summary>The outcome of one weighted least-squares fit.</summary>
/// <param name="Values">Fitted parameters in the order given.</param>
/// <param name="Jacobian">Jacobian of the weighted residuals at the solution (data rows only, no regularisation rows).</param>
/// <param name="Correlation">Correlation matrix of the parameters.</param>
/// <param name="ResidualRms">RMS of the weighted data residuals (1 when the noise estimate is right).</param>
/// <param name="NoiseScale">√(χ²/(m − p)): the factor by which the residual says the assumed noise is off; the standard errors include it.</param>
/// <param name="ConditionNumber">Ratio of the largest to the smallest singular value of the data Jacobian.</param>
/// <param name="Iterations">Levenberg–Marquardt iterations.</param>
/// <param name="Converged">Whether the minimiser stopped on a tolerance (not on its iteration limit).</param>
/// <param name="Normal">JᵀJ of the data Jacobian.</param>
/// <param name="Resolution">The model resolution matrix (JᵀJ + Λ)⁻¹JᵀJ (W. Menke, <i>Geophysical Data Analysis</i>, 3rd ed.,
/// 2012, Sec. 4.7, from memory): the identity without regularisation and full rank; a diagonal entry near 0 marks a
/// parameter the data leave to the regularisation.</param>
internal sealed record WeightedFitResult(IReadOnlyList<FittedValue> Values, Matrix<double> Jacobian, Matrix<double> Correlation,
    double ResidualRms, double NoiseScale, double ConditionNumber, int Iterations, bool Converged, Matrix<double> Normal, Matrix<double> Resolution);

/// <summary>
/// Weighted, optionally regularised non-linear least squares by MathNet's Levenberg–Marquardt minimiser
/// (K. Levenberg, Q. Appl. Math. 2, 1944; D. W. Marquardt, J. SIAM 11, 1963), with the parameter covariance
/// s² (JᵀJ + λ²I)⁻¹ JᵀJ (JᵀJ + λ²I)⁻¹ from the Jacobian J of the weighted residuals and s² = χ²/(m − p) the noise
/// variance the residual implies (W. H. Press et al., <i>Numerical Recipes</i>, 3rd ed., Cambridge 2007, Sec. 15.5
/// and 15.6, from memory; the sandwich form for Tikhonov regularisation: W. Menke, <i>Geophysical Data Analysis:
/// Discrete Inverse Theory</i>, 3rd ed., Academic Press 2012, Sec. 3.7 and 4.4, from memory). The Jacobian is the
/// caller's (for a model linear in most of its parameters, whose columns are cheap in closed form) or else by central
/// differences of the model with the caller's steps.
/// </summary>
internal static class WeightedFit
{
    /// <summary>Relative step size at which the minimiser stops: 1e-9.</summary>
    public const double StepTolerance = 1e-9;

    /// <summary>Fits <paramref name="model"/> to <paramref name="observed"/>.</summary>
    /// <param name="names">Parameter names.</param>
    /// <param name="model">The model's predicted data for a parameter vector.</param>
    /// <param name="observed">Measured data.</param>
    /// <param name="sigma">Assumed 1σ noise of each datum (&gt; 0).</param>
    /// <param name="start">Starting parameters.</param>
    /// <param name="steps">Central-difference step of each parameter.</param>
    /// <param name="regularisation">Tikhonov weight λ_i pulling parameter i toward 0 (in the weighted-residual unit), or null.</param>
    /// <param name="maximumIterations">Iteration limit of the minimiser.</param>
    /// <param name="jacobian">∂model/∂p (data × parameters, unweighted) at a parameter vector, or null for central differences.</param>
    public static WeightedFitResult Fit(IReadOnlyList<string> names, Func<double[], double[]> model, double[] observed, double[] sigma,
        double[] start, double[] steps, double[]? regularisation = null, int maximumIterations = 40, Func<double[], double[,]>? jacobian = null)
    {
        int m = observed.Length, p = start.Length;
        int rows = m + (regularisation is null ? 0 : p);
        // MathNet's model maps (parameters, x) to predictions at x; x is only the row index here and the whole vector
        // is computed at once, so the last vector evaluated is cached.
        double[]? lastP = null, lastY = null;
        double[] Eval(Vector<double> v)
        {
            var arr = v.ToArray();
            if (lastP is not null && arr.AsSpan().SequenceEqual(lastP)) return lastY!;
            var y = model(arr);
            if (y.Length != m) throw new InvalidOperationException($"the model returned {y.Length} values for {m} data");
            lastP = arr;
            lastY = y;
            return y;
        }
        Vector<double> Predict(Vector<double> v, Vector<double> _)
        {
            var y = Eval(v);
            var r = Vector<double>.Build.Dense(rows);
            for (int i = 0; i < m; i++) r[i] = y[i] / sigma[i];
            if (regularisation is not null) for (int j = 0; j < p; j++) r[m + j] = regularisation[j] * v[j];
            return r;
        }
        // While the minimiser iterates, the Jacobian only steers its steps, so forward differences from the value it has
        // just evaluated (cached) are enough and cost p model evaluations instead of 2p; the Jacobian of the reported
        // covariance is taken by central differences at the solution.
        Matrix<double> Jac(Vector<double> v, Vector<double> _) => Differences(v, central: false);
        Matrix<double> Differences(Vector<double> v, bool central)
        {
            var j = Matrix<double>.Build.Dense(rows, p);
            if (jacobian is not null)
            {
                var d = jacobian(v.ToArray());
                for (int c = 0; c < p; c++)
                {
                    for (int i = 0; i < m; i++) j[i, c] = d[i, c] / sigma[i];
                    if (regularisation is not null) j[m + c, c] = regularisation[c];
                }
                return j;
            }
            var y0 = central ? null : Eval(v);
            for (int c = 0; c < p; c++)
            {
                var plus = v.Clone(); plus[c] += steps[c];
                var yp = model(plus.ToArray());
                double span = central ? 2 * steps[c] : steps[c];
                var ym = y0;
                if (central)
                {
                    var minus = v.Clone(); minus[c] -= steps[c];
                    ym = model(minus.ToArray());
                }
                for (int i = 0; i < m; i++) j[i, c] = (yp[i] - ym![i]) / (span * sigma[i]);
                if (regularisation is not null) j[m + c, c] = regularisation[c];
            }
            return j;
        }
        var obs = Vector<double>.Build.Dense(rows);
        for (int i = 0; i < m; i++) obs[i] = observed[i] / sigma[i];
        var x = Vector<double>.Build.Dense(rows, i => i);
        var objective = ObjectiveFunction.NonlinearModel(Predict, Jac, x, obs);
        // Stops once a step moves the parameters by less than 1e-9 of their size (far below any interval a fit reports);
        // MathNet's default of 1e-15 spends the last iterations on rounding.
        var lm = new LevenbergMarquardtMinimizer(stepTolerance: StepTolerance, maximumIterations: maximumIterations);
        var result = lm.FindMinimum(objective, Vector<double>.Build.DenseOfArray(start));
        var best = result.MinimizingPoint;

        var full = jacobian is null ? Differences(best, central: true) : Jac(best, x);
        var jData = full.SubMatrix(0, m, 0, p);
        var yBest = Eval(best);
        double chi2 = 0;
        for (int i = 0; i < m; i++) { double r = (observed[i] - yBest[i]) / sigma[i]; chi2 += r * r; }
        double s2 = chi2 / Math.Max(1, m - p);
        var jtj = jData.TransposeThisAndMultiply(jData);
        var h = jtj.Clone();
        if (regularisation is not null) for (int j = 0; j < p; j++) h[j, j] += regularisation[j] * regularisation[j];
        var hInv = InverseOfNormalMatrix(h);
        var resolution = hInv * jtj;
        var cov = s2 * (regularisation is null ? hInv : resolution * hInv);
        var values = new FittedValue[p];
        for (int j = 0; j < p; j++) values[j] = new FittedValue(names[j], best[j], Math.Sqrt(Math.Max(0, cov[j, j])));
        var corr = Matrix<double>.Build.Dense(p, p, (a, b) =>
        {
            double d = Math.Sqrt(cov[a, a] * cov[b, b]);
            return d > 0 ? cov[a, b] / d : (a == b ? 1 : 0);
        });
        double cond = ConditionNumber(jData, jtj);
        return new WeightedFitResult(values, jData, corr, Math.Sqrt(chi2 / m), Math.Sqrt(s2), cond, result.Iterations,
            result.ReasonForExit != ExitCondition.ExceedIterations, jtj, resolution);
    }
    /// <summary>
    /// (JᵀJ + Λ)⁻¹ of a normal matrix: by Cholesky when it is positive definite (always, with a regularisation), else
    /// the pseudo-inverse (a Jacobian without full column rank). The same matrix either way; Cholesky costs a sixth of
    /// the singular value decomposition behind the pseudo-inverse.
    /// </summary>
    internal static Matrix<double> InverseOfNormalMatrix(Matrix<double> h)
    {
        ArgumentNullException.ThrowIfNull(h);
        try
        {
            var inverse = h.Cholesky().Solve(Matrix<double>.Build.DenseIdentity(h.RowCount));
            if (inverse.Enumerate().All(double.IsFinite)) return inverse;
        }
        catch (ArgumentException)
        {
            // not positive definite: fall through to the pseudo-inverse
        }
        return h.PseudoInverse();
    }

    /// <summary>
    /// Ratio of the largest to the smallest singular value of J, from the eigenvalues of JᵀJ (σ_i² = λ_i; a symmetric
    /// eigenproblem of p × p in place of the SVD of the m × p Jacobian). Below λ_min/λ_max = 10⁻¹² the eigenvalues of
    /// JᵀJ carry too little precision (rounding of order 10⁻¹⁶ λ_max), so the SVD of J itself is taken.
    /// </summary>
    internal static double ConditionNumber(Matrix<double> j, Matrix<double> jtj)
    {
        ArgumentNullException.ThrowIfNull(j);
        ArgumentNullException.ThrowIfNull(jtj);
        if (j.ColumnCount == 0) return double.PositiveInfinity;
        var eigen = jtj.Evd(Symmetricity.Symmetric).EigenValues.Select(z => z.Real).ToArray();
        double high = eigen.Max(), low = eigen.Min();
        if (high > 0 && low > 1e-12 * high) return Math.Sqrt(high / low);
        var sv = j.Svd(false).S;
        return sv.Count > 0 && sv[sv.Count - 1] > 0 ? sv[0] / sv[sv.Count - 1] : double.PositiveInfinity;
    }
}
