using System.Numerics;

namespace SlotArray.Core.Slots;

/// <summary>
/// Sine and cosine integrals Si(x) = ∫₀ˣ sin t/t dt and Ci(x) = γ + ln x + ∫₀ˣ (cos t − 1)/t dt for real x,
/// accurate to about 1e-14 absolute (tests check 1e-10 against tabulated values).
/// </summary>
/// <remarks>
/// M. Abramowitz and I. A. Stegun, <i>Handbook of Mathematical Functions</i>, NBS AMS 55, 1964, ch. 5 (equation
/// numbers from memory): power series 5.2.14 (Si) and 5.2.16 (Ci) for x ≤ 3; for 3 &lt; x &lt; 40 the continued
/// fraction of E1(z) (5.1.22) at z = ix with E1(ix) = −Ci(x) + i(Si(x) − π/2) (5.2.23), evaluated by the modified
/// Lentz method as in W. H. Press et al., <i>Numerical Recipes</i>, 3rd ed., 2007, Sec. 6.8 (cisi; from memory);
/// for x ≥ 40 the asymptotic auxiliary functions f, g (5.2.8, 5.2.9, 5.2.34, 5.2.35), whose truncation error is
/// below e^(−40). Internal: a public Si/Ci for mutual coupling is planned elsewhere; merge when it lands.
/// </remarks>
internal static class GroundPlaneSlotMath
{
    /// <summary>Euler–Mascheroni constant γ.</summary>
    internal const double EulerGamma = 0.57721566490153286061;

    private const double SeriesLimit = 3.0, AsymptoticLimit = 40.0;

    /// <summary>Si(x), any real x (odd function).</summary>
    internal static double Si(double x)
    {
        if (double.IsNaN(x)) throw new ArgumentOutOfRangeException(nameof(x), x, "Si needs a number");
        if (x < 0) return -Si(-x);
        if (x <= SeriesLimit) return SiSeries(x);
        return x < AsymptoticLimit ? SiCiContinuedFraction(x).Si : SiCiAsymptotic(x).Si;
    }

    /// <summary>Ci(x), x &gt; 0.</summary>
    internal static double Ci(double x)
    {
        if (!(x > 0)) throw new ArgumentOutOfRangeException(nameof(x), x, "Ci(x) is real only for x > 0");
        if (x <= SeriesLimit) return CiSeries(x);
        return x < AsymptoticLimit ? SiCiContinuedFraction(x).Ci : SiCiAsymptotic(x).Ci;
    }

    /// <summary>A&amp;S 5.2.14: Si(x) = Σ (−1)ⁿ x^(2n+1)/((2n+1)(2n+1)!).</summary>
    internal static double SiSeries(double x)
    {
        double term = x, sum = x, x2 = x * x; // term_n = (−1)ⁿ x^(2n+1)/(2n+1)!
        for (int n = 1; n < 100; n++)
        {
            term *= -x2 / ((2 * n) * (2 * n + 1));
            double add = term / (2 * n + 1);
            sum += add;
            if (Math.Abs(add) < 1e-17 * Math.Abs(sum)) break;
        }
        return sum;
    }

    /// <summary>A&amp;S 5.2.16: Ci(x) = γ + ln x + Σ_{n≥1} (−1)ⁿ x^(2n)/(2n (2n)!).</summary>
    internal static double CiSeries(double x)
    {
        double term = 1, sum = 0, x2 = x * x; // term_n = (−1)ⁿ x^(2n)/(2n)!
        for (int n = 1; n < 100; n++)
        {
            term *= -x2 / ((2 * n - 1) * (2 * n));
            double add = term / (2 * n);
            sum += add;
            if (Math.Abs(add) < 1e-17) break;
        }
        return EulerGamma + Math.Log(x) + sum;
    }

    /// <summary>Si and Ci from the continued fraction of E1(ix) (A&amp;S 5.1.22; modified Lentz), x &gt; about 2.</summary>
    internal static (double Si, double Ci) SiCiContinuedFraction(double x)
    {
        const double tiny = 1e-300;
        var b = new Complex(1, x);
        Complex c = 1 / tiny, d = 1 / b, h = d;
        for (int i = 2; i < 1000; i++)
        {
            double a = -(double)(i - 1) * (i - 1);
            b += 2;
            d = 1 / (a * d + b);
            c = b + a / c;
            var del = c * d;
            h *= del;
            if (Math.Abs(del.Real - 1) + Math.Abs(del.Imaginary) < 1e-16) break;
        }
        h *= new Complex(Math.Cos(x), -Math.Sin(x)); // h = E1(ix)
        return (Math.PI / 2 + h.Imaginary, -h.Real);
    }

    /// <summary>Asymptotic forms (A&amp;S 5.2.8, 5.2.9 with 5.2.34, 5.2.35), summed to the smallest term; x ≥ about 25.</summary>
    internal static (double Si, double Ci) SiCiAsymptotic(double x)
    {
        double x2 = x * x, f = 0, g = 0, tf = 1, tg = 1; // tf = (2n)!/x^(2n), tg = (2n+1)!/x^(2n)
        for (int n = 0; n < 200; n++)
        {
            f += (n % 2 == 0 ? 1 : -1) * tf;
            g += (n % 2 == 0 ? 1 : -1) * tg;
            double nf = tf * (2 * n + 1) * (2 * n + 2) / x2, ng = tg * (2 * n + 2) * (2 * n + 3) / x2;
            if (ng >= tg || nf < 1e-18) break;
            tf = nf; tg = ng;
        }
        f /= x; g /= x2;
        return (Math.PI / 2 - f * Math.Cos(x) - g * Math.Sin(x), f * Math.Sin(x) - g * Math.Cos(x));
    }
}
