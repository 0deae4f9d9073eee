namespace SlotArray.Core.Patterns;

/// <summary>
/// Walks a sampled power pattern: local extrema, three-point parabolic refinement and level crossings. Shared by
/// the sum- and difference-pattern metrics. The hot walks are generic in the list type, so an ImmutableArray is read
/// without boxing (the tolerance trials call them for every local maximum of every cut).
/// </summary>
internal static class LobeSearch
{
    /// <summary>From index <paramref name="i"/> step in direction <paramref name="dir"/> (±1) while the power falls; returns the local minimum (or the grid end).</summary>
    /// <typeparam name="TPower">The power list's type.</typeparam>
    public static int DescendTo<TPower>(TPower p, int i, int dir) where TPower : IReadOnlyList<double>
    {
        while (i + dir >= 0 && i + dir < p.Count && p[i + dir] < p[i]) i += dir;
        return i;
    }

    /// <summary>From index <paramref name="i"/> step in direction <paramref name="dir"/> while the power rises (ties included); returns the local maximum (or the grid end).</summary>
    public static int AscendTo(IReadOnlyList<double> p, int i, int dir)
    {
        while (i + dir >= 0 && i + dir < p.Count && p[i + dir] >= p[i]) i += dir;
        return i;
    }

    /// <summary>True when <paramref name="i"/> is an end of the grid.</summary>
    /// <typeparam name="TPower">The power list's type.</typeparam>
    public static bool AtEnd<TPower>(TPower p, int i) where TPower : IReadOnlyList<double> => i == 0 || i == p.Count - 1;

    /// <summary>
    /// Vertex of the parabola through (x0,y0), (x1,y1), (x2,y2) (x not necessarily equally spaced); falls back to
    /// the middle point when the three are collinear.
    /// </summary>
    public static (double X, double Y) Parabola(double x0, double y0, double x1, double y1, double x2, double y2)
    {
        double d01 = (y1 - y0) / (x1 - x0), d12 = (y2 - y1) / (x2 - x1);
        double a = (d12 - d01) / (x2 - x0);
        if (a == 0 || double.IsNaN(a)) return (x1, y1);
        double b = d01 - a * (x0 + x1);
        double xv = -b / (2 * a);
        if (xv < x0 || xv > x2) return (x1, y1);
        return (xv, y1 + (xv - x1) * (d01 + a * (xv - x0)));
    }

    /// <summary>
    /// A local maximum of the power at index i refined in dB by a parabola (exact for a Gaussian-like lobe top);
    /// at a grid end the sample itself. Returns the angle and the power.
    /// </summary>
    /// <typeparam name="TTheta">The angle list's type.</typeparam>
    /// <typeparam name="TPower">The power list's type.</typeparam>
    public static (double Theta, double Power) RefineMaximum<TTheta, TPower>(TTheta theta, TPower p, int i)
        where TTheta : IReadOnlyList<double> where TPower : IReadOnlyList<double>
    {
        if (AtEnd(p, i) || p[i - 1] <= 0 || p[i + 1] <= 0 || p[i] <= 0) return (theta[i], p[i]);
        var (x, y) = Parabola(theta[i - 1], Db(p[i - 1]), theta[i], Db(p[i]), theta[i + 1], Db(p[i + 1]));
        return (x, Math.Pow(10, y / 10));
    }

    /// <summary>
    /// True when the refined value of the local maximum at <paramref name="i"/> (<see cref="RefineMaximum"/>) is certainly
    /// below <paramref name="level"/>, so that a search for the highest lobe may skip it. On equally spaced angles the
    /// vertex of the parabola through (−h, y1 − a), (0, y1), (h, y1 − b) (a, b ≥ 0, in dB) is y1 + (a − b)²/(8(a + b))
    /// ≤ y1 + max(a, b)/8 (derived here), i.e. a power at most p1 (p1/min(p0, p2))^{1/8}; the test keeps a margin of
    /// 1e-6 relative for rounding. False (refine it) at a grid end, on unequal spacing or when a sample is not positive.
    /// </summary>
    /// <typeparam name="TTheta">The angle list's type.</typeparam>
    /// <typeparam name="TPower">The power list's type.</typeparam>
    public static bool RefinedBelow<TTheta, TPower>(TTheta theta, TPower p, int i, double level)
        where TTheta : IReadOnlyList<double> where TPower : IReadOnlyList<double>
    {
        if (AtEnd(p, i)) return p[i] < level;   // a grid end is not refined
        double p0 = p[i - 1], p1 = p[i], p2 = p[i + 1];
        if (!(p0 > 0 && p1 > 0 && p2 > 0)) return false;
        double h0 = theta[i] - theta[i - 1], h1 = theta[i + 1] - theta[i];
        if (!(Math.Abs(h1 - h0) <= 1e-9 * Math.Abs(h0))) return false;
        double ratio = p1 / Math.Min(p0, p2);
        if (!(ratio >= 1)) return false;
        double bound = p1 * Math.Sqrt(Math.Sqrt(Math.Sqrt(ratio)));
        return bound * (1 + 1e-6) < level;
    }

    /// <summary>
    /// A local minimum (a null) at index i refined by a parabola in power, |F|² being quadratic about a zero of F.
    /// Returns the angle.
    /// </summary>
    public static double RefineMinimum(IReadOnlyList<double> theta, IReadOnlyList<double> p, int i)
    {
        if (AtEnd(p, i)) return theta[i];
        return Parabola(theta[i - 1], p[i - 1], theta[i], p[i], theta[i + 1], p[i + 1]).X;
    }

    /// <summary>
    /// Walking from the peak index in direction dir, the angle where the power first falls below
    /// <paramref name="level"/>: the root of the quadratic through the two samples either side of the crossing and
    /// the one before them (local error O(h³)), or of the chord when no third sample exists; NaN if the power stays
    /// above the level to the grid end.
    /// </summary>
    public static double Crossing(IReadOnlyList<double> theta, IReadOnlyList<double> p, int peak, int dir, double level)
    {
        int i = peak;
        while (i + dir >= 0 && i + dir < p.Count)
        {
            int j = i + dir, a = i - dir;
            if (p[j] < level)
            {
                double xi = theta[i], xj = theta[j];
                if (a < 0 || a >= p.Count) return xi + (p[i] - level) / (p[i] - p[j]) * (xj - xi);
                double xa = theta[a];
                double Q(double x) =>
                    p[a] * (x - xi) * (x - xj) / ((xa - xi) * (xa - xj)) +
                    p[i] * (x - xa) * (x - xj) / ((xi - xa) * (xi - xj)) +
                    p[j] * (x - xa) * (x - xi) / ((xj - xa) * (xj - xi)) - level;
                double lo = xi, hi = xj, qlo = Q(lo);
                for (int it = 0; it < 60; it++)
                {
                    double mid = 0.5 * (lo + hi), qm = Q(mid);
                    if (Math.Sign(qm) == Math.Sign(qlo)) { lo = mid; qlo = qm; } else hi = mid;
                }
                return 0.5 * (lo + hi);
            }
            i = j;
        }
        return double.NaN;
    }

    /// <summary>10 log10 of a power; −3000 for zero.</summary>
    public static double Db(double power) => power > 0 ? 10 * Math.Log10(power) : -3000;

    /// <summary>∫ p du over grid indices [from, to] by the trapezoidal rule in u = sin θ.</summary>
    public static double IntegrateInSine(IReadOnlyList<double> u, IReadOnlyList<double> p, int from, int to)
    {
        double s = 0;
        for (int i = from; i < to; i++) s += 0.5 * (p[i] + p[i + 1]) * (u[i + 1] - u[i]);
        return s;
    }
}
