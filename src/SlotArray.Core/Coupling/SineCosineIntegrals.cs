using System.Numerics;

namespace SlotArray.Core.Coupling;

/// <summary>
/// The sine and cosine integrals Si(x) = ∫₀ˣ sin t/t dt, Ci(x) = γ + ln x + ∫₀ˣ (cos t − 1)/t dt, the entire
/// function Cin(x) = ∫₀ˣ (1 − cos t)/t dt = γ + ln x − Ci(x), and the auxiliary functions f(x), g(x), for x &gt; 0.
/// </summary>
/// <remarks>
/// <para>Definitions: M. Abramowitz and I. A. Stegun, <i>Handbook of Mathematical Functions</i>, NBS 1964,
/// eqs. 5.2.1, 5.2.2 (Si, Ci), 5.2.2 (Cin), 5.2.6–5.2.7 (f, g).</para>
/// <para>Method (the route of W. H. Press et al., <i>Numerical Recipes in C</i>, 2nd ed., Cambridge 1992,
/// Sec. 6.9, routine <c>cisi</c>):</para>
/// <list type="bullet">
/// <item>x ≤ 2: the power series A&amp;S 5.2.14 (Si) and 5.2.16 (Ci), summed until the term is below
/// 1e-17 of the sum (at most about 12 terms; all terms are below 2 in size, so there is no cancellation).</item>
/// <item>x &gt; 2: E1(ix) = −Ci(x) + i si(x), si(x) = Si(x) − π/2 (A&amp;S 5.2.23), from the continued fraction
/// E1(z) = e^(−z) · 1/(z + 1 − 1²/(z + 3 − 2²/(z + 5 − …))) (A&amp;S 5.1.22, even form), evaluated by the
/// modified Lentz method to relative 1e-16. The fraction itself equals e^(ix) E1(ix) = g(x) − i f(x), so the
/// auxiliary functions come out directly, without the cancellation of A&amp;S 5.2.8–5.2.9.</item>
/// </list>
/// <para>Accuracy (checked in the tests against the series, the asymptotic expansions A&amp;S 5.2.34–5.2.35
/// and tabulated values): about 1e-15 absolute for Si and Ci, relative to the larger of 1 and the size of the result;
/// near the zeros of Ci its relative accuracy is correspondingly lower. Cost: one series or one
/// continued fraction (about 20 complex steps at x = 2, fewer for larger x); no quadrature.</para>
/// </remarks>
public static class SineCosineIntegrals
{
    /// <summary>Euler–Mascheroni constant γ (A&amp;S 6.1.3).</summary>
    public const double EulerGamma = 0.57721566490153286060651209;

    private const double SeriesLimit = 2.0;
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
        var (f, g) = AuxiliaryFromFraction(x);
        double s = Math.Sin(x), c = Math.Cos(x);
        // A&S 5.2.8–5.2.9 inverted: Ci = f sin x − g cos x, si = −f cos x − g sin x.
        return (Math.PI / 2 - f * c - g * s, f * s - g * c);
    }

    /// <summary>
    /// The auxiliary functions f(x) = Ci(x) sin x − si(x) cos x and g(x) = −Ci(x) cos x − si(x) sin x, si = Si − π/2
    /// (A&amp;S 5.2.6–5.2.7), for x &gt; 0. For large x, f ≈ 1/x and g ≈ 1/x² (A&amp;S 5.2.34–5.2.35).
    /// </summary>
    public static (double F, double G) Auxiliary(double x)
    {
        if (!(x > 0) || double.IsPositiveInfinity(x))
            throw new ArgumentOutOfRangeException(nameof(x), x, "f and g need a finite argument x > 0");
        if (x > SeriesLimit) return AuxiliaryFromFraction(x);
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
        var (f, g) = AuxiliaryFromFraction(x);
        double s = Math.Sin(x), c = Math.Cos(x);
        // e^(−ix) (g − i f) = (c − i s)(g − i f)
        return new Complex(c * g - s * f, -(c * f + s * g));
    }

    /// <summary>Si series, A&amp;S 5.2.14: Σ (−1)ⁿ x^(2n+1) / ((2n+1)(2n+1)!).</summary>
    private static double SiSeries(double x)
    {
        double x2 = x * x, term = x, sum = x;   // term = (−1)ⁿ x^(2n+1)/(2n+1)!
        for (int n = 1; n < MaximumTerms; n++)
        {
            term *= -x2 / ((2 * n) * (2 * n + 1));
            double add = term / (2 * n + 1);
            sum += add;
            if (Math.Abs(add) < Epsilon * Math.Abs(sum)) break;
        }
        return sum;
    }

    /// <summary>Cin series from A&amp;S 5.2.16: Cin(x) = −Σ_{n≥1} (−1)ⁿ x^(2n) / (2n (2n)!).</summary>
    private static double CinSeries(double x)
    {
        double x2 = x * x, term = 1, sum = 0;   // term = (−1)ⁿ x^(2n)/(2n)!
        for (int n = 1; n < MaximumTerms; n++)
        {
            term *= -x2 / ((2 * n - 1) * (2 * n));
            double add = term / (2 * n);
            sum -= add;
            if (Math.Abs(add) < Epsilon * Math.Abs(sum)) break;
        }
        return sum;
    }

    /// <summary>
    /// e^(ix) E1(ix) = g(x) − i f(x) by the continued fraction of A&amp;S 5.1.22 (even form), modified Lentz
    /// (Numerical Recipes 2nd ed., Sec. 5.2 and 6.9). Converges for x &gt; 2 in at most about 20 steps.
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
