using System.Collections.Immutable;
using MathNet.Numerics;
using MathNet.Numerics.RootFinding;

namespace SlotArray.Core.Tapers;

/// <summary>
/// Hansen's circular Taylor n̄ distribution for a circular aperture of radius R: the first n̄ − 1 pattern zeros of the
/// uniform circular aperture (the roots μ_n of J1(πμ) = 0) are moved to u_n = σ√(A² + (n − ½)²), the rest stay, and the
/// aperture distribution is a finite Fourier–Bessel series in J0.
/// </summary>
/// <remarks>
/// <para>Source: R. C. Hansen, "Tables of Taylor distributions for circular aperture antennas", IRE Trans. AP-8,
/// 23–26, 1960, and R. C. Hansen, <i>Phased Array Antennas</i>, Wiley 1998, Sec. 3.2 (circular Taylor); formulas from
/// memory [M] and checked here [D] by transforming the sampled distribution numerically back to the pattern
/// (the tests). A = acosh(R_s)/π with R_s the voltage sidelobe ratio (Taylor 1955), σ = μ_n̄ / √(A² + (n̄ − ½)²).
/// Pattern, u = (2R/λ) sin θ: F(u) = [2 J1(πu)/(πu)] Π_{n&lt;n̄} (1 − u²/u_n²)/(1 − u²/μ_n²).
/// Distribution, p = ρ/R: g(p) = Σ_{m=0}^{n̄−1} [F(μ_m)/J0²(πμ_m)] J0(πμ_m p), μ_0 = 0, with
/// F(μ_m) = −J0(πμ_m) Π_{n&lt;n̄}(1 − μ_m²/u_n²) / Π_{n&lt;n̄, n≠m}(1 − μ_m²/μ_n²) the pattern's samples at the uniform
/// aperture's zeros (the distribution's Fourier–Bessel coefficients).</para>
/// <para>The published tables (Hansen 1960) list σ, the u_n and the F(μ_m) for 15 … 40 dB and n̄ up to about 10; the
/// tabulated numbers were not available to check against here, so the tests check the defining properties instead:
/// the first n̄ − 1 sidelobes near the design level and the pattern of the distribution equal to F(u).</para>
/// </remarks>
internal static class CircularTaylor
{
    /// <summary>One design: A, σ, the uniform aperture's zeros μ_1 … μ_n̄, the moved zeros and the coefficients.</summary>
    /// <param name="A">Taylor's A = acosh(R_s)/π.</param>
    /// <param name="Sigma">Dilation σ = μ_n̄/√(A² + (n̄ − ½)²).</param>
    /// <param name="UniformZeros">μ_1 … μ_n̄ (roots of J1(πμ)).</param>
    /// <param name="Zeros">u_1 … u_{n̄−1}, the moved zeros.</param>
    /// <param name="Coefficients">F(μ_m)/J0²(πμ_m) for m = 0 … n̄ − 1, the weights of J0(πμ_m p).</param>
    public sealed record Design(double A, double Sigma, ImmutableArray<double> UniformZeros, ImmutableArray<double> Zeros,
        ImmutableArray<double> Coefficients)
    {
        /// <summary>n̄ of the design.</summary>
        public int Nbar => Zeros.Length + 1;

        /// <summary>The aperture distribution g(p), p = ρ/R ∈ [0, 1] (not normalised; g is largest at the centre for monotonic designs).</summary>
        /// <param name="p">Normalised radius.</param>
        public double Distribution(double p)
        {
            double g = Coefficients[0];
            for (int m = 1; m < Coefficients.Length; m++)
                g += Coefficients[m] * SpecialFunctions.BesselJ(0, Math.PI * UniformZeros[m - 1] * p);
            return g;
        }

        /// <summary>The pattern F(u), u = (2R/λ) sin θ, normalised to F(0) = 1 (removable points evaluated by their limit).</summary>
        /// <param name="u">Pattern variable.</param>
        public double Pattern(double u)
        {
            double au = Math.Abs(u);
            for (int n = 0; n < Zeros.Length; n++)
                if (Math.Abs(au - UniformZeros[n]) < 1e-9) au += 1e-7;
            double f = au < 1e-9 ? 1 : 2 * SpecialFunctions.BesselJ(1, Math.PI * au) / (Math.PI * au);
            for (int n = 0; n < Zeros.Length; n++)
                f *= (1 - au * au / (Zeros[n] * Zeros[n])) / (1 - au * au / (UniformZeros[n] * UniformZeros[n]));
            return f;
        }
    }

    /// <summary>The n-th root μ_n of J1(πμ) = 0 (n ≥ 1): j_{1,n}/π, McMahon's start refined by Brent's method.</summary>
    /// <param name="n">Root number, ≥ 1.</param>
    public static double UniformZero(int n)
    {
        if (n < 1) throw new ArgumentOutOfRangeException(nameof(n), n, "the root number must be at least 1");
        double beta = (n + 0.25) * Math.PI, guess = beta - 3 / (8 * beta);
        return Brent.FindRoot(x => SpecialFunctions.BesselJ(1, x), guess - 0.3, guess + 0.3, 1e-14, 200) / Math.PI;
    }

    /// <summary>The design for a sidelobe level and n̄ (Hansen 1960).</summary>
    /// <param name="sidelobeLevelDb">Design sidelobe level, negative dB, −17.6 … −60 (the uniform circular aperture's first sidelobe is −17.57 dB).</param>
    /// <param name="nbar">n̄, 2 … 20.</param>
    public static Design Parameters(double sidelobeLevelDb, int nbar)
    {
        TaperMath.CheckLevel(sidelobeLevelDb, 17.6, 60, "circular Taylor");
        TaperMath.CheckNbar(nbar, 20, "circular Taylor", "larger n̄ only adds far-out zeros and an edge-peaked distribution");
        double a = Math.Acosh(TaperMath.RatioFromLevel(sidelobeLevelDb)) / Math.PI, a2 = a * a;
        var mu = new double[nbar];
        for (int n = 1; n <= nbar; n++) mu[n - 1] = UniformZero(n);
        double sigma = mu[nbar - 1] / Math.Sqrt(a2 + (nbar - 0.5) * (nbar - 0.5));
        var un = new double[nbar - 1];
        for (int n = 1; n < nbar; n++) un[n - 1] = sigma * Math.Sqrt(a2 + (n - 0.5) * (n - 0.5));
        var c = new double[nbar];
        c[0] = 1;
        for (int m = 1; m < nbar; m++)
        {
            double x = mu[m - 1], num = 1, den = 1;
            for (int n = 1; n < nbar; n++)
            {
                num *= 1 - x * x / (un[n - 1] * un[n - 1]);
                if (n != m) den *= 1 - x * x / (mu[n - 1] * mu[n - 1]);
            }
            double j0 = SpecialFunctions.BesselJ(0, Math.PI * x);
            c[m] = -j0 * num / den / (j0 * j0);
        }
        return new Design(a, sigma, ImmutableArray.Create(mu), ImmutableArray.Create(un), ImmutableArray.Create(c));
    }

    /// <summary>
    /// Highest sidelobe of F(u), dB (negative), searched on u ∈ [u_1, n̄ + 3] at 128 points per unit with parabolic refinement.
    /// </summary>
    /// <param name="design">The design.</param>
    public static double PeakSidelobeDb(Design design)
    {
        ArgumentNullException.ThrowIfNull(design);
        double start = design.Zeros.Length > 0 ? design.Zeros[0] : design.UniformZeros[0];
        return TaperMath.ContinuousPeakSidelobeDb(design.Pattern, start, design.Nbar + 3, 1.0 / 128);
    }

    /// <summary>Half-power full width of F in u (u = (2R/λ) sin θ), by bisection on 0 … u_1.</summary>
    /// <param name="design">The design.</param>
    public static double HalfPowerWidthU(Design design)
    {
        ArgumentNullException.ThrowIfNull(design);
        double target = Math.Sqrt(0.5);
        double hi = design.Zeros.Length > 0 ? design.Zeros[0] : design.UniformZeros[0];
        return 2 * Bisection.FindRoot(u => design.Pattern(u) - target, 0, hi, 1e-12, 200);
    }
}
