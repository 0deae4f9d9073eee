using System.Collections.Concurrent;
using System.Numerics;
using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Slots;

/// <summary>Truncations of the longitudinal-slot moment method. The defaults are converged (see the tests and the benchmark notes).</summary>
/// <param name="BasisFunctions">P, the number of sine basis functions along the slot; ≥ 1. Default 9.</param>
/// <param name="ModeCutFactor">Γ/(P k): the directly summed interior remainder keeps the modes with k_c ≤ Γ. Default 4.</param>
/// <param name="ClosedFormTerms">N_A, the n terms of the closed-form m-sum before its analytic tail. Default 24.</param>
/// <param name="QuadraturePanels">Panels of the exterior τ quadrature. Default 6.</param>
/// <param name="QuadratureOrder">Gauss–Legendre points per panel. Default 12.</param>
/// <param name="EquivalentRadiusFactor">r_e/w of the reduced exterior kernel; Butler's 1/4 by default (<see cref="Coupling.StripEquivalentRadius"/>).</param>
/// <param name="ExtrapolationBasisFunctions">
/// P2 &gt; P for Richardson extrapolation in the basis count, X∞ = (P2 X(P2) − P X(P))/(P2 − P) applied to the scattered
/// amplitudes B and C; 0 turns it off. Default 15. It assumes the 1/P convergence found for finite walls (checked to P = 41
/// at t = 1.27 mm: the (9, 15) and (31, 41) extrapolations agree to 1e-3 |y|, while P = 9 alone is 2–4 % off near resonance).
/// Thin walls converge more slowly (about P^(−1/2)), which the extrapolation only partly corrects.
/// </param>
internal sealed record MomentMethodOptions(
    int BasisFunctions = 9,
    double ModeCutFactor = 4,
    int ClosedFormTerms = 24,
    int QuadraturePanels = 6,
    int QuadratureOrder = 12,
    double EquivalentRadiusFactor = Coupling.StripEquivalentRadius.WidthFraction,
    int ExtrapolationBasisFunctions = 15)
{
    /// <summary>The default, converged options.</summary>
    public static MomentMethodOptions Default { get; } = new();
}

/// <summary>The TE10 scattering of one slot: shunt admittance and the backward and forward scattered amplitudes.</summary>
/// <param name="Admittance">Normalised shunt admittance y = Y/G0 = −2B/(1 + B).</param>
/// <param name="Backward">Backward scattered TE10 amplitude B (incident amplitude 1, reference plane at the slot centre).</param>
/// <param name="Forward">Forward scattered TE10 amplitude C.</param>
internal readonly record struct SlotScattering(Complex Admittance, Complex Backward, Complex Forward)
{
    /// <summary>|B − C|/|B|: zero for an ideal shunt element (Stern and Elliott 1985).</summary>
    public double ShuntAsymmetry => (Backward - Forward).Magnitude / Backward.Magnitude;
}

/// <summary>
/// Galerkin moment method for a longitudinal shunt slot in the broad wall of a rectangular waveguide, with finite
/// wall thickness. Thread-safe; the length-independent sums are cached per offset and frequency (bounded).
/// </summary>
/// <remarks>
/// <para>Formulation: Galerkin method [D; structure M: V. H. Khac and C. T. Carson, "Impedance properties of a
/// longitudinal slot antenna in the broad face of a rectangular waveguide", IEEE Trans. AP-21, 708–710, 1973;
/// G. J. Stern and R. S. Elliott, IEEE Trans. AP-33(11), 1264–1271, 1985; L. G. Josefsson, "Analysis of longitudinal
/// slots in rectangular waveguides", IEEE Trans. AP-35(12), 1351–1357, 1987]. Aperture field uniform across the width,
/// P sine functions f_p(z) = sin(pπ(z + l)/(2l)) along it. Interior block: <see cref="WaveguideSlotModalSums"/>;
/// exterior block: <see cref="HalfSpaceSlotKernel"/>.</para>
/// <para>Finite wall t (derived here, after Khac and Carson's and Josefsson's two-aperture model): the slot is a short
/// guide of cross-section L × w; keeping its modes uniform across w, mode p (cutoff α_p = pπ/L, γ_p = √(α_p² − k²)) is a
/// line of length t whose Neumann Green's function gives, in the same Galerkin normalisation as the other blocks,
/// Y11 = Y22 = κ_p coth(γ_p t), Y12 = κ_p csch(γ_p t), κ_p = j l γ_p/(ωμ0) (diagonal in p). With V1, V2 the inner- and
/// outer-face coefficients: (Y^int + Y11) V1 − Y12 V2 = I and −Y12 V1 + (Y22 + Y^ext) V2 = 0. As t → 0, V2 → V1 and
/// Y11 − Y12 → 0, which restores (Y^int + Y^ext) V = I. t = 0 uses the thin-wall system directly.</para>
/// <para>Scattered amplitudes from V1 (modal excitation, R. E. Collin, <i>Field Theory of Guided Waves</i>, from memory): B = −j (π/(a² b β)) cos(πx_c/a) sinc_1
/// Σ V_p ∫ f_p e^(−jβz) dz, C the same with e^(+jβz); y = −2B/(1 + B).</para>
/// <para>Convergence (measured here, WR-90, 9.375 GHz, w = 1.5875 mm, x = 2 mm): the interior sums are converged to
/// ~3e-5 |y| at Γ = 4Pk and the exterior quadrature to 1e-7 at 6 × 12 points. In the basis count, the 1.27 mm wall's
/// resonant length falls as ≈ 0.3 mm/P (15.179 mm at P = 9, 15.152 mm at P = 41, limit ≈ 15.145 mm), hence the default
/// Richardson extrapolation (15.145 mm). With a zero-thickness wall it falls more slowly, about as P^(−1/2): the
/// thin-wall model with the reduced exterior kernel is not converged in P, and its resonant length carries an
/// uncertainty of order 1 %.</para>
/// </remarks>
internal sealed class LongitudinalSlotMomentMethod
{
    private const int CacheLimit = 128;
    private readonly ConcurrentDictionary<(double Offset, double Frequency, int Basis), WaveguideSlotModalSums> _sums = new();

    /// <summary>A solver for slots of the given width in the given guide (its wall thickness is used).</summary>
    public LongitudinalSlotMomentMethod(RectangularWaveguide guide, Length width, MomentMethodOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(guide);
        if (!(width.Meters > 0) || width.Meters >= guide.BroadWall.Meters / 2)
            throw new ArgumentOutOfRangeException(nameof(width), width.ToString(), $"slot width {width} must be positive and well below a/2 = {Length.FromMeters(guide.BroadWall.Meters / 2)}");
        Guide = guide;
        Width = width;
        Options = options ?? MomentMethodOptions.Default;
        if (Options.BasisFunctions < 1) throw new ArgumentOutOfRangeException(nameof(options), Options.BasisFunctions, "BasisFunctions must be at least 1");
    }

    /// <summary>The guide (dimensions and wall thickness).</summary>
    public RectangularWaveguide Guide { get; }

    /// <summary>Slot width.</summary>
    public Length Width { get; }

    /// <summary>Truncations.</summary>
    public MomentMethodOptions Options { get; }

    /// <summary>Scattering of a slot of the given signed offset and (rectangular) full length at frequency f.</summary>
    public SlotScattering Solve(Length offset, Length length, Frequency f) => Solve(offset.Meters, length.Meters, f.Hertz, null);

    /// <summary>
    /// Core solve. <paramref name="bruteForceModes"/> replaces the accelerated interior sum by the brute-force
    /// Σ_{m≤M, n≤N} of <c>WaveguideSlotModalSums</c> (tests and the convergence study only).
    /// </summary>
    internal SlotScattering Solve(double offset, double length, double frequency, (int M, int N)? bruteForceModes)
    {
        int p1 = Options.BasisFunctions, p2 = Options.ExtrapolationBasisFunctions;
        if (p2 <= p1 || bruteForceModes is not null) return SolveAt(offset, length, frequency, p1, bruteForceModes);
        var s1 = SolveAt(offset, length, frequency, p1, null);
        var s2 = SolveAt(offset, length, frequency, p2, null);
        Complex bw = (p2 * s2.Backward - p1 * s1.Backward) / (p2 - p1), fw = (p2 * s2.Forward - p1 * s1.Forward) / (p2 - p1);
        return new SlotScattering(-2 * bw / (1 + bw), bw, fw);
    }

    private SlotScattering SolveAt(double offset, double length, double frequency, int nb, (int M, int N)? bruteForceModes)
    {
        double a = Guide.BroadWall.Meters, b = Guide.NarrowWall.Meters, w = Width.Meters, t = Guide.WallThickness.Meters;
        if (Math.Abs(offset) + w / 2 >= a / 2)
            throw new ArgumentOutOfRangeException(nameof(offset), offset, $"offset {offset * 1e3:0.###} mm puts the slot edge beyond the side wall (a/2 = {a / 2 * 1e3:0.###} mm)");
        if (!(length > 2 * w))
            throw new ArgumentOutOfRangeException(nameof(length), length, $"slot length {length * 1e3:0.###} mm must exceed twice the width for the narrow-slot model");
        var f = Frequency.FromHertz(frequency);
        double k = Guide.MediumWavenumber(f), beta = Guide.PhaseConstant(f), omegaMu0 = f.AngularFrequency * PhysicalConstants.Mu0;
        double l = length / 2;
        var sums = GetSums(offset, frequency, k, nb);
        Complex[,] yin = bruteForceModes is { } bf
            ? sums.BruteForceBlock(l, nb, omegaMu0, bf.M, bf.N)
            : sums.Block(l, nb, omegaMu0);
        Complex[,] yex = HalfSpaceSlotKernel.Block(length, w, Options.EquivalentRadiusFactor * w, k, nb, omegaMu0,
            Options.QuadraturePanels, Options.QuadratureOrder);

        double xc = a / 2 + offset, c1 = Math.Cos(Math.PI * xc / a), arg1 = Math.PI * w / (2 * a), s1 = Math.Sin(arg1) / arg1;
        var pm = new Complex[nb];
        var pp = new Complex[nb];
        for (int p = 0; p < nb; p++)
        {
            double al = (p + 1) * Math.PI / length, sgn = (p % 2 == 0) ? -1 : 1; // (−1)^(p+1)
            double den = al * al - beta * beta;
            pm[p] = Complex.FromPolarCoordinates(1, beta * l) * al * (1 - sgn * Complex.FromPolarCoordinates(1, -beta * length)) / den;
            pp[p] = Complex.FromPolarCoordinates(1, -beta * l) * al * (1 - sgn * Complex.FromPolarCoordinates(1, beta * length)) / den;
        }
        var rhsScale = new Complex(0, Math.PI / (omegaMu0 * a)) * w * c1 * s1;

        Complex[] v1;
        if (t == 0)
        {
            var m = new Complex[nb, nb];
            var r = new Complex[nb];
            for (int q = 0; q < nb; q++)
            {
                r[q] = rhsScale * pm[q];
                for (int p = 0; p < nb; p++) m[q, p] = yin[q, p] + yex[q, p];
            }
            v1 = ComplexSolve(m, r);
        }
        else
        {
            var m = new Complex[2 * nb, 2 * nb];
            var r = new Complex[2 * nb];
            for (int q = 0; q < nb; q++)
            {
                r[q] = rhsScale * pm[q];
                for (int p = 0; p < nb; p++) { m[q, p] = yin[q, p]; m[nb + q, nb + p] = yex[q, p]; }
                double al = (q + 1) * Math.PI / length, g2 = al * al - k * k;
                Complex g = g2 >= 0 ? new Complex(Math.Sqrt(g2), 0) : new Complex(0, Math.Sqrt(-g2));
                Complex kap = new Complex(0, l / omegaMu0), self, mutual;
                if ((g * t).Magnitude < 1e-8) self = mutual = kap / t; // γ coth(γt), γ csch(γt) → 1/t at the cavity cutoff
                else
                {
                    Complex e1 = Complex.Exp(-g * t), e2 = e1 * e1;
                    self = kap * g * (1 + e2) / (1 - e2);
                    mutual = kap * g * 2 * e1 / (1 - e2);
                }
                m[q, q] += self;
                m[nb + q, nb + q] += self;
                m[q, nb + q] -= mutual;
                m[nb + q, q] -= mutual;
            }
            v1 = ComplexSolve(m, r)[..nb];
        }
        var scale = new Complex(0, -Math.PI / (a * a * b * beta)) * c1 * s1;
        Complex bsum = Complex.Zero, csum = Complex.Zero;
        for (int p = 0; p < nb; p++) { bsum += v1[p] * pm[p]; csum += v1[p] * pp[p]; }
        Complex bw = scale * bsum, fw = scale * csum;
        return new SlotScattering(-2 * bw / (1 + bw), bw, fw);
    }

    private WaveguideSlotModalSums GetSums(double offset, double frequency, double k, int basis)
    {
        var key = (offset, frequency, basis);
        if (_sums.TryGetValue(key, out var s)) return s;
        if (_sums.Count > CacheLimit) _sums.Clear();
        double gammaCut = Options.ModeCutFactor * basis * k;
        return _sums.GetOrAdd(key, _ => new WaveguideSlotModalSums(Guide.BroadWall.Meters, Guide.NarrowWall.Meters, k,
            Width.Meters, offset, gammaCut, Options.ClosedFormTerms));
    }

    /// <summary>Gaussian elimination with partial pivoting (small dense complex systems).</summary>
    internal static Complex[] ComplexSolve(Complex[,] m, Complex[] r)
    {
        int n = r.Length;
        var a = (Complex[,])m.Clone();
        var x = (Complex[])r.Clone();
        for (int c = 0; c < n; c++)
        {
            int piv = c;
            for (int i = c + 1; i < n; i++) if (a[i, c].Magnitude > a[piv, c].Magnitude) piv = i;
            if (a[piv, c] == Complex.Zero) throw new ConvergenceException("singular moment-method matrix", c, 0);
            if (piv != c)
            {
                for (int j = 0; j < n; j++) (a[c, j], a[piv, j]) = (a[piv, j], a[c, j]);
                (x[c], x[piv]) = (x[piv], x[c]);
            }
            for (int i = c + 1; i < n; i++)
            {
                Complex fct = a[i, c] / a[c, c];
                if (fct == Complex.Zero) continue;
                for (int j = c; j < n; j++) a[i, j] -= fct * a[c, j];
                x[i] -= fct * x[c];
            }
        }
        for (int i = n - 1; i >= 0; i--)
        {
            Complex s = x[i];
            for (int j = i + 1; j < n; j++) s -= a[i, j] * x[j];
            x[i] = s / a[i, i];
        }
        return x;
    }
}
