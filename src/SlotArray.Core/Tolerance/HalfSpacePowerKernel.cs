using System.Numerics;
using MathNet.Numerics.Integration;

namespace SlotArray.Core.Tolerance;

/// <summary>
/// The radiated-power integral of the half-space directivity, P = ∫_{−1}^{1} |E·AF|² du, for elements displaced slightly
/// from an equally spaced line: P = Σ_m Σ_n a_m a_n* K(p_m − p_n + δ_m − δ_n), K(Δ) = ∫ E(u)² e^{jkΔu} du, with K expanded
/// about each nominal lag, K(Δ0 + δ) = Σ_q K_q(Δ0) δ^q/q!, K_q(Δ0) = ∫ E² (jku)^q e^{jkΔ0 u} du. The K_q are integrated once
/// with the rule of <see cref="Patterns.Directivity.HalfSpace(IReadOnlyList{double}, IReadOnlyList{Complex}, double, Func{double, double}, double)"/>
/// (composite 16-point Gauss–Legendre, a panel per π/(k·span) of u plus 8), so with all δ = 0 this is that rule's value.
/// </summary>
/// <remarks>
/// Source: the directivity definition D = 4πU/∫∫U dΩ over the front half-space (IEEE Std 145-2013; the φ-integral is π),
/// expanded in a Taylor series in the small displacements — derived here, checked in the tolerance tests against
/// <c>Directivity.HalfSpace</c> of the displaced slots (agreement 1e-9).
/// Terms are kept while (2k max|δ|)^{q}/q! exceeds 1e-12 (q ≤ 6); beyond that <see cref="TryPower"/> returns false and the
/// caller integrates directly. For machining errors of 0.03 mm at X band three terms suffice.
/// </remarks>
internal sealed class HalfSpacePowerKernel
{
    private const int MaxOrder = 6;
    private const double Remainder = 1e-12;
    private readonly int n;
    private readonly double k;
    private readonly Complex[,] kernel;   // K_q/q! at [q, lag + n − 1]

    public HalfSpacePowerKernel(double[] nominalPositions, double wavenumber, Func<double, double> element)
    {
        n = nominalPositions.Length;
        k = wavenumber;
        double d = n > 1 ? (nominalPositions[^1] - nominalPositions[0]) / (n - 1) : 0;
        double span = Math.Abs(nominalPositions[^1] - nominalPositions[0]);
        int panels = Math.Max(8, (int)Math.Ceiling(k * span / Math.PI) + 8);
        var rule = new GaussLegendreRule(-1, 1, 16);
        double h = 2.0 / panels;
        kernel = new Complex[MaxOrder + 1, 2 * n - 1];
        for (int p = 0; p < panels; p++)
            for (int q = 0; q < rule.Order; q++)
            {
                double u = -1 + h * (p + 0.5 * (rule.Abscissas[q] + 1));
                double e = element(Math.Asin(u));
                double w = 0.5 * h * rule.Weights[q] * e * e;
                var jku = new Complex(0, k * u);
                for (int lag = -(n - 1); lag <= n - 1; lag++)
                {
                    Complex t = w * Complex.FromPolarCoordinates(1, k * lag * d * u);
                    for (int o = 0; o <= MaxOrder; o++)
                    {
                        kernel[o, lag + n - 1] += t;
                        t *= jku / (o + 1);   // stored as K_q/q!
                    }
                }
            }
    }

    /// <summary>P for excitations a_n at p_n + δ_n; false when the displacements need more terms than kept.</summary>
    public bool TryPower(Complex[] a, double[] offsets, out double power)
    {
        double x = 0;
        foreach (var o in offsets) x = Math.Max(x, Math.Abs(o));
        x *= 2 * k;
        int order = 0;
        double term = x;
        while (term > Remainder && order < MaxOrder) { order++; term *= x / (order + 1); }
        power = 0;
        if (term > Remainder) return false;
        // K(−x) = K(x)* (E² is real), so the pair (n, m) is the conjugate of (m, n): P = Σ|a_m|² K(0) + 2 Re Σ_{m>n}.
        double sum = 0;
        for (int m = 0; m < n; m++)
        {
            sum += (a[m].Real * a[m].Real + a[m].Imaginary * a[m].Imaginary) * kernel[0, n - 1].Real;
            for (int i = 0; i < m; i++)
            {
                int lag = m - i + n - 1;
                double delta = offsets[m] - offsets[i];
                Complex kk = kernel[order, lag];
                for (int q = order - 1; q >= 0; q--) kk = kk * delta + kernel[q, lag];
                sum += 2 * (a[m] * Complex.Conjugate(a[i]) * kk).Real;
            }
        }
        power = sum;
        return true;
    }
}
