using System.Numerics;
using System.Runtime.Intrinsics;
using MathNet.Numerics.Integration;

namespace SlotArray.Core.Tolerance;

/// <summary>
/// The radiated-power integral of the half-space directivity, P = ∫_{−1}^{1} |E·AF|² du, for elements displaced slightly
/// from an equally spaced line: P = Σ_m Σ_n a_m a_n* K(p_m − p_n + δ_m − δ_n), K(Δ) = ∫ E(u)² e^{jkΔu} du, with K expanded
/// about each nominal lag, K(Δ0 + δ) = Σ_q K_q(Δ0) δ^q/q!, K_q(Δ0) = ∫ E² (jku)^q e^{jkΔ0 u} du. The K_q are integrated once
/// with the rule of <see cref="Patterns.Directivity.HalfSpace(IReadOnlyList{double}, IReadOnlyList{Complex}, double, Func{double, double}, double)"/>
/// (composite 16-point Gauss–Legendre, a panel per π/(k·span) of u plus 8), so with all δ = 0 this is that rule's value.
/// </summary>
/// <remarks>
/// Source: the directivity definition D = 4πU/∫∫U dΩ over the front half-space (IEEE Std 145-2013; the φ-integral is π),
/// expanded in a Taylor series in the small displacements — derived here, checked in the tolerance tests against
/// <c>Directivity.HalfSpace</c> of the displaced slots (agreement 1e-9).
/// Terms are kept while (2k max|δ|)^{q}/q! exceeds 1e-12 (q ≤ 6); beyond that <see cref="TryPower(Complex[], double[], out double)"/> returns false and the
/// caller integrates directly. For machining errors of 0.03 mm at X band three terms suffice.
/// </remarks>
internal sealed class HalfSpacePowerKernel
{
    private const int MaxOrder = 6;
    private const double Remainder = 1e-12;
    private readonly int n;
    private readonly double k;
    private readonly double[][] reversedRe, reversedIm;   // K_q/q! at [q][(n − 1) − lag], real and imaginary parts

    public HalfSpacePowerKernel(double[] nominalPositions, double wavenumber, Func<double, double> element)
    {
        n = nominalPositions.Length;
        k = wavenumber;
        double d = n > 1 ? (nominalPositions[^1] - nominalPositions[0]) / (n - 1) : 0;
        double span = Math.Abs(nominalPositions[^1] - nominalPositions[0]);
        int panels = Math.Max(8, (int)Math.Ceiling(k * span / Math.PI) + 8);
        var rule = new GaussLegendreRule(-1, 1, 16);
        double h = 2.0 / panels;
        var kernel = new Complex[MaxOrder + 1, 2 * n - 1];
        for (int p = 0; p < panels; p++)
            for (int q = 0; q < rule.Order; q++)
            {
                double u = -1 + h * (p + 0.5 * (rule.Abscissas[q] + 1));
                double e = element(Math.Asin(u));
                double w = 0.5 * h * rule.Weights[q] * e * e;
                var jku = new Complex(0, k * u);
                for (int lag = -(n - 1); lag <= n - 1; lag++)
                {
                    Complex t = w * Complex.FromPolarCoordinates(1, k * lag * d * u);
                    for (int o = 0; o <= MaxOrder; o++)
                    {
                        kernel[o, lag + n - 1] += t;
                        t *= jku / (o + 1);   // stored as K_q/q!
                    }
                }
            }
        reversedRe = new double[MaxOrder + 1][];
        reversedIm = new double[MaxOrder + 1][];
        for (int o = 0; o <= MaxOrder; o++)
        {
            reversedRe[o] = new double[2 * n - 1];
            reversedIm[o] = new double[2 * n - 1];
            for (int r = 0; r < 2 * n - 1; r++)
            {
                reversedRe[o][r] = kernel[o, 2 * n - 2 - r].Real;
                reversedIm[o][r] = kernel[o, 2 * n - 2 - r].Imaginary;
            }
        }
    }

    /// <summary>Working arrays for <see cref="TryPower(ReadOnlySpan{Complex}, ReadOnlySpan{double}, out double, Scratch)"/>, one per thread.</summary>
    public Scratch NewScratch() => new(n);

    /// <summary>P for excitations a_n at p_n + δ_n; false when the displacements need more terms than kept (allocating; see the other overload).</summary>
    public bool TryPower(Complex[] a, double[] offsets, out double power) => TryPower(a, offsets, out power, NewScratch());

    /// <summary>
    /// P for excitations a_n at p_n + δ_n; false when the displacements need more terms than kept. Each pair's term is
    /// computed by the same operations as the pairwise sum 2 Re(a_m a_i* K(δ_m − δ_i)) in complex arithmetic (Horner's
    /// rule in δ, no fused multiply-add), four pairs per vector, and the terms are added one by one in the order
    /// (m ascending, the diagonal then i = 0 … m − 1): the value is that of the scalar double loop to the bit.
    /// </summary>
    public bool TryPower(ReadOnlySpan<Complex> a, ReadOnlySpan<double> offsets, out double power, Scratch w)
    {
        double x = 0;
        foreach (var o in offsets) x = Math.Max(x, Math.Abs(o));
        x *= 2 * k;
        int order = 0;
        double term = x;
        while (term > Remainder && order < MaxOrder) { order++; term *= x / (order + 1); }
        power = 0;
        if (term > Remainder) return false;
        var re = w.Re;
        var im = w.Im;
        var negIm = w.NegIm;
        for (int i = 0; i < n; i++) { re[i] = a[i].Real; im[i] = a[i].Imaginary; negIm[i] = -a[i].Imaginary; }
        // K(−x) = K(x)* (E² is real), so the pair (n, m) is the conjugate of (m, n): P = Σ|a_m|² K(0) + 2 Re Σ_{m>n}.
        double sum = 0, k0 = reversedRe[0][n - 1];
        var terms = w.Terms;
        for (int m = 0; m < n; m++)
        {
            sum += (re[m] * re[m] + im[m] * im[m]) * k0;
            if (m == 0) continue;
            PairTerms(m, order, re, im, negIm, offsets, terms);
            for (int i = 0; i < m; i++) sum += terms[i];
        }
        power = sum;
        return true;
    }

    /// <summary>
    /// The terms 2 Re(a_m a_i* K(δ_m − δ_i)) of row m for i = 0 … m − 1 into <paramref name="terms"/>: Horner's rule
    /// kk ← kk δ + K_q in complex arithmetic, then (a_m a_i*) kk, with the products and sums of
    /// <see cref="Complex"/>'s operators in the same order.
    /// </summary>
    private void PairTerms(int m, int order, double[] re, double[] im, double[] negIm, ReadOnlySpan<double> offsets, double[] terms)
    {
        int r0 = n - 1 - m;   // reversed lag index of (m, i = 0); it grows with i
        double am = re[m], bm = im[m], dm = offsets[m];
        int i = 0;
        if (Vector256.IsHardwareAccelerated)
        {
            var vam = Vector256.Create(am);
            var vbm = Vector256.Create(bm);
            var vdm = Vector256.Create(dm);
            var two = Vector256.Create(2.0);
            for (; i + 4 <= m; i += 4)
            {
                var delta = vdm - Vector256.Create(offsets.Slice(i, 4));
                var kr = Vector256.Create(reversedRe[order], r0 + i);
                var ki = Vector256.Create(reversedIm[order], r0 + i);
                for (int q = order - 1; q >= 0; q--)
                {
                    kr = kr * delta + Vector256.Create(reversedRe[q], r0 + i);
                    ki = ki * delta + Vector256.Create(reversedIm[q], r0 + i);
                }
                var ar = Vector256.Create(re, i);
                var ai = Vector256.Create(im, i);
                var nai = Vector256.Create(negIm, i);
                var xr = vam * ar - vbm * nai;   // a_m × conj(a_i), as Complex's operator
                var xi = vbm * ar + vam * nai;
                (two * (xr * kr - xi * ki)).CopyTo(terms, i);
            }
        }
        for (; i < m; i++)
        {
            double delta = dm - offsets[i];
            double kr = reversedRe[order][r0 + i], ki = reversedIm[order][r0 + i];
            for (int q = order - 1; q >= 0; q--)
            {
                kr = kr * delta + reversedRe[q][r0 + i];
                ki = ki * delta + reversedIm[q][r0 + i];
            }
            double xr = am * re[i] - bm * negIm[i];
            double xi = bm * re[i] + am * negIm[i];
            terms[i] = 2 * (xr * kr - xi * ki);
        }
    }

    /// <summary>Per-thread working arrays (the excitations split into parts, one row's terms).</summary>
    internal sealed class Scratch
    {
        internal Scratch(int n)
        {
            Re = new double[n]; Im = new double[n]; NegIm = new double[n]; Terms = new double[n];
        }

        internal double[] Re { get; }
        internal double[] Im { get; }
        internal double[] NegIm { get; }
        internal double[] Terms { get; }
    }
}
