using System.Numerics;
using System.Runtime.Intrinsics;
using SlotArray.Core.Patterns;

namespace SlotArray.Core.Tolerance;

/// <summary>
/// The array factor of elements displaced slightly from an equally spaced line, on a fixed set of u = sin θ:
/// AF(u) = Σ_n a_n e^{jk(p_n + δ_n)u} = e^{jkp_0u} Σ_{s=0}^{M} ((jku)^s/s!) P_s(w), P_s(w) = Σ_n c_sn w^n, c_sn = a_n δ_n^s,
/// w = e^{jkdu}: each P_s an equally spaced sum (no sine per element), the series cut when the next term is below 1e-7
/// of the peak field Σ|a_n| (−140 dB: 0.001 dB on a −60 dB sidelobe) (M ≤ 8; beyond that the direct sum is used). The
/// grids' phase factors are computed once.
/// </summary>
/// <remarks>
/// <para>The series is the exponential's Taylor series, truncated where its remainder (k max|δ|)^{M+1}/(M+1)! falls below
/// 1e-7: for 0.03 mm at X band, k max|δ| ≈ 0.006, so M = 2. It is an evaluation of the same sum, not a linearisation.
/// With all δ = 0 it is the equally spaced sum itself (as in <see cref="ArrayFactor"/>'s fast path).</para>
/// <para>Each P_s is split into its real-coefficient halves, P_s = A_s + jB_s, and each half summed by Goertzel's
/// second-order recurrence b_n = c_n + 2 cos φ b_{n+1} − b_{n+2}, A(e^{jφ}) = b_0 − b_1 e^{−jφ} (G. Goertzel, "An algorithm
/// for the evaluation of finite trigonometric series", Amer. Math. Monthly 65(1), 34–35, 1958; the Clenshaw form, from
/// memory): one fused multiply-add and one subtraction per coefficient, half the work of complex Horner. On a grid that is
/// mirrored in u (u_{m−1−j} = −u_j exactly, as the half-space grids are), A(e^{−jφ}) = A(e^{jφ})*, so the recurrences run
/// on one half of the grid and give both: a quarter of the arithmetic of complex Horner on every point. Rounding: Goertzel's
/// error grows toward φ = 0 and π to a few N² ulps of Σ|c_n| (W. M. Gentleman, "An error analysis of Goertzel's (Watt's)
/// method for computing Fourier coefficients", Computer J. 12(2), 160–165, 1969; from memory); for N = 64 that is ≈ 1e-12
/// of the peak field, 1e-10 dB on a −40 dB sidelobe, and the tests hold it to 1e-11 against the direct sum.</para>
/// <para>The recurrence takes two coefficients per pass with the two state registers exchanging roles, so that the
/// compiled loop copies no vector register (with a copy per step the register allocator spilled the state to the stack
/// whenever profile-guided optimisation was off or had not yet run, which doubled the cost of a short run).</para>
/// <para>Determinism: every lane runs the same fused operations (Vector256.FusedMultiplyAdd, which is exact in software
/// where the hardware lacks it), so the values do not depend on the processor or the thread.</para>
/// </remarks>
internal sealed class NearUniformArrayFactor
{
    private const int MaxOrder = 8;
    private const double Remainder = 1e-7;
    private const int Lanes = 4;   // Vector256<double>
    private const int Block = 4 * Lanes;
    private const int WideLanes = 8;   // Vector512<double>
    private const int WideBlock = 4 * WideLanes;
    private readonly double k;
    private readonly int n, m, half, padded;
    private readonly double[] positions, sines, ku, twoCos, wr, wi, cr, ci;

    /// <summary>Nominal positions p_n (equally spaced, either direction), wavenumber and the u values.</summary>
    public NearUniformArrayFactor(double[] nominalPositions, double wavenumber, double[] sinesOfTheta)
    {
        positions = nominalPositions;
        k = wavenumber;
        sines = sinesOfTheta;
        n = positions.Length;
        m = sines.Length;
        double p0 = positions[0];
        double d = n > 1 ? (positions[^1] - positions[0]) / (n - 1) : 0;
        double tol = 1e-12 * Math.Abs(positions[^1] - positions[0]);
        for (int i = 0; i < n; i++)
            if (Math.Abs(positions[i] - (p0 + i * d)) > tol)
                throw new ArgumentException("the nominal positions must be equally spaced", nameof(nominalPositions));
        bool mirrored = true;
        for (int j = 0; j < m; j++) mirrored &= sines[m - 1 - j] == -sines[j];
        half = mirrored ? (m + 1) / 2 : m;
        padded = (half + WideBlock - 1) / WideBlock * WideBlock;   // whole blocks of either width
        ku = new double[padded]; twoCos = new double[padded]; wr = new double[padded]; wi = new double[padded];
        cr = new double[padded]; ci = new double[padded];
        for (int j = 0; j < padded; j++)
        {
            double u = sines[Math.Min(j, half - 1)];   // the padding repeats the last point; its values are not stored
            ku[j] = k * u;
            (wi[j], wr[j]) = Math.SinCos(k * d * u);
            twoCos[j] = 2 * wr[j];
            (ci[j], cr[j]) = Math.SinCos(k * p0 * u);
        }
    }

    /// <summary>Number of u values.</summary>
    public int Count => m;

    /// <summary>Working arrays for <see cref="Evaluate(ReadOnlySpan{Complex}, ReadOnlySpan{double}, Span{double}, Span{double}, Scratch)"/>, one per thread.</summary>
    public Scratch NewScratch() => new(n, padded);

    /// <summary>The field at every u for excitations a_n at p_n + δ_n (allocating; see the other overload).</summary>
    public Complex[] Evaluate(Complex[] a, double[] offsets)
    {
        var re = new double[m];
        var im = new double[m];
        Evaluate(a, offsets, re, im, NewScratch());
        var field = new Complex[m];
        for (int j = 0; j < m; j++) field[j] = new Complex(re[j], im[j]);
        return field;
    }

    /// <summary>The field at every u for excitations a_n at p_n + δ_n, into <paramref name="re"/> and <paramref name="im"/> (length <see cref="Count"/>).</summary>
    public void Evaluate(ReadOnlySpan<Complex> a, ReadOnlySpan<double> offsets, Span<double> re, Span<double> im, Scratch scratch)
    {
        double x = 0;
        foreach (var o in offsets) x = Math.Max(x, Math.Abs(o));
        x *= k;   // |u| ≤ 1
        int order = 0;
        double term = x;
        while (term > Remainder && order < MaxOrder) { order++; term *= x / (order + 1); }
        if (term > Remainder)
        {
            var p = new double[n];
            for (int i = 0; i < n; i++) p[i] = positions[i] + offsets[i];
            var direct = ArrayFactor.AtSines(p, a.ToArray(), k, sines);
            for (int j = 0; j < m; j++) { re[j] = direct[j].Real; im[j] = direct[j].Imaginary; }
            return;
        }
        int sets = order + 1;
        // Coefficients c[s][n] = a_n δ_n^s / s!, real and imaginary parts as separate sequences per set.
        var cRe = scratch.CoefficientsRe;
        var cIm = scratch.CoefficientsIm;
        for (int i = 0; i < n; i++)
        {
            double f = 1;
            for (int s = 0; s < sets; s++)
            {
                cRe[s * n + i] = a[i].Real * f;
                cIm[s * n + i] = a[i].Imaginary * f;
                f *= offsets[i] / (s + 1);
            }
        }
        // Highest set first: acc ← acc·(jku) + P_s (Horner's rule in jku), at +u (acc) and at −u (mirror).
        bool wide = Vector512.IsHardwareAccelerated;
        for (int s = sets - 1; s >= 0; s--)
            if (wide)
                for (int j = 0; j < padded; j += WideBlock) Goertzel4Wide(cRe, cIm, s * n, j, scratch, s == sets - 1);
            else
                for (int j = 0; j < padded; j += Block) Goertzel4(cRe, cIm, s * n, j, scratch, s == sets - 1);
        for (int j = 0; j < half; j++)
        {
            re[j] = scratch.AccRe[j] * cr[j] - scratch.AccIm[j] * ci[j];
            im[j] = scratch.AccRe[j] * ci[j] + scratch.AccIm[j] * cr[j];
            if (half == m || m - 1 - j == j) continue;
            // e^{jkp0(−u)} = (e^{jkp0u})*.
            re[m - 1 - j] = scratch.MirRe[j] * cr[j] + scratch.MirIm[j] * ci[j];
            im[m - 1 - j] = scratch.MirIm[j] * cr[j] - scratch.MirRe[j] * ci[j];
        }
    }

    /// <summary>
    /// One set's A_s and B_s by Goertzel's recurrence at the sixteen points from <paramref name="j"/> (four lane groups
    /// as independent chains, which hides the multiply-add latency; each lane's arithmetic is the same as alone), then
    /// acc ← acc·(jku) + P_s at +u and at −u.
    /// </summary>
    private void Goertzel4(double[] cRe, double[] cIm, int b, int j, Scratch w, bool first)
    {
        Vector256<double> c0 = Vector256.Create(twoCos, j), c1 = Vector256.Create(twoCos, j + Lanes),
            c2 = Vector256.Create(twoCos, j + 2 * Lanes), c3 = Vector256.Create(twoCos, j + 3 * Lanes);
        Vector256<double> z = Vector256<double>.Zero;
        Vector256<double> a10 = z, a20 = z, a11 = z, a21 = z, a12 = z, a22 = z, a13 = z, a23 = z;   // A: b_{n+1}, b_{n+2} per group
        Vector256<double> b10 = z, b20 = z, b11 = z, b21 = z, b12 = z, b22 = z, b13 = z, b23 = z;   // B
        // Two coefficients per pass with the roles of the two registers alternating (b_e lands where b_{e+2} was), so
        // that no register is copied; each step is the same fused operation as one step at a time.
        int e = n - 1;
        for (; e >= 1; e -= 2)
        {
            var ca = Vector256.Create(cRe[b + e]);
            var cb = Vector256.Create(cIm[b + e]);
            a20 = Vector256.FusedMultiplyAdd(c0, a10, ca - a20);
            a21 = Vector256.FusedMultiplyAdd(c1, a11, ca - a21);
            a22 = Vector256.FusedMultiplyAdd(c2, a12, ca - a22);
            a23 = Vector256.FusedMultiplyAdd(c3, a13, ca - a23);
            b20 = Vector256.FusedMultiplyAdd(c0, b10, cb - b20);
            b21 = Vector256.FusedMultiplyAdd(c1, b11, cb - b21);
            b22 = Vector256.FusedMultiplyAdd(c2, b12, cb - b22);
            b23 = Vector256.FusedMultiplyAdd(c3, b13, cb - b23);
            ca = Vector256.Create(cRe[b + e - 1]);
            cb = Vector256.Create(cIm[b + e - 1]);
            a10 = Vector256.FusedMultiplyAdd(c0, a20, ca - a10);
            a11 = Vector256.FusedMultiplyAdd(c1, a21, ca - a11);
            a12 = Vector256.FusedMultiplyAdd(c2, a22, ca - a12);
            a13 = Vector256.FusedMultiplyAdd(c3, a23, ca - a13);
            b10 = Vector256.FusedMultiplyAdd(c0, b20, cb - b10);
            b11 = Vector256.FusedMultiplyAdd(c1, b21, cb - b11);
            b12 = Vector256.FusedMultiplyAdd(c2, b22, cb - b12);
            b13 = Vector256.FusedMultiplyAdd(c3, b23, cb - b13);
        }
        if (e == 0)   // an odd count: one more step, and the swap puts b_0 in *1x and b_1 in *2x
        {
            var ca = Vector256.Create(cRe[b]);
            var cb = Vector256.Create(cIm[b]);
            a20 = Vector256.FusedMultiplyAdd(c0, a10, ca - a20); (a10, a20) = (a20, a10);
            a21 = Vector256.FusedMultiplyAdd(c1, a11, ca - a21); (a11, a21) = (a21, a11);
            a22 = Vector256.FusedMultiplyAdd(c2, a12, ca - a22); (a12, a22) = (a22, a12);
            a23 = Vector256.FusedMultiplyAdd(c3, a13, ca - a23); (a13, a23) = (a23, a13);
            b20 = Vector256.FusedMultiplyAdd(c0, b10, cb - b20); (b10, b20) = (b20, b10);
            b21 = Vector256.FusedMultiplyAdd(c1, b11, cb - b21); (b11, b21) = (b21, b11);
            b22 = Vector256.FusedMultiplyAdd(c2, b12, cb - b22); (b12, b22) = (b22, b12);
            b23 = Vector256.FusedMultiplyAdd(c3, b13, cb - b23); (b13, b23) = (b23, b13);
        }
        // After the loop b_0 is in *1x and b_1 in *2x.
        Combine(a10, a20, b10, b20, j, w, first);
        Combine(a11, a21, b11, b21, j + Lanes, w, first);
        Combine(a12, a22, b12, b22, j + 2 * Lanes, w, first);
        Combine(a13, a23, b13, b23, j + 3 * Lanes, w, first);
    }

    /// <summary>
    /// <see cref="Goertzel4"/> with eight lanes per group (32 points), where the processor has 512-bit vectors: each lane
    /// runs the same fused operations in the same order, so the values are those of the four-lane path to the bit.
    /// </summary>
    private void Goertzel4Wide(double[] cRe, double[] cIm, int b, int j, Scratch w, bool first)
    {
        Vector512<double> c0 = Vector512.Create(twoCos, j), c1 = Vector512.Create(twoCos, j + WideLanes),
            c2 = Vector512.Create(twoCos, j + 2 * WideLanes), c3 = Vector512.Create(twoCos, j + 3 * WideLanes);
        Vector512<double> z = Vector512<double>.Zero;
        Vector512<double> a10 = z, a20 = z, a11 = z, a21 = z, a12 = z, a22 = z, a13 = z, a23 = z;
        Vector512<double> b10 = z, b20 = z, b11 = z, b21 = z, b12 = z, b22 = z, b13 = z, b23 = z;
        // Two coefficients per pass with the roles of the two registers alternating (b_e lands where b_{e+2} was), so
        // that no register is copied; each step is the same fused operation as one step at a time.
        int e = n - 1;
        for (; e >= 1; e -= 2)
        {
            var ca = Vector512.Create(cRe[b + e]);
            var cb = Vector512.Create(cIm[b + e]);
            a20 = Vector512.FusedMultiplyAdd(c0, a10, ca - a20);
            a21 = Vector512.FusedMultiplyAdd(c1, a11, ca - a21);
            a22 = Vector512.FusedMultiplyAdd(c2, a12, ca - a22);
            a23 = Vector512.FusedMultiplyAdd(c3, a13, ca - a23);
            b20 = Vector512.FusedMultiplyAdd(c0, b10, cb - b20);
            b21 = Vector512.FusedMultiplyAdd(c1, b11, cb - b21);
            b22 = Vector512.FusedMultiplyAdd(c2, b12, cb - b22);
            b23 = Vector512.FusedMultiplyAdd(c3, b13, cb - b23);
            ca = Vector512.Create(cRe[b + e - 1]);
            cb = Vector512.Create(cIm[b + e - 1]);
            a10 = Vector512.FusedMultiplyAdd(c0, a20, ca - a10);
            a11 = Vector512.FusedMultiplyAdd(c1, a21, ca - a11);
            a12 = Vector512.FusedMultiplyAdd(c2, a22, ca - a12);
            a13 = Vector512.FusedMultiplyAdd(c3, a23, ca - a13);
            b10 = Vector512.FusedMultiplyAdd(c0, b20, cb - b10);
            b11 = Vector512.FusedMultiplyAdd(c1, b21, cb - b11);
            b12 = Vector512.FusedMultiplyAdd(c2, b22, cb - b12);
            b13 = Vector512.FusedMultiplyAdd(c3, b23, cb - b13);
        }
        if (e == 0)   // an odd count: one more step, and the swap puts b_0 in *1x and b_1 in *2x
        {
            var ca = Vector512.Create(cRe[b]);
            var cb = Vector512.Create(cIm[b]);
            a20 = Vector512.FusedMultiplyAdd(c0, a10, ca - a20); (a10, a20) = (a20, a10);
            a21 = Vector512.FusedMultiplyAdd(c1, a11, ca - a21); (a11, a21) = (a21, a11);
            a22 = Vector512.FusedMultiplyAdd(c2, a12, ca - a22); (a12, a22) = (a22, a12);
            a23 = Vector512.FusedMultiplyAdd(c3, a13, ca - a23); (a13, a23) = (a23, a13);
            b20 = Vector512.FusedMultiplyAdd(c0, b10, cb - b20); (b10, b20) = (b20, b10);
            b21 = Vector512.FusedMultiplyAdd(c1, b11, cb - b21); (b11, b21) = (b21, b11);
            b22 = Vector512.FusedMultiplyAdd(c2, b12, cb - b22); (b12, b22) = (b22, b12);
            b23 = Vector512.FusedMultiplyAdd(c3, b13, cb - b23); (b13, b23) = (b23, b13);
        }
        Combine(a10.GetLower(), a20.GetLower(), b10.GetLower(), b20.GetLower(), j, w, first);
        Combine(a10.GetUpper(), a20.GetUpper(), b10.GetUpper(), b20.GetUpper(), j + Lanes, w, first);
        Combine(a11.GetLower(), a21.GetLower(), b11.GetLower(), b21.GetLower(), j + WideLanes, w, first);
        Combine(a11.GetUpper(), a21.GetUpper(), b11.GetUpper(), b21.GetUpper(), j + WideLanes + Lanes, w, first);
        Combine(a12.GetLower(), a22.GetLower(), b12.GetLower(), b22.GetLower(), j + 2 * WideLanes, w, first);
        Combine(a12.GetUpper(), a22.GetUpper(), b12.GetUpper(), b22.GetUpper(), j + 2 * WideLanes + Lanes, w, first);
        Combine(a13.GetLower(), a23.GetLower(), b13.GetLower(), b23.GetLower(), j + 3 * WideLanes, w, first);
        Combine(a13.GetUpper(), a23.GetUpper(), b13.GetUpper(), b23.GetUpper(), j + 3 * WideLanes + Lanes, w, first);
    }

    /// <summary>
    /// A(w) = b0_A − b1_A e^{−jφ}, B(w) likewise; P(w) = A + jB and P(w*) = A* + jB*; acc ← acc·(jku) + P(w),
    /// mirror ← mirror·(−jku) + P(w*); on the <paramref name="first"/> (highest) set acc ← P(w), mirror ← P(w*).
    /// </summary>
    private void Combine(Vector256<double> a0, Vector256<double> a1, Vector256<double> b0, Vector256<double> b1, int j, Scratch w, bool first)
    {
        var cos = Vector256.Create(wr, j);
        var sin = Vector256.Create(wi, j);
        var aRe = a0 - a1 * cos;   // Re A(w)
        var aIm = a1 * sin;        // Im A(w)
        var bRe = b0 - b1 * cos;
        var bIm = b1 * sin;
        var pRe = aRe - bIm;       // P(w) = A + jB
        var pIm = aIm + bRe;
        var qRe = aRe + bIm;       // P(w*) = A* + jB*
        var qIm = bRe - aIm;
        if (first)
        {
            pRe.CopyTo(w.AccRe, j); pIm.CopyTo(w.AccIm, j); qRe.CopyTo(w.MirRe, j); qIm.CopyTo(w.MirIm, j);
            return;
        }
        var kv = Vector256.Create(ku, j);
        var accRe = Vector256.Create(w.AccRe, j);
        var accIm = Vector256.Create(w.AccIm, j);
        (pRe - accIm * kv).CopyTo(w.AccRe, j);
        (pIm + accRe * kv).CopyTo(w.AccIm, j);
        var mirRe = Vector256.Create(w.MirRe, j);
        var mirIm = Vector256.Create(w.MirIm, j);
        (qRe + mirIm * kv).CopyTo(w.MirRe, j);
        (qIm - mirRe * kv).CopyTo(w.MirIm, j);
    }

    /// <summary>Per-thread working arrays of one factor (coefficients and the running series sums).</summary>
    internal sealed class Scratch
    {
        internal Scratch(int elements, int points)
        {
            CoefficientsRe = new double[(MaxOrder + 1) * elements];
            CoefficientsIm = new double[(MaxOrder + 1) * elements];
            AccRe = new double[points]; AccIm = new double[points]; MirRe = new double[points]; MirIm = new double[points];
        }

        internal double[] CoefficientsRe { get; }
        internal double[] CoefficientsIm { get; }
        internal double[] AccRe { get; }
        internal double[] AccIm { get; }
        internal double[] MirRe { get; }
        internal double[] MirIm { get; }
    }
}
