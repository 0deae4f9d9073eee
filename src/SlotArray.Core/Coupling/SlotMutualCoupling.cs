using System.Numerics;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Coupling;

/// <summary>
/// Where one longitudinal broad-wall slot sits: centre position z along the guide (from the datum), signed offset x
/// of its centre line from the broad-wall centre line, and its HALF length l (Elliott's notation; full length 2l).
/// </summary>
/// <param name="Position">Centre position z along the guide axis.</param>
/// <param name="Offset">Signed offset x from the broad-wall centre line (positive toward the +x side wall).</param>
/// <param name="HalfLength">Half length l of the slot; the full length is 2l.</param>
internal readonly record struct LongitudinalSlotPlacement(Length Position, Length Offset, Length HalfLength);

/// <summary>
/// External (half-space) mutual coupling between longitudinal slots through their Babinet-dual equivalent dipoles:
/// the dipole impedances of <see cref="DipoleMutualImpedance"/> and the Babinet–Booker maps to slot admittances.
/// </summary>
/// <remarks>
/// <para>Babinet mapping ([D], after H. G. Booker, J. IEE 93 Pt IIIA, 1946 [M]): a slot of length 2l and width w, carrying its
/// magnetic current along its length, maps to a dipole of the same length and position on the slot axis, a strip
/// of width w, i.e. a round wire of equivalent radius w/4 (C. M. Butler, "A formulation of the finite-length
/// narrow slot or strip equation", IEEE Trans. AP-30, 1254–1257, 1982). H. G. Booker, "Slot aerials and their
/// relation to complementary wire aerials", J. IEE 93 Pt IIIA, 1946: Z_slot Z_dipole = η²/4 for a slot radiating
/// on both sides of the screen; a slot radiating into one half-space (a waveguide behind it) has
/// Y = 2 Z_d/η², and mutual terms map the same way, Y_mn = 2 Z_mn/η².</para>
/// <para>Two longitudinal slots in one broad wall are parallel: lateral distance d = |x_m − x_n| (2|x| for alternating
/// offsets), stagger s = z_n − z_m; slots on the same side at equal offsets are collinear.</para>
/// <para>Neglected: the internal coupling of the slots through the guide's higher-order (evanescent) modes, and the
/// finite wall and finite ground plane. Elliott's procedure neglects the internal part too (it is small at λg/2
/// spacing, where the evanescent modes have decayed over the distance; it matters for slots closer than about
/// a/2 along the guide, for closely spaced slots of adjacent branch guides sharing a wall, and for the
/// non-shunt behaviour of large offsets); the dominant-mode (TE10) interaction is carried by the guide network.</para>
/// </remarks>
internal static class SlotMutualCoupling
{
    /// <summary>One-sided slot admittance from the dual dipole impedance: Y = 2 Z_d/η0² (S) (Booker 1946).</summary>
    public static Complex OneSidedSlotAdmittance(Complex dipoleImpedance)
        => 2 * dipoleImpedance / (PhysicalConstants.Eta0 * PhysicalConstants.Eta0);

    /// <summary>Two-sided slot impedance from the dual dipole impedance: Z_slot = η0²/(4 Z_d) (Ω) (Booker 1946).</summary>
    public static Complex TwoSidedSlotImpedance(Complex dipoleImpedance)
        => PhysicalConstants.Eta0 * PhysicalConstants.Eta0 / (4 * dipoleImpedance);

    /// <summary>
    /// The N × N impedance matrix (Ω) of the equivalent dipoles of N longitudinal slots of width w at frequency f:
    /// off-diagonal entries Z_mn (<see cref="DipoleMutualImpedance.Mutual"/>, actual half-lengths, loop currents),
    /// diagonal entries the self impedance of a dipole of half-length l_n and radius w/4.
    /// Symmetric (Z_mn = Z_nm, each pair computed once); filled in parallel on up to
    /// <paramref name="maxDegreeOfParallelism"/> threads, with identical results for any thread count.
    /// Cost ∝ N(N − 1)/2 closed-form pair evaluations.
    /// </summary>
    /// <param name="slots">The slots; no two may overlap in the wall (offsets closer than w and centres closer than l_m + l_n).</param>
    /// <param name="width">Slot width w (the same for all slots); sets the equivalent radius w/4 of the diagonal.</param>
    /// <param name="frequency">Frequency; the exterior is free space.</param>
    /// <param name="maxDegreeOfParallelism">Threads to use, ≥ 1. Default 2.</param>
    public static CouplingMatrix EquivalentDipoleImpedances(IReadOnlyList<LongitudinalSlotPlacement> slots, Length width,
        Frequency frequency, int maxDegreeOfParallelism = 2)
    {
        ArgumentNullException.ThrowIfNull(slots);
        if (!(width.Meters > 0)) throw new ArgumentOutOfRangeException(nameof(width), width.ToString(), "the slot width must be positive");
        if (maxDegreeOfParallelism < 1) throw new ArgumentOutOfRangeException(nameof(maxDegreeOfParallelism), maxDegreeOfParallelism, "must be at least 1");
        int n = slots.Count;
        double k = frequency.FreeSpaceWavenumber;
        var z = new double[n];
        var x = new double[n];
        var h = new double[n];
        for (int i = 0; i < n; i++)
        {
            var p = slots[i];
            if (!(p.HalfLength.Meters > 0))
                throw new ArgumentOutOfRangeException(nameof(slots), $"slot {i + 1}: the half length must be positive, got {p.HalfLength}");
            z[i] = k * p.Position.Meters;
            x[i] = k * p.Offset.Meters;
            h[i] = k * p.HalfLength.Meters;
        }
        CheckNoOverlap(slots, x, z, h, k * width.Meters);

        double kr = k * StripEquivalentRadius.Of(width).Meters;
        var values = new Complex[n * n];
        // Fold row i with row n−1−i so that every work item holds n − 1 pairs (balanced across threads).
        int items = (n + 1) / 2;
        Parallel.For(0, items, new ParallelOptions { MaxDegreeOfParallelism = maxDegreeOfParallelism }, item =>
        {
            FillRow(item, n, x, z, h, kr, values);
            int other = n - 1 - item;
            if (other != item) FillRow(other, n, x, z, h, kr, values);
        });
        return CouplingMatrix.Adopt(n, values);
    }

    /// <summary>The one-sided mutual-admittance matrix Y_mn = 2 Z_mn/η0² (S) of the slots (Booker 1946).</summary>
    public static CouplingMatrix OneSidedAdmittances(IReadOnlyList<LongitudinalSlotPlacement> slots, Length width,
        Frequency frequency, int maxDegreeOfParallelism = 2)
        => EquivalentDipoleImpedances(slots, width, frequency, maxDegreeOfParallelism)
            .Scale(2 / (PhysicalConstants.Eta0 * PhysicalConstants.Eta0));

    /// <summary>Row i: the diagonal and the pairs (i, j &gt; i), written to both (i, j) and (j, i).</summary>
    private static void FillRow(int i, int n, double[] x, double[] z, double[] h, double kr, Complex[] values)
    {
        values[i * n + i] = DipoleMutualImpedance.MutualElectrical(kr, 0, h[i], h[i]);
        for (int j = i + 1; j < n; j++)
        {
            var zij = DipoleMutualImpedance.MutualElectrical(Math.Abs(x[i] - x[j]), z[j] - z[i], h[i], h[j]);
            values[i * n + j] = zij;
            values[j * n + i] = zij;
        }
    }

    /// <summary>Slots whose rectangles (length 2l, width w) intersect in the wall are rejected, naming both.</summary>
    private static void CheckNoOverlap(IReadOnlyList<LongitudinalSlotPlacement> slots, double[] x, double[] z, double[] h, double kw)
    {
        // Sorting by position and stopping at the longest possible reach keeps this near O(N log N).
        var order = Enumerable.Range(0, slots.Count).OrderBy(i => z[i]).ToArray();
        double hMax = h.Length == 0 ? 0 : h.Max();
        for (int a = 0; a + 1 < order.Length; a++)
        {
            int i = order[a];
            for (int b = a + 1; b < order.Length && z[order[b]] - z[i] < h[i] + hMax; b++)
            {
                int j = order[b];
                if (Math.Abs(x[i] - x[j]) < kw * (1 - 1e-12) && z[j] - z[i] < h[i] + h[j] - 1e-12 * (h[i] + h[j]))
                    throw new ArgumentException(
                        $"slots {i + 1} and {j + 1} overlap in the wall: offsets {slots[i].Offset} and {slots[j].Offset} are closer " +
                        $"than the slot width, and centres {slots[i].Position} and {slots[j].Position} are closer than the sum of " +
                        "their half lengths; move them apart along the guide or change an offset",
                        nameof(slots));
            }
        }
    }
}
