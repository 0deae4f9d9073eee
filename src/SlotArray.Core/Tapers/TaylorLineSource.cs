using System.Collections.Immutable;

namespace SlotArray.Core.Tapers;

/// <summary>
/// Taylor n̄ line source (T. T. Taylor, "Design of line-source antennas for narrow beamwidth and low side lobes",
/// IRE Trans. AP-3, 16–28, 1955; structure as in R. J. Mailloux, <i>Phased Array Antenna Handbook</i>, Sec. 3.1,
/// eqs. 3.31–3.33). The first n̄ − 1 zeros are moved to σ√(A² + (n − ½)²), the rest stay
/// at the uniform source's integers; the distribution is a finite cosine series.
/// </summary>
internal static class TaylorLineSource
{
    /// <summary>The parameters of one design: A, σ, the moved zeros and the cosine coefficients.</summary>
    /// <param name="A">Taylor's A = acosh(R)/π.</param>
    /// <param name="Sigma">Dilation σ = n̄/√(A² + (n̄ − ½)²).</param>
    /// <param name="Zeros">z_1 … z_{n̄−1} (u units).</param>
    /// <param name="Coefficients">F_1 … F_{n̄−1} of g(x) = 1 + 2 Σ F_m cos(2πm x/L).</param>
    public sealed record Design(double A, double Sigma, ImmutableArray<double> Zeros, ImmutableArray<double> Coefficients)
    {
        /// <summary>n̄ of the design.</summary>
        public int Nbar => Zeros.Length + 1;

        /// <summary>The aperture distribution g(x/L), −½ ≤ x/L ≤ ½ (Taylor 1955); 1 + 2 Σ F_m cos(2πm x/L).</summary>
        /// <param name="xOverL">Position as a fraction of the aperture length.</param>
        public double Distribution(double xOverL)
        {
            double g = 1;
            for (int m = 1; m <= Coefficients.Length; m++) g += 2 * Coefficients[m - 1] * Math.Cos(2 * Math.PI * m * xOverL);
            return g;
        }

        /// <summary>
        /// The line-source pattern F(u) = [sin(πu)/(πu)] Π_{n&lt;n̄} (1 − u²/z_n²)/(1 − u²/n²), u = (L/λ) sin θ (Taylor 1955),
        /// normalised to F(0) = 1. Removable points at the integers n &lt; n̄ are evaluated by the limit.
        /// </summary>
        /// <param name="u">Pattern variable.</param>
        public double Pattern(double u)
        {
            double r = Math.Round(Math.Abs(u));
            if (r >= 1 && r < Nbar && Math.Abs(Math.Abs(u) - r) < 1e-9) u += 1e-8;   // removable point: take the limit
            double f = Math.Abs(u) < 1e-12 ? 1 : Math.Sin(Math.PI * u) / (Math.PI * u);
            for (int n = 1; n < Nbar; n++)
                f *= (1 - u * u / (Zeros[n - 1] * Zeros[n - 1])) / (1 - u * u / (n * (double)n));
            return f;
        }

        /// <summary>Taper efficiency of the continuous source, η_t = 1/(1 + 2 Σ F_m²) (Parseval on the cosine series; Taylor 1955).</summary>
        public double ContinuousTaperEfficiency => 1 / (1 + 2 * Coefficients.Sum(f => f * f));
    }

    /// <summary>Taylor's A = acosh(R)/π, R = 10^(−SLL/20) (Taylor 1955).</summary>
    /// <param name="sidelobeLevelDb">Design sidelobe level, negative dB.</param>
    public static double A(double sidelobeLevelDb) => Math.Acosh(TaperMath.RatioFromLevel(sidelobeLevelDb)) / Math.PI;

    /// <summary>The design for a sidelobe level and n̄ (Taylor 1955 formulas for σ, z_n and F_m).</summary>
    /// <param name="sidelobeLevelDb">Design sidelobe level, negative dB, −13.3 … −100.</param>
    /// <param name="nbar">n̄, 2 … 100.</param>
    public static Design Parameters(double sidelobeLevelDb, int nbar)
    {
        TaperMath.CheckLevel(sidelobeLevelDb, 13.3, 100, "Taylor");
        TaperMath.CheckNbar(nbar, 100, "Taylor", "larger n̄ only adds far-out zeros");
        double a = A(sidelobeLevelDb), a2 = a * a;
        double sigma = nbar / Math.Sqrt(a2 + (nbar - 0.5) * (nbar - 0.5));
        var z = new double[nbar - 1];
        for (int n = 1; n < nbar; n++) z[n - 1] = sigma * Math.Sqrt(a2 + (n - 0.5) * (n - 0.5));
        var f = new double[nbar - 1];
        for (int m = 1; m < nbar; m++)
        {
            double num = 1, den = 1;
            for (int n = 1; n < nbar; n++)
            {
                num *= 1 - m * (double)m / (z[n - 1] * z[n - 1]);
                if (n != m) den *= 1 - m * (double)m / (n * (double)n);
            }
            f[m - 1] = (m % 2 == 1 ? 1 : -1) * num / (2 * den);
        }
        return new Design(a, sigma, ImmutableArray.Create(z), ImmutableArray.Create(f));
    }

    /// <summary>
    /// Weights of an N-element array sampling the distribution at the element centres with L = N d (each element owns
    /// a cell of width d): I_n = g((n − (N − 1)/2)/N) (equal to scipy.signal.windows.taylor(N, n̄, SLL,
    /// norm=False) up to the max-normalisation used here).
    /// </summary>
    /// <param name="count">Number of elements, 2 … 100,000.</param>
    /// <param name="sidelobeLevelDb">Design sidelobe level, negative dB, −13.3 … −100.</param>
    /// <param name="nbar">n̄, 2 … 100.</param>
    public static double[] Weights(int count, double sidelobeLevelDb, int nbar)
    {
        TaperMath.CheckCount(count);
        var d = Parameters(sidelobeLevelDb, nbar);
        var w = new double[count];
        for (int n = 0; n < count; n++) w[n] = d.Distribution(TaperMath.CellCentre(n, count));
        return TaperMath.NormalizeToPeak(w);
    }

    /// <summary>
    /// Highest sidelobe of the continuous pattern F(u), dB (negative), searched on u ∈ [z_1, n̄ + 2] at 64 points per
    /// unit with parabolic refinement; beyond n̄ the lobes only fall (uniform-source zeros).
    /// </summary>
    /// <param name="design">The design.</param>
    public static double ContinuousPeakSidelobeDb(Design design)
    {
        ArgumentNullException.ThrowIfNull(design);
        double start = design.Zeros.Length > 0 ? design.Zeros[0] : 1;
        return TaperMath.ContinuousPeakSidelobeDb(design.Pattern, start, design.Nbar + 2, 1.0 / 64);
    }

    /// <summary>
    /// True when the continuous distribution falls monotonically from the centre to the edges (checked at 2,001
    /// points). It stops doing so for n̄ above about 4A² (found numerically [N]: largest monotonic n̄ = 3, 5, 7, 9, 11 at 20 … 40 dB).
    /// </summary>
    /// <param name="design">The design.</param>
    public static bool IsMonotonic(Design design)
    {
        ArgumentNullException.ThrowIfNull(design);
        double prev = design.Distribution(0);
        for (int i = 1; i <= 2000; i++)
        {
            double g = design.Distribution(0.5 * i / 2000);
            if (g > prev + 1e-12) return false;
            prev = g;
        }
        return true;
    }
}
