using System.Numerics;

namespace SlotArray.Core.Planar;

/// <summary>
/// How close the grating lobes of one principal plane come to visible space, skirt included: a grating lobe is a copy of
/// the main beam shifted by ±λ/d in u = sin θ, so its own first null sits as far from its peak as the main beam's does.
/// </summary>
/// <remarks>
/// The principal cut of a planar grid is the 1-D array factor of the column (or branch) sums,
/// F(ψ) = Σ w_n e^{j n ψ}, ψ = k d u, periodic in ψ with period 2π: the main beam at ψ₀ = k d u₀ repeats at ψ₀ ± 2π
/// (grating lobes), and for equal weights the nulls sit at ψ₀ ± 2π m/N (R. A. Balanis, <i>Antenna Theory</i>, 4th ed.,
/// Wiley 2016, Sec. 6.3, Eq. (6-10) and the null and maximum conditions under it, from memory). With the main beam's
/// first nulls at ψ₀ − Δ₋ and ψ₀ + Δ₊ (measured here from F, so any taper is covered; Δ = 2π/N when uniform), the lobe
/// at ψ₀ + 2π keeps its skirt out of visible space while u₀ + (2π − Δ₋)/(k d) ≥ 1, and the one at ψ₀ − 2π while
/// u₀ − (2π − Δ₊)/(k d) ≤ −1. Both hold for d ≤ min((2π − Δ₋)/(k(1 − u₀)), (2π − Δ₊)/(k(1 + u₀))), which for equal
/// weights at broadside is the familiar d ≤ λ(1 − 1/N) (R. J. Mailloux, <i>Phased Array Antenna Handbook</i>, 2nd ed.,
/// Artech 2005, Sec. 1.1, from memory).
/// </remarks>
/// <param name="Spacing">Element spacing d of the plane, m.</param>
/// <param name="Beam">Main-beam direction u₀ = sin θ₀ in the plane.</param>
/// <param name="InnerNullU">The grating lobes' first nulls nearest visible space, in u: the smaller |u| of the two.</param>
/// <param name="LargestSpacing">The largest spacing that keeps both grating lobes' first nulls out of visible space, m.</param>
internal sealed record GratingLobeSkirt(double Spacing, double Beam, double InnerNullU, double LargestSpacing)
{
    /// <summary>Whether a grating lobe's main lobe (out to its first null) reaches into visible space |u| &lt; 1.</summary>
    public bool ReachesVisibleSpace => Math.Abs(InnerNullU) < 1;

    /// <summary>
    /// The skirt figures of a uniform grid of <paramref name="weights"/> (index n at n d) with the beam at u₀.
    /// </summary>
    /// <param name="weights">Complex weight of each grid position in order (the column or branch sums); zeros allowed.</param>
    /// <param name="spacing">Grid spacing d, m.</param>
    /// <param name="wavelength">Free-space wavelength, m.</param>
    /// <param name="beam">Main-beam direction u₀ = sin θ₀ in the plane (0 at broadside).</param>
    public static GratingLobeSkirt Of(IReadOnlyList<Complex> weights, double spacing, double wavelength, double beam = 0)
    {
        ArgumentNullException.ThrowIfNull(weights);
        double k = 2 * Math.PI / wavelength, psi0 = k * spacing * beam;
        // The main beam's first null on each side of ψ₀: walk |F| outward on a fine grid until it turns up again.
        int steps = 64 * Math.Max(weights.Count, 2);
        double h = 2 * Math.PI / steps;
        double NullOffset(int sign)
        {
            double prev = Magnitude(weights, psi0);
            for (int i = 1; i < steps; i++)
            {
                double m = Magnitude(weights, psi0 + sign * i * h);
                if (m > prev) return (i - 1) * h;
                prev = m;
            }
            return Math.PI;
        }
        double dMinus = NullOffset(-1), dPlus = NullOffset(+1);
        double upper = beam + (2 * Math.PI - dMinus) / (k * spacing), lower = beam - (2 * Math.PI - dPlus) / (k * spacing);
        double inner = Math.Abs(upper) <= Math.Abs(lower) ? upper : lower;
        double largest = Math.Min((2 * Math.PI - dMinus) / (k * (1 - beam)), (2 * Math.PI - dPlus) / (k * (1 + beam)));
        return new GratingLobeSkirt(spacing, beam, inner, largest);
    }

    /// <summary>
    /// The two principal planes of a planar layout: x-z (columns, spacing along the branches) and y-z (branches, the pitch),
    /// each from the sums of <paramref name="excitations"/> (layout order) over the other index.
    /// </summary>
    public static (GratingLobeSkirt AlongBranches, GratingLobeSkirt AcrossBranches) Of(PlanarLayout layout, IReadOnlyList<Complex> excitations,
        double wavelength, double beamU = 0, double beamV = 0)
    {
        ArgumentNullException.ThrowIfNull(layout);
        ArgumentNullException.ThrowIfNull(excitations);
        var columns = new Complex[layout.Columns];
        var branches = new Complex[layout.Branches];
        for (int i = 0; i < layout.Slots.Count; i++)
        {
            columns[layout.Slots[i].Column] += excitations[i];
            branches[layout.Slots[i].Branch - 1] += excitations[i];
        }
        return (Of(columns, layout.Spacing.Meters, wavelength, beamU), Of(branches, layout.Pitch.Meters, wavelength, beamV));
    }

    private static double Magnitude(IReadOnlyList<Complex> w, double psi)
    {
        Complex s = Complex.Zero;
        for (int n = 0; n < w.Count; n++) s += w[n] * Complex.FromPolarCoordinates(1, n * psi);
        return s.Magnitude;
    }
}
