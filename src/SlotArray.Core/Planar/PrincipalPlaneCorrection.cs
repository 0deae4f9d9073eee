using System.Numerics;
using MathNet.Numerics.LinearAlgebra;
using Vector = MathNet.Numerics.LinearAlgebra.Vector<double>;
using SlotArray.Core.Patterns;

namespace SlotArray.Core.Planar;

/// <summary>
/// Makes the realised principal-plane cuts of a planar design reach the asked sidelobe level, by a factor per branch and
/// one per column on the taper's amplitudes (computed here [D]; the published 1-D and circular syntheses assume point
/// elements on a regular grid, which a slotted plate is not).
/// </summary>
/// <remarks>
/// <para>Why: the slots of a branch sit at y_b ± δ, alternately either side of its centre line, and once the coupling
/// is designed in δ differs from slot to slot and from branch to branch; in the y-z plane each branch then acts as an
/// element of its own pattern H_b(v) = Σ_{n in b} a_n e^{jk v y_n}, not as a point at y_b. On an 8 × 10 array at
/// −25 dB this alone raised the y-z sidelobes by 1.4 dB. Along x the slots sit on the grid, but a taper sampled at
/// a few points misses its level (the x-z cut also carries the slot's element pattern).</para>
/// <para>Method [D], in passes: (1) column factors r_c = T_c / Σ_{n in c} a_n c_b, T_c the column sums of the taper
/// re-synthesised at level L_x (the x-z cut is then exactly that taper's projection, slots on the grid); the x-z cut's
/// peak sidelobe, with the slot's element pattern (<see cref="PlanarArrayFactor.SlotElement"/>), is measured as the
/// figures measure it (<see cref="PatternMetrics"/>) and L_x moves by the asked level minus the measured one (within
/// ±3 dB). (2) Branch factors c_b = x_b S_b/Σ_{n in b} a_n r_c (S_b the taper's branch sums) with x found by
/// minimising Σ_j max(0, p_j/T − 1)² + μ Σ_b (x_b − 1)² over the sidelobe samples v_j of the y-z cut F(v) = Σ_b c_b H_b(v)
/// (p_j = |F(v_j)|²/|F(0)|², T the asked level less <see cref="Margin"/>, μ = <see cref="Regularisation"/>, at least 32
/// samples a lobe over v ∈ [−1, 1], the main lobe to its first nulls left out) with MathNet's limited-memory BFGS: only
/// the lobes above the asked level are pulled down, and the factors stay as near the taper as that allows (on the
/// 272-slot circular demo they move by ±2.3 %). Tapers without a level (uniform) keep x = 1. A separable taper whose y-z
/// cut stays more than <see cref="Floor"/> below the asked level (an outline clips its branches) has its across level
/// L_y raised by the difference, as L_x is moved for the x-z cut.</para>
/// </remarks>
internal static class PrincipalPlaneCorrection
{
    /// <summary>Largest number of level passes.</summary>
    public const int MaximumPasses = 12;

    /// <summary>Level agreement at which the passes stop, dB.</summary>
    public const double LevelTolerance = 0.02;

    /// <summary>How far below the asked level the y-z lobes are pulled, dB (room for the sampling of the cut).</summary>
    public const double Margin = 0.1;

    /// <summary>How far below the asked level a separable taper's y-z cut may stay before its across level is raised, dB.</summary>
    public const double Floor = 0.3;

    /// <summary>Weight μ of the factors' distance from the taper.</summary>
    public const double Regularisation = 1e-3;

    /// <summary>
    /// The corrected amplitudes (layout order, max 1) of <paramref name="asked"/> (the taper's amplitudes at its asked
    /// levels) for slots whose centres are at <paramref name="y"/> (m, aperture y; x is the layout's column x) at free-space
    /// wavenumber <paramref name="k"/>, with the realised peak sidelobes of the x-z and y-z cuts (dB; null when none).
    /// </summary>
    /// <param name="layout">The aperture.</param>
    /// <param name="taper">The taper (re-synthesised at other levels).</param>
    /// <param name="asked">The taper's amplitudes at its asked levels, layout order.</param>
    /// <param name="y">Each slot's real centre y, m (its branch's centre line plus its offset).</param>
    /// <param name="k">Free-space wavenumber, rad/m.</param>
    public static (double[] Amplitudes, double? AlongDb, double? AcrossDb) Correct(PlanarLayout layout, ApertureTaper taper, IReadOnlyList<double> asked, IReadOnlyList<double> y, double k)
    {
        ArgumentNullException.ThrowIfNull(layout);
        ArgumentNullException.ThrowIfNull(taper);
        ArgumentNullException.ThrowIfNull(asked);
        ArgumentNullException.ThrowIfNull(y);
        var cut = new Cuts(layout, asked, y, k);
        var (askX, askY) = taper.DesignLevels;
        double? lx = askX, ly = askY;
        var c = Enumerable.Repeat(1.0, cut.BranchCount).ToArray();
        double[] amp = [.. asked];
        double? px = null, py = null;
        int passes = askX is null && askY is null ? 1 : MaximumPasses;
        for (int pass = 0; pass < passes; pass++)
        {
            var forColumns = taper.AmplitudesAt(layout, lx, ly);
            var r = cut.ColumnFactors(forColumns, c);
            c = cut.BranchFactors(taper.IsCircular ? [.. asked] : forColumns, r, askY);
            amp = cut.Apply(c, r);
            (px, py) = (cut.AlongPeakSidelobe(amp), cut.AcrossPeakSidelobe(amp));
            bool done = askY is null || py is null || py <= askY + LevelTolerance;
            if (askX is { } ax && px is { } mx && Math.Abs(mx - ax) > LevelTolerance) { lx = Math.Clamp(lx!.Value + ax - mx, ax - 3, ax + 3); done = false; }
            if (!taper.IsCircular && askY is { } ay && py is { } my && my < ay - Floor)
            {
                ly = Math.Clamp(ly!.Value + ay - 2 * Margin - my, ay - 3, ay + 3);   // well below the level (a clipped separable taper): less taper across
                done = false;
            }
            if (done) break;
        }
        return (amp, px, py);
    }

    /// <summary>The principal cuts of one aperture on a grid uniform in sine.</summary>
    private sealed class Cuts
    {
        private readonly int[] branchOf, columnOf;
        private readonly double[] asked, y, centre, columnX;
        private readonly double k;
        private readonly AngleGrid grid;

        public Cuts(PlanarLayout layout, IReadOnlyList<double> asked, IReadOnlyList<double> y, double k)
        {
            var fed = layout.FedBranches.ToList();
            var columns = layout.Slots.Select(s => s.Column).Distinct().Order().ToList();
            branchOf = layout.Slots.Select(s => fed.IndexOf(s.Branch)).ToArray();
            columnOf = layout.Slots.Select(s => columns.IndexOf(s.Column)).ToArray();
            centre = fed.Select(b => layout.Slots.First(s => s.Branch == b).Y).ToArray();
            columnX = columns.Select(col => layout.Slots.First(s => s.Column == col).X).ToArray();
            this.asked = [.. asked];
            this.y = [.. y];
            this.k = k;
            double extent = Math.Max(columnX.Max() - columnX.Min(), this.y.Max() - this.y.Min());
            int n = Math.Max(801, (int)Math.Ceiling(32 * k * extent / Math.PI) + 1);
            grid = AngleGrid.VisibleInSine(n % 2 == 0 ? n + 1 : n);
        }

        public int BranchCount => centre.Length;

        /// <summary>r_c = T_c / Σ_{n in c} a_n c_b (T_c the column sums of <paramref name="target"/>).</summary>
        public double[] ColumnFactors(double[] target, double[] c)
        {
            var t = new double[columnX.Length];
            var have = new double[columnX.Length];
            for (int i = 0; i < asked.Length; i++)
            {
                t[columnOf[i]] += target[i];
                have[columnOf[i]] += asked[i] * c[branchOf[i]];
            }
            return t.Select((v, j) => v / have[j]).ToArray();
        }

        /// <summary>The branch factors (see the type's remarks) for the branch sums of <paramref name="target"/> and column factors <paramref name="r"/>.</summary>
        public double[] BranchFactors(double[] target, double[] r, double? level)
        {
            int m = centre.Length, nv = grid.Count;
            var s = new double[m];
            var own = new double[m];
            for (int i = 0; i < asked.Length; i++)
            {
                s[branchOf[i]] += target[i];
                own[branchOf[i]] += asked[i] * r[columnOf[i]];
            }
            var c0 = s.Select((v, b) => v / own[b]).ToArray();
            if (level is null) return c0;
            var g = new Complex[nv, m];
            for (int i = 0; i < asked.Length; i++)
            {
                int b = branchOf[i];
                double a = asked[i] * r[columnOf[i]] * c0[b];
                for (int j = 0; j < nv; j++) g[j, b] += a * Complex.FromPolarCoordinates(1, k * y[i] * grid.Sines[j]);
            }
            var x = SidelobeFit(g, level.Value);
            return c0.Select((v, b) => v * x[b]).ToArray();
        }

        /// <summary>x minimising the type's penalty for the y-z field F = G x (rows: the grid's sines); x = 1 if the minimiser fails.</summary>
        private double[] SidelobeFit(Complex[,] g, double level)
        {
            int nv = g.GetLength(0), m = g.GetLength(1), centreRow = nv / 2;
            var start = new double[nv];
            for (int j = 0; j < nv; j++) { Complex f = 0; for (int b = 0; b < m; b++) f += g[j, b]; start[j] = f.Magnitude; }
            int left = centreRow, right = centreRow;
            while (left > 0 && start[left - 1] <= start[left]) left--;
            while (right < nv - 1 && start[right + 1] <= start[right]) right++;
            var rows = Enumerable.Range(0, nv).Where(j => j < left || j > right).ToArray();
            double t = Math.Pow(10, (level - Margin) / 10);
            var objective = MathNet.Numerics.Optimization.ObjectiveFunction.Gradient(xv =>
            {
                var grad = new double[m];
                double f0 = 0, cost = 0;
                for (int b = 0; b < m; b++) f0 += g[centreRow, b].Real * xv[b];
                foreach (int j in rows)
                {
                    Complex f = 0;
                    for (int b = 0; b < m; b++) f += g[j, b] * xv[b];
                    double pw = (f.Real * f.Real + f.Imaginary * f.Imaginary) / (f0 * f0), e = pw / t - 1;
                    if (e <= 0) continue;
                    cost += e * e;
                    for (int b = 0; b < m; b++)
                    {
                        double dp = 2 * (f.Real * g[j, b].Real + f.Imaginary * g[j, b].Imaginary) / (f0 * f0) - 2 * pw * g[centreRow, b].Real / f0;
                        grad[b] += 2 * e * dp / t;
                    }
                }
                for (int b = 0; b < m; b++) { cost += Regularisation * (xv[b] - 1) * (xv[b] - 1); grad[b] += 2 * Regularisation * (xv[b] - 1); }
                return (cost, Vector.Build.DenseOfArray(grad));
            });
            try
            {
                var result = new MathNet.Numerics.Optimization.LimitedMemoryBfgsMinimizer(1e-12, 1e-9, 1e-14, 7, 2000)
                    .FindMinimum(objective, Vector.Build.Dense(m, 1.0));
                var x = result.MinimizingPoint.ToArray();
                return x.All(v => v > 0 && double.IsFinite(v)) ? x : [.. Enumerable.Repeat(1.0, m)];
            }
            catch (MathNet.Numerics.Optimization.OptimizationException)
            {
                return [.. Enumerable.Repeat(1.0, m)];
            }
        }

        /// <summary>a_n c_b r_c, max 1.</summary>
        public double[] Apply(double[] c, double[] r)
        {
            var a = asked.Select((v, i) => v * c[branchOf[i]] * r[columnOf[i]]).ToArray();
            double max = a.Max();
            return a.Select(v => v / max).ToArray();
        }

        /// <summary>Peak sidelobe of the x-z cut (with the slot's element pattern), dB.</summary>
        public double? AlongPeakSidelobe(double[] amp)
        {
            var sums = new double[columnX.Length];
            for (int i = 0; i < amp.Length; i++) sums[columnOf[i]] += amp[i];
            return Peak(u =>
            {
                Complex f = 0;
                for (int col = 0; col < sums.Length; col++) f += sums[col] * Complex.FromPolarCoordinates(1, k * columnX[col] * u);
                return PlanarArrayFactor.SlotElement(u) * f;
            });
        }

        /// <summary>Peak sidelobe of the y-z cut (the slot's element pattern is 1 there), dB.</summary>
        public double? AcrossPeakSidelobe(double[] amp) => Peak(v =>
        {
            Complex f = 0;
            for (int i = 0; i < amp.Length; i++) f += amp[i] * Complex.FromPolarCoordinates(1, k * y[i] * v);
            return f;
        });

        private double? Peak(Func<double, Complex> field)
        {
            var p = new double[grid.Count];
            for (int j = 0; j < p.Length; j++)
            {
                var f = field(grid.Sines[j]);
                p[j] = f.Real * f.Real + f.Imaginary * f.Imaginary;
            }
            return PatternMetrics.BeamAndPeakSidelobe(grid.Theta, [.. p], p.Max()).PeakSidelobeDb;
        }
    }
}
