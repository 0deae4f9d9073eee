using System.Collections.Immutable;

namespace SlotArray.Core.Tapers;

/// <summary>
/// Bayliss difference (monopulse) line source: an odd distribution whose pattern has a null at boresight and
/// near-equal sidelobes (E. T. Bayliss, "Design of monopulse antenna difference patterns with low sidelobes", Bell
/// Syst. Tech. J. 47(5), 623–650, 1968). The first four zeros ξ1…ξ4 and A come from
/// Bayliss's quartic fits in the sidelobe level (the table "below Fig. 4"), the rest are √(A² + n²).
/// </summary>
internal static class Bayliss
{
    // Rows A, ξ1, ξ2, ξ3, ξ4, p0; columns c0…c4 of P(S) = Σ c_i S^i, S the level in dB entered as a negative
    // number (Bayliss 1968, table below Fig. 4).
    private static readonly double[][] Fits =
    [
        [0.30387530, -0.05042922, -0.00027989, -0.00000343, -0.00000002],
        [0.98583020, -0.03338850, 0.00014064, 0.00000190, 0.00000001],
        [2.00337487, -0.01141548, 0.00041590, 0.00000373, 0.00000001],
        [3.00636321, -0.00683394, 0.00029281, 0.00000161, 0],
        [4.00518423, -0.00501795, 0.00021735, 0.00000088, 0],
        [0.47972120, -0.01456692, -0.00018739, -0.00000218, -0.00000001],
    ];

    /// <summary>Levels beyond which the polynomial fits are no longer trusted (below about −45 dB; the U.S. NRL Tracker Component Library note on
    /// <c>BaylissLinearTapering</c>).</summary>
    public const double FitLimitDb = -45;

    /// <summary>The parameters of one design.</summary>
    /// <param name="A">Bayliss's A (fit).</param>
    /// <param name="Xi">ξ1 … ξ4 (fits).</param>
    /// <param name="P0">p0, the u of the difference peak in the undilated pattern (fit; not used in the weights).</param>
    /// <param name="Sigma">σ = (n̄ + ½)/z_{n̄}.</param>
    /// <param name="Zeros">z_1 … z_{n̄−1}.</param>
    /// <param name="Coefficients">B_0 … B_{n̄−1} of g(p) = Σ B_m sin((m + ½)p), normalised to B_0 = 1.</param>
    public sealed record Design(double A, ImmutableArray<double> Xi, double P0, double Sigma, ImmutableArray<double> Zeros, ImmutableArray<double> Coefficients)
    {
        /// <summary>The odd distribution g(p) = Σ B_m sin((m + ½)p), p = 2πx/L ∈ [−π, π].</summary>
        /// <param name="p">Normalised position.</param>
        public double Distribution(double p)
        {
            double g = 0;
            for (int m = 0; m < Coefficients.Length; m++) g += Coefficients[m] * Math.Sin((m + 0.5) * p);
            return g;
        }
    }

    private static double Fit(int row, double s)
    {
        var c = Fits[row];
        return c[0] + s * (c[1] + s * (c[2] + s * (c[3] + s * c[4])));
    }

    /// <summary>Zero z_n of the undilated pattern: ξ_n for n ≤ 4, √(A² + n²) beyond (Bayliss 1968).</summary>
    private static double Zero(int n, double a, double[] xi) => n <= 4 ? xi[n - 1] : Math.Sqrt(a * a + n * (double)n);

    /// <summary>
    /// The design for a level and n̄. B_m ∝ (−1)^m (m + ½)² Π_{n=1}^{n̄−1}(1 − ((m + ½)/(σ z_n))²) /
    /// Π_{n=0, n≠m}^{n̄−1}(1 − ((m + ½)/(n + ½))²) (Bayliss 1968). Pitfall: a public implementation writes (m − ½)² here;
    /// (m + ½)² is the factor that reproduces Bayliss's pattern F(u) (checked numerically here, ratio constant to 1e-6 [D]).
    /// </summary>
    /// <param name="sidelobeLevelDb">Design sidelobe level, negative dB, −15 … −60 (fits trusted to −45).</param>
    /// <param name="nbar">n̄, 2 … 100.</param>
    public static Design Parameters(double sidelobeLevelDb, int nbar)
    {
        TaperMath.CheckLevel(sidelobeLevelDb, 15, 60, "Bayliss");
        TaperMath.CheckNbar(nbar, 100, "Bayliss", "larger n̄ only adds far-out zeros");
        double s = sidelobeLevelDb, a = Fit(0, s);
        var xi = new[] { Fit(1, s), Fit(2, s), Fit(3, s), Fit(4, s) };
        double sigma = (nbar + 0.5) / Zero(nbar, a, xi);
        var z = Enumerable.Range(1, nbar - 1).Select(n => Zero(n, a, xi)).ToArray();
        var b = new double[nbar];
        for (int m = 0; m < nbar; m++)
        {
            double um = m + 0.5, num = um * um, den = 1;
            for (int n = 1; n < nbar; n++) num *= 1 - Math.Pow(um / (sigma * z[n - 1]), 2);
            for (int n = 0; n < nbar; n++) if (n != m) den *= 1 - Math.Pow(um / (n + 0.5), 2);
            b[m] = (m % 2 == 0 ? 1 : -1) * num / den;
        }
        double b0 = b[0];
        for (int m = 0; m < nbar; m++) b[m] /= b0;
        return new Design(a, ImmutableArray.Create(xi), Fit(5, s), sigma, ImmutableArray.Create(z), ImmutableArray.Create(b));
    }

    /// <summary>
    /// Weights sampled at the element centres with L = N d: p_n = 2π(n − (N − 1)/2)/N (Bayliss 1968); odd, normalised to
    /// max |a| = 1, negative on the −z half.
    /// </summary>
    /// <param name="count">Number of elements, 2 … 100,000.</param>
    /// <param name="sidelobeLevelDb">Design sidelobe level, negative dB, −15 … −60.</param>
    /// <param name="nbar">n̄, 2 … 100.</param>
    public static double[] Weights(int count, double sidelobeLevelDb, int nbar)
    {
        TaperMath.CheckCount(count);
        var d = Parameters(sidelobeLevelDb, nbar);
        var w = new double[count];
        for (int n = 0; n < count; n++) w[n] = d.Distribution(2 * Math.PI * TaperMath.CellCentre(n, count));
        if (count % 2 == 1) w[count / 2] = 0;     // exactly zero at the centre of an odd array
        return TaperMath.NormalizeToPeak(w);
    }
}
