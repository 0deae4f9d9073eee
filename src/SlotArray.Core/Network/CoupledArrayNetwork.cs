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
/// <para>Solution: the line rows are linear in the arm amplitudes and the shunt currents, so they are eliminated in
/// closed form (each arm's cascade from its termination plus the particular solution of each injected current, the arm
/// amplitudes from the feed conditions): V = V_s + G i, leaving the N × N system (D + M − P G P) w = P V_s in the slot
/// voltages, P = diag(pol_n f_n): the same equations as the 3N-unknown transfer-form assembly (which gave the same S11,
/// mode and slot voltages to 1e-15 on end- and centre-fed arrays, short and load), for a 27th of the LU's work; the LU is <see cref="ComplexLu"/>.</para>
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
        var sys = BandSystem(design, slot, low, high, coupling);
        var list = new NetworkSolution[points + 1];
        // The frequencies are independent systems (the slot model's memo is thread-safe): solved in parallel, each into
        // its own slot, so the order of evaluation cannot change them; the design frequency is the last item, solved with
        // the mutual impedances filled at it (so every figure at the design frequency is that of Solve).
        ParallelFailures.Unwrapped(() => Parallel.For(0, points + 1, i => list[i] = i == points
            ? new CoupledSystem(design, slot, coupling).Solve(design.DesignFrequency)
            : sys.Solve(Frequency.FromHertz(low.Hertz + (high.Hertz - low.Hertz) * i / (points - 1)))));
        return new FrequencySweep(design.DesignFrequency, list[points], Array.AsReadOnly(list[..points]));
    }

    /// <summary>
    /// The coupled system for solves across [low, high] (spanning the design frequency too): when that span is narrow enough
    /// (<see cref="CouplingAcrossBand.Interpolates"/>), the mutual impedances are filled at the
    /// <see cref="CouplingAcrossBand.Nodes"/> Chebyshev nodes of the span and interpolated between them (relative error
    /// of order 1e-9, measured in the tests against direct fills) instead of a fill, N(N − 1)/2 reaction integrals, at
    /// every frequency; otherwise filled at each frequency.
    /// </summary>
    private static CoupledSystem BandSystem(ArrayDesign design, IShuntSlotModel slot, Frequency low, Frequency high, MutualImpedanceModel? coupling)
    {
        var direct = new CoupledSystem(design, slot, coupling);
        var f0 = design.DesignFrequency;
        var lo = f0 < low ? f0 : low;
        var hi = f0 > high ? f0 : high;
        if (!CouplingAcrossBand.Interpolates(lo, hi)) return direct;
        var across = new CouplingAcrossBand(direct.Placements, design.Slots[0].Width, lo, hi, direct.Coupling);
        return new CoupledSystem(design, slot, (_, _, f) => across.At(f));
    }

    /// <summary>
    /// The frequency of best match (smallest |S11|) in [low, high]: the smallest of <paramref name="points"/> equally
    /// spaced samples, refined by golden-section search between its neighbours to 1e-7 of the design frequency.
    /// </summary>
    public static NetworkSolution BestMatch(ArrayDesign design, IShuntSlotModel slot, Frequency low, Frequency high, int points,
        MutualImpedanceModel? coupling = null)
    {
        var sweep = Sweep(design, slot, low, high, points, coupling);
        var sys = BandSystem(design, slot, low, high, coupling);
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
            this.coupling = coupling ?? CoupledSlotImpedances.Scaled(design.MutualCouplingScale);
            bool centre = design.Feed == FeedPosition.Centre;
            line = new LineNetwork(design.Guide, design.Slots.Select(s => s.Position.Meters).ToArray(), design.NearTermination,
                centre ? design.FarTermination ?? throw new ArgumentException("a centre-fed design needs a far termination", nameof(design)) : null,
                design.FeedPlane.Meters, design.JunctionRatio);
            signs = design.Slots.Select(s => (double)Math.Sign(s.Coupling)).ToArray();
            placements = design.Slots.Select(s => new LongitudinalSlotPlacement(s.Position, Length.FromMeters(s.Coupling), 0.5 * s.Length)).ToArray();
            leftCount = centre ? design.Slots.Count(s => s.Position < design.FeedPlane) : design.Count;
        }

        /// <summary>The mutual-impedance model in use (the given one, or the default of the design).</summary>
        public MutualImpedanceModel Coupling => coupling;

        /// <summary>The slots as equivalent dipoles (centre, offset, half-length), the coupling model's input.</summary>
        public IReadOnlyList<LongitudinalSlotPlacement> Placements => placements;

        /// <summary>The mutual impedances of the slots at f.</summary>
        public CouplingMatrix Mutual(Frequency f) => coupling(placements, design.Slots[0].Width, f);

        /// <summary>f_n, D + M and Γ0 at frequency f.</summary>
        public (double[] F, Matrix<Complex> DM, double Gamma0) SlotBlocks(Frequency f)
        {
            var (fn, dm, gamma0) = SlotArrays(f);
            return (fn, Matrix<Complex>.Build.Dense(fn.Length, fn.Length, dm), gamma0);
        }

        /// <summary>f_n, D + M (column-major) and Γ0 at frequency f.</summary>
        private (double[] F, Complex[] DM, double Gamma0) SlotArrays(Frequency f)
        {
            int n = design.Count;
            double gamma0 = ElliottDesignEquations.Gamma0(design.Guide, f);
            var z = Mutual(f);
            double scale = 1 / (gamma0 * PhysicalConstants.HalfWaveDipoleResistance);
            var fn = new double[n];
            var dm = new Complex[n * n];
            for (int i = 0; i < n; i++)
            {
                var s = design.Slots[i];
                fn[i] = ElliottDesignEquations.CouplingFunction(design.Guide, f, Length.FromMeters(s.Coupling), 0.5 * s.Length);
                var y = admittances is null ? slot!.Admittance(s.Coupling, s.Length, f) : admittances[i];
                for (int j = 0; j < n; j++)
                    dm[j * n + i] = i == j ? fn[i] * fn[i] / y : scale * z[i, j];
            }
            return (fn, dm, gamma0);
        }

        public NetworkSolution Solve(Frequency f)
        {
            int n = design.Count;
            var (fn, k, gamma0) = SlotArrays(f);
            var (source, response) = LineResponse(design.Guide.PropagationConstant(f));
            // Shunt current of slot j in its arm's polarity: i_j = p_j w_j, p_j = pol_j f_j. The slot rows
            // p_i V_i − Σ_j (D + M)_ij w_j = 0 with V = V_s + G i become (D + M − P G P) w = P V_s.
            var p = new double[n];
            for (int i = 0; i < n; i++) p[i] = (i < leftCount ? 1 : -1) * fn[i];
            var b = new Complex[n];
            for (int i = 0; i < n; i++)
            {
                b[i] = p[i] * source[i];
                for (int j = 0; j < n; j++) k[j * n + i] -= p[i] * response[i * n + j] * p[j];
            }
            var w = ComplexLu.Factor(k, n).Solve(b);

            var ya = new Complex[n];
            var e = new Complex[n];
            double root = Math.Sqrt(gamma0);
            for (int i = 0; i < n; i++)
            {
                var vi = source[i];
                for (int j = 0; j < n; j++) vi += response[i * n + j] * p[j] * w[j];
                ya[i] = fn[i] * w[i] / ((i < leftCount ? 1 : -1) * vi);
                e[i] = w[i] / root;
            }
            var sol = line.Solve(f, ya, signs);
            return sol with { Excitations = Array.AsReadOnly(e) };
        }

        /// <summary>
        /// The unloaded line's response: the mode voltage V_j at each slot (in its arm's polarity) is V_s,j + Σ_k G_jk i_k for
        /// shunt currents i_k injected at the slots. Each arm is the cascade from its termination: the state (V, J) at
        /// distance ℓ from it is a T(ℓ)(V_t, I_t) + Σ_k i_k T(ℓ − ℓ_k)(0, 1) over the slots k nearer the termination,
        /// T(d) = [cosh γd, sinh γd; sinh γd, cosh γd] (the cascade of <see cref="ArrayNetwork"/>; Pozar 2012, Secs. 2.1, 4.4,
        /// from memory), with (V_t, I_t) = (0, 1) for a short, (1, y_L) for a load; the arm amplitudes a follow from the feed
        /// conditions (end feed: V_f + I_f = 2; centre feed: equal currents out of both halves and (V_L + V_R)/n + n I_L = 2),
        /// which are linear in a and i. The same equations as the transfer-form assembly, reduced to the N slot unknowns.
        /// </summary>
        private (Complex[] Source, Complex[] Response) LineResponse(Complex gamma)
        {
            int n = design.Count;
            bool centre = design.Feed == FeedPosition.Centre;
            double zNear = design.Slots[0].Position.Meters - design.NearTermination.Distance.Meters;
            double zFar = centre ? design.Slots[n - 1].Position.Meters + design.FarTermination!.Distance.Meters : 0;
            var ell = new double[n];
            for (int i = 0; i < n; i++) ell[i] = i < leftCount ? design.Slots[i].Position.Meters - zNear : zFar - design.Slots[i].Position.Meters;
            var ex = ell.Select(l => Complex.Exp(gamma * l)).ToArray();
            var terms = centre ? new[] { design.NearTermination, design.FarTermination! } : new[] { design.NearTermination };
            var phi = new Complex[n];
            for (int i = 0; i < n; i++) phi[i] = ArmState(terms[i < leftCount ? 0 : 1], ex[i]).V;

            // Feed conditions: A a = r − C i (rows × arms, rows × slots).
            var a = new Complex[2, 2];
            var c = new Complex[2, n];
            var r = new Complex[2];
            double fp = design.FeedPlane.Meters;
            if (!centre)
            {
                var ein = Complex.Exp(gamma * (fp - zNear));
                var s = ArmState(terms[0], ein);
                a[0, 0] = s.V + s.I;
                for (int k = 0; k < n; k++) c[0, k] = ein / ex[k];      // V + I of T(d)(0, 1) = e^{γd}
                r[0] = 2;
                a[1, 1] = 1;                                             // no second arm
            }
            else
            {
                double nr = Math.Sqrt(design.JunctionRatio);
                Complex el = Complex.Exp(gamma * (fp - zNear)), er = Complex.Exp(gamma * (zFar - fp));
                var sl = ArmState(terms[0], el);
                var sr = ArmState(terms[1], er);
                a[0, 0] = sl.I; a[0, 1] = -sr.I;                          // I_L − I_R = 0
                a[1, 0] = sl.V / nr + nr * sl.I; a[1, 1] = sr.V / nr;    // (V_L + V_R)/n + n I_L = 2
                r[1] = 2;
                for (int k = 0; k < n; k++)
                {
                    bool left = k < leftCount;
                    var q = (left ? el : er) / ex[k];
                    Complex sh = 0.5 * (q - 1 / q), ch = 0.5 * (q + 1 / q);
                    c[0, k] = left ? ch : -ch;
                    c[1, k] = left ? sh / nr + nr * ch : sh / nr;
                }
            }
            var det = a[0, 0] * a[1, 1] - a[0, 1] * a[1, 0];
            Complex[,] inv = { { a[1, 1] / det, -a[0, 1] / det }, { -a[1, 0] / det, a[0, 0] / det } };

            var source = new Complex[n];
            var g = new Complex[n * n];
            var u = new Complex[2, n];       // row of A⁻¹C for each arm
            for (int arm = 0; arm < 2; arm++)
                for (int k = 0; k < n; k++) u[arm, k] = inv[arm, 0] * c[0, k] + inv[arm, 1] * c[1, k];
            var back = ex.Select(x => 1 / x).ToArray();
            for (int j = 0; j < n; j++)
            {
                int arm = j < leftCount ? 0 : 1;
                source[j] = phi[j] * (inv[arm, 0] * r[0] + inv[arm, 1] * r[1]);
                for (int k = 0; k < n; k++)
                {
                    var v = -phi[j] * u[arm, k];
                    if ((k < leftCount) == (j < leftCount) && ell[k] < ell[j]) v += 0.5 * (ex[j] * back[k] - ex[k] * back[j]);
                    g[j * n + k] = v;
                }
            }
            return (source, g);
        }

        /// <summary>(V, I) = T(ℓ)(V_t, I_t) of a termination, from e^{γℓ}.</summary>
        private static (Complex V, Complex I) ArmState(Termination t, Complex exp)
        {
            Complex ch = 0.5 * (exp + 1 / exp), sh = 0.5 * (exp - 1 / exp);
            Complex vt = t.Kind == TerminationKind.Short ? 0 : 1;
            Complex it = t.Kind switch { TerminationKind.Short => 1, TerminationKind.MatchedLoad => 1, _ => t.LoadAdmittance };
            return (vt * ch + it * sh, vt * sh + it * ch);
        }
    }
}
