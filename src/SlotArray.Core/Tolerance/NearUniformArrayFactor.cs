using System.Numerics;
using System.Runtime.Intrinsics;
using SlotArray.Core.Patterns;

namespace SlotArray.Core.Tolerance;

/// <summary>
/// The array factor of elements displaced slightly from an equally spaced line, on a fixed set of u = sin θ:
/// AF(u) = Σ_n a_n e^{jk(p_n + δ_n)u} = Σ_{m=0}^{M} ((jku)^m/m!) Σ_n a_n δ_n^m e^{jk p_n u}, each inner sum an equally
/// spaced sum by Horner's rule in w = e^{jkdu} (vectorised over u, no sine per element), the series cut when the next
/// term is below 1e-7 of the peak field Σ|a_n| (−140 dB: 0.001 dB on a −60 dB sidelobe) (M ≤ 8; beyond that the direct sum is used). The grids' phase factors are computed once.
/// </summary>
/// <remarks>
/// The series is the exponential's Taylor series, truncated where its remainder (k max|δ|)^{M+1}/(M+1)! falls below
/// 1e-7: for 0.03 mm at X band, k max|δ| ≈ 0.006, so M = 2. It is an evaluation of the same sum, not a linearisation.
/// With all δ = 0 it is the equally spaced sum itself (as in <see cref="ArrayFactor"/>'s fast path).
/// </remarks>
internal sealed class NearUniformArrayFactor
{
    private const int MaxOrder = 8;
    private const double Remainder = 1e-7;
    private readonly double k, p0, d;
    private readonly double[] positions, sines, ku, wr, wi, cr, ci;

    /// <summary>Nominal positions p_n (equally spaced, either direction), wavenumber and the u values.</summary>
    public NearUniformArrayFactor(double[] nominalPositions, double wavenumber, double[] sinesOfTheta)
    {
        positions = nominalPositions;
        k = wavenumber;
        sines = sinesOfTheta;
        int n = positions.Length, m = sines.Length;
        p0 = positions[0];
        d = n > 1 ? (positions[^1] - positions[0]) / (n - 1) : 0;
        double tol = 1e-12 * Math.Abs(positions[^1] - positions[0]);
        for (int i = 0; i < n; i++)
            if (Math.Abs(positions[i] - (p0 + i * d)) > tol)
                throw new ArgumentException("the nominal positions must be equally spaced", nameof(nominalPositions));
        ku = new double[m]; wr = new double[m]; wi = new double[m]; cr = new double[m]; ci = new double[m];
        for (int j = 0; j < m; j++)
        {
            ku[j] = k * sines[j];
            (wi[j], wr[j]) = Math.SinCos(k * d * sines[j]);
            (ci[j], cr[j]) = Math.SinCos(k * p0 * sines[j]);
        }
    }

    /// <summary>The field at every u for excitations a_n at p_n + δ_n.</summary>
    public Complex[] Evaluate(Complex[] a, double[] offsets)
    {
        int n = a.Length, m = sines.Length;
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
            return ArrayFactor.AtSines(p, a, k, sines);
        }
        int sets = order + 1;
        // Coefficients c[s][n] = a_n δ_n^s / s!, interleaved as re/im arrays per set.
        var ar = new double[sets * n];
        var ai = new double[sets * n];
        for (int i = 0; i < n; i++)
        {
            double f = 1;
            for (int s = 0; s < sets; s++)
            {
                ar[s * n + i] = a[i].Real * f;
                ai[s * n + i] = a[i].Imaginary * f;
                f *= offsets[i] / (s + 1);
            }
        }
        var field = new Complex[m];
        int lanes = Vector256<double>.Count, jv = 0;
        if (Vector256.IsHardwareAccelerated)
        {
            // Four lane groups at once: four independent Horner chains hide the multiply-add latency. Each lane's
            // arithmetic is the same as one group alone, so the result does not depend on the grouping.
            for (; jv + 4 * lanes <= m; jv += 4 * lanes) Horner4(ar, ai, n, sets, jv, field);
            for (; jv + lanes <= m; jv += lanes) Horner1(ar, ai, n, sets, jv, field);
        }
        for (int j = jv; j < m; j++)
        {
            Complex acc = 0;
            var jku = new Complex(0, ku[j]);
            for (int s = sets - 1; s >= 0; s--)
            {
                double r = 0, im = 0;
                int b = s * n;
                for (int e = n - 1; e >= 0; e--)
                {
                    double t = r * wr[j] - im * wi[j] + ar[b + e];
                    im = r * wi[j] + im * wr[j] + ai[b + e];
                    r = t;
                }
                acc = acc * jku + new Complex(r, im);
            }
            field[j] = acc * new Complex(cr[j], ci[j]);
        }
        return field;
    }

    /// <summary>Σ_s (jku)^s Σ_n c[s][n] w^n at the four lanes from <paramref name="j"/>, times the phase of p0.</summary>
    private void Horner1(double[] ar, double[] ai, int n, int sets, int j, Complex[] field)
    {
        var vr = Vector256.Create(wr, j);
        var vi = Vector256.Create(wi, j);
        var vk = Vector256.Create(ku, j);
        Vector256<double> accR = Vector256<double>.Zero, accI = accR;
        // Highest set first: acc ← acc·(j ku) + S_s, so the series is summed by Horner's rule in (j ku) as well.
        for (int s = sets - 1; s >= 0; s--)
        {
            Vector256<double> r = Vector256<double>.Zero, im = r;
            int b = s * n;
            for (int e = n - 1; e >= 0; e--)
            {
                var t = r * vr - im * vi + Vector256.Create(ar[b + e]);
                im = r * vi + im * vr + Vector256.Create(ai[b + e]);
                r = t;
            }
            var nr = r - accI * vk;
            accI = im + accR * vk;
            accR = nr;
        }
        Store(accR, accI, j, field);
    }

    /// <summary><see cref="Horner1"/> at sixteen lanes from <paramref name="j"/>, as four interleaved chains.</summary>
    private void Horner4(double[] ar, double[] ai, int n, int sets, int j, Complex[] field)
    {
        int l = Vector256<double>.Count;
        Vector256<double> vr0 = Vector256.Create(wr, j), vr1 = Vector256.Create(wr, j + l), vr2 = Vector256.Create(wr, j + 2 * l), vr3 = Vector256.Create(wr, j + 3 * l);
        Vector256<double> vi0 = Vector256.Create(wi, j), vi1 = Vector256.Create(wi, j + l), vi2 = Vector256.Create(wi, j + 2 * l), vi3 = Vector256.Create(wi, j + 3 * l);
        Vector256<double> aR0 = Vector256<double>.Zero, aR1 = aR0, aR2 = aR0, aR3 = aR0, aI0 = aR0, aI1 = aR0, aI2 = aR0, aI3 = aR0;
        for (int s = sets - 1; s >= 0; s--)
        {
            Vector256<double> r0 = Vector256<double>.Zero, r1 = r0, r2 = r0, r3 = r0, i0 = r0, i1 = r0, i2 = r0, i3 = r0;
            int b = s * n;
            for (int e = n - 1; e >= 0; e--)
            {
                var sr = Vector256.Create(ar[b + e]);
                var si = Vector256.Create(ai[b + e]);
                var t0 = r0 * vr0 - i0 * vi0 + sr; i0 = r0 * vi0 + i0 * vr0 + si; r0 = t0;
                var t1 = r1 * vr1 - i1 * vi1 + sr; i1 = r1 * vi1 + i1 * vr1 + si; r1 = t1;
                var t2 = r2 * vr2 - i2 * vi2 + sr; i2 = r2 * vi2 + i2 * vr2 + si; r2 = t2;
                var t3 = r3 * vr3 - i3 * vi3 + sr; i3 = r3 * vi3 + i3 * vr3 + si; r3 = t3;
            }
            var k0 = Vector256.Create(ku, j);
            var n0 = r0 - aI0 * k0; aI0 = i0 + aR0 * k0; aR0 = n0;
            var k1 = Vector256.Create(ku, j + l);
            var n1 = r1 - aI1 * k1; aI1 = i1 + aR1 * k1; aR1 = n1;
            var k2 = Vector256.Create(ku, j + 2 * l);
            var n2 = r2 - aI2 * k2; aI2 = i2 + aR2 * k2; aR2 = n2;
            var k3 = Vector256.Create(ku, j + 3 * l);
            var n3 = r3 - aI3 * k3; aI3 = i3 + aR3 * k3; aR3 = n3;
        }
        Store(aR0, aI0, j, field);
        Store(aR1, aI1, j + l, field);
        Store(aR2, aI2, j + 2 * l, field);
        Store(aR3, aI3, j + 3 * l, field);
    }

    /// <summary>field[j..] = acc × e^{jk p0 u}.</summary>
    private void Store(Vector256<double> accR, Vector256<double> accI, int j, Complex[] field)
    {
        var pr = Vector256.Create(cr, j);
        var pi = Vector256.Create(ci, j);
        var fr = accR * pr - accI * pi;
        var fi = accR * pi + accI * pr;
        for (int l = 0; l < Vector256<double>.Count; l++) field[j + l] = new Complex(fr[l], fi[l]);
    }
}
