using MathNet.Numerics.Integration;
using Complex = System.Numerics.Complex;

namespace SlotArray.Core.Patterns;

/// <summary>
/// Directivity D(θ0) = 4π U(θ0) / ∫∫ U dΩ of a linear array (the standard definition,
/// IEEE Std 145-2013, "directivity"; C. A. Balanis, <i>Antenna Theory</i>, 3rd ed., Wiley 2005, eq. 2-16, number from memory).
/// The array lies on the z axis; θ is measured from broadside in a plane containing the axis, and the pattern is
/// taken as rotationally symmetric about the axis within the region integrated, so with u = sin θ (the cosine of
/// the polar angle from the axis) dΩ = du dφ and ∫∫ U dΩ = Φ ∫_{−1}^{1} U(u) du, Φ being the φ-range (2π full
/// sphere, π a half-space in front of an infinite ground plane).
/// </summary>
internal static class Directivity
{
    /// <summary>
    /// Isotropic elements radiating into the full sphere, closed form:
    /// D(θ0) = |AF(θ0)|² / Σ_m Σ_n a_m a_n* sinc(k(z_m − z_n)), sinc x = sin x / x (from ∫ e^{jkΔz u} du/2 over
    /// [−1, 1]; Balanis 2005 Sec. 6.10 for the uniform case, from memory). O(N²); equally spaced
    /// positions use the lag sums of the excitations so that each sinc is evaluated once.
    /// </summary>
    /// <param name="positions">Element positions z_n, m.</param>
    /// <param name="excitations">Complex excitations.</param>
    /// <param name="wavenumber">k = 2π/λ, rad/m.</param>
    /// <param name="direction">θ0, rad from broadside (default 0).</param>
    public static double Isotropic(IReadOnlyList<double> positions, IReadOnlyList<Complex> excitations, double wavenumber, double direction = 0)
    {
        Complex af = ArrayFactor.AtSines(positions, excitations, wavenumber, [Math.Sin(direction)])[0];
        int n = positions.Count;
        double den = 0;
        if (ArrayGeometry.IsUniform(positions, out double d))
        {
            for (int lag = 0; lag < n; lag++)
            {
                Complex r = 0;
                for (int i = 0; i + lag < n; i++) r += excitations[i + lag] * Complex.Conjugate(excitations[i]);
                den += (lag == 0 ? 1 : 2) * r.Real * Sinc(wavenumber * d * lag);
            }
        }
        else
        {
            for (int m = 0; m < n; m++)
                for (int i = 0; i < n; i++)
                    den += (excitations[m] * Complex.Conjugate(excitations[i])).Real * Sinc(wavenumber * (positions[m] - positions[i]));
        }
        if (!(den > 0)) throw new ArgumentException("All excitations are zero.", nameof(excitations));
        return af.Magnitude * af.Magnitude / den;
    }

    /// <summary>Isotropic directivity of real weights; see the complex overload.</summary>
    /// <param name="positions">Element positions, m.</param>
    /// <param name="weights">Real excitations.</param>
    /// <param name="wavenumber">k, rad/m.</param>
    /// <param name="direction">θ0, rad (default 0).</param>
    public static double Isotropic(IReadOnlyList<double> positions, IReadOnlyList<double> weights, double wavenumber, double direction = 0)
        => Isotropic(positions, ArrayFactor.ToComplex(weights), wavenumber, direction);

    /// <summary>
    /// Elements with pattern E(θ) in front of an infinite ground plane, radiating into the half-space only, the
    /// field independent of φ there (φ-range π): D(θ0) = 4 |E·AF|²(θ0) / ∫_{−1}^{1} |E·AF|² du
    /// (IEEE Std 145-2013 definition over the front half-space). Integrated by composite 16-point Gauss–Legendre in u, with a panel for every
    /// π/(k·span) of u (≥ 8 panels), which resolves the array factor's oscillation.
    /// </summary>
    /// <param name="positions">Element positions, m.</param>
    /// <param name="excitations">Complex excitations.</param>
    /// <param name="wavenumber">k, rad/m.</param>
    /// <param name="element">Element field pattern E(θ), θ ∈ [−π/2, π/2].</param>
    /// <param name="direction">θ0, rad (default 0).</param>
    public static double HalfSpace(IReadOnlyList<double> positions, IReadOnlyList<Complex> excitations, double wavenumber,
        Func<double, double> element, double direction = 0)
        => Integrated(positions, excitations, wavenumber, element, direction, Math.PI);

    /// <summary>Half-space directivity of real weights; see the complex overload.</summary>
    /// <param name="positions">Element positions, m.</param>
    /// <param name="weights">Real excitations.</param>
    /// <param name="wavenumber">k, rad/m.</param>
    /// <param name="element">Element field pattern E(θ).</param>
    /// <param name="direction">θ0, rad (default 0).</param>
    public static double HalfSpace(IReadOnlyList<double> positions, IReadOnlyList<double> weights, double wavenumber,
        Func<double, double> element, double direction = 0)
        => HalfSpace(positions, ArrayFactor.ToComplex(weights), wavenumber, element, direction);

    /// <summary>
    /// Elements with pattern E(θ) radiating into the full sphere, rotationally symmetric about the array axis
    /// (φ-range 2π): D(θ0) = 2 |E·AF|²(θ0) / ∫_{−1}^{1} |E·AF|² du. Same quadrature as <see cref="HalfSpace(IReadOnlyList{double}, IReadOnlyList{Complex}, double, Func{double, double}, double)"/>.
    /// </summary>
    /// <param name="positions">Element positions, m.</param>
    /// <param name="excitations">Complex excitations.</param>
    /// <param name="wavenumber">k, rad/m.</param>
    /// <param name="element">Element field pattern E(θ).</param>
    /// <param name="direction">θ0, rad (default 0).</param>
    public static double FullSphere(IReadOnlyList<double> positions, IReadOnlyList<Complex> excitations, double wavenumber,
        Func<double, double> element, double direction = 0)
        => Integrated(positions, excitations, wavenumber, element, direction, 2 * Math.PI);

    /// <summary>Directivity in dBi, 10 log10 D.</summary>
    /// <param name="directivity">D, dimensionless, &gt; 0.</param>
    public static double ToDbi(double directivity) => 10 * Math.Log10(directivity);

    private static double Integrated(IReadOnlyList<double> positions, IReadOnlyList<Complex> excitations, double wavenumber,
        Func<double, double> element, double direction, double phiRange)
    {
        ArgumentNullException.ThrowIfNull(element);
        Complex af0 = ArrayFactor.AtSines(positions, excitations, wavenumber, [Math.Sin(direction)])[0];
        double u0 = element(direction) * af0.Magnitude;
        double span = positions.Max() - positions.Min();
        int panels = Math.Max(8, (int)Math.Ceiling(wavenumber * span / Math.PI) + 8);
        var rule = new GaussLegendreRule(-1, 1, 16);
        var u = new double[panels * rule.Order];
        var w = new double[u.Length];
        double h = 2.0 / panels;
        for (int p = 0; p < panels; p++)
            for (int q = 0; q < rule.Order; q++)
            {
                u[p * rule.Order + q] = -1 + h * (p + 0.5 * (rule.Abscissas[q] + 1));
                w[p * rule.Order + q] = 0.5 * h * rule.Weights[q];
            }
        var af = ArrayFactor.AtSines(positions, excitations, wavenumber, u);
        double integral = 0;
        for (int i = 0; i < u.Length; i++)
        {
            double e = element(Math.Asin(u[i])), a = af[i].Magnitude;
            integral += w[i] * e * e * a * a;
        }
        return 4 * Math.PI * u0 * u0 / (phiRange * integral);
    }

    private static double Sinc(double x) => Math.Abs(x) < 1e-8 ? 1 - x * x / 6 : Math.Sin(x) / x;
}
