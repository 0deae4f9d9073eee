using System.Numerics;
using SlotArray.Core.Coupling;
using SlotArray.Core.Design;
using SlotArray.Core.Network;
using SlotArray.Core.Quantities;
using SlotArray.Core.Stick;

namespace SlotArray.Core.Planar;

/// <summary>
/// Elliott's design of a planar array of longitudinal shunt slots: centre-fed standing-wave branches, each a stick of
/// <see cref="StandingWaveDesigner"/>, whose slots are then re-sized together so that, with the external mutual
/// coupling of every slot of the aperture included, each slot's active admittance is the one its share of the 2-D
/// taper needs; then the coupling slots that feed each branch its power from a standing-wave feed guide.
/// </summary>
/// <remarks>
/// <para>Method: R. S. Elliott and L. A. Kurtz, "The design of small slot arrays", IEEE Trans. AP-26, 214–219, 1978;
/// R. S. Elliott, "An improved design procedure for small arrays of shunt slots", IEEE Trans. AP-31, 48–53, 1983
/// (planar arrays fed by series-series coupling slots); structure from memory [M], in the form of
/// <see cref="ElliottDesigner"/> [D]. Every branch is fed at its centre by a series coupling slot, so (as for the centre-fed
/// stick) the mode voltage has one magnitude along a branch and (E1) gives the targets
/// T_n = 2 f_n|A_n| / Σ_{m in the branch} f_m|A_m| (Σ y^a = 2 per branch: each half matched to the junction). (E2)
/// for slot n: 1/y(x_n, L_n) + C_n/f_n² = 1/T_n with C_n = Σ_{m ≠ n, whole aperture} (A_m/A_n) Z_nm/(Γ0 R_d): the
/// coupling sum runs over the collinear neighbours in the branch and the parallel slots of every other branch (the
/// aperture voltages of other branches are those the design asks for, all branches being driven in phase). Each
/// slot's two real equations are solved by the damped Newton of <see cref="ElliottDesigner.SolveSlot"/> with f and
/// Z from the previous sweep (Elliott's iteration), started from the isolated-slot sticks; the sweep is repeated
/// until no offset or length moves by more than <see cref="PlanarRequest.Tolerance"/>, and the history is reported.
/// This is the fixed-point (Gauss–Jacobi) form of Elliott's iteration, not a joint Newton on all 2N unknowns. Without
/// coupling (<see cref="PlanarRequest.Coupled"/> false) the same equations are solved with C_n = 0, so that the isolated-slot
/// design and <see cref="PlanarNetwork"/> share Elliott's slot-voltage relation (the stick designer's start, V ∝ √g, differs
/// from it by up to 3 % in amplitude where the slot model's g is not exactly ∝ f_n², which cost 0.8 dB of x-z sidelobe on
/// an 8 × 10 array at −25 dB).</para>
/// <para>The taper's amplitudes are then corrected so that the principal cuts of the slots at their real offsets reach the
/// asked level (<see cref="PrincipalPlaneCorrection"/>) and the aperture redesigned from where it stands, up to
/// <see cref="CorrectionPasses"/> times (the offsets move a little with the amplitudes).</para>
/// <para>Feed: with every branch matched (z_branch = 2), the power a branch takes is P_k ∝ S_k², S_k = Σ f_m|A_m| over
/// its slots (its slots' aperture voltages are then c·A_n with one c for the whole aperture). The feed guide is a
/// standing-wave line with the coupling slots at λg/2 (= pitch) where the current is largest, shorts λg/2 beyond
/// the outermost; a series element there takes P ∝ r. End feed: r_k = P_k/ΣP (Σ r = 1, matched). Centre feed (an
/// ideal series tee a quarter guide wavelength from the middle two slots, each half's Σ r inverted by that quarter
/// wave): r_k = P·P_k/P_half², which matches the tee, 1/Σr_left + 1/Σr_right = 1, and splits P_left : P_right as asked
/// (derived here [D]). Each coupling slot's rotation then gives r_k from its branch's 2 (<see cref="CouplingSlot"/>);
/// its sign alternates so that the branches are driven in phase (set from the network at f0).</para>
/// <para>Neglected (as in Elliott's procedure): internal coupling through higher-order modes (between the slots of
/// one guide and, through the common wall, of neighbouring branches), the coupling slots' own radiation into the
/// branch (they sit in the back wall) and their reactance off resonance.</para>
/// </remarks>
internal static class PlanarDesigner
{
    /// <summary>
    /// Designs the array. Throws <see cref="InfeasibleDesignException"/> naming the branch and slot when a slot or a
    /// coupling slot cannot be realised, <see cref="ConvergenceException"/> when the coupled iteration does not settle.
    /// </summary>
    public static PlanarDesign Design(PlanarRequest request)
    {
        ArgumentNullException.ThrowIfNull(request);
        var layout = request.Layout;
        var f0 = request.DesignFrequency;
        var (asked, method, warnings) = request.Taper.Weights(layout);
        var lambdaG = request.BranchGuide.GuideWavelength(f0);
        if (Math.Abs(layout.Spacing.Meters - 0.5 * lambdaG.Meters) > 1e-9 * lambdaG.Meters)
            throw new ArgumentException($"the layout's slot spacing {layout.Spacing} is not λg/2 = {0.5 * lambdaG} of the branch guide at {f0}", nameof(request));
        var sticks = UncoupledSticks(request, asked);
        double[] Corrected() => PrincipalPlaneCorrection.Correct(layout, request.Taper, asked,
            Placements(sticks, layout.Count).Select(q => q.Offset.Meters).ToArray(), f0.FreeSpaceWavenumber).Amplitudes;
        var amp = Corrected();   // first on the isolated sticks' offsets: a start near the end for the coupled sweeps
        var history = new List<ElliottIteration>();
        var sweeps = request.Coupled ? history : new List<ElliottIteration>();
        Iterate(request, amp, sticks, sweeps);
        for (int pass = 0; pass < CorrectionPasses; pass++)
        {
            var next = Corrected();
            double moved = amp.Zip(next, (a, b) => Math.Abs(a - b)).Max();
            if (moved < CorrectionSettled) break;
            amp = next;
            Iterate(request, amp, sticks, sweeps);
        }
        if (request.Coupled) Iterate(request, amp, sticks, sweeps, final: true);
        foreach (var b in sticks)
            b.Design = b.Design with { Slots = Array.AsReadOnly(b.Design.Slots.Select((s, k) => s with { TargetAmplitude = amp[b.Indices[k]] }).ToArray()) };
        var list = warnings.ToList();
        foreach (var s in sticks)
            foreach (var w in s.Design.Warnings)
                if (!list.Contains(w)) list.Add(w);
        var design = new PlanarDesign(request.Name, f0, layout, Array.AsReadOnly(amp), method,
            sticks.Select(s => new PlanarBranch(s.Number, s.Y, s.Design, s.Indices, Placeholder(s.Number, s.Y))).ToArray(),
            request.FeedGuide, request.FeedPosition, 0.5 * request.FeedGuide.GuideWavelength(f0),
            request.FeedPosition == FeedPosition.Centre ? 0.5 * layout.Pitch : 0.5 * request.FeedGuide.GuideWavelength(f0),
            request.Coupled, history.AsReadOnly(), list.AsReadOnly());
        return FeedDesign.Apply(design, request, list);
    }

    /// <summary>
    /// Rounds of principal-plane correction (<see cref="PrincipalPlaneCorrection"/>) and redesign: the correction reads the
    /// slots' offsets, which move a little when the amplitudes change, so it is repeated on the redesigned aperture.
    /// </summary>
    private const int CorrectionPasses = 3;

    /// <summary>Largest amplitude change (of the largest amplitude) below which the correction has settled: 1e-3 (an uncorrelated error that small lies some 70 dB below the beam of an 80-slot aperture).</summary>
    private const double CorrectionSettled = 1e-3;

    private static CouplingSlotDesign Placeholder(int branch, double y) => new(branch, y, Angle.FromRadians(0), Length.Zero, Length.Zero, 0, 0);

    /// <summary>A branch under design: its stick, number, centre line and slot indices.</summary>
    private sealed class BranchWork(int number, double y, int[] indices, ArrayDesign design)
    {
        public int Number { get; } = number;
        public double Y { get; } = y;
        public int[] Indices { get; } = indices;
        public ArrayDesign Design { get; set; } = design;
    }

    private static List<BranchWork> UncoupledSticks(PlanarRequest request, double[] amp)
    {
        var layout = request.Layout;
        var feed = new FeedRequest(FeedType.StandingWave, GuideDistance.InGuideWavelengths(0.5), FeedPosition.Centre, 0, GuideDistance.InGuideWavelengths(0.25));
        var list = new List<BranchWork>();
        foreach (int b in layout.FedBranches)
        {
            var idx = Enumerable.Range(0, layout.Count).Where(i => layout.Slots[i].Branch == b).ToArray();
            var stick = new StickRequest($"{request.Name} branch {b}", request.BranchGuide, request.DesignFrequency, idx.Length, feed,
                idx.Select(i => amp[i]).ToArray(), request.Slot) { Cutter = request.Cutter };
            ArrayDesign d;
            try { d = StandingWaveDesigner.Design(stick).Design; }
            catch (InfeasibleDesignException e) { throw new InfeasibleDesignException($"branch {b}: {e.Message}"); }
            list.Add(new BranchWork(b, layout.Slots[idx[0]].Y, idx, d));
        }
        return list;
    }

    /// <summary>
    /// Elliott's sweeps over the aperture until no offset or length moves by more than the request's tolerance, with the
    /// coupling refilled after every <see cref="RefillDistance"/> of movement; a <paramref name="final"/> run also refills
    /// and goes on when it settles on a coupling matrix filled more than <see cref="FinalRefillDistance"/> away, so that
    /// the design returned solves (E2) with the coupling of its own geometry.
    /// </summary>
    private static void Iterate(PlanarRequest request, double[] amp, List<BranchWork> branches, List<ElliottIteration> history, bool final = false)
    {
        var f0 = request.DesignFrequency;
        var guide = request.BranchGuide;
        var surrogate = ElliottDesigner.SurrogateFor(request.Slot, f0);
        double scale = 1 / (ElliottDesignEquations.Gamma0(guide, f0) * PhysicalConstants.HalfWaveDipoleResistance);
        int n = request.Layout.Count;
        var coupling = CoupledSlotImpedances.HalfCosineCentreReferredAdaptive;
        // The coupling sums C_n depend on the geometry only through Z (the amplitudes are fixed), and Z barely moves with
        // it: Z and C are refilled whenever any offset or length has moved by more than RefillDistance (25 µm) since the
        // last fill. A Z that stale changes a nearest-neighbour term by under 1 % (|d ln Z/dR| ≤ k + 1/R ≈ 240 /m at
        // 23 mm, X band), an active admittance by ~0.1 % (the coupling is a tenth to a third of 1/T) and a slot voltage
        // by ~0.05 % (0.005 dB). The last run (final) then refills at its settled geometry until that is within 1 µm of
        // the fill, so the design returned solves (E2) with its own coupling.
        Complex[] c = new Complex[n];
        double[]? filledAt = request.Coupled ? null : [];
        var extrapolation = new StepExtrapolation();
        for (int it = 1; it <= request.MaximumIterations; it++)
        {
            var geometry = Geometry(branches, n);
            if (request.Coupled && (filledAt is null || MaxDifference(filledAt, geometry) > RefillDistance))
            {
                var z = coupling(Placements(branches, n), branches[0].Design.Slots[0].Width, f0);
                c = CouplingSums(z, amp, scale);
                filledAt = geometry;
            }
            double dMax = 0, dxMax = 0, dlMax = 0, match = 0;
            int worst = 0;
            foreach (var b in branches)
            {
                var slots = b.Design.Slots;
                var fn = slots.Select(s => ElliottDesigner.F(guide, f0, Math.Abs(s.Coupling), s.Length.Meters)).ToArray();
                double sum = 0;
                for (int k = 0; k < slots.Count; k++) sum += fn[k] * Math.Abs(amp[b.Indices[k]]);
                var updated = new SlotDesign[slots.Count];
                Complex total = 0;
                for (int k = 0; k < slots.Count; k++)
                {
                    int i = b.Indices[k];
                    double target = StandingWaveDesigner.CentreJunctionRatio * fn[k] * Math.Abs(amp[i]) / sum;
                    double x = Math.Abs(slots[k].Coupling), l = slots[k].Length.Meters;
                    var y = surrogate.Admittance(x, l);
                    total += y / (1 + y * c[i] / (fn[k] * fn[k]));
                    (double X, double L) r;
                    try { r = ElliottDesigner.SolveSlot(surrogate, guide, f0, k, x, l, c[i], target, 60); }
                    catch (InfeasibleDesignException e) { throw new InfeasibleDesignException($"branch {b.Number}, {e.Message}"); }
                    catch (ConvergenceException e) { throw new ConvergenceException($"branch {b.Number}, {e.Message}", e.Iterations, e.Residual); }
                    double dx = Math.Abs(r.X - x), dl = Math.Abs(r.L - l);
                    if (Math.Max(dx, dl) > dMax) { dMax = Math.Max(dx, dl); worst = i; }
                    dxMax = Math.Max(dxMax, dx);
                    dlMax = Math.Max(dlMax, dl);
                    updated[k] = slots[k] with { Coupling = Math.Sign(slots[k].Coupling) * r.X, Length = Length.FromMeters(r.L), Conductance = target };
                }
                match = Math.Max(match, (total - StandingWaveDesigner.CentreJunctionRatio).Magnitude);
                b.Design = b.Design with { Slots = Array.AsReadOnly(updated) };
            }
            history.Add(new ElliottIteration(it, dxMax, dlMax, worst + 1, match));
            if (dMax < request.Tolerance && final && request.Coupled && MaxDifference(filledAt!, Geometry(branches, n)) > FinalRefillDistance)
            {
                filledAt = null;   // settled on a stale coupling matrix: refill at this geometry and go on
                continue;
            }
            if (dMax < request.Tolerance)
            {
                foreach (var b in branches)
                {
                    try { Fabrication.SlotClearance.Require(b.Design, request.Cutter); }
                    catch (InfeasibleDesignException e) { throw new InfeasibleDesignException($"branch {b.Number}: {e.Message}"); }
                }
                return;
            }
            if (extrapolation.Factor(it, geometry, Geometry(branches, n)) is { } jump) Extrapolate(branches, geometry, jump, surrogate);
        }
        var last = history[^1];
        var (wb, ws) = Locate(branches, last.WorstSlot - 1);
        throw new ConvergenceException(FormattableString.Invariant(
            $"Elliott's planar iteration did not converge in {request.MaximumIterations} sweeps: branch {wb} slot {ws} still moved by {Math.Max(last.MaximumOffsetChange, last.MaximumLengthChange) * 1e3:G3} mm in the last one; the coupling is too strong: use a gentler taper, more slots or coupling: none"),
            request.MaximumIterations, Math.Max(last.MaximumOffsetChange, last.MaximumLengthChange));
    }

    /// <summary>
    /// Moves every slot on along its last step by <paramref name="factor"/> times that step (the remaining sum of a
    /// geometric series of steps), kept inside the surrogate's offset and length ranges.
    /// </summary>
    private static void Extrapolate(List<BranchWork> branches, double[] before, double factor, ElliottSlotSurrogate surrogate)
    {
        foreach (var b in branches)
        {
            var slots = b.Design.Slots.ToArray();
            for (int k = 0; k < slots.Length; k++)
            {
                int i = b.Indices[k];
                double x = Math.Abs(slots[k].Coupling), l = slots[k].Length.Meters;
                double xe = Math.Clamp(x + factor * (x - before[2 * i]), 0.25 * surrogate.MinimumOffset, surrogate.MaximumOffset);
                double lr = surrogate.ResonantLength(xe);
                double le = Math.Clamp(l + factor * (l - before[2 * i + 1]), ElliottSlotSurrogate.MinimumRatio * lr, ElliottSlotSurrogate.MaximumRatio * lr);
                slots[k] = slots[k] with { Coupling = Math.Sign(slots[k].Coupling) * xe, Length = Length.FromMeters(le) };
            }
            b.Design = b.Design with { Slots = Array.AsReadOnly(slots) };
        }
    }

    /// <summary>
    /// Acceleration of the fixed-point iteration [D]: once the largest step has shrunk by the same ratio ρ (0.3 … 0.95, within
    /// 5 %) on two sweeps running, the error is dominated by one slowly decaying mode, and the remaining steps sum to
    /// ρ/(1 − ρ) times the last (the extrapolation of L. A. Lyusternik's kind for linearly converging iterations, e.g.
    /// C. Brezinski and M. Redivo Zaglia, <i>Extrapolation Methods</i>, North-Holland 1991, from memory). At most once every three
    /// sweeps; the iteration then goes on and its own tolerance decides convergence, so a poor jump costs sweeps, not accuracy.
    /// </summary>
    private sealed class StepExtrapolation
    {
        private double previousNorm, previousRatio;
        private int last = -10;

        /// <summary>The factor to jump by after sweep <paramref name="it"/>, or null.</summary>
        public double? Factor(int it, double[] before, double[] after)
        {
            double norm = MaxDifference(before, after);
            double ratio = previousNorm > 0 ? norm / previousNorm : 0;
            bool steady = ratio > 0.3 && ratio < 0.95 && Math.Abs(ratio - previousRatio) < 0.1 * ratio && it - last >= 2;
            previousNorm = norm;
            previousRatio = ratio;
            if (!steady) return null;
            last = it;
            previousNorm = 0;
            return ratio / (1 - ratio);
        }
    }

    /// <summary>Geometry change (m) after which the coupling matrix is refilled during the iteration: 25 µm (see Iterate).</summary>
    private const double RefillDistance = 25e-6;

    /// <summary>Largest distance (m) between the geometry of the last fill and the final design: 1 µm.</summary>
    private const double FinalRefillDistance = 1e-6;

    /// <summary>C_n = Σ_{m≠n} (A_m/A_n) Z_nm/(Γ0 R_d) for every slot (the whole aperture).</summary>
    private static Complex[] CouplingSums(CouplingMatrix z, double[] amp, double scale)
    {
        int n = amp.Length;
        var c = new Complex[n];
        Parallel.For(0, n, new ParallelOptions { MaxDegreeOfParallelism = 2 }, i =>
        {
            Complex sum = 0;
            for (int m = 0; m < n; m++) if (m != i) sum += amp[m] * z[i, m];
            c[i] = sum * (scale / amp[i]);
        });
        return c;
    }

    /// <summary>|offset| and length of every slot, layout order (2 values a slot).</summary>
    private static double[] Geometry(List<BranchWork> branches, int n)
    {
        var g = new double[2 * n];
        foreach (var b in branches)
            for (int k = 0; k < b.Indices.Length; k++)
            {
                g[2 * b.Indices[k]] = Math.Abs(b.Design.Slots[k].Coupling);
                g[2 * b.Indices[k] + 1] = b.Design.Slots[k].Length.Meters;
            }
        return g;
    }

    private static double MaxDifference(double[] a, double[] b)
    {
        double m = 0;
        for (int i = 0; i < a.Length; i++) m = Math.Max(m, Math.Abs(a[i] - b[i]));
        return m;
    }

    private static (int Branch, int Slot) Locate(List<BranchWork> branches, int index)
    {
        foreach (var b in branches)
            for (int k = 0; k < b.Indices.Length; k++)
                if (b.Indices[k] == index) return (b.Number, k + 1);
        return (0, 0);
    }

    /// <summary>Every slot's placement on the aperture (Position = x, Offset = y of its centre), layout order.</summary>
    private static LongitudinalSlotPlacement[] Placements(List<BranchWork> branches, int n)
    {
        var p = new LongitudinalSlotPlacement[n];
        foreach (var b in branches)
            for (int k = 0; k < b.Indices.Length; k++)
            {
                var s = b.Design.Slots[k];
                p[b.Indices[k]] = new LongitudinalSlotPlacement(Length.FromMeters(s.Position.Meters - b.Design.FeedPlane.Meters),
                    Length.FromMeters(b.Y + s.Coupling), 0.5 * s.Length);
            }
        return p;
    }

    /// <summary>The aperture placements of a finished design (layout order), as the coupled network and pattern use them.</summary>
    public static LongitudinalSlotPlacement[] Placements(PlanarDesign design)
    {
        ArgumentNullException.ThrowIfNull(design);
        var p = new LongitudinalSlotPlacement[design.Layout.Count];
        foreach (var b in design.Branches)
            for (int k = 0; k < b.SlotIndices.Count; k++)
            {
                var s = b.Stick.Slots[k];
                p[b.SlotIndices[k]] = new LongitudinalSlotPlacement(Length.FromMeters(b.ApertureX(s.Position)), Length.FromMeters(b.Y + s.Coupling), 0.5 * s.Length);
            }
        return p;
    }
}
