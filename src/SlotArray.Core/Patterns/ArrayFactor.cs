using System.Collections.Immutable;
using System.Runtime.Intrinsics;
using Complex = System.Numerics.Complex;

namespace SlotArray.Core.Patterns;

/// <summary>
/// Far-field array factor of N elements on a line (the z axis) with complex excitations:
/// AF(θ) = Σ_n a_n exp(j k z_n sin θ), θ from broadside in the plane containing the axis, θ &gt; 0 toward +z
/// (C. A. Balanis, <i>Antenna Theory</i>, 3rd ed., Wiley 2005, eq. 6-52 (equation number from memory) with the angle measured from broadside;
/// ψ = k d sin θ). With this sign a progressive phase a_n ∝ exp(−j k z_n sin θ0) steers the
/// beam to θ0. The total field is E(θ)·AF(θ) for an element pattern E (pattern multiplication, Balanis §6.2).
/// </summary>
internal static class ArrayFactor
{
    /// <summary>
    /// The pattern on a grid. Equally spaced positions take the fast path (a Horner recurrence in
    /// w = exp(j k d sin θ), vectorised over angles); other positions a vectorised direct sum.
    /// </summary>
    /// <param name="positions">Element positions z_n along the array axis, m.</param>
    /// <param name="excitations">Complex excitation a_n of each element (any scale).</param>
    /// <param name="wavenumber">Free-space wavenumber k = 2π/λ, rad/m, &gt; 0.</param>
    /// <param name="grid">Observation angles.</param>
    /// <param name="element">Element field pattern E(θ), or null for isotropic elements.</param>
    public static Pattern Compute(IReadOnlyList<double> positions, IReadOnlyList<Complex> excitations, double wavenumber,
        AngleGrid grid, Func<double, double>? element = null)
    {
        ArgumentNullException.ThrowIfNull(grid);
        Validate(positions, excitations, wavenumber);
        var field = ArrayGeometry.IsUniform(positions, out double d)
            ? UniformSum(positions[0], d, excitations, wavenumber, grid.Sines.AsSpan())
            : DirectSum(positions, excitations, wavenumber, grid.Sines.AsSpan());
        return Finish(grid, field, element);
    }

    /// <summary>The pattern of real weights (e.g. a taper) on a grid; see the complex overload.</summary>
    /// <param name="positions">Element positions z_n, m.</param>
    /// <param name="weights">Real excitation of each element.</param>
    /// <param name="wavenumber">Free-space wavenumber, rad/m.</param>
    /// <param name="grid">Observation angles.</param>
    /// <param name="element">Element field pattern, or null for isotropic elements.</param>
    public static Pattern Compute(IReadOnlyList<double> positions, IReadOnlyList<double> weights, double wavenumber,
        AngleGrid grid, Func<double, double>? element = null)
        => Compute(positions, ToComplex(weights), wavenumber, grid, element);

    /// <summary>
    /// The pattern by the direct sum whatever the positions (the reference for the fast path, and the path for
    /// perturbed positions).
    /// </summary>
    /// <param name="positions">Element positions z_n, m.</param>
    /// <param name="excitations">Complex excitations.</param>
    /// <param name="wavenumber">Free-space wavenumber, rad/m.</param>
    /// <param name="grid">Observation angles.</param>
    /// <param name="element">Element field pattern, or null for isotropic elements.</param>
    public static Pattern ComputeDirect(IReadOnlyList<double> positions, IReadOnlyList<Complex> excitations, double wavenumber,
        AngleGrid grid, Func<double, double>? element = null)
    {
        ArgumentNullException.ThrowIfNull(grid);
        Validate(positions, excitations, wavenumber);
        return Finish(grid, DirectSum(positions, excitations, wavenumber, grid.Sines.AsSpan()), element);
    }

    /// <summary>The array factor alone (no element pattern) at the given values of u = sin θ.</summary>
    /// <param name="positions">Element positions z_n, m.</param>
    /// <param name="excitations">Complex excitations.</param>
    /// <param name="wavenumber">Free-space wavenumber, rad/m.</param>
    /// <param name="sines">Values of sin θ.</param>
    public static Complex[] AtSines(IReadOnlyList<double> positions, IReadOnlyList<Complex> excitations, double wavenumber,
        ReadOnlySpan<double> sines)
    {
        Validate(positions, excitations, wavenumber);
        return ArrayGeometry.IsUniform(positions, out double d)
            ? UniformSum(positions[0], d, excitations, wavenumber, sines)
            : DirectSum(positions, excitations, wavenumber, sines);
    }

    internal static Complex[] ToComplex(IReadOnlyList<double> weights)
    {
        ArgumentNullException.ThrowIfNull(weights);
        var a = new Complex[weights.Count];
        for (int i = 0; i < a.Length; i++) a[i] = weights[i];
        return a;
    }

    private static Pattern Finish(AngleGrid grid, Complex[] field, Func<double, double>? element)
    {
        if (element is not null)
            for (int i = 0; i < field.Length; i++) field[i] *= element(grid.Theta[i]);
        return new Pattern(grid, ImmutableArray.Create(field));
    }

    private static void Validate(IReadOnlyList<double> positions, IReadOnlyList<Complex> excitations, double wavenumber)
    {
        ArgumentNullException.ThrowIfNull(positions);
        ArgumentNullException.ThrowIfNull(excitations);
        if (positions.Count == 0) throw new ArgumentException("The array has no elements: give at least one position.", nameof(positions));
        if (positions.Count != excitations.Count)
            throw new ArgumentException($"{positions.Count} positions but {excitations.Count} excitations: give one excitation per element.", nameof(excitations));
        if (!(wavenumber > 0) || double.IsInfinity(wavenumber))
            throw new ArgumentOutOfRangeException(nameof(wavenumber), wavenumber, "The wavenumber k = 2π/λ must be positive and finite (rad/m).");
    }

    /// <summary>
    /// Σ a_n w^n exp(j k z_0 u) with w = exp(j k d u), by Horner's rule; four angles per 256-bit vector and two
    /// vectors per pass so that the multiply-add chains overlap.
    /// </summary>
    private static Complex[] UniformSum(double z0, double d, IReadOnlyList<Complex> a, double k, ReadOnlySpan<double> u)
    {
        int n = a.Count, m = u.Length;
        var ar = new double[n];
        var ai = new double[n];
        for (int i = 0; i < n; i++) { ar[i] = a[i].Real; ai[i] = a[i].Imaginary; }
        var outR = new double[m];
        var outI = new double[m];
        var wr = new double[m];
        var wi = new double[m];
        for (int j = 0; j < m; j++) (wi[j], wr[j]) = Math.SinCos(k * d * u[j]);
        int lanes = Vector256<double>.Count, step = 2 * lanes, jv = 0;
        if (Vector512.IsHardwareAccelerated) jv = UniformSumWide(ar, ai, wr, wi, outR, outI);
        if (Vector256.IsHardwareAccelerated)
        {
            for (; jv + step <= m; jv += step)
            {
                var wr0 = Vector256.Create(wr, jv); var wi0 = Vector256.Create(wi, jv);
                var wr1 = Vector256.Create(wr, jv + lanes); var wi1 = Vector256.Create(wi, jv + lanes);
                Vector256<double> r0 = Vector256<double>.Zero, i0 = r0, r1 = r0, i1 = r0;
                for (int e = n - 1; e >= 0; e--)
                {
                    var br = Vector256.Create(ar[e]); var bi = Vector256.Create(ai[e]);
                    var t0 = r0 * wr0 - i0 * wi0 + br; i0 = r0 * wi0 + i0 * wr0 + bi; r0 = t0;
                    var t1 = r1 * wr1 - i1 * wi1 + br; i1 = r1 * wi1 + i1 * wr1 + bi; r1 = t1;
                }
                r0.CopyTo(outR, jv); i0.CopyTo(outI, jv); r1.CopyTo(outR, jv + lanes); i1.CopyTo(outI, jv + lanes);
            }
        }
        for (int j = jv; j < m; j++)
        {
            double r = 0, im = 0, cr = wr[j], ci = wi[j];
            for (int e = n - 1; e >= 0; e--)
            {
                double t = r * cr - im * ci + ar[e];
                im = r * ci + im * cr + ai[e];
                r = t;
            }
            outR[j] = r; outI[j] = im;
        }
        var f = new Complex[m];
        for (int j = 0; j < m; j++)
        {
            var (s, c) = Math.SinCos(k * z0 * u[j]);
            f[j] = new Complex(outR[j], outI[j]) * new Complex(c, s);
        }
        return f;
    }

    /// <summary>
    /// The Horner sums of <see cref="UniformSum"/> on 512-bit vectors, four independent chains of eight angles (32 angles
    /// per pass: more chains in flight hide the multiply-add latency of the recurrence); each lane runs the same products
    /// and sums in the same order as the 256-bit and scalar loops, so the values are the same to the bit. Returns the
    /// number of angles done (a multiple of 32); the callers' loops finish the rest.
    /// </summary>
    private static int UniformSumWide(double[] ar, double[] ai, double[] wr, double[] wi, double[] outR, double[] outI)
    {
        const int Lanes = 8, Step = 4 * Lanes;
        int n = ar.Length, m = wr.Length, jv = 0;
        for (; jv + Step <= m; jv += Step)
        {
            var wr0 = Vector512.Create(wr, jv); var wi0 = Vector512.Create(wi, jv);
            var wr1 = Vector512.Create(wr, jv + Lanes); var wi1 = Vector512.Create(wi, jv + Lanes);
            var wr2 = Vector512.Create(wr, jv + 2 * Lanes); var wi2 = Vector512.Create(wi, jv + 2 * Lanes);
            var wr3 = Vector512.Create(wr, jv + 3 * Lanes); var wi3 = Vector512.Create(wi, jv + 3 * Lanes);
            Vector512<double> r0 = Vector512<double>.Zero, i0 = r0, r1 = r0, i1 = r0, r2 = r0, i2 = r0, r3 = r0, i3 = r0;
            for (int e = n - 1; e >= 0; e--)
            {
                var br = Vector512.Create(ar[e]); var bi = Vector512.Create(ai[e]);
                var t0 = r0 * wr0 - i0 * wi0 + br; i0 = r0 * wi0 + i0 * wr0 + bi; r0 = t0;
                var t1 = r1 * wr1 - i1 * wi1 + br; i1 = r1 * wi1 + i1 * wr1 + bi; r1 = t1;
                var t2 = r2 * wr2 - i2 * wi2 + br; i2 = r2 * wi2 + i2 * wr2 + bi; r2 = t2;
                var t3 = r3 * wr3 - i3 * wi3 + br; i3 = r3 * wi3 + i3 * wr3 + bi; r3 = t3;
            }
            r0.CopyTo(outR, jv); i0.CopyTo(outI, jv); r1.CopyTo(outR, jv + Lanes); i1.CopyTo(outI, jv + Lanes);
            r2.CopyTo(outR, jv + 2 * Lanes); i2.CopyTo(outI, jv + 2 * Lanes); r3.CopyTo(outR, jv + 3 * Lanes); i3.CopyTo(outI, jv + 3 * Lanes);
        }
        return jv;
    }

    /// <summary>Angles × elements above which the direct sum spreads its angles over the cores (about 1 ms of work).</summary>
    internal const int ParallelDirectSumWork = 1 << 20;

    /// <summary>
    /// Σ a_n exp(j k z_n u) directly: eight elements per pass (two 256-bit vectors, or one 512-bit vector where the
    /// processor has it: the same lanes, products and partial sums, so the same bits), with the vector sine/cosine of
    /// <see cref="VectorTrig"/>. Where the grid holds −u as well as u (symmetric grids), both come from the same sines and
    /// cosines: exp(−jx) = cos x − j sin x. Each angle is summed on its own, so spreading the angles over the cores (large
    /// sums) changes no bit.
    /// </summary>
    /// <param name="z">Element positions.</param>
    /// <param name="a">Excitations.</param>
    /// <param name="k">Wavenumber.</param>
    /// <param name="u">Values of sin θ.</param>
    /// <param name="wide">Use 512-bit vectors where accelerated (false: the 256-bit kernel; for the test that they agree).</param>
    internal static Complex[] DirectSum(IReadOnlyList<double> z, IReadOnlyList<Complex> a, double k, ReadOnlySpan<double> u, bool wide = true)
    {
        int n = a.Count, m = u.Length;
        var zr = new double[n];
        var ar = new double[n];
        var ai = new double[n];
        for (int i = 0; i < n; i++) { zr[i] = z[i]; ar[i] = a[i].Real; ai[i] = a[i].Imaginary; }
        var f = new Complex[m];
        // Symmetric: u[j] = −u[m−1−j] for every j, including a middle point u = 0 when m is odd (a lone u ≠ 0 is not).
        bool symmetric = m % 2 == 0 || u[m / 2] == 0;
        for (int j = 0; j < m / 2 && symmetric; j++) symmetric = u[j] == -u[m - 1 - j];
        int upper = symmetric ? (m + 1) / 2 : m, first = m - upper;
        var us = u.ToArray();
        bool use512 = wide && Vector512.IsHardwareAccelerated;
        void Angle(int j)
        {
            var (cRe, cIm, sRe, sIm) = use512 ? Sums512(zr, ar, ai, k, us[j]) : Sums256(zr, ar, ai, k, us[j]);
            // C + jS with C = cRe + j cIm, S = sRe + j sIm
            f[j] = new Complex(cRe - sIm, cIm + sRe);
            if (symmetric) f[m - 1 - j] = new Complex(cRe + sIm, cIm - sRe);
        }
        if ((long)upper * n >= ParallelDirectSumWork)
        {
            const int Chunk = 64;
            Parallel.For(0, (upper + Chunk - 1) / Chunk, c =>
            {
                for (int j = first + c * Chunk, end = Math.Min(m, j + Chunk); j < end; j++) Angle(j);
            });
        }
        else
        {
            for (int j = first; j < m; j++) Angle(j);
        }
        return f;
    }

    /// <summary>
    /// Σ a cos(k u z) and Σ a sin(k u z) for complex a (real and imaginary parts apart), eight elements per pass in two
    /// 256-bit vectors, the remainder scalar.
    /// </summary>
    private static (double CRe, double CIm, double SRe, double SIm) Sums256(double[] zr, double[] ar, double[] ai, double k, double u)
    {
        int n = zr.Length, lanes = Vector256<double>.Count, step = 2 * lanes;
        int nv = Vector256.IsHardwareAccelerated ? n - n % step : 0;
        var kv = Vector256.Create(k * u);
        Vector256<double> cr0 = Vector256<double>.Zero, ci0 = cr0, sr0 = cr0, si0 = cr0, cr1 = cr0, ci1 = cr0, sr1 = cr0, si1 = cr0;
        for (int e = 0; e < nv; e += step)
        {
            var (s0, c0) = VectorTrig.SinCos(Vector256.Create(zr, e) * kv);
            var (s1, c1) = VectorTrig.SinCos(Vector256.Create(zr, e + lanes) * kv);
            var br0 = Vector256.Create(ar, e); var bi0 = Vector256.Create(ai, e);
            var br1 = Vector256.Create(ar, e + lanes); var bi1 = Vector256.Create(ai, e + lanes);
            cr0 += br0 * c0; ci0 += bi0 * c0; sr0 += br0 * s0; si0 += bi0 * s0;
            cr1 += br1 * c1; ci1 += bi1 * c1; sr1 += br1 * s1; si1 += bi1 * s1;
        }
        return Tail(zr, ar, ai, k, u, nv, Vector256.Sum(cr0 + cr1), Vector256.Sum(ci0 + ci1), Vector256.Sum(sr0 + sr1), Vector256.Sum(si0 + si1));
    }

    /// <summary>As <see cref="Sums256"/> with one 512-bit vector per pass: lanes 0–3 and 4–7 are the two 256-bit vectors.</summary>
    private static (double CRe, double CIm, double SRe, double SIm) Sums512(double[] zr, double[] ar, double[] ai, double k, double u)
    {
        int n = zr.Length, step = Vector512<double>.Count;
        int nv = n - n % step;
        var kv = Vector512.Create(k * u);
        Vector512<double> cr = Vector512<double>.Zero, ci = cr, sr = cr, si = cr;
        for (int e = 0; e < nv; e += step)
        {
            var (s, c) = VectorTrig.SinCos(Vector512.Create(zr, e) * kv);
            var br = Vector512.Create(ar, e); var bi = Vector512.Create(ai, e);
            cr += br * c; ci += bi * c; sr += br * s; si += bi * s;
        }
        return Tail(zr, ar, ai, k, u, nv, Vector256.Sum(cr.GetLower() + cr.GetUpper()), Vector256.Sum(ci.GetLower() + ci.GetUpper()),
            Vector256.Sum(sr.GetLower() + sr.GetUpper()), Vector256.Sum(si.GetLower() + si.GetUpper()));
    }

    /// <summary>The elements from <paramref name="from"/> on, one by one with Math.SinCos of (z k) u, added to the vector sums.</summary>
    private static (double, double, double, double) Tail(double[] zr, double[] ar, double[] ai, double k, double u, int from,
        double cRe, double cIm, double sRe, double sIm)
    {
        for (int e = from; e < zr.Length; e++)
        {
            var (s, c) = Math.SinCos(zr[e] * k * u);
            cRe += ar[e] * c; cIm += ai[e] * c; sRe += ar[e] * s; sIm += ai[e] * s;
        }
        return (cRe, cIm, sRe, sIm);
    }
}
