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
            for (; jv + lanes <= m; jv += lanes)
            {
                var vr = Vector256.Create(wr, jv);
                var vi = Vector256.Create(wi, jv);
                var vk = Vector256.Create(ku, jv);
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
                var pr = Vector256.Create(cr, jv);
                var pi = Vector256.Create(ci, jv);
                var fr = accR * pr - accI * pi;
                var fi = accR * pi + accI * pr;
                for (int l = 0; l < lanes; l++) field[jv + l] = new Complex(fr[l], fi[l]);
            }
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
}
