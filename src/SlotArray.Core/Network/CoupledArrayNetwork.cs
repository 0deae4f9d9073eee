using System.Numerics;
using MathNet.Numerics.LinearAlgebra;
using SlotArray.Core.Coupling;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;

namespace SlotArray.Core.Network;

/// <summary>
/// Network analysis of a designed array of longitudinal slots with the external mutual coupling included: the guide
/// as the transmission line of <see cref="ArrayNetwork"/>, the slots as shunt branches whose currents are coupled
/// through the mutual admittances of their equivalent dipoles. One linear system per frequency.
/// </summary>
/// <remarks>
/// <para>Formulation (structure of R. S. Elliott and L. A. Kurtz, IEEE Trans. AP-26, 214–219, 1978, and R. S. Elliott,
/// IEEE Trans. AP-31, 48–53, 1983; structure from memory [M], constants derived here [D]). Slot n has mode voltage V_n (the TE10 line
/// voltage at its centre) and a scaled slot voltage w_n (the aperture voltage at its centre, in units in which the
/// slot's shunt current is i_n = f_n w_n, f_n = f(x_n, l_n) Elliott's coupling function). The Galerkin condition of
/// slot n with self and external mutual terms reads
/// (f_n²/y_n) w_n + Σ_{m≠n} M_nm w_m = f_n V_n, M_nm = Z_mn/(Γ0 R_d),
/// with y_n the isolated slot's admittance from the slot model, Z_mn the equivalent-dipole mutual impedance
/// (<see cref="CoupledSlotImpedances"/>) and Γ0 = <see cref="ElliottDesignEquations.Gamma0"/>: for one slot it gives
/// i = y V, and with the mode voltages fixed it is (E2). Together with the line's nodal equations
/// of the line, whose shunt currents are i_n = f_n w_n, the unknowns solve one linear system per frequency; D = diag(f_n²/y_n).
/// Eliminating w gives the slots' N × N admittance matrix F (D + M)⁻¹ F (<see cref="SlotAdmittanceMatrix"/>),
/// diagonal diag(y_n) when M = 0.</para>
/// <para>Line equations (transfer form, so that lossless half-wave sections, which have no nodal admittance matrix,
/// stay regular): unknowns per slot the mode voltage V_k, the line current J_k arriving from the arm's termination side
/// and the slot voltage w_k; a section of length d maps (V, J + i) beyond one slot to (V, J) at the next by
/// T = [cosh γd, sinh γd; sinh γd, cosh γd] (the cascade of <see cref="ArrayNetwork"/>; D. M. Pozar, <i>Microwave
/// Engineering</i>, 4th ed., Wiley 2012, Secs. 2.1, 4.4, from memory); a termination adds V e − J c = 0 with
/// (c, e) = T(d)(0, 1) for a short and T(d)(1, y_L) for a load; the feed is a matched source of unit incident wave,
/// V_feed + I_feed = 2. Centre feed: the series junction of <c>StandingWaveDesigner</c> (Core/Design): equal currents out of
/// both halves and (V_left + V_right)/n + n I = 2 (ideal transformer n² to the feed); the far half is written in its
/// own polarity (the junction reverses E_y), so its slots enter with a minus sign.</para>
/// <para>The solution is reported as a <see cref="NetworkSolution"/>: each slot's admittance is its active admittance
/// y^a_n = i_n/V_n, and the line is re-solved with these (<see cref="ArrayNetwork"/>'s cascade, which then reproduces
/// the same V and S11) to get wall loss, powers and the peak field; the power into slot n, Re(i_n V_n*), may be
/// negative for a slot that takes power from its neighbours, and their sum is the radiated power. The excitations
/// are the slot voltages, e_n = w_n/√Γ0, which equal <see cref="ArrayNetwork"/>'s power-based excitations when the
/// slot has Stevenson's resonant conductance Γ0 f_r² (Stevenson 1948).</para>
/// </remarks>
internal static class CoupledArrayNetwork
{
    /// <summary>Solves the coupled array at one frequency.</summary>
    /// <param name="design">A designed array of offset (longitudinal) slots.</param>
    /// <param name="slot">The isolated-slot model.</param>
    /// <param name="f">Frequency.</param>
    /// <param name="coupling">The mutual-impedance model; default <see cref="CoupledSlotImpedances.HalfCosineCentreReferred"/>.</param>
    public static NetworkSolution Solve(ArrayDesign design, IShuntSlotModel slot, Frequency f, MutualImpedanceModel? coupling = null)
        => new CoupledSystem(design, slot, coupling).Solve(f);

    /// <summary>
    /// The coupled network at f with each slot's self admittance given (<paramref name="admittances"/>, y_n = Y_n/G0, for
    /// example a tolerance trial's perturbed slots) and the mutual impedances given (<paramref name="mutual"/>, e.g. the
    /// nominal design's from <see cref="MutualImpedances"/>); otherwise the same equations as
    /// <see cref="Solve(ArrayDesign, IShuntSlotModel, Frequency, MutualImpedanceModel?)"/>.
    /// </summary>
    public static NetworkSolution Solve(ArrayDesign design, IReadOnlyList<Complex> admittances, CouplingMatrix mutual, Frequency f)
    {
        ArgumentNullException.ThrowIfNull(admittances);
        ArgumentNullException.ThrowIfNull(mutual);
        if (admittances.Count != design.Count) throw new ArgumentException("one admittance per slot is needed", nameof(admittances));
        return new CoupledSystem(design, null, (_, _, _) => mutual, admittances).Solve(f);
    }

    /// <summary>The mutual impedances of the design's slots at f (the model of <see cref="Solve(ArrayDesign, IShuntSlotModel, Frequency, MutualImpedanceModel?)"/>).</summary>
    public static CouplingMatrix MutualImpedances(ArrayDesign design, Frequency f, MutualImpedanceModel? coupling = null)
        => new CoupledSystem(design, null, coupling, null).Mutual(f);

    /// <summary>Solves at <paramref name="points"/> equally spaced frequencies from low to high and at the design frequency.</summary>
    public static FrequencySweep Sweep(ArrayDesign design, IShuntSlotModel slot, Frequency low, Frequency high, int points,
        MutualImpedanceModel? coupling = null)
    {
        if (points < 2) throw new ArgumentOutOfRangeException(nameof(points), points, "a sweep needs at least 2 points");
        if (!(high > low)) throw new ArgumentOutOfRangeException(nameof(high), high.ToString(), $"the band's upper edge must exceed its lower edge {low}");
        var sys = new CoupledSystem(design, slot, coupling);
        var list = new NetworkSolution[points + 1];
        // The frequencies are independent systems (the slot model's memo is thread-safe): solved in parallel, each into
        // its own slot, so the order of evaluation cannot change them; the design frequency is the last item.
        ParallelFailures.Unwrapped(() => Parallel.For(0, points + 1, i => list[i] = sys.Solve(i == points
            ? design.DesignFrequency
            : Frequency.FromHertz(low.Hertz + (high.Hertz - low.Hertz) * i / (points - 1)))));
        return new FrequencySweep(design.DesignFrequency, list[points], Array.AsReadOnly(list[..points]));
    }

    /// <summary>
    /// The frequency of best match (smallest |S11|) in [low, high]: the smallest of <paramref name="points"/> equally
    /// spaced samples, refined by golden-section search between its neighbours to 1e-7 of the design frequency.
    /// </summary>
    public static NetworkSolution BestMatch(ArrayDesign design, IShuntSlotModel slot, Frequency low, Frequency high, int points,
        MutualImpedanceModel? coupling = null)
    {
        var sweep = Sweep(design, slot, low, high, points, coupling);
        var sys = new CoupledSystem(design, slot, coupling);
        int best = 0;
        for (int i = 1; i < points; i++) if (sweep.Points[i].S11.Magnitude < sweep.Points[best].S11.Magnitude) best = i;
        double step = (high.Hertz - low.Hertz) / (points - 1);
        double lo = Math.Max(low.Hertz, low.Hertz + (best - 1) * step), hi = Math.Min(high.Hertz, low.Hertz + (best + 1) * step);
        double g = (Math.Sqrt(5) - 1) / 2, tol = 1e-7 * design.DesignFrequency.Hertz;
        double c = hi - g * (hi - lo), d = lo + g * (hi - lo);
        double fc = Mag(c), fd = Mag(d);
        while (hi - lo > tol)
        {
            if (fc < fd) { hi = d; d = c; fd = fc; c = hi - g * (hi - lo); fc = Mag(c); }
            else { lo = c; c = d; fc = fd; d = lo + g * (hi - lo); fd = Mag(d); }
        }
        var refined = sys.Solve(Frequency.FromHertz(0.5 * (lo + hi)));
        return refined.S11.Magnitude <= sweep.Points[best].S11.Magnitude ? refined : sweep.Points[best];

        double Mag(double hz) => sys.Solve(Frequency.FromHertz(hz)).S11.Magnitude;
    }

    /// <summary>
    /// The slots' admittance matrix F (D + M)⁻¹ F (normalised to G0) relating the shunt currents to the mode voltages,
    /// both in one E_y polarity: diag(y_n) without coupling, symmetric for a reciprocal coupling model.
    /// </summary>
    public static Complex[,] SlotAdmittanceMatrix(ArrayDesign design, IShuntSlotModel slot, Frequency f, MutualImpedanceModel? coupling = null)
    {
        var sys = new CoupledSystem(design, slot, coupling);
        var (fn, dm, _) = sys.SlotBlocks(f);
        int n = fn.Length;
        var inv = dm.Inverse();
        var r = new Complex[n, n];
        for (int i = 0; i < n; i++)
            for (int j = 0; j < n; j++)
                r[i, j] = fn[i] * inv[i, j] * fn[j];
        return r;
    }

    /// <summary>The assembled system of one design.</summary>
    private sealed class CoupledSystem
    {
        private readonly ArrayDesign design;
        private readonly IShuntSlotModel? slot;
        private readonly MutualImpedanceModel coupling;
        private readonly LineNetwork line;
        private readonly double[] signs;
        private readonly LongitudinalSlotPlacement[] placements;
        private readonly int leftCount;

        private readonly IReadOnlyList<Complex>? admittances;

        /// <param name="design">The design.</param>
        /// <param name="slot">The slot model of the self admittances; may be null when <paramref name="admittances"/> gives them.</param>
        /// <param name="coupling">The mutual-impedance model (default: half-cosine, centre-referred).</param>
        /// <param name="admittances">Fixed self admittances y_n, or null to ask the slot model.</param>
        public CoupledSystem(ArrayDesign design, IShuntSlotModel? slot, MutualImpedanceModel? coupling, IReadOnlyList<Complex>? admittances = null)
        {
            ArgumentNullException.ThrowIfNull(design);
            this.admittances = admittances;
            if (design.CouplingKind != SlotCouplingKind.Offset)
                throw new ArgumentException("the coupled analysis is for longitudinal (offset) slots; edge slots have no equivalent-dipole model here", nameof(design));
            this.design = design;
            this.slot = slot;
            this.coupling = coupling ?? CoupledSlotImpedances.HalfCosineCentreReferred;
            bool centre = design.Feed == FeedPosition.Centre;
            line = new LineNetwork(design.Guide, design.Slots.Select(s => s.Position.Meters).ToArray(), design.NearTermination,
                centre ? design.FarTermination ?? throw new ArgumentException("a centre-fed design needs a far termination", nameof(design)) : null,
                design.FeedPlane.Meters, design.JunctionRatio);
            signs = design.Slots.Select(s => (double)Math.Sign(s.Coupling)).ToArray();
            placements = design.Slots.Select(s => new LongitudinalSlotPlacement(s.Position, Length.FromMeters(s.Coupling), 0.5 * s.Length)).ToArray();
            leftCount = centre ? design.Slots.Count(s => s.Position < design.FeedPlane) : design.Count;
        }

        /// <summary>f_n, D + M and Γ0 at frequency f.</summary>
        /// <summary>The mutual impedances of the slots at f.</summary>
        public CouplingMatrix Mutual(Frequency f) => coupling(placements, design.Slots[0].Width, f);

        public (double[] F, Matrix<Complex> DM, double Gamma0) SlotBlocks(Frequency f)
        {
            int n = design.Count;
            double gamma0 = ElliottDesignEquations.Gamma0(design.Guide, f);
            var z = Mutual(f);
            double scale = 1 / (gamma0 * PhysicalConstants.HalfWaveDipoleResistance);
            var fn = new double[n];
            var dm = Matrix<Complex>.Build.Dense(n, n);
            for (int i = 0; i < n; i++)
            {
                var s = design.Slots[i];
                fn[i] = ElliottDesignEquations.CouplingFunction(design.Guide, f, Length.FromMeters(s.Coupling), 0.5 * s.Length);
                var y = admittances is null ? slot!.Admittance(s.Coupling, s.Length, f) : admittances[i];
                for (int j = 0; j < n; j++)
                    dm[i, j] = i == j ? fn[i] * fn[i] / y : scale * z[i, j];
            }
            return (fn, dm, gamma0);
        }

        public NetworkSolution Solve(Frequency f)
        {
            int n = design.Count;
            var (fn, dm, gamma0) = SlotBlocks(f);
            var gamma = design.Guide.PropagationConstant(f);
            bool centre = design.Feed == FeedPosition.Centre;
            // Unknowns: V_k (mode voltage at slot k, its arm's polarity), J_k (line current arriving at slot k from its
            // arm's termination side), w_k (scaled slot voltage, global polarity).
            int size = 3 * n;
            var a = Matrix<Complex>.Build.Dense(size, size);
            var b = MathNet.Numerics.LinearAlgebra.Vector<Complex>.Build.Dense(size);
            var pol = new double[n];
            for (int i = 0; i < n; i++) pol[i] = i < leftCount ? 1 : -1;
            int row = 0;
            double[] z = design.Slots.Select(s => s.Position.Meters).ToArray();

            Termination(a, row++, 0, design.NearTermination, gamma);
            for (int k = 0; k + 1 < leftCount; k++) { Section(a, row, k, k + 1, gamma, z[k + 1] - z[k], pol, fn); row += 2; }
            if (!centre)
            {
                // Feed state (V_f, I_f) = T(d)(V, J + i) of the last slot; matched source of unit incident wave: V_f + I_f = 2.
                var (c, s) = Hyperbolic(gamma, design.FeedPlane.Meters - z[n - 1]);
                AddState(a, row, n - 1, 1, c + s, c + s, pol, fn);
                b[row++] = 2;
            }
            else
            {
                Termination(a, row++, n - 1, design.FarTermination!, gamma);
                for (int k = n - 1; k > leftCount; k--) { Section(a, row, k, k - 1, gamma, z[k] - z[k - 1], pol, fn); row += 2; }
                double fp = design.FeedPlane.Meters, nr = Math.Sqrt(design.JunctionRatio);
                var (cl, sl) = Hyperbolic(gamma, fp - z[leftCount - 1]);
                var (cr, sr) = Hyperbolic(gamma, z[leftCount] - fp);
                // Same current through both halves: I_left − I_right = 0.
                AddState(a, row, leftCount - 1, 1, sl, cl, pol, fn);
                AddState(a, row, leftCount, -1, sr, cr, pol, fn);
                row++;
                // Transformer n² to the feed: V_feed = (V_left + V_right)/n, I_feed = n I; V_feed + I_feed = 2.
                AddState(a, row, leftCount - 1, 1, cl / nr + nr * sl, sl / nr + nr * cl, pol, fn);
                AddState(a, row, leftCount, 1, cr / nr, sr / nr, pol, fn);
                b[row++] = 2;
            }
            for (int i = 0; i < n; i++, row++)
            {
                a[row, i] = pol[i] * fn[i];
                for (int j = 0; j < n; j++) a[row, 2 * n + j] = -dm[i, j];
            }
            var x = a.LU().Solve(b);

            var ya = new Complex[n];
            var e = new Complex[n];
            double root = Math.Sqrt(gamma0);
            for (int i = 0; i < n; i++)
            {
                Complex v = pol[i] * x[i], w = x[2 * n + i];
                ya[i] = fn[i] * w / v;
                e[i] = w / root;
            }
            var sol = line.Solve(f, ya, signs);
            return sol with { Excitations = Array.AsReadOnly(e) };
        }

        private static (Complex Cosh, Complex Sinh) Hyperbolic(Complex gamma, double d) => (Complex.Cosh(gamma * d), Complex.Sinh(gamma * d));

        /// <summary>
        /// Adds sign × (p V_k + q (J_k + i_k)) to one row, i_k = pol_k f_k w_k the slot's shunt current in its arm's polarity:
        /// one component of the line state T(d)(V, J + i) just beyond slot k (p, q the row of T).
        /// </summary>
        private static void AddState(Matrix<Complex> a, int row, int k, double sign, Complex p, Complex q, double[] pol, double[] fn)
        {
            int n = pol.Length;
            a[row, k] += sign * p;
            a[row, n + k] += sign * q;
            a[row, 2 * n + k] += sign * q * pol[k] * fn[k];
        }

        /// <summary>Two rows: (V, J) at slot <paramref name="to"/> = T(d) (V, J + i) at slot <paramref name="from"/>, T = [cosh sinh; sinh cosh].</summary>
        private static void Section(Matrix<Complex> a, int row, int from, int to, Complex gamma, double d, double[] pol, double[] fn)
        {
            if (!(d > 0)) throw new ArgumentException($"slots {from + 1} and {to + 1} coincide; the coupled analysis needs distinct positions");
            int n = pol.Length;
            var (c, s) = Hyperbolic(gamma, d);
            AddState(a, row, from, 1, c, s, pol, fn);
            a[row, to] -= 1;
            AddState(a, row + 1, from, 1, s, c, pol, fn);
            a[row + 1, n + to] -= 1;
        }

        /// <summary>
        /// The termination seen at slot k through distance d: (V, J) = T(d)(V_t, I_t) with (V_t, I_t) ∝ (0, 1) for a short
        /// and (1, y_L) for a load (1 for a matched load), i.e. V e − J c = 0 with (c, e) = T(d)(V_t, I_t).
        /// </summary>
        private static void Termination(Matrix<Complex> a, int row, int k, Termination t, Complex gamma)
        {
            int n = a.RowCount / 3;
            var (ch, sh) = Hyperbolic(gamma, t.Distance.Meters);
            Complex vt = t.Kind == TerminationKind.Short ? 0 : 1;
            Complex it = t.Kind switch { TerminationKind.Short => 1, TerminationKind.MatchedLoad => 1, _ => t.LoadAdmittance };
            Complex c = ch * vt + sh * it, e = sh * vt + ch * it;
            a[row, k] = e;
            a[row, n + k] = -c;
        }
    }
}
