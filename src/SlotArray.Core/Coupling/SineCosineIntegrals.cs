using System.Numerics;

namespace SlotArray.Core.Coupling;

/// <summary>
/// The sine and cosine integrals Si(x) = ∫₀ˣ sin t/t dt, Ci(x) = γ + ln x + ∫₀ˣ (cos t − 1)/t dt, the entire
/// function Cin(x) = ∫₀ˣ (1 − cos t)/t dt = γ + ln x − Ci(x), and the auxiliary functions f(x), g(x), for x &gt; 0.
/// </summary>
/// <remarks>
/// <para>Definitions: M. Abramowitz and I. A. Stegun, <i>Handbook of Mathematical Functions</i>, NBS 1964,
/// eqs. 5.2.1, 5.2.2 (Si, Ci), 5.2.2 (Cin), 5.2.6–5.2.7 (f, g).</para>
/// <para>Method:</para>
/// <list type="bullet">
/// <item>x ≤ 4: the power series A&amp;S 5.2.14 (Si) and 5.2.16 (Ci, Cin), summed until the term is below
/// 1e-17 of the sum (at most about 17 terms; the largest term is below 4, so at most one digit is lost).</item>
/// <item>4 &lt; x &lt; 64: E1(ix) = −Ci(x) + i si(x), si(x) = Si(x) − π/2 (A&amp;S 5.2.23), by a 13-term Taylor expansion
/// about the nearest node of a grid of step 1/4 (dE1(ix)/dx = −e^(−ix)/x gives the coefficients by a two-term
/// recurrence). The node values are computed once from the continued fraction
/// E1(z) = e^(−z) · 1/(z + 1 − 1²/(z + 3 − 2²/(z + 5 − …))) (A&amp;S 5.1.22, even form), evaluated by the modified
/// Lentz method to relative 1e-16 (W. H. Press et al., <i>Numerical Recipes in C</i>, 2nd ed., Cambridge 1992,
/// Sec. 5.2 and routine <c>cisi</c> of Sec. 6.9). The fraction equals e^(ix) E1(ix) = g(x) − i f(x).</item>
/// <item>x ≥ 64: the asymptotic expansions of f and g, A&amp;S 5.2.34–5.2.35, ten terms each (omitted term
/// below 4e-17 relative), and Si = π/2 − f cos x − g sin x, Ci = f sin x − g cos x (A&amp;S 5.2.8–5.2.9).</item>
/// </list>
/// <para>Accuracy (checked in the tests against the series summed in 28-digit decimal, the asymptotic expansions
/// and tabulated values): about 1e-15 absolute for Si and Ci; near the zeros of Ci its relative accuracy is
/// correspondingly lower. Cost: 10–70 ns per call after the one-off table set-up (about 1 ms); no quadrature.</para>
/// </remarks>
internal static class SineCosineIntegrals
{
    /// <summary>Euler–Mascheroni constant γ (A&amp;S 6.1.3).</summary>
    public const double EulerGamma = 0.57721566490153286060651209;

    private const double SeriesLimit = 4.0;
    private const double AsymptoticLimit = 64.0;
    private const double TableStep = 0.25;
    private const int TaylorOrder = 13;
    private const double Epsilon = 1e-17;
    private const int MaximumTerms = 200;

    /// <summary>Si(x) = ∫₀ˣ sin t/t dt, any real x (odd function; Si(0) = 0).</summary>
    public static double Si(double x)
    {
        if (x < 0) return -Si(-x);
        if (x == 0) return 0;
        return SiCi(x).Si;
    }

    /// <summary>Ci(x) = γ + ln x + ∫₀ˣ (cos t − 1)/t dt for x &gt; 0 (A&amp;S 5.2.2). Throws for x ≤ 0.</summary>
    public static double Ci(double x) => SiCi(x).Ci;

    /// <summary>
    /// Cin(x) = ∫₀ˣ (1 − cos t)/t dt = γ + ln x − Ci(x) (A&amp;S 5.2.2), an even entire function; computed from its
    /// own series for |x| ≤ 2, so it keeps full relative accuracy for small x (Cin(x) ≈ x²/4).
    /// Example: the radiation resistance of a thin half-wave dipole is (η/4π) Cin(2π).
    /// </summary>
    public static double Cin(double x)
    {
        x = Math.Abs(x);
        if (x == 0) return 0;
        if (x <= SeriesLimit) return CinSeries(x);
        return EulerGamma + Math.Log(x) - SiCi(x).Ci;
    }

    /// <summary>
    /// Si(x) and Ci(x) together for x &gt; 0 (one evaluation serves both). Throws
    /// <see cref="ArgumentOutOfRangeException"/> for x ≤ 0 or not finite.
    /// </summary>
    public static (double Si, double Ci) SiCi(double x)
    {
        if (!(x > 0) || double.IsPositiveInfinity(x))
            throw new ArgumentOutOfRangeException(nameof(x), x, "Si/Ci need a finite argument x > 0");
        if (x <= SeriesLimit) return (SiSeries(x), EulerGamma + Math.Log(x) - CinSeries(x));
        var e1 = E1OfImaginary(x);   // = −Ci + i (Si − π/2)
        return (Math.PI / 2 + e1.Imaginary, -e1.Real);
    }

    /// <summary>
    /// The auxiliary functions f(x) = Ci(x) sin x − si(x) cos x and g(x) = −Ci(x) cos x − si(x) sin x, si = Si − π/2
    /// (A&amp;S 5.2.6–5.2.7), for x &gt; 0. For large x, f ≈ 1/x and g ≈ 1/x² (A&amp;S 5.2.34–5.2.35).
    /// </summary>
    public static (double F, double G) Auxiliary(double x)
    {
        if (!(x > 0) || double.IsPositiveInfinity(x))
            throw new ArgumentOutOfRangeException(nameof(x), x, "f and g need a finite argument x > 0");
        if (x >= AsymptoticLimit) return AuxiliaryAsymptotic(x);
        if (x > SeriesLimit)
        {
            var w = Complex.FromPolarCoordinates(1, x) * E1OfImaginary(x);   // e^(ix) E1(ix) = g − i f
            return (-w.Imaginary, w.Real);
        }
        var (si, ci) = SiCi(x);
        double s = Math.Sin(x), c = Math.Cos(x), sm = si - Math.PI / 2;
        return (ci * s - sm * c, -ci * c - sm * s);
    }

    /// <summary>
    /// The exponential integral of an imaginary argument, E1(ix) = −Ci(x) + i (Si(x) − π/2) (A&amp;S 5.2.23), x &gt; 0.
    /// For large x it is small, e^(−ix)(g(x) − i f(x)) ≈ −i e^(−ix)/x, and it is returned without the cancellation
    /// that forming it from Si − π/2 would cause. The antiderivative of e^(−ix)/x is −E1(ix).
    /// </summary>
    public static Complex E1OfImaginary(double x)
    {
        if (!(x > 0) || double.IsPositiveInfinity(x))
            throw new ArgumentOutOfRangeException(nameof(x), x, "E1(ix) needs a finite argument x > 0");
        if (x <= SeriesLimit)
            return new Complex(CinSeries(x) - EulerGamma - Math.Log(x), SiSeries(x) - Math.PI / 2);
        if (x < AsymptoticLimit) return FromTable(x);
        var (f, g) = AuxiliaryAsymptotic(x);
        var (s, c) = Math.SinCos(x);
        // e^(−ix) (g − i f) = (c − i s)(g − i f)
        return new Complex(c * g - s * f, -(c * f + s * g));
    }

    // Series coefficients, A&S 5.2.14: Si = Σ SiC[n] x^(2n+1), SiC[n] = (−1)ⁿ/((2n+1)(2n+1)!);
    // A&S 5.2.16: Cin = Σ_{n≥1} CinC[n] x^(2n), CinC[n] = −(−1)ⁿ/(2n (2n)!).
    private static readonly double[] SiC = BuildSeries(odd: true);
    private static readonly double[] CinC = BuildSeries(odd: false);

    private static double[] BuildSeries(bool odd)
    {
        var c = new double[40];
        double factorial = 1;   // (2n+1)! or (2n)!
        for (int n = 0; n < c.Length; n++)
        {
            if (odd)
            {
                if (n > 0) factorial *= (2.0 * n) * (2.0 * n + 1);
                c[n] = (n % 2 == 0 ? 1 : -1) / ((2.0 * n + 1) * factorial);
            }
            else
            {
                if (n > 0) factorial *= (2.0 * n - 1) * (2.0 * n);
                c[n] = n == 0 ? 0 : -(n % 2 == 0 ? 1 : -1) / (2.0 * n * factorial);
            }
        }
        return c;
    }

    /// <summary>Si series, A&amp;S 5.2.14, summed until the term is below 1e-17 of the sum.</summary>
    private static double SiSeries(double x) => PowerSeries(SiC, 0, x, x * x);

    /// <summary>Cin series from A&amp;S 5.2.16: Cin(x) = −Σ_{n≥1} (−1)ⁿ x^(2n) / (2n (2n)!).</summary>
    private static double CinSeries(double x) => PowerSeries(CinC, 1, x * x, x * x);

    /// <summary>Σ_{n≥first} c[n]·p·x2^(n−first), p the first power, stopped once a term is below 1e-17 of the sum.</summary>
    private static double PowerSeries(double[] c, int first, double firstPower, double x2)
    {
        double power = firstPower, sum = 0;
        for (int n = first; n < c.Length; n++, power *= x2)
        {
            double add = c[n] * power;
            sum += add;
            if (Math.Abs(add) < Epsilon * Math.Abs(sum)) break;
        }
        return sum;
    }

    /// <summary>
    /// f and g by their asymptotic expansions, A&amp;S 5.2.34–5.2.35: f ~ (1/x) Σ (−1)ⁿ (2n)!/x^(2n),
    /// g ~ (1/x²) Σ (−1)ⁿ (2n+1)!/x^(2n), ten terms each; for x ≥ 64 the omitted term is below 4e-17 relative.
    /// </summary>
    private static (double F, double G) AuxiliaryAsymptotic(double x)
    {
        double y = 1 / (x * x), f = 0, g = 0;
        for (int n = AsymptoticF.Length - 1; n >= 0; n--)
        {
            f = f * y + AsymptoticF[n];
            g = g * y + AsymptoticG[n];
        }
        return (f / x, g * y);
    }

    private static readonly double[] AsymptoticF = BuildAsymptotic(0);
    private static readonly double[] AsymptoticG = BuildAsymptotic(1);

    private static double[] BuildAsymptotic(int shift)
    {
        var c = new double[10];
        for (int n = 0; n < c.Length; n++)
        {
            double factorial = 1;
            for (int j = 2; j <= 2 * n + shift; j++) factorial *= j;
            c[n] = (n % 2 == 0 ? 1 : -1) * factorial;
        }
        return c;
    }

    /// <summary>
    /// E1(ix) for 4 &lt; x &lt; 64 by a Taylor expansion about the nearest node x0 of a grid of step 1/4:
    /// E1(i(x0 + t)) = E1(ix0) − e^(−ix0) ∫₀ᵗ e^(−iτ)/(x0 + τ) dτ (since d E1(ix)/dx = −e^(−ix)/x), with
    /// e^(−iτ)/(x0 + τ) = Σ aₙ τⁿ, x0 aₙ + aₙ₋₁ = (−i)ⁿ/n!. |t| ≤ 1/8 and x0 ≥ 4, so 13 terms reach 1e-17.
    /// The node values come from the continued fraction once, when the type is first used.
    /// </summary>
    private static Complex FromTable(double x)
    {
        int j = (int)Math.Round((x - SeriesLimit) / TableStep);
        double t = x - (SeriesLimit + j * TableStep);
        var row = Table[j];
        var acc = row[TaylorOrder];
        for (int n = TaylorOrder - 1; n >= 0; n--) acc = acc * t + row[n];
        return row[TaylorOrder + 1] + acc * t;
    }

    /// <summary>Per node: TaylorOrder+1 coefficients bₙ = −e^(−ix0) aₙ/(n+1), then E1(ix0).</summary>
    private static readonly Complex[][] Table = BuildTable();

    private static Complex[][] BuildTable()
    {
        int nodes = (int)Math.Ceiling((AsymptoticLimit - SeriesLimit) / TableStep) + 1;
        var table = new Complex[nodes][];
        for (int j = 0; j < nodes; j++)
        {
            double x0 = SeriesLimit + j * TableStep;
            var row = new Complex[TaylorOrder + 2];
            var phase = Complex.FromPolarCoordinates(1, -x0);
            Complex a = 1 / x0, minusIPower = Complex.One;
            double factorial = 1;
            for (int n = 0; n <= TaylorOrder; n++)
            {
                if (n > 0)
                {
                    minusIPower *= -Complex.ImaginaryOne;
                    factorial *= n;
                    a = (minusIPower / factorial - a) / x0;
                }
                row[n] = -phase * a / (n + 1);
            }
            var (f, g) = AuxiliaryFromFraction(x0);
            row[TaylorOrder + 1] = phase * new Complex(g, -f);
            table[j] = row;
        }
        return table;
    }

    /// <summary>
    /// e^(ix) E1(ix) = g(x) − i f(x) by the continued fraction of A&amp;S 5.1.22 (even form), modified Lentz
    /// (Numerical Recipes 2nd ed., Sec. 5.2 and 6.9). Converges for x ≥ 4 within the term limit; used to build the table.
    /// </summary>
    private static (double F, double G) AuxiliaryFromFraction(double x)
    {
        const double tiny = 1e-300;
        var b = new Complex(1, x);
        var c = new Complex(1 / tiny, 0);
        var d = Complex.One / b;
        var h = d;
        for (int i = 2; i < MaximumTerms; i++)
        {
            double a = -(double)(i - 1) * (i - 1);
            b += 2;
            d = Complex.One / (a * d + b);
            c = b + a / c;
            var del = c * d;
            h *= del;
            if (Math.Abs(del.Real - 1) + Math.Abs(del.Imaginary) < 1e-16) return (-h.Imaginary, h.Real);
        }
        throw new ConvergenceException($"Si/Ci continued fraction did not converge at x = {x:R}", MaximumTerms, double.NaN);
    }
}
