using System.Numerics;
using SlotArray.Core.Coupling;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Network;

/// <summary>
/// A model of the external mutual impedances Z_mn (Ω) between the equivalent dipoles of N longitudinal slots, referred
/// to the slot voltages at the slot centres; the diagonal is not used by Elliott's equations.
/// </summary>
/// <param name="slots">Where the slots are (centre, signed offset, half length).</param>
/// <param name="width">Slot width.</param>
/// <param name="f">Frequency.</param>
internal delegate CouplingMatrix MutualImpedanceModel(IReadOnlyList<LongitudinalSlotPlacement> slots, Length width, Frequency f);

/// <summary>
/// The mutual-impedance models the coupled design and analysis use. The default pairs the coupling function of
/// Elliott's equations with the same aperture distribution and the same reference point.
/// </summary>
/// <remarks>
/// <para>Reference of the currents (Elliott 1983; Carter 1932). Elliott's coupling function f(x, l)
/// (<see cref="ElliottDesignEquations.CouplingFunction"/>) is derived for the aperture distribution cos(πz/(2l)) and
/// multiplies the slot voltage V^s at the slot centre. The mutual impedance that belongs with it is therefore the
/// reaction of two half-cosine currents referred to their centre values:
/// <see cref="CosineCurrentMutualImpedance"/> (Carter's induced EMF in mixed-potential form). The closed-form
/// sinusoidal-current value (<see cref="DipoleMutualImpedance"/>) is referred to the loop currents; referred to the
/// centre it would be Z/(sin kl_m sin kl_n), about 2 % larger for resonant slots (2l ≈ 0.46 λ), and its shape differs
/// from the half-cosine away from kl = π/2. Using the half-cosine, centre-referred value keeps (E2) consistent: the
/// self term f²/y equals Z_self/(Γ0 R_d) for a resonant Stevenson slot at kl = π/2, where both shapes coincide.</para>
/// <para>Neglected: internal coupling through the guide's higher-order modes and the finite ground plane (see
/// <see cref="SlotMutualCoupling"/>).</para>
/// </remarks>
internal static class CoupledSlotImpedances
{
    /// <summary>
    /// Half-cosine currents, centre-referred (<see cref="CosineCurrentMutualImpedance"/>), each pair once (symmetric),
    /// filled on two threads with results independent of the thread count; zero diagonal. Cost ∝ N(N − 1)/2, about
    /// 35 µs a pair.
    /// </summary>
    public static MutualImpedanceModel HalfCosineCentreReferred { get; } = (slots, width, f) => Fill(slots, f, CosineCurrentMutualImpedance.MutualElectrical);

    /// <summary>
    /// <see cref="HalfCosineCentreReferred"/> with the lower-order rule for pairs a quarter wavelength or more apart
    /// (<see cref="CosineCurrentMutualImpedance.AdaptiveElectrical"/>; the same values to about 1e-9): for large planar
    /// apertures, where almost every pair is distant.
    /// </summary>
    public static MutualImpedanceModel HalfCosineCentreReferredAdaptive { get; } = (slots, width, f) => Fill(slots, f, CosineCurrentMutualImpedance.AdaptiveElectrical);

    /// <summary>
    /// <see cref="HalfCosineCentreReferred"/> with every mutual impedance multiplied by <paramref name="scale"/> (the same
    /// model when it is 1): a calibration of the infinite-ground-plane exterior for the real outside of the guide. The
    /// model's exterior is an infinite flat plane; slots in the 25 mm face of a WR-90 tube radiate into a narrow face
    /// whose edges and side walls the model leaves out (see <see cref="SlotMutualCoupling"/>), and a full-wave run of the
    /// uncoupled array of the same slots measures what that changes (measured here: about 0.9∠−25° for 6 slots at λg/2 in
    /// WR-90, README "Full-wave characterisation").
    /// </summary>
    public static MutualImpedanceModel Scaled(Complex scale) => scale == Complex.One
        ? HalfCosineCentreReferred
        : (slots, width, f) => Fill(slots, f, CosineCurrentMutualImpedance.MutualElectrical).Times(scale);

    /// <summary>No coupling: a zero matrix (the isolated-slot limit; used to check that the coupled procedures reduce to the uncoupled ones).</summary>
    public static MutualImpedanceModel None { get; } = (slots, _, _) => CouplingMatrix.Zero(slots.Count);

    private static CouplingMatrix Fill(IReadOnlyList<LongitudinalSlotPlacement> slots, Frequency f, Func<double, double, double, double, double, Complex> pair)
    {
        ArgumentNullException.ThrowIfNull(slots);
        int n = slots.Count;
        double k = f.FreeSpaceWavenumber;
        var values = new Complex[n * n];
        int items = (n + 1) / 2;
        Parallel.For(0, items, new ParallelOptions { MaxDegreeOfParallelism = 2 }, item =>
        {
            Row(item);
            int other = n - 1 - item;
            if (other != item) Row(other);
        });
        return CouplingMatrix.Adopt(n, values);

        void Row(int i)
        {
            var p = slots[i];
            for (int j = i + 1; j < n; j++)
            {
                var q = slots[j];
                var z = pair(k * Math.Abs(p.Offset.Meters - q.Offset.Meters),
                    k * (q.Position.Meters - p.Position.Meters), k * p.HalfLength.Meters, k * q.HalfLength.Meters, PhysicalConstants.Eta0);
                values[i * n + j] = z;
                values[j * n + i] = z;
            }
        }
    }
}
