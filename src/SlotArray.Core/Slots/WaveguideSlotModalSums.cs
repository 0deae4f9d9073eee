using System.Numerics;

namespace SlotArray.Core.Slots;

/// <summary>
/// The interior (waveguide-side) Galerkin block of a longitudinal broad-wall slot: the modal double sum of
/// the Galerkin formulation (Stern &amp; Elliott 1985; Josefsson 1987), evaluated by an accelerated scheme, plus the brute-force sum it is tested against.
/// </summary>
/// <remarks>
/// <para>Notation ([D]; structure after G. J. Stern and R. S. Elliott, "Resonant length of
/// longitudinal slots and validity of circuit representation: theory and experiment", IEEE Trans. AP-33(11),
/// 1264–1271, 1985): Y^int_qp = (1/(jωμ0)) Σ_m Σ_n W_mn T_qp(γ_mn) with the mode weight
/// W_mn = (ε_m ε_n/(ab)) w cos²(mπx_c/a) sinc_m² and the bracket T_qp = k_c² D_qp(γ) − l δ_qp.</para>
/// <para><b>Acceleration (derived here).</b> With k_c² = γ² + k² the bracket splits exactly into
/// T = T^A + T^B, T^A_pp = l (k² − α_p²)/(α_p² + γ²) (diagonal only) and
/// T^B_qp = (γ² + k²)(1 − s e^(−2γl)) α_q α_p / (γ (α_q² + γ²)(α_p² + γ²)) (same parity only).</para>
/// <para>(i) T^A is rational in α_p² + γ_mn² = c_pn² + (mπ/a)², c_pn² = α_p² − k² + (nπ/b)², so its m-sum is the
/// Neumann Green's function of d²/dx² − c² on 0 &lt; x &lt; a, g(x, x′) = cosh(c x_&lt;) cosh(c(a − x_&gt;))/(c sinh ca),
/// averaged over the slot width in x and x′ (the weight w cos² sinc² is exactly that double average). In closed form
/// c² Q(c) = 1 − 2 sinh(c(a − w/2)) sinh(cw/2)/(w c sinh ca) + 2 sinh²(cw/2) cosh(2cx)/(w c sinh ca), x the offset
/// (c imaginary and c → 0 handled by the same expression). The remaining n-sum has terms 1/c² − (1 − e^(−cw))/(w c³);
/// after N_A terms its tail is added in closed form: Σ_n∈ℤ 1/(d² + (nπ/b)²) = (b/d) coth(db) for the 1/c² part and
/// the midpoint (Euler–Maclaurin) integral for the 1/c³ part.</para>
/// <para>(ii) T^B decays as α_q α_p/γ³. That asymptote is subtracted mode by mode (Kummer's transformation), and its
/// double sum S3 = Σ W_mn/γ_mn³ — independent of the slot length — is computed once per offset and frequency: the
/// n-sum by Poisson summation, Σ_n ε_n/(b γ³) = 2/(π κ_m²) + O(e^(−2κ_m b)) with κ_m² = (mπ/a)² − k², when κ_m b &gt; 18,
/// and directly (with a midpoint-integral tail) otherwise; the m-sum to 4000 terms. The remainder T^B − α_qα_p/γ³
/// decays as γ⁻⁵ and is summed directly over the modes with k_c ≤ Γ.</para>
/// </remarks>
internal sealed class WaveguideSlotModalSums
{
    private readonly double _a, _b, _k, _w, _offset, _xc;
    private readonly int _nA;
    // Remainder modes (k_c ≤ Γ): weight and γ² (γ² = k_c² − k²).
    private readonly double[] _weight, _gamma2;
    private readonly Complex _s3;

    /// <summary>Number of modes in the directly summed remainder (for reports and benchmarks).</summary>
    public int RemainderModeCount => _weight.Length;

    /// <summary>The length-independent sum S3 = Σ W_mn/γ_mn³ (1/m², complex).</summary>
    public Complex S3 => _s3;

    /// <param name="a">Broad wall (m).</param>
    /// <param name="b">Narrow wall (m).</param>
    /// <param name="k">Wavenumber in the filling (rad/m).</param>
    /// <param name="width">Slot width w (m).</param>
    /// <param name="offset">Signed offset of the slot centre line from the guide centre line (m).</param>
    /// <param name="modeCut">Γ: remainder modes with cutoff wavenumber k_c ≤ Γ (rad/m).</param>
    /// <param name="closedFormTerms">N_A: n terms summed before the closed-form tail of T^A.</param>
    public WaveguideSlotModalSums(double a, double b, double k, double width, double offset, double modeCut, int closedFormTerms)
    {
        _a = a; _b = b; _k = k; _w = width; _offset = offset; _xc = a / 2 + offset; _nA = closedFormTerms;
        var weights = new List<double>();
        var gammas = new List<double>();
        int mMax = (int)Math.Ceiling(modeCut * a / Math.PI), nMax = (int)Math.Ceiling(modeCut * b / Math.PI);
        for (int m = 0; m <= mMax; m++)
        {
            double km = m * Math.PI / a, wm = WidthWeight(m);
            for (int n = 0; n <= nMax; n++)
            {
                double kn = n * Math.PI / b, kc2 = km * km + kn * kn;
                if (kc2 > modeCut * modeCut) break;
                weights.Add(wm * (n == 0 ? 1.0 : 2.0) / b);
                gammas.Add(kc2 - k * k);
            }
        }
        _weight = [.. weights];
        _gamma2 = [.. gammas];
        _s3 = ComputeS3();
    }

    /// <summary>(ε_m/a) w cos²(mπx_c/a) sinc_m²: the x-part of the mode weight.</summary>
    private double WidthWeight(int m)
    {
        if (m == 0) return _w / _a;
        double km = m * Math.PI / _a, arg = km * _w / 2, sinc = Math.Sin(arg) / arg, c = Math.Cos(km * _xc);
        return 2 / _a * _w * c * c * sinc * sinc;
    }

    private static Complex Gamma(double gamma2) => gamma2 >= 0 ? new Complex(Math.Sqrt(gamma2), 0) : new Complex(0, Math.Sqrt(-gamma2));

    private Complex ComputeS3()
    {
        Complex sum = Complex.Zero;
        for (int m = 0; m <= 4000; m++)
        {
            double km = m * Math.PI / _a, kappa2 = km * km - _k * _k;
            Complex nsum;
            if (kappa2 > 0 && Math.Sqrt(kappa2) * _b > 18) nsum = 2 / (Math.PI * kappa2);
            else
            {
                const int nDirect = 60;
                nsum = Complex.Zero;
                for (int n = 0; n <= nDirect; n++)
                {
                    double kn = n * Math.PI / _b;
                    Complex g = Gamma(kappa2 + kn * kn);
                    nsum += (n == 0 ? 1.0 : 2.0) / _b / (g * g * g);
                }
                double u0 = (nDirect + 0.5) * Math.PI / _b, r = Math.Sqrt(kappa2 + u0 * u0);
                nsum += 2 / Math.PI / (r * (r + u0));
            }
            sum += WidthWeight(m) * nsum;
        }
        return sum;
    }

    /// <summary>
    /// The interior Galerkin block Y^int (P×P, siemens-like units of this normalisation) for a slot of half length l.
    /// </summary>
    public Complex[,] Block(double halfLength, int basisCount, double omegaMu0)
    {
        int nb = basisCount;
        double l = halfLength, k2 = _k * _k;
        var alpha = new double[nb];
        for (int p = 0; p < nb; p++) alpha[p] = (p + 1) * Math.PI / (2 * l);
        var t = new Complex[nb, nb];

        // (i) T^A: closed-form m-sum, n-sum with closed-form tail (diagonal only).
        for (int p = 0; p < nb; p++)
        {
            double a2 = alpha[p] * alpha[p], d2 = a2 - k2, acc = -CSquaredQ(d2) / _b; // n = 0: (k² − α²)/c0² = −1
            for (int n = 1; n <= _nA; n++)
            {
                double kn = n * Math.PI / _b, c2 = d2 + kn * kn;
                acc += (k2 - a2) * 2 / _b * CSquaredQ(c2) / c2;
            }
            acc += (k2 - a2) * TailA(d2);
            t[p, p] += l * acc;
        }

        // (ii) T^B: extracted asymptote α_q α_p S3 plus the directly summed remainder.
        var (remRe, remIm) = Remainder(alpha, l);
        var pre = 1 / new Complex(0, omegaMu0);
        var y = new Complex[nb, nb];
        for (int p = 0; p < nb; p++)
            for (int q = p % 2; q <= p; q += 2)
            {
                var rem = new Complex(remRe[q * nb + p], remIm[q * nb + p]);
                Complex v = rem + alpha[q] * alpha[p] * _s3 + (q == p ? t[p, p] : Complex.Zero);
                y[q, p] = y[p, q] = pre * v;
            }
        return y;
    }

    /// <summary>
    /// Σ over the remainder modes of W_mn (T^B_qp − α_q α_p/γ³) for same-parity q ≤ p, real and imaginary parts apart
    /// (index q·P + p). The factors that depend on one index only (α_q α_p, 1/(α_q² + γ²), k_c²(1 − s e^(−2γl))) are formed
    /// once per mode instead of once per pair, and for each p the pairs (q = p mod 2, p mod 2 + 2, …) run in the lanes of a
    /// vector: the same operations in the same order on each pair, and the modes added one after another as before, so
    /// the sum has the same bits as the pairwise scalar form.
    /// </summary>
    private (double[] Re, double[] Im) Remainder(double[] alpha, double l)
    {
        int nb = alpha.Length, width = Vector<double>.Count;
        int lanes = ((nb + 1) / 2 + width - 1) / width * width;   // q = parity + 2j, j < lanes (padded to whole vectors)
        double k2 = _k * _k;
        var aa = new double[nb * lanes];   // [p, j]: α_q α_p
        var dq = new double[2 * lanes];    // [parity, j]: 1/(α_q² + γ²), 0 where q ≥ P
        var re = new double[nb * lanes];
        var im = new double[nb * lanes];
        for (int p = 0; p < nb; p++)
            for (int q = p % 2; q <= p; q += 2) aa[p * lanes + q / 2] = alpha[q] * alpha[p];
        var ke = new double[nb];
        for (int i = 0; i < _weight.Length; i++)
        {
            double g2 = _gamma2[i], kc2 = g2 + k2, wgt = _weight[i];
            for (int q = 0; q < nb; q++) dq[(q % 2) * lanes + q / 2] = 1 / (alpha[q] * alpha[q] + g2);
            if (g2 > 0)
            {
                double g = Math.Sqrt(g2), e = 2 * g * l > 700 ? 0 : Math.Exp(-2 * g * l), inv3 = 1 / (g2 * g);
                for (int p = 0; p < nb; p++) ke[p] = kc2 * (1 - ((p % 2 == 0) ? -1.0 : 1.0) * e); // s = (−1)^(p+1) with 0-based p
                var gv = new Vector<double>(g);
                var inv3v = new Vector<double>(inv3);
                var wv = new Vector<double>(wgt);
                for (int p = 0; p < nb; p++)
                {
                    var kp = new Vector<double>(ke[p]);
                    var dp = new Vector<double>(dq[(p % 2) * lanes + p / 2]);
                    int used = p / 2 + 1;
                    for (int j = 0; j < used; j += width)
                    {
                        var av = new Vector<double>(aa, p * lanes + j);
                        var tb = kp * av * new Vector<double>(dq, (p % 2) * lanes + j) * dp / gv - av * inv3v;
                        (new Vector<double>(re, p * lanes + j) + wv * tb).CopyTo(re, p * lanes + j);
                    }
                }
            }
            else
            {
                Complex g = Gamma(g2), e = Complex.Exp(-2 * g * l), inv3 = 1 / (g * g * g);
                for (int p = 0; p < nb; p++)
                {
                    double s = (p % 2 == 0) ? -1 : 1;
                    double dp = dq[(p % 2) * lanes + p / 2];
                    for (int q = p % 2; q <= p; q += 2)
                    {
                        double a = aa[p * lanes + q / 2], d = dq[(q % 2) * lanes + q / 2];
                        Complex tb = kc2 == 0 ? Complex.Zero : kc2 * (1 - s * e) * a * d * dp / g;
                        var term = wgt * (tb - a * inv3);
                        re[p * lanes + q / 2] += term.Real;
                        im[p * lanes + q / 2] += term.Imaginary;
                    }
                }
            }
        }
        var outRe = new double[nb * nb];
        var outIm = new double[nb * nb];
        for (int p = 0; p < nb; p++)
            for (int q = p % 2; q <= p; q += 2) { outRe[q * nb + p] = re[p * lanes + q / 2]; outIm[q * nb + p] = im[p * lanes + q / 2]; }
        return (outRe, outIm);
    }

    /// <summary>
    /// c² Q(c), Q the width-averaged Neumann Green's function of d²/dx² − c² (see remarks), as a function of c².
    /// Real for real or imaginary c; the c → 0 limit is w/a.
    /// </summary>
    internal double CSquaredQ(double c2)
    {
        double a = _a, w = _w, x = Math.Abs(_offset);
        if (Math.Abs(c2) * a * a < 1e-14) return w / a;
        if (c2 > 0)
        {
            double c = Math.Sqrt(c2);
            if (c * a > 1)
            {
                double ew = Math.Exp(-c * w), den = 1 - Math.Exp(-2 * c * a);
                double t2 = (1 - ew) * (1 - Math.Exp(-2 * c * (a - w / 2))) / den;
                double t3 = 0.5 * (1 - ew) * (1 - ew) * (Math.Exp(-c * (a - 2 * x - w)) + Math.Exp(-c * (a + 2 * x - w))) / den;
                return 1 - (t2 - t3) / (c * w);
            }
            double sa = Math.Sinh(c * a), sw = Math.Sinh(c * w / 2);
            return 1 - 2 * Math.Sinh(c * (a - w / 2)) * sw / (w * c * sa) + 2 * sw * sw * Math.Cosh(2 * c * x) / (w * c * sa);
        }
        double kp = Math.Sqrt(-c2), s = Math.Sin(kp * a), swt = Math.Sin(kp * w / 2);
        return 1 - 2 * Math.Sin(kp * (a - w / 2)) * swt / (w * kp * s) + 2 * swt * swt * Math.Cos(2 * kp * x) / (w * kp * s);
    }

    /// <summary>Σ_{n&gt;N_A} (2/b) [1/c_n² − 1/(w c_n³)], c_n² = d² + (nπ/b)²: the closed-form tail of the T^A n-sum.</summary>
    private double TailA(double d2)
    {
        double b = _b, full; // full = Σ_ℤ 1/(d² + (nπ/b)²) − 1/d²
        double z = d2 * b * b;
        if (Math.Abs(z) < 1e-2) full = b * b * (1.0 / 3 - z / 45 + 2 * z * z / 945 - z * z * z / 4725);
        else if (d2 > 0) { double d = Math.Sqrt(d2); full = b / (d * Math.Tanh(d * b)) - 1 / d2; }
        else { double d = Math.Sqrt(-d2); full = -b / (d * Math.Tan(d * b)) + 1 / -d2; } // d = jκ: (b/d) coth(db) = −(b/κ) cot(κb)
        double partial = 0;
        for (int n = 1; n <= _nA; n++) { double kn = n * Math.PI / b; partial += 1 / (d2 + kn * kn); }
        double tail2 = (full - 2 * partial) / b;
        double u0 = (_nA + 0.5) * Math.PI / b, r = Math.Sqrt(d2 + u0 * u0);
        double tail3 = 2 / (Math.PI * _w) / (r * (r + u0));
        return tail2 - tail3;
    }

    /// <summary>
    /// The brute-force interior block: Σ over 0 ≤ m ≤ M, 0 ≤ n ≤ N of W_mn [k_c² D_qp(γ) − l δ_qp] exactly as written in
    /// the remarks above. Slow; the reference for the accelerated <see cref="Block"/>.
    /// </summary>
    public Complex[,] BruteForceBlock(double halfLength, int basisCount, double omegaMu0, int modesM, int modesN)
    {
        int nb = basisCount;
        double l = halfLength, k2 = _k * _k;
        var alpha = new double[nb];
        for (int p = 0; p < nb; p++) alpha[p] = (p + 1) * Math.PI / (2 * l);
        var sum = new Complex[nb, nb];
        for (int m = 0; m <= modesM; m++)
        {
            double km = m * Math.PI / _a, wm = WidthWeight(m);
            for (int n = 0; n <= modesN; n++)
            {
                double kn = n * Math.PI / _b, kc2 = km * km + kn * kn, wgt = wm * (n == 0 ? 1.0 : 2.0) / _b;
                Complex g = Gamma(kc2 - k2), e = Complex.Exp(-2 * g * l);
                for (int p = 0; p < nb; p++)
                {
                    double s = (p % 2 == 0) ? -1 : 1;
                    Complex dp = 1 / (alpha[p] * alpha[p] + g * g);
                    for (int q = p % 2; q <= p; q += 2)
                    {
                        Complex dq = 1 / (alpha[q] * alpha[q] + g * g);
                        Complex d = (q == p ? l * dp : Complex.Zero) + (1 - s * e) * alpha[q] * alpha[p] / g * dq * dp;
                        Complex term = kc2 == 0 ? Complex.Zero : kc2 * d;
                        sum[q, p] += wgt * (term - (q == p ? l : 0));
                    }
                }
            }
        }
        var pre = 1 / new Complex(0, omegaMu0);
        var y = new Complex[nb, nb];
        for (int p = 0; p < nb; p++)
            for (int q = p % 2; q <= p; q += 2) y[q, p] = y[p, q] = pre * sum[q, p];
        return y;
    }
}
