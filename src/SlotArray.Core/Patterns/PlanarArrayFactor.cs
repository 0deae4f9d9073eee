using System.Collections.Immutable;
using System.Numerics;
using System.Runtime.Intrinsics;
using MathNet.Numerics.Integration;

namespace SlotArray.Core.Patterns;

/// <summary>A point of the u-v plane (direction cosines u = sin θ cos φ along x, v = sin θ sin φ along y) and its level.</summary>
/// <param name="U">Direction cosine along x (the slot axes).</param>
/// <param name="V">Direction cosine along y.</param>
/// <param name="LevelDb">Level relative to the beam peak, dB.</param>
internal readonly record struct UvPoint(double U, double V, double LevelDb);

/// <summary>
/// The far field of a planar array of longitudinal slots lying in the plane z = 0 with their axes along x, in an
/// infinite ground plane: array factor at arbitrary element positions times the element pattern of a half-wave slot,
/// on the u-v plane, in cuts, its peak sidelobe over the whole visible region and its directivity.
/// </summary>
/// <remarks>
/// <para>Array factor AF(u, v) = Σ a_n exp(jk(x_n u + y_n v)) (e^{jωt}; e.g. R. J. Mailloux, <i>Phased Array Antenna
/// Handbook</i>, 2nd ed., Artech 2005, Sec. 1.2, from memory). Element: a half-wave slot along x is the Babinet dual
/// of a half-wave dipole along x: |E| = cos((π/2) cos ψ)/sin ψ with cos ψ = u, the direction cosine on the slot axis
/// (C. A. Balanis, <i>Antenna Theory</i>, 3rd ed., Wiley 2005, eq. 4-84 and Sec. 12.9, from memory); 1 across the
/// slot (the E-plane, y-z), cos((π/2) sin θ)/cos θ in the plane of the slot axis (the H-plane, x-z), as in
/// <see cref="ElementPatterns.HalfWaveSlotHPlane"/>. Polarisation is not resolved (the magnitude only).</para>
/// <para>Directivity D = 4π |F(u0, v0)|² / ∫_{z&gt;0} |F|² dΩ (IEEE Std 145-2013's definition over the front half
/// space), integrated numerically: composite 16-point Gauss–Legendre in θ ∈ [0, π/2] and the trapezoid rule in φ
/// (spectrally accurate for a periodic integrand), with at least 8 points per lobe of the aperture's largest extent.</para>
/// </remarks>
internal sealed class PlanarArrayFactor
{
    private readonly double[] x, y, ar, ai;
    private readonly double k;

    /// <summary>An array of elements at (x_n, y_n) with excitations a_n at wavenumber k.</summary>
    /// <param name="x">Element x, m.</param>
    /// <param name="y">Element y, m.</param>
    /// <param name="excitations">Complex excitations (any scale).</param>
    /// <param name="wavenumber">Free-space k, rad/m.</param>
    public PlanarArrayFactor(IReadOnlyList<double> x, IReadOnlyList<double> y, IReadOnlyList<Complex> excitations, double wavenumber)
    {
        ArgumentNullException.ThrowIfNull(x);
        ArgumentNullException.ThrowIfNull(y);
        ArgumentNullException.ThrowIfNull(excitations);
        if (x.Count != y.Count || x.Count != excitations.Count || x.Count == 0)
            throw new ArgumentException($"one x, y and excitation per element is needed (got {x.Count}, {y.Count}, {excitations.Count})");
        if (!(wavenumber > 0)) throw new ArgumentOutOfRangeException(nameof(wavenumber), wavenumber, "k must be positive");
        this.x = x.ToArray();
        this.y = y.ToArray();
        ar = excitations.Select(c => c.Real).ToArray();
        ai = excitations.Select(c => c.Imaginary).ToArray();
        k = wavenumber;
        double ex = this.x.Max() - this.x.Min(), ey = this.y.Max() - this.y.Min();
        Extent = Math.Max(Math.Max(ex, ey), 1e-9);
    }

    /// <summary>The largest extent of the element positions along x or y, m.</summary>
    public double Extent { get; }

    /// <summary>Number of elements.</summary>
    public int Count => x.Length;

    /// <summary>The half-wave slot's element pattern |E| for a direction with cosine u on the slot axis (Balanis 2005, dual of eq. 4-84).</summary>
    /// <param name="u">Direction cosine along the slot axis, |u| ≤ 1.</param>
    public static double SlotElement(double u)
    {
        double s2 = 1 - u * u;
        if (s2 < 1e-18) return 0;
        return Math.Cos(Math.PI / 2 * u) / Math.Sqrt(s2);
    }

    /// <summary>The array factor alone at (u, v).</summary>
    public Complex ArrayFactorAt(double u, double v)
    {
        double re = 0, im = 0;
        for (int n = 0; n < x.Length; n++)
        {
            var (s, c) = Math.SinCos(k * (x[n] * u + y[n] * v));
            re += ar[n] * c - ai[n] * s;
            im += ar[n] * s + ai[n] * c;
        }
        return new Complex(re, im);
    }

    /// <summary>The field (array factor × slot element) at (u, v), u² + v² ≤ 1.</summary>
    public Complex Field(double u, double v) => SlotElement(u) * ArrayFactorAt(u, v);

    /// <summary>|F|² at (u, v).</summary>
    public double Power(double u, double v)
    {
        var f = Field(u, v);
        return f.Real * f.Real + f.Imaginary * f.Imaginary;
    }

    /// <summary>
    /// |F|² on an n × n grid of u, v ∈ [−1, 1] (row i = u_i, column j = v_j, u_i = −1 + 2i/(n − 1)); NaN outside the
    /// visible circle u² + v² ≤ 1. Cost n² N complex multiply-adds (four at a time, <see cref="Dot"/>) after 2nN sines (the exponential factorises in u and v), rows on two threads.
    /// </summary>
    /// <param name="n">Points per axis, 3 … 4096.</param>
    public double[,] PowerGrid(int n)
    {
        if (n < 3 || n > 4096) throw new ArgumentOutOfRangeException(nameof(n), n, "the u-v grid needs 3 … 4096 points per axis");
        int m = x.Length;
        var cr = new double[n * m];
        var ci = new double[n * m];
        for (int j = 0; j < n; j++)
        {
            double v = -1 + 2.0 * j / (n - 1);
            for (int e = 0; e < m; e++)
            {
                var (s, c) = Math.SinCos(k * y[e] * v);
                cr[j * m + e] = c;
                ci[j * m + e] = s;
            }
        }
        var result = new double[n, n];
        // Rows are independent: two threads, each with its own work arrays (results do not depend on the thread count).
        Parallel.For(0, n, new ParallelOptions { MaxDegreeOfParallelism = 2 }, () => (new double[m], new double[m]), (i, _, work) =>
        {
            var (pr, pi) = work;
            double u = -1 + 2.0 * i / (n - 1), el = SlotElement(u);
            for (int e = 0; e < m; e++)
            {
                var (s, c) = Math.SinCos(k * x[e] * u);
                pr[e] = ar[e] * c - ai[e] * s;
                pi[e] = ar[e] * s + ai[e] * c;
            }
            for (int j = 0; j < n; j++)
            {
                double v = -1 + 2.0 * j / (n - 1);
                if (u * u + v * v > 1 + 1e-12) { result[i, j] = double.NaN; continue; }
                var (re, im) = Dot(pr, pi, cr.AsSpan(j * m, m), ci.AsSpan(j * m, m));
                result[i, j] = el * el * (re * re + im * im);
            }
            return work;
        }, _ => { });
        return result;
    }

    /// <summary>
    /// Σ_e (p_e c_e) for complex p = pr + j pi and c = cr + j ci, four terms at a time in <see cref="Vector256{T}"/> lanes
    /// (four partial sums, added in a fixed order at the end, then the remainder): the same values on every machine,
    /// whether or not it has 256-bit vectors (each lane is the scalar arithmetic; no fused multiply-add).
    /// </summary>
    private static (double Re, double Im) Dot(ReadOnlySpan<double> pr, ReadOnlySpan<double> pi, ReadOnlySpan<double> cr, ReadOnlySpan<double> ci)
    {
        int m = pr.Length, e = 0;
        var vre = Vector256<double>.Zero;
        var vim = Vector256<double>.Zero;
        for (; e + 4 <= m; e += 4)
        {
            var a = Vector256.Create(pr.Slice(e, 4));
            var b = Vector256.Create(pi.Slice(e, 4));
            var c = Vector256.Create(cr.Slice(e, 4));
            var d = Vector256.Create(ci.Slice(e, 4));
            vre += a * c - b * d;
            vim += a * d + b * c;
        }
        double re = (vre[0] + vre[1]) + (vre[2] + vre[3]), im = (vim[0] + vim[1]) + (vim[2] + vim[3]);
        for (; e < m; e++)
        {
            re += pr[e] * cr[e] - pi[e] * ci[e];
            im += pr[e] * ci[e] + pi[e] * cr[e];
        }
        return (re, im);
    }

    /// <summary>A cut in the plane at azimuth φ (0: the x-z plane, the slots' H-plane; π/2: the y-z plane, their E-plane), θ from broadside, positive toward +φ.</summary>
    /// <param name="phi">Azimuth of the cut plane, rad.</param>
    /// <param name="grid">The θ grid (−π/2 … π/2).</param>
    /// <param name="elementPattern">False: the array factor alone (isotropic elements), the figure a check that leaves the slot's own pattern out computes.</param>
    public Pattern Cut(double phi, AngleGrid grid, bool elementPattern = true)
    {
        ArgumentNullException.ThrowIfNull(grid);
        var (sp, cp) = Math.SinCos(phi);
        var f = new Complex[grid.Count];
        for (int i = 0; i < f.Length; i++)
        {
            double s = grid.Sines[i];
            f[i] = elementPattern ? Field(s * cp, s * sp) : ArrayFactorAt(s * cp, s * sp);
        }
        return new Pattern(grid, ImmutableArray.Create(f));
    }

    /// <summary>Points per axis of a u-v grid that puts about <paramref name="perLobe"/> samples on each lobe of this aperture (odd, ≥ 101).</summary>
    /// <param name="perLobe">Samples per lobe width λ/extent in u.</param>
    public int GridPointsFor(double perLobe = 4)
    {
        double lobes = k * Extent / Math.PI; // lobes across u ∈ [−1, 1]
        int n = (int)Math.Ceiling(perLobe * lobes) + 1;
        n = Math.Max(101, n);
        return n % 2 == 0 ? n + 1 : n;
    }

    /// <summary>
    /// The beam peak and the highest sidelobe anywhere in the visible region: local maxima of |F|² on the u-v grid
    /// (<see cref="GridPointsFor"/>), each of the highest candidates refined by a compass search on the continuous
    /// field to 1e-6 in u and v; the beam is the highest refined maximum, every other maximum is a sidelobe (maxima on
    /// the visible circle's rim count by their value there).
    /// </summary>
    public (UvPoint Beam, UvPoint? PeakSidelobe) BeamAndPeakSidelobe()
    {
        int n = GridPointsFor();
        var g = PowerGrid(n);
        double h = 2.0 / (n - 1);
        var candidates = new List<(double P, int I, int J)>();
        for (int i = 0; i < n; i++)
            for (int j = 0; j < n; j++)
            {
                double p = g[i, j];
                if (double.IsNaN(p) || p <= 0) continue;
                bool max = true;
                for (int di = -1; di <= 1 && max; di++)
                    for (int dj = -1; dj <= 1; dj++)
                    {
                        if (di == 0 && dj == 0) continue;
                        int a = i + di, b = j + dj;
                        if (a < 0 || b < 0 || a >= n || b >= n || double.IsNaN(g[a, b])) continue;
                        if (g[a, b] > p || (g[a, b] == p && (a < i || (a == i && b < j)))) { max = false; break; }
                    }
                if (max) candidates.Add((p, i, j));
            }
        var top = candidates.OrderByDescending(c => c.P).Take(12)
            .Select(c => Refine(-1 + c.I * h, -1 + c.J * h, h)).OrderByDescending(r => r.P).ToList();
        var beam = top[0];
        double peakDb = 10 * Math.Log10(beam.P);
        var beamPoint = new UvPoint(beam.U, beam.V, 0);
        // A refined candidate that climbed onto the beam is the beam itself, not a sidelobe.
        var side = top.Skip(1).Where(r => Math.Abs(r.U - beam.U) > h / 2 || Math.Abs(r.V - beam.V) > h / 2).ToList();
        if (side.Count == 0) return (beamPoint, null);
        var s = side[0];
        return (beamPoint, new UvPoint(s.U, s.V, 10 * Math.Log10(s.P) - peakDb));
    }

    private (double P, double U, double V) Refine(double u, double v, double step)
    {
        double best = Power(u, v);
        while (step > 1e-6)
        {
            bool moved = false;
            foreach (var (du, dv) in new[] { (step, 0.0), (-step, 0.0), (0.0, step), (0.0, -step) })
            {
                double a = u + du, b = v + dv;
                if (a * a + b * b > 1) continue;
                double p = Power(a, b);
                if (p > best) { best = p; u = a; v = b; moved = true; break; }
            }
            if (!moved) step /= 2;
        }
        return (best, u, v);
    }

    /// <summary>
    /// Directivity toward (u0, v0) by integrating |F|² over the front half space (see the remarks), dimensionless.
    /// </summary>
    /// <param name="u0">Direction cosine along x of the direction asked (default broadside).</param>
    /// <param name="v0">Direction cosine along y.</param>
    public double Directivity(double u0 = 0, double v0 = 0)
    {
        double lobes = k * Extent / Math.PI + 2;
        int panels = Math.Max(8, (int)Math.Ceiling(lobes / 2));
        int nphi = Math.Max(64, (int)Math.Ceiling(8 * lobes * Math.PI / 2));
        var rule = new GaussLegendreRule(0, Math.PI / 2 / panels, 16);
        double total = 0;
        for (int p = 0; p < panels; p++)
        {
            double t0 = p * Math.PI / 2 / panels;
            for (int q = 0; q < 16; q++)
            {
                double th = t0 + rule.GetAbscissa(q), st = Math.Sin(th), ring = 0;
                for (int m = 0; m < nphi; m++)
                {
                    var (sp, cp) = Math.SinCos(2 * Math.PI * m / nphi);
                    ring += Power(st * cp, st * sp);
                }
                total += rule.GetWeight(q) * st * ring * 2 * Math.PI / nphi;
            }
        }
        return 4 * Math.PI * Power(u0, v0) / total;
    }
}
