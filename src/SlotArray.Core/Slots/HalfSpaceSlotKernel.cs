using System.Numerics;
using MathNet.Numerics.Integration;

namespace SlotArray.Core.Slots;

/// <summary>
/// The exterior (half-space) Galerkin block of a narrow slot in an infinite ground plane (mixed-potential form
/// after Stern &amp; Elliott 1985): Y^ext_qp = (2w/(jωμ0)) ∫∫ [k² f_q(z) f_p(z′) − f_q′(z) f_p′(z′)] e^(−jkR)/(4πR) dz dz′ with the reduced kernel
/// R = √((z − z′)² + r_e²), r_e the equivalent strip radius.
/// </summary>
/// <remarks>
/// <para>Equivalent radius r_e = w/4: C. M. Butler, "A formulation of the finite-length narrow slot or strip equation",
/// IEEE Trans. AP-30, 1254–1257, 1982 (abstract: "width/4 emerges as the value of the equivalent radius").</para>
/// <para>Quadrature (derived here): the kernel depends on u = z − z′ only, so the double integral is
/// ∫₀^L K(u) [C_qp(u) + C_pq(u)] du with the correlations C_qp(u) = ∫ f_q(z) f_p(z − u) dz of the sine basis in closed
/// form. The near-singular 1/R is removed by u = r_e sinh τ (du/R = dτ), leaving the smooth integrand
/// e^(−jk r_e cosh τ)[…](r_e sinh τ) on 0 ≤ τ ≤ asinh(L/r_e), integrated by composite Gauss–Legendre.</para>
/// </remarks>
internal static class HalfSpaceSlotKernel
{
    /// <summary>The exterior block (P×P) for a slot of full length L, width w, wavenumber k.</summary>
    public static Complex[,] Block(double length, double width, double equivalentRadius, double k, int basisCount,
        double omegaMu0, int panels, int order)
    {
        int nb = basisCount;
        double bigL = length, re = equivalentRadius, tauMax = Math.Asinh(bigL / re);
        var alpha = new double[nb];
        for (int p = 0; p < nb; p++) alpha[p] = (p + 1) * Math.PI / bigL;
        var acc = new Complex[nb, nb];
        var (xs, ws) = Rule(order);
        double h = tauMax / panels;
        var sn = new double[nb];
        var cs = new double[nb];
        for (int panel = 0; panel < panels; panel++)
        {
            double t0 = panel * h;
            for (int j = 0; j < order; j++)
            {
                double tau = t0 + h * (xs[j] + 1) / 2, wt = ws[j] * h / 2;
                double u = re * Math.Sinh(tau), r = re * Math.Cosh(tau);
                Complex kern = wt * Complex.FromPolarCoordinates(1, -k * r);
                for (int p = 0; p < nb; p++) { sn[p] = Math.Sin(alpha[p] * u); cs[p] = Math.Cos(alpha[p] * u); }
                for (int p = 0; p < nb; p++)
                    for (int q = p % 2; q <= p; q += 2)
                        acc[q, p] += kern * Correlations(alpha[q], alpha[p], sn[q], sn[p], cs[p], q == p, u, bigL, k);
            }
        }
        var pre = 2 * width / new Complex(0, omegaMu0) / (4 * Math.PI);
        var y = new Complex[nb, nb];
        for (int p = 0; p < nb; p++)
            for (int q = p % 2; q <= p; q += 2) y[q, p] = y[p, q] = pre * acc[q, p];
        return y;
    }

    private static readonly System.Collections.Concurrent.ConcurrentDictionary<int, (double[] X, double[] W)> Rules = new();

    private static (double[] X, double[] W) Rule(int order) => Rules.GetOrAdd(order, n =>
    {
        var rule = new GaussLegendreRule(-1, 1, n);
        return (rule.Abscissas, rule.Weights);
    });

    /// <summary>
    /// k² [C^f_qp + C^f_pq](u) − [C^d_qp + C^d_pq](u) for 0 ≤ u ≤ L and same-parity p, q, in closed form. 
    /// C^f_qp = ½(I− − I+), C^d_qp = ½ α_q α_p (I− + I+), I− = ∫_u^L cos((α_q − α_p)s + α_p u) ds, I+ = ∫_u^L cos((α_q + α_p)s − α_p u) ds;
    /// since (α_q ± α_p)L is a multiple of 2π for same parity, I− = (sin α_p u − sin α_q u)/(α_q − α_p) (q ≠ p),
    /// I− = (L − u) cos α_p u (q = p), I+ = −(sin α_p u + sin α_q u)/(α_q + α_p). Both orders (q, p) and (p, q) give the same sum.
    /// </summary>
    private static double Correlations(double aq, double ap, double sq, double sp, double cp, bool diagonal, double u, double bigL, double k)
    {
        double iMinus = diagonal ? (bigL - u) * cp : (sp - sq) / (aq - ap);
        double iPlus = -(sp + sq) / (aq + ap);
        double one = k * k * 0.5 * (iMinus - iPlus) - aq * ap * 0.5 * (iMinus + iPlus);
        // The (p, q) order: I− changes to (sin α_q u − sin α_p u)/(α_p − α_q), the same value; I+ is symmetric.
        return 2 * one;
    }
}
