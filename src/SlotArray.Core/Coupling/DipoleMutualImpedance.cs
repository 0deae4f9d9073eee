using System.Numerics;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Coupling;

/// <summary>
/// Mutual and self impedance of parallel thin dipoles with sinusoidal currents, by the induced-EMF method,
/// in closed form with sine and cosine integrals. Impedances are referred to the loop (maximum) currents
/// I0 of I0 sin(k(h − |ζ|)), which for h ≠ λ/4 differ from the terminal currents.
/// </summary>
/// <remarks>
/// <para>Induced-EMF formula: P. S. Carter, "Circuit relations in radiating systems and applications to antenna
/// problems", Proc. IRE 20, 1004–1041, 1932; G. H. Brown and R. King, "High-frequency models in antenna
/// investigations", Proc. IRE 22, 457–480, 1934; C. A. Balanis, <i>Antenna Theory</i>, 3rd ed., Wiley 2005,
/// Sec. 8.6 (from memory [M]):</para>
/// <para>Z21 = −(1/(I1 I2)) ∫ E_z1(d, z) I2(z) dz, E_z1 = −j(η I1/4π) [e^(−jkR1)/R1 + e^(−jkR2)/R2 − 2 cos(kh1) e^(−jkr)/r],
/// R1,2 = √(d² + (z ∓ h1)²), r = √(d² + z²), integrated over dipole 2 (centre at stagger s, half-length h2).</para>
/// <para>Closed form (derived here by direct integration, the route of H. E. King, "Mutual impedance of unequal
/// length antennas in echelon", IRE Trans. AP-5, 306–313, 1957, from memory): each of the three spherical-wave
/// terms, times each exponential half of the sinusoidal current on each half of dipole 2, integrates exactly,
/// because with u = z − z_a and R = √(d² + u²), du/R = ∓ dw/w for w = k(R ∓ u). Hence
/// ∫ e^(−jkR) e^(±jku)/R du = ∓[−E1(j k (R ∓ u))] between the end points, with E1(jx) = −Ci(x) + j(Si(x) − π/2)
/// (<see cref="SineCosineIntegrals.E1OfImaginary"/>). Any lengths, any lateral distance d ≥ 0 and stagger s;
/// the side-by-side, collinear and echelon cases are special cases. The closed form is checked in the tests
/// against an independent Gauss–Legendre quadrature of the reaction integral, the textbook side-by-side formula
/// and the classic values −12.5 − j29.9 Ω (side by side, d = λ/2) and 26.4 + j20.2 Ω (collinear, touching)
/// (J. D. Kraus, <i>Antennas</i>; Balanis Sec. 8.6; from memory).</para>
/// <para>Validity: thin dipoles (radius ≪ λ and ≪ length) with the assumed sinusoidal currents; parallel axes.
/// Collinear dipoles (d = 0) must not overlap; d is floored at 1e-12/k, which changes nothing measurable.
/// The impedance is reciprocal, Z21 = Z12, also for h1 ≠ h2. Referred to the centre (terminal) currents instead,
/// Z21 becomes Z21/(sin kh1 sin kh2).</para>
/// </remarks>
internal static class DipoleMutualImpedance
{
    /// <summary>Smallest lateral distance used, in radians of kd (a numerical floor for collinear dipoles).</summary>
    private const double MinimumElectricalDistance = 1e-12;

    /// <summary>
    /// Mutual impedance (Ω) of two parallel thin dipoles: half-lengths h1, h2, lateral distance d between the
    /// axes, centre stagger s along the axes, at frequency f in free space (η = η0). Referred to the loop currents.
    /// </summary>
    public static Complex Mutual(Length lateralDistance, Length stagger, Length halfLength1, Length halfLength2, Frequency f)
    {
        double k = f.FreeSpaceWavenumber;
        return MutualElectrical(k * lateralDistance.Meters, k * stagger.Meters, k * halfLength1.Meters, k * halfLength2.Meters);
    }

    /// <summary>
    /// Self impedance (Ω) of a thin dipole of half-length h and radius r, by the induced-EMF method (the field of
    /// the filament on the axis evaluated at the wire surface), referred to the loop current. Half-wave, r → 0:
    /// 73.08 + j42.51 Ω ([N]; S. J. Orfanidis, <i>Electromagnetic Waves and Antennas</i>,
    /// toolbox function <c>imped</c>, documentation).
    /// </summary>
    public static Complex Self(Length halfLength, Length radius, Frequency f)
    {
        if (!(radius.Meters > 0)) throw new ArgumentOutOfRangeException(nameof(radius), radius.ToString(), "the dipole radius must be positive");
        if (!(radius < halfLength)) throw new ArgumentOutOfRangeException(nameof(radius), radius.ToString(), $"the radius must be much smaller than the half-length {halfLength}");
        double k = f.FreeSpaceWavenumber;
        return MutualElectrical(k * radius.Meters, 0, k * halfLength.Meters, k * halfLength.Meters);
    }

    /// <summary>
    /// Side-by-side half-wave dipoles (h1 = h2 = λ/4, no stagger), the textbook closed form
    /// R21 = (η/4π)[2Ci(u0) − Ci(u1) − Ci(u2)], X21 = −(η/4π)[2Si(u0) − Si(u1) − Si(u2)], u0 = kd,
    /// u1,2 = k(√(d² + L²) ± L), L = λ/2 (Balanis, <i>Antenna Theory</i>, 3rd ed., Sec. 8.6, from memory;
    /// [M]). Used as an independent check of <see cref="Mutual"/>.
    /// </summary>
    public static Complex SideBySideHalfWave(Length lateralDistance, Frequency f)
    {
        if (!(lateralDistance.Meters > 0)) throw new ArgumentOutOfRangeException(nameof(lateralDistance), lateralDistance.ToString(), "the distance must be positive");
        double k = f.FreeSpaceWavenumber, d = lateralDistance.Meters, l = f.FreeSpaceWavelength.Meters / 2;
        double root = Math.Sqrt(d * d + l * l);
        var (s0, c0) = SineCosineIntegrals.SiCi(k * d);
        var (s1, c1) = SineCosineIntegrals.SiCi(k * (root + l));
        var (s2, c2) = SineCosineIntegrals.SiCi(k * d * d / (root + l));   // k(√(d²+L²) − L) without cancellation
        double scale = PhysicalConstants.Eta0 / (4 * Math.PI);
        return new Complex(scale * (2 * c0 - c1 - c2), -scale * (2 * s0 - s1 - s2));
    }

    /// <summary>
    /// <see cref="Mutual"/> in electrical lengths (radians): kd, ks, kh1, kh2, impedance of the medium η (Ω,
    /// default η0). kd ≥ 0, kh1, kh2 &gt; 0 and not multiples of π (the loop current must exist); collinear
    /// dipoles (kd = 0) must not overlap, |ks| ≥ kh1 + kh2.
    /// </summary>
    public static Complex MutualElectrical(double kd, double ks, double kh1, double kh2, double eta = PhysicalConstants.Eta0)
    {
        if (!(kd >= 0) || !double.IsFinite(kd)) throw new ArgumentOutOfRangeException(nameof(kd), kd, "the lateral distance must be zero or positive");
        if (!(kh1 > 0) || !double.IsFinite(kh1)) throw new ArgumentOutOfRangeException(nameof(kh1), kh1, "the half-length must be positive");
        if (!(kh2 > 0) || !double.IsFinite(kh2)) throw new ArgumentOutOfRangeException(nameof(kh2), kh2, "the half-length must be positive");
        if (!double.IsFinite(ks)) throw new ArgumentOutOfRangeException(nameof(ks), ks, "the stagger must be finite");
        ks = Math.Abs(ks);   // both current shapes are even about their own centres
        if (kd < MinimumElectricalDistance)
        {
            if (ks < kh1 + kh2 - 1e-12 * (kh1 + kh2))
                throw new ArgumentOutOfRangeException(nameof(ks), ks,
                    $"collinear dipoles overlap: stagger ks = {ks:G6} rad is less than kh1 + kh2 = {kh1 + kh2:G6} rad");
            kd = MinimumElectricalDistance;
        }

        double a = ks - kh2, b = ks + kh2;
        double d2 = kd * kd;
        var sum = Term(1.0, kh1, a, ks, b, d2) + Term(1.0, -kh1, a, ks, b, d2)
            + Term(-2 * Math.Cos(kh1), 0.0, a, ks, b, d2);
        return eta / (8 * Math.PI) * sum;
    }

    /// <summary>
    /// One spherical-wave term c e^(−jkR)/R of the source (R measured from z_a) integrated against the sinusoidal
    /// current of the receiver on [a, s] and [s, b]; returns 2j × the integral (the caller applies jη/4π · 1/2j).
    /// </summary>
    private static Complex Term(double weight, double za, double a, double s, double b, double d2)
    {
        if (weight == 0) return Complex.Zero;
        var (ma, pa) = Parts(a - za, d2);
        var (ms, ps) = Parts(s - za, d2);
        var (mb, pb) = Parts(b - za, d2);
        // F(w) = −E1(jw) is the antiderivative of e^(−jw)/w; only differences of F appear, so E1 itself will do.
        Complex fma = -SineCosineIntegrals.E1OfImaginary(ma), fpa = -SineCosineIntegrals.E1OfImaginary(pa);
        Complex fms = -SineCosineIntegrals.E1OfImaginary(ms), fps = -SineCosineIntegrals.E1OfImaginary(ps);
        Complex fmb = -SineCosineIntegrals.E1OfImaginary(mb), fpb = -SineCosineIntegrals.E1OfImaginary(pb);
        // P(u0,u1) = ∫ e^(−j(R−u))/R du = F(m0) − F(m1);  M(u0,u1) = ∫ e^(−j(R+u))/R du = F(p1) − F(p0).
        Complex pLow = fma - fms, mLow = fps - fpa, mHigh = fpb - fps, pHigh = fms - fmb;
        var (sinLow, cosLow) = Math.SinCos(za - a);
        var (sinHigh, cosHigh) = Math.SinCos(b - za);
        Complex eLow = new(cosLow, sinLow), eHigh = new(cosHigh, sinHigh);
        return weight * (eLow * pLow - Complex.Conjugate(eLow) * mLow + eHigh * mHigh - Complex.Conjugate(eHigh) * pHigh);
    }

    /// <summary>R − u and R + u for R = √(d² + u²), each formed without cancellation.</summary>
    private static (double Minus, double Plus) Parts(double u, double d2)
    {
        double r = Math.Sqrt(d2 + u * u);
        if (u >= 0) { double p = r + u; return (d2 / p, p); }
        double m = r - u;
        return (m, d2 / m);
    }
}
