using System.Numerics;
using SlotArray.Core.Coupling;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Network;

/// <summary>
/// The mutual impedances of one slot geometry across a measured band, from <see cref="Nodes"/> fills of the model at
/// Chebyshev points of the band, so that a fit over dozens of frequencies fills the matrix a handful of times. Each
/// entry is written Z_mn(f) = e^{−jkρ_mn} S_mn(f) with ρ_mn the distance between the slot centres, and S_mn, which varies
/// only as much as the path differences within the two slots (k(h_m + h_n) ≲ π) times the band's relative width, is
/// interpolated by the barycentric formula (J.-P. Berrut and L. N. Trefethen, "Barycentric Lagrange interpolation", SIAM
/// Review 46(3), 2004, eq. 5.4, from memory; the error of a degree-6 interpolant of a function whose phase moves by
/// ≲ 0.2 rad over the band is of order 0.2⁷/7! ≈ 10⁻⁹ relative; the tests measure it against direct fills).
/// </summary>
internal sealed class CouplingAcrossBand
{
    /// <summary>Number of fills (Chebyshev nodes): 7.</summary>
    public const int Nodes = 7;

    /// <summary>Widest band (high/low − 1) interpolated: 8 %; a wider one is filled at every frequency.</summary>
    public const double MaximumRelativeWidth = 0.08;

    private readonly double centre, half;
    private readonly double[] nodes, weights;
    private readonly Complex[][] scaled;     // per node: S_mn row-major
    private readonly double[] distance;      // ρ_mn row-major
    private readonly int count;

    /// <summary>Fills the model at the nodes of [low, high].</summary>
    /// <param name="slots">The slots.</param>
    /// <param name="width">Slot width.</param>
    /// <param name="low">Lowest frequency of the band.</param>
    /// <param name="high">Highest frequency of the band (&gt; low).</param>
    /// <param name="model">The mutual-impedance model.</param>
    public CouplingAcrossBand(IReadOnlyList<LongitudinalSlotPlacement> slots, Length width, Frequency low, Frequency high, MutualImpedanceModel model)
    {
        ArgumentNullException.ThrowIfNull(slots);
        ArgumentNullException.ThrowIfNull(model);
        if (!(high > low)) throw new ArgumentOutOfRangeException(nameof(high), high.ToString(), "the band's upper edge must exceed its lower edge");
        count = slots.Count;
        centre = 0.5 * (low.Hertz + high.Hertz);
        half = 0.5 * (high.Hertz - low.Hertz);
        (nodes, weights) = ChebyshevBarycentric.Nodes(half, Nodes);
        distance = new double[count * count];
        for (int m = 0; m < count; m++)
            for (int n = 0; n < count; n++)
            {
                double dx = slots[m].Offset.Meters - slots[n].Offset.Meters, dz = slots[m].Position.Meters - slots[n].Position.Meters;
                distance[m * count + n] = Math.Sqrt(dx * dx + dz * dz);
            }
        scaled = new Complex[Nodes][];
        for (int k = 0; k < Nodes; k++)
        {
            var f = Frequency.FromHertz(centre + nodes[k]);
            var z = model(slots, width, f);
            double wave = f.FreeSpaceWavenumber;
            var s = new Complex[count * count];
            for (int m = 0; m < count; m++)
                for (int n = 0; n < count; n++)
                    s[m * count + n] = z[m, n] * Complex.FromPolarCoordinates(1, wave * distance[m * count + n]);
            scaled[k] = s;
        }
    }

    /// <summary>Whether the band is narrow enough to interpolate (see <see cref="MaximumRelativeWidth"/>).</summary>
    public static bool Interpolates(Frequency low, Frequency high) => high > low && high.Hertz / low.Hertz - 1 <= MaximumRelativeWidth;

    /// <summary>Whether f lies in the band.</summary>
    public bool Covers(Frequency f) => Math.Abs(f.Hertz - centre) <= half * (1 + 1e-12);

    /// <summary>The interpolated mutual impedances at f (exactly the model's fill at a node).</summary>
    public CouplingMatrix At(Frequency f)
    {
        Span<double> c = stackalloc double[Nodes];
        ChebyshevBarycentric.Coefficients(nodes, weights, f.Hertz - centre, c);
        double wave = f.FreeSpaceWavenumber;
        var values = new Complex[count * count];
        for (int i = 0; i < values.Length; i++)
        {
            double re = 0, im = 0;
            for (int k = 0; k < Nodes; k++) { re += c[k] * scaled[k][i].Real; im += c[k] * scaled[k][i].Imaginary; }
            values[i] = new Complex(re, im) * Complex.FromPolarCoordinates(1, -wave * distance[i]);
        }
        return CouplingMatrix.Adopt(count, values);
    }
}
