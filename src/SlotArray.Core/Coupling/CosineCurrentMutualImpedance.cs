using System.Numerics;
using MathNet.Numerics.Integration;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Coupling;

/// <summary>
/// Mutual impedance of two parallel thin dipoles carrying the half-cosine currents I(ζ) = I(0) cos(πζ/(2h)) (zero at
/// the ends), the distribution behind Elliott's coupling function (R. S. Elliott, "An improved design procedure for
/// small arrays of shunt slots", IEEE Trans. AP-31, 48–53, 1983), referred to the centre currents I(0). Fixed-order Gauss–Legendre.
/// </summary>
/// <remarks>
/// <para>Reaction in mixed-potential form (the induced-EMF integral of Carter 1932 after one integration by parts,
/// both currents vanishing at their ends; R. F. Harrington, <i>Field Computation by Moment Methods</i>, Macmillan
/// 1968, Sec. 4.2, from memory): Z21 = (jη k/(4π)) ∫∫ [I1(z) I2(z′) − I1′(z) I2′(z′)/k²] e^(−jkR)/R dz dz′ / (I1(0) I2(0)),
/// R = √(d² + (z − z′)²). Each dipole is split at its centre and each half carries a 16-point Gauss–Legendre rule
/// (1024 kernel evaluations per pair, about 35 µs). At kh = π/2 the half-cosine equals the sinusoid sin(k(h − |ζ|)), so there the
/// result must equal <see cref="DipoleMutualImpedance.Mutual"/>; the tests check that and reciprocity.</para>
/// <para>Validity: the kernel must stay smooth on the rule's scale, i.e. the closest approach of the two dipoles
/// (√(d² + gap²), gap = |s| − h1 − h2 for collinear ones) should exceed about a tenth of the shorter half-length;
/// closer pairs are rejected. Slots of one guide at λg/2 spacing are far inside this limit.</para>
/// </remarks>
internal static class CosineCurrentMutualImpedance
{
    private const int Order = 16;
    private static readonly GaussLegendreRule Rule = new(0, 1, Order);

    /// <summary>The lower orders <see cref="AdaptiveElectrical"/> uses for pairs a quarter wavelength and one wavelength apart.</summary>
    private static readonly GaussLegendreRule NearRule = new(0, 1, 6), FarRule = new(0, 1, 4);

    /// <summary>
    /// Mutual impedance (Ω) for half-cosine currents on dipoles of half-lengths h1, h2, lateral distance d and
    /// centre stagger s, at frequency f (η0), referred to the centre currents.
    /// </summary>
    public static Complex Mutual(Length lateralDistance, Length stagger, Length halfLength1, Length halfLength2, Frequency f)
    {
        double k = f.FreeSpaceWavenumber;
        return MutualElectrical(k * lateralDistance.Meters, k * stagger.Meters, k * halfLength1.Meters, k * halfLength2.Meters);
    }

    /// <summary><see cref="Mutual"/> in electrical lengths (radians) kd, ks, kh1, kh2; η in Ω (default η0).</summary>
    public static Complex MutualElectrical(double kd, double ks, double kh1, double kh2, double eta = PhysicalConstants.Eta0)
        => Electrical(kd, ks, kh1, kh2, eta, Rule);

    /// <summary>
    /// <see cref="MutualElectrical"/> with fewer points for distant pairs, which make up almost all of a large aperture: a
    /// 6-point rule on each half when the dipoles' closest approach R is at least a quarter wavelength (kR ≥ π/2), a
    /// 4-point rule from two wavelengths (kR ≥ 4π), the 16-point rule closer. The integrand is analytic in a strip whose
    /// half-width grows with R (the kernel's branch points sit at the closest approach off the axis) and its phase varies
    /// by at most kh ≈ 1.5 rad over a half, so the Gauss–Legendre error falls fast with the order (the Bernstein-ellipse
    /// bound, e.g. L. N. Trefethen, <i>Approximation Theory and Approximation Practice</i>, SIAM 2013, Ch. 19, from
    /// memory). Measured against the 16-point value for half-lengths 0.23 and 0.25 λ: 6 points ≤ 5e-9 relative from λ/4
    /// on, 4 points ≤ 8e-6 from λ on (the tests hold it to 1e-8 and 1e-5): far below the model's own error, on terms
    /// that are themselves small. About 1/16 of the kernel evaluations on a 32 × 32 aperture.
    /// </summary>
    public static Complex AdaptiveElectrical(double kd, double ks, double kh1, double kh2, double eta = PhysicalConstants.Eta0)
    {
        double gap = Math.Max(0, Math.Abs(ks) - kh1 - kh2), r2 = kd * kd + gap * gap;
        var rule = r2 >= 4 * Math.PI * Math.PI ? FarRule : r2 >= Math.PI * Math.PI / 4 ? NearRule : Rule;
        return Electrical(kd, ks, kh1, kh2, eta, rule);
    }

    private static Complex Electrical(double kd, double ks, double kh1, double kh2, double eta, GaussLegendreRule rule)
    {
        if (!(kd >= 0) || !double.IsFinite(kd)) throw new ArgumentOutOfRangeException(nameof(kd), kd, "the lateral distance must be zero or positive");
        if (!(kh1 > 0) || !double.IsFinite(kh1)) throw new ArgumentOutOfRangeException(nameof(kh1), kh1, "the half-length must be positive");
        if (!(kh2 > 0) || !double.IsFinite(kh2)) throw new ArgumentOutOfRangeException(nameof(kh2), kh2, "the half-length must be positive");
        if (!double.IsFinite(ks)) throw new ArgumentOutOfRangeException(nameof(ks), ks, "the stagger must be finite");
        ks = Math.Abs(ks);
        double gap = Math.Max(0, ks - kh1 - kh2);
        double approach = Math.Sqrt(kd * kd + gap * gap);
        if (approach < 0.1 * Math.Min(kh1, kh2))
            throw new ArgumentOutOfRangeException(nameof(kd), kd,
                $"the dipoles come within {approach:G3} rad of each other, less than a tenth of the shorter half-length; " +
                "the fixed-order rule is not accurate there");

        var sum = Complex.Zero;
        for (int half1 = -1; half1 <= 1; half1 += 2)
            for (int half2 = -1; half2 <= 1; half2 += 2)
                sum += Block(kd, ks, kh1, kh2, half1, half2, rule);
        return Complex.ImaginaryOne * eta / (4 * Math.PI) * sum;
    }

    /// <summary>∫∫ over one half of each dipole (sign gives the side of the centre).</summary>
    private static Complex Block(double d, double s, double h1, double h2, int side1, int side2, GaussLegendreRule rule)
    {
        int order = rule.Order;
        double a1 = Math.PI / (2 * h1), a2 = Math.PI / (2 * h2), d2 = d * d;
        // The second dipole's abscissae, weights and current shapes do not depend on the first's point: computed once.
        Span<double> zeta = stackalloc double[order], w2 = stackalloc double[order], cos2 = stackalloc double[order], dsin2 = stackalloc double[order];
        for (int j = 0; j < order; j++)
        {
            zeta[j] = side2 * h2 * rule.GetAbscissa(j);
            w2[j] = h2 * rule.GetWeight(j);
            var (sin2, c2) = Math.SinCos(a2 * zeta[j]);
            cos2[j] = c2;
            dsin2[j] = -a2 * sin2;
        }
        var sum = Complex.Zero;
        for (int i = 0; i < order; i++)
        {
            double z = side1 * h1 * rule.GetAbscissa(i), w1 = h1 * rule.GetWeight(i);
            var (sin1, cos1) = Math.SinCos(a1 * z);
            double i1 = cos1, di1 = -a1 * sin1;
            var inner = Complex.Zero;
            for (int j = 0; j < order; j++)
            {
                double dz = z - (s + zeta[j]), r = Math.Sqrt(d2 + dz * dz);
                var (sr, cr) = Math.SinCos(r);
                double shape = i1 * cos2[j] - di1 * dsin2[j];
                inner += w2[j] * shape / r * new Complex(cr, -sr);
            }
            sum += w1 * inner;
        }
        return sum;
    }
}
