using System.Numerics;
using MathNet.Numerics.LinearAlgebra;
using SlotArray.Core.Coupling;
using SlotArray.Core.Network;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;

namespace SlotArray.Core.Planar;

/// <summary>The planar network solved at one frequency.</summary>
/// <param name="Frequency">Frequency.</param>
/// <param name="S11">Reflection coefficient at the feed guide's input, normalised to its Z_TE.</param>
/// <param name="Excitations">Aperture slot voltage of every slot, w_n/√Γ0 (layout order, one global polarity).</param>
/// <param name="ModeVoltages">Branch-guide mode voltage at every slot (normalised to √Z_TE; incident wave of unit power).</param>
/// <param name="SlotPowers">Power into each slot's radiation, Re(V_n i_n*) per unit incident power (a slot may take power from its neighbours: negative).</param>
/// <param name="InputPower">Power accepted at the input, 1 − |S11|², per unit incident power.</param>
/// <param name="BranchPowers">Power into each branch through its coupling slot (branch order), per unit incident power.</param>
internal sealed record PlanarSolution(Frequency Frequency, Complex S11, IReadOnlyList<Complex> Excitations, IReadOnlyList<Complex> ModeVoltages,
    IReadOnlyList<double> SlotPowers, double InputPower, IReadOnlyList<double> BranchPowers);

/// <summary>
/// The whole planar array as one network at one frequency: the feed guide (a line with series elements: its input and
/// the coupling slots), each coupling slot an ideal transformer to its branch's centre series port, each branch a
/// line shorted at both ends with shunt slots, and the slots coupled to each other through the exterior (every pair of
/// the aperture). One dense linear system of N + 2P unknowns (N slots, P series elements in the feed guide).
/// </summary>
/// <remarks>
/// <para>Slots: the Galerkin form of <see cref="CoupledArrayNetwork"/> (Elliott and Kurtz 1978; Elliott 1983 [M]):
/// (f_n²/y_n) w_n + Σ_{m≠n} M_nm w_m = f_n V_n, shunt current i_n = f_n w_n, M_nm = Z_nm/(Γ0 R_d) over the whole aperture.</para>
/// <para>Branch lines [D]: each half of a branch is a line from its short (z = 0) to the junction (z = L), with
/// open-circuit impedances Z(z1, z2) = sinh(γ z&lt;) cosh(γ(L − z&gt;)) / cosh(γL) (normalised; transmission-line theory,
/// e.g. D. M. Pozar, <i>Microwave Engineering</i>, 4th ed., Wiley 2012, Sec. 2.3, from memory); the series port's current
/// I_p enters the left half's junction end and leaves the right half's, V_p = V_left(L) − V_right(L). So
/// V = −Z F w + Z_np I_p and V_p = Z_pp I_p − Z_pn F w. The half lengths are whole multiples of λg/2 at f0, far from
/// the zeros of cosh(γL) (a quarter guide wavelength away), so the entries stay finite over any usual band.</para>
/// <para>Coupling slot k: v_k = s_k V_p/n_k and I_p = s_k I_f/n_k (an ideal transformer, power conserved), with
/// n_k² = r_b(90° − θ)/r_f(θ) at each frequency (<see cref="CouplingSlot"/>) and s_k the sign of its rotation.</para>
/// <para>Feed guide: transfer relations V(z + d) = V cosh γd − I sinh γd, I(z + d) = I cosh γd − V sinh γd between the
/// series elements (voltage drop v across each), shorts at both ends; the input is a series element of source
/// impedance 1 and EMF 2 (a unit incident wave), behind a short for the end feed (then it is a matched source at the
/// guide's end) or at the centre between the middle branches (an ideal series tee). S11 = 1 − I_in.</para>
/// </remarks>
internal static class PlanarNetwork
{
    /// <summary>Solves the network at f with the coupling-slot signs of the design.</summary>
    /// <param name="design">The planar design.</param>
    /// <param name="slot">The branch guide's slot model (y at any frequency).</param>
    /// <param name="f">Frequency.</param>
    /// <param name="coupled">Include the exterior mutual coupling of all slots.</param>
    public static PlanarSolution Solve(PlanarDesign design, ISlotAdmittance slot, Frequency f, bool coupled)
        => Solve(design, slot, f, coupled, design.Branches.Select(b => (double)Math.Sign(b.Coupling.Tilt.Radians)).ToArray());

    /// <summary>Solves with given coupling-slot signs s_k (±1, branch order).</summary>
    public static PlanarSolution Solve(PlanarDesign design, ISlotAdmittance slot, Frequency f, bool coupled, IReadOnlyList<double> signs)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(slot);
        ArgumentNullException.ThrowIfNull(signs);
        var guide = design.BranchGuide;
        int n = design.Layout.Count;
        var gamma = guide.PropagationConstant(f);
        double gamma0 = ElliottDesignEquations.Gamma0(guide, f);
        var placements = PlanarDesigner.Placements(design);
        var fn = new double[n];
        var dself = new Complex[n];
        for (int b = 0; b < design.Branches.Count; b++)
        {
            var br = design.Branches[b];
            for (int k = 0; k < br.SlotIndices.Count; k++)
            {
                var s = br.Stick.Slots[k];
                int i = br.SlotIndices[k];
                fn[i] = ElliottDesignEquations.CouplingFunction(guide, f, Length.FromMeters(s.Coupling), 0.5 * s.Length);
                dself[i] = fn[i] * fn[i] / slot.Admittance(s.Coupling, s.Length, f);
            }
        }
        var feed = FeedLine.Of(design);
        int p = feed.Count, size = n + 2 * p;
        var a = Matrix<Complex>.Build.Dense(size, size);
        var rhs = MathNet.Numerics.LinearAlgebra.Vector<Complex>.Build.Dense(size);
        if (coupled)
        {
            var z = CoupledSlotImpedances.HalfCosineCentreReferredAdaptive(placements, design.Branches[0].Stick.Slots[0].Width, f);
            double scale = 1 / (gamma0 * PhysicalConstants.HalfWaveDipoleResistance);
            for (int i = 0; i < n; i++)
                for (int j = 0; j < n; j++)
                    if (i != j) a[i, j] = scale * z[i, j];
        }
        for (int i = 0; i < n; i++) a[i, i] += dself[i];
        var lines = design.Branches.Select(br => BranchLine.Of(br, gamma)).ToArray();
        var ratio = design.Branches.Select(br => Math.Sqrt(1 / CouplingSlot.ImpedanceRatio(design.FeedGuide, guide, br.Coupling.Tilt, f))).ToArray();
        for (int b = 0; b < lines.Length; b++)
        {
            var br = design.Branches[b];
            var line = lines[b];
            int col = feed.CurrentColumn(n, feed.ElementOfBranch(b));
            for (int k = 0; k < br.SlotIndices.Count; k++)
            {
                int i = br.SlotIndices[k];
                for (int m = 0; m < br.SlotIndices.Count; m++)
                    a[i, br.SlotIndices[m]] += fn[i] * line.Z[k, m] * fn[br.SlotIndices[m]];
                a[i, col] -= fn[i] * line.Zport[k] * signs[b] / ratio[b];
            }
        }
        feed.AddRows(a, rhs, n, design.FeedGuide.PropagationConstant(f), (b, row, coef) =>
        {
            // drop of coupling element of branch b: (Z_pp/n²) I_f − (s/n) Σ Z_pn f w
            var br = design.Branches[b];
            var line = lines[b];
            a[row, feed.CurrentColumn(n, feed.ElementOfBranch(b))] += coef * line.Zpp / (ratio[b] * ratio[b]);
            for (int k = 0; k < br.SlotIndices.Count; k++)
                a[row, br.SlotIndices[k]] -= coef * signs[b] / ratio[b] * line.Zport[k] * fn[br.SlotIndices[k]];
        });
        var x = a.LU().Solve(rhs);
        return Collect(design, x, fn, gamma0, lines, ratio, signs, feed, f);
    }

    private static PlanarSolution Collect(PlanarDesign design, MathNet.Numerics.LinearAlgebra.Vector<Complex> x, double[] fn, double gamma0,
        BranchLine[] lines, double[] ratio, IReadOnlyList<double> signs, FeedLine feed, Frequency f)
    {
        int n = fn.Length;
        var v = new Complex[n];
        var e = new Complex[n];
        var pw = new double[n];
        var branchPower = new double[lines.Length];
        double root = Math.Sqrt(gamma0);
        for (int b = 0; b < lines.Length; b++)
        {
            var br = design.Branches[b];
            var ip = signs[b] * x[feed.CurrentColumn(n, feed.ElementOfBranch(b))] / ratio[b];
            var vp = lines[b].Zpp * ip;
            for (int k = 0; k < br.SlotIndices.Count; k++)
            {
                int i = br.SlotIndices[k];
                var vi = lines[b].Zport[k] * ip;
                for (int m = 0; m < br.SlotIndices.Count; m++) vi -= lines[b].Z[k, m] * fn[br.SlotIndices[m]] * x[br.SlotIndices[m]];
                vp -= lines[b].Zport[k] * fn[i] * x[i];
                v[i] = vi;
                var current = fn[i] * x[i];
                pw[i] = (vi * Complex.Conjugate(current)).Real;
                e[i] = x[i] / root;
            }
            branchPower[b] = (vp * Complex.Conjugate(ip)).Real;
        }
        var iin = x[feed.CurrentColumn(n, feed.InputElement)];
        var s11 = 1 - iin;
        return new PlanarSolution(f, s11, Array.AsReadOnly(e), Array.AsReadOnly(v), Array.AsReadOnly(pw), 1 - s11.Magnitude * s11.Magnitude,
            Array.AsReadOnly(branchPower));
    }
}
