using System.Collections.Concurrent;
using System.Numerics;
using System.Runtime.CompilerServices;
using SlotArray.Core.Coupling;
using SlotArray.Core.Network;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;

namespace SlotArray.Core.Design;

/// <summary>Settings of Elliott's iterated design.</summary>
/// <param name="Tolerance">Stop when no offset and no length changed by more than this between iterations; default 1e-4 mm.</param>
/// <param name="MaximumIterations">Outer iterations allowed before <see cref="ConvergenceException"/>; default 60.</param>
/// <param name="Coupling">Mutual-impedance model; null for <see cref="CoupledSlotImpedances.HalfCosineCentreReferred"/>.</param>
internal sealed record ElliottOptions(double Tolerance = 1e-7, int MaximumIterations = 60, MutualImpedanceModel? Coupling = null)
{
    /// <summary>The defaults.</summary>
    public static ElliottOptions Default { get; } = new();

    /// <summary>Receives one report per iteration (done of at most <see cref="MaximumIterations"/>); null for none.</summary>
    public IProgress<WorkProgress>? Progress { get; init; }

    /// <summary>Stops the iteration with an <see cref="OperationCanceledException"/>.</summary>
    public CancellationToken Cancellation { get; init; }

    /// <summary>Newton steps allowed per slot and outer iteration before <see cref="ConvergenceException"/>; default 60, ≥ 1.</summary>
    public int NewtonIterations { get; init; } = 60;
}

/// <summary>One outer iteration of Elliott's procedure.</summary>
/// <param name="Index">1-based iteration number.</param>
/// <param name="MaximumOffsetChange">Largest |Δx_n| of this iteration (m).</param>
/// <param name="MaximumLengthChange">Largest |ΔL_n| (full length) of this iteration (m).</param>
/// <param name="WorstSlot">1-based slot with the largest change.</param>
/// <param name="MatchError">|Σ y^a_n − target| at the start of the iteration from (E2) on the surrogate (target 1, or 2 for a centre feed).</param>
public sealed record ElliottIteration(int Index, double MaximumOffsetChange, double MaximumLengthChange, int WorstSlot, double MatchError);

/// <summary>The result of Elliott's design: the coupled design, how it got there, and the isolated-slot design it started from.</summary>
/// <param name="Design">The coupled design (<see cref="SlotDesign.Conductance"/> holds each slot's active conductance Re y^a_n).</param>
/// <param name="Uncoupled">The isolated-slot design the iteration started from (<see cref="StandingWaveDesigner"/>).</param>
/// <param name="Iterations">The iteration history, in order; the last one met the tolerance.</param>
/// <param name="ActiveAdmittances">y^a_n from (E2) at the final geometry with the slot model's own (direct) admittances.</param>
/// <param name="SurrogateError">Largest |y_surrogate − y_direct|/|y_direct| over the final slots: the surrogate's interpolation error where it mattered.</param>
/// <param name="Tolerance">The tolerance the iteration met (m).</param>
internal sealed record ElliottResult(ArrayDesign Design, ArrayDesign Uncoupled, IReadOnlyList<ElliottIteration> Iterations,
    IReadOnlyList<Complex> ActiveAdmittances, double SurrogateError, double Tolerance) : StickDesign(Design);

/// <summary>
/// Elliott's design procedure for a standing-wave array of longitudinal broad-wall shunt slots with external mutual
/// coupling: each slot's offset and length are found so that the slot voltages follow the taper and the array is
/// matched at the design frequency with the mutual coupling of all the other slots included.
/// </summary>
/// <remarks>
/// <para>Equations: R. S. Elliott and L. A. Kurtz, "The design of small slot arrays", IEEE Trans. AP-26, 214–219, 1978;
/// R. S. Elliott, "An improved design procedure for small arrays of shunt slots", IEEE Trans. AP-31, 48–53, 1983;
/// structure from memory [M], constants derived here [D]. At λg/2 spacing all mode voltages have one magnitude
/// (alternation absorbed by the offset sides), so (E1) Y^a_n ∝ f_n V^s_n and the match Σ y^a_n = 1 give the targets
/// T_n = f_n|a_n| / Σ_m f_m|a_m| (real: every active admittance resonant). (E2) with V^s_m/V^s_n = a_m/a_n reads
/// 1/y(x_n, L_n) + C_n/f(x_n, L_n)² = 1/T_n, C_n = Σ_{m≠n} (a_m/a_n) Z_mn/(Γ0 R_d): two real equations in the two
/// unknowns (x_n, L_n), solved by damped 2-D Newton on <see cref="ElliottSlotSurrogate"/> (a smooth spline surrogate
/// of the slot model at the design frequency) with finite-difference Jacobian. The f_m in the targets and the geometry
/// in C_n are those of the previous iteration (Elliott's iteration, Elliott 1983), which is repeated until no offset
/// or length changes by more than <see cref="ElliottOptions.Tolerance"/>. Centre feed: targets 2 f_n|a_n|/Σ f_m|a_m|
/// (Σ y^a = 1 per half for a symmetric taper), as in <see cref="StandingWaveDesigner"/>.</para>
/// <para>Current reference: f is the coupling function of the cos(πz/(2l)) aperture distribution with V^s the slot
/// voltage at the centre, so the mutual impedances are those of half-cosine currents referred to their centre values
/// (<see cref="CoupledSlotImpedances.HalfCosineCentreReferred"/>); the loop-referred sinusoidal values would be about 2 %
/// smaller.</para>
/// <para>Neglected (as in Elliott's procedure): coupling of slots through the guide's higher-order modes (small at
/// λg/2 spacing; it matters for slots closer than about a/2 along the guide and for closely spaced branch guides),
/// the finite ground plane and wall thickness in the exterior coupling (the exterior is an infinite flat plane; a
/// narrow face or a short plate near the array changes the outer slots' coupling), and wall loss in the equal-mode-
/// voltage assumption. Without coupling (Z = 0) the procedure reduces to T_n = y_n: for a slot with Stevenson's
/// g_r ∝ f_r² and an offset-independent resonant length that is the isolated-slot design exactly; for the moment-method
/// slot it differs from <see cref="StandingWaveDesigner"/> by the few-per-cent departure of g_r from Γ0 f_r² (the
/// isolated design weights by power, Elliott's by slot voltage).</para>
/// </remarks>
internal static class ElliottDesigner
{
    private static readonly ConditionalWeakTable<IShuntSlotModel, ConcurrentDictionary<double, ElliottSlotSurrogate>> Surrogates = new();

    /// <summary>
    /// The surrogate of <paramref name="slot"/> at frequency f, built once per model and frequency and cached (the build
    /// costs <see cref="ElliottSlotSurrogate.OffsetNodes"/> × <see cref="ElliottSlotSurrogate.RatioNodes"/> direct solves;
    /// the result depends only on the model and f, so caching does not change any design).
    /// </summary>
    public static ElliottSlotSurrogate SurrogateFor(IShuntSlotModel slot, Frequency f)
    {
        ArgumentNullException.ThrowIfNull(slot);
        return Surrogates.GetOrCreateValue(slot).GetOrAdd(f.Hertz, _ => new ElliottSlotSurrogate(slot, f));
    }

    /// <summary>
    /// Designs the array. Throws <see cref="InfeasibleDesignException"/> when a slot would need an offset or length
    /// outside the slot model's range, and <see cref="ConvergenceException"/> when the iteration does not meet the
    /// tolerance (naming the slot and the residual); never returns a partly converged design.
    /// </summary>
    /// <param name="stick">A standing-wave stick of longitudinal slots: an offset-coupled slot model, amplitudes a_n (signed; none zero).</param>
    /// <param name="options">Tolerance, iteration limit, coupling model.</param>
    public static ElliottResult Design(StickRequest stick, ElliottOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(stick);
        var slot = stick.Slot;
        var amplitudes = stick.Amplitudes;
        options ??= ElliottOptions.Default;
        if (!(options.Tolerance > 0)) throw new ArgumentOutOfRangeException(nameof(options), options.Tolerance, "the tolerance must be positive");
        if (options.MaximumIterations < 1 || options.NewtonIterations < 1)
            throw new ArgumentOutOfRangeException(nameof(options), "Elliott's iteration needs at least one outer and one Newton iteration");
        if (slot.CouplingKind != SlotCouplingKind.Offset)
            throw new InfeasibleDesignException("Elliott's design with mutual coupling is implemented for longitudinal (offset) slots only: use coupling: none for edge slots");
        var uncoupled = StandingWaveDesigner.Design(stick).Design with { MutualCouplingScale = stick.MutualCouplingScale };
        var coupling = options.Coupling ?? CoupledSlotImpedances.Scaled(stick.MutualCouplingScale);
        var f0 = stick.DesignFrequency;
        var guide = stick.Guide;
        int n = uncoupled.Count;
        var surrogate = SurrogateFor(slot, f0);
        double scale = 1 / (ElliottDesignEquations.Gamma0(guide, f0) * PhysicalConstants.HalfWaveDipoleResistance);
        double halves = stick.Feed.Position == FeedPosition.Centre ? StandingWaveDesigner.CentreJunctionRatio : 1;

        var side = uncoupled.Slots.Select(s => (double)Math.Sign(s.Coupling)).ToArray();
        var x = uncoupled.Slots.Select(s => Math.Abs(s.Coupling)).ToArray();
        var len = uncoupled.Slots.Select(s => s.Length.Meters).ToArray();
        var a = amplitudes.ToArray();
        var history = new List<ElliottIteration>();
        var target = new double[n];
        for (int it = 1; it <= options.MaximumIterations; it++)
        {
            options.Cancellation.ThrowIfCancellationRequested();
            options.Progress?.Report(new WorkProgress("Elliott's coupled iterations", it, options.MaximumIterations));
            var z = coupling(Placements(uncoupled, side, x, len), uncoupled.Slots[0].Width, f0);
            var fn = new double[n];
            double sum = 0;
            for (int i = 0; i < n; i++)
            {
                fn[i] = F(guide, f0, x[i], len[i]);
                sum += fn[i] * Math.Abs(a[i]);
            }
            var c = new Complex[n];
            Complex total = 0;
            for (int i = 0; i < n; i++)
            {
                target[i] = halves * fn[i] * Math.Abs(a[i]) / sum;
                for (int m = 0; m < n; m++)
                    if (m != i) c[i] += a[m] / a[i] * z[i, m];
                c[i] *= scale;
                var y = surrogate.Admittance(x[i], len[i]);
                total += y / (1 + y * c[i] / (fn[i] * fn[i]));
            }
            double dxMax = 0, dlMax = 0;
            int worst = 0;
            for (int i = 0; i < n; i++)
            {
                var (xi, li) = SolveSlot(surrogate, guide, f0, i, x[i], len[i], c[i], target[i], options.NewtonIterations);
                double dx = Math.Abs(xi - x[i]), dl = Math.Abs(li - len[i]);
                if (Math.Max(dx, dl) > Math.Max(dxMax, dlMax)) worst = i;
                dxMax = Math.Max(dxMax, dx);
                dlMax = Math.Max(dlMax, dl);
                x[i] = xi;
                len[i] = li;
            }
            history.Add(new ElliottIteration(it, dxMax, dlMax, worst + 1, (total - halves).Magnitude));
            if (Math.Max(dxMax, dlMax) < options.Tolerance)
                return Finish(slot, uncoupled, surrogate, coupling, side, x, len, a, target, history, options.Tolerance);
        }
        var lastIt = history[^1];
        throw new ConvergenceException((
            FormattableString.Invariant($"Elliott's iteration did not converge in {options.MaximumIterations} iterations: slot {lastIt.WorstSlot} still moved by ") +
            FormattableString.Invariant($"{Math.Max(lastIt.MaximumOffsetChange, lastIt.MaximumLengthChange) * 1e3:G3} mm in the last one (tolerance {options.Tolerance * 1e3:G3} mm); ") +
            "the coupling is too strong for the fixed-point iteration: use a gentler taper, more slots or coupling: none"),
            options.MaximumIterations, Math.Max(lastIt.MaximumOffsetChange, lastIt.MaximumLengthChange));
    }

    private static ElliottResult Finish(IShuntSlotModel slot, ArrayDesign uncoupled, ElliottSlotSurrogate surrogate,
        MutualImpedanceModel coupling, double[] side, double[] x, double[] len, double[] a, double[] target, List<ElliottIteration> history, double tolerance)
    {
        int n = x.Length;
        var f0 = uncoupled.DesignFrequency;
        var guide = uncoupled.Guide;
        var z = coupling(Placements(uncoupled, side, x, len), uncoupled.Slots[0].Width, f0);
        var direct = new Complex[n];
        var fn = new double[n];
        var volts = new Complex[n];
        double err = 0;
        for (int i = 0; i < n; i++)
        {
            direct[i] = slot.Admittance(side[i] * x[i], Length.FromMeters(len[i]), f0);
            err = Math.Max(err, (surrogate.Admittance(x[i], len[i]) - direct[i]).Magnitude / direct[i].Magnitude);
            fn[i] = F(guide, f0, x[i], len[i]);
            volts[i] = a[i];
        }
        var ya = ElliottDesignEquations.ActiveAdmittances(direct, fn, volts, z, ElliottDesignEquations.Gamma0(guide, f0));
        var slots = new SlotDesign[n];
        for (int i = 0; i < n; i++)
        {
            var u = uncoupled.Slots[i];
            slots[i] = u with { Coupling = side[i] * x[i], Length = Length.FromMeters(len[i]), Conductance = target[i] };
        }
        var warnings = uncoupled.Warnings.ToList();
        foreach (var s in slots)
            foreach (var w in slot.Warnings(s.Coupling, f0))
                if (!warnings.Contains(w)) warnings.Add(w);
        var design = uncoupled with { Slots = Array.AsReadOnly(slots), Warnings = warnings.AsReadOnly() };
        return new ElliottResult(design, uncoupled, history.AsReadOnly(), Array.AsReadOnly(ya), err, tolerance);
    }

    private static LongitudinalSlotPlacement[] Placements(ArrayDesign d, double[] side, double[] x, double[] len)
    {
        var p = new LongitudinalSlotPlacement[x.Length];
        for (int i = 0; i < p.Length; i++)
            p[i] = new LongitudinalSlotPlacement(d.Slots[i].Position, Length.FromMeters(side[i] * x[i]), Length.FromMeters(0.5 * len[i]));
        return p;
    }

    internal static double F(Waveguides.RectangularWaveguide guide, Frequency f0, double x, double len)
        => ElliottDesignEquations.CouplingFunction(guide, f0, Length.FromMeters(x), Length.FromMeters(0.5 * len));

    /// <summary>
    /// Damped 2-D Newton for slot i: 1/y(x, L) + C/f(x, L)² − 1/T = 0 (real and imaginary parts), scaled by T.
    /// </summary>
    internal static (double X, double L) SolveSlot(ElliottSlotSurrogate s, Waveguides.RectangularWaveguide guide, Frequency f0, int i,
        double x, double l, Complex c, double t, int newtonIterations)
    {
        double xMin = 0.25 * s.MinimumOffset, xMax = s.MaximumOffset;
        Complex R(double xx, double ll)
        {
            double ff = F(guide, f0, xx, ll);
            return t * (1 / s.Admittance(xx, ll) + c / (ff * ff)) - 1;
        }
        var r = R(x, l);
        for (int k = 0; k < newtonIterations; k++)
        {
            double res = r.Magnitude;
            if (res < 1e-13) return (x, l);
            double hx = 1e-7, hl = 1e-7;
            var rx = (R(x + hx, l) - R(x - hx, l)) / (2 * hx);
            var rl = (R(x, l + hl) - R(x, l - hl)) / (2 * hl);
            // [Re rx Re rl; Im rx Im rl] [dx; dl] = −[Re r; Im r]
            double det = rx.Real * rl.Imaginary - rl.Real * rx.Imaginary;
            if (det == 0 || !double.IsFinite(det))
                throw new ConvergenceException(FormattableString.Invariant($"slot {i + 1}: the Newton Jacobian of Elliott's equations is singular at x = {x * 1e3:G6} mm, L = {l * 1e3:G6} mm"), k, res);
            double dx = -(r.Real * rl.Imaginary - rl.Real * r.Imaginary) / det;
            double dl = -(rx.Real * r.Imaginary - r.Real * rx.Imaginary) / det;
            double step = 1;
            double xn = x, ln = l;
            Complex rn = r;
            for (int half = 0; half < 30; half++, step *= 0.5)
            {
                xn = Math.Clamp(x + step * dx, xMin, xMax);
                ln = l + step * dl;
                double lr = s.ResonantLength(xn);
                ln = Math.Clamp(ln, ElliottSlotSurrogate.MinimumRatio * lr, ElliottSlotSurrogate.MaximumRatio * lr);
                rn = R(xn, ln);
                if (rn.Magnitude < res) break;
            }
            bool small = Math.Abs(xn - x) < 1e-12 && Math.Abs(ln - l) < 1e-12;
            x = xn; l = ln; r = rn;
            if (small) break;
        }
        if (r.Magnitude < 1e-9) return (x, l);
        double lrEnd = s.ResonantLength(x);
        bool atEdge = x >= xMax * (1 - 1e-9) || x <= xMin * (1 + 1e-9)
            || l <= ElliottSlotSurrogate.MinimumRatio * lrEnd * (1 + 1e-9) || l >= ElliottSlotSurrogate.MaximumRatio * lrEnd * (1 - 1e-9);
        if (atEdge)
            throw new InfeasibleDesignException((
                FormattableString.Invariant($"slot {i + 1} needs an active conductance {t:0.0000} that the slot model cannot give within offsets {xMin * 1e3:0.###}–{xMax * 1e3:0.###} mm ") +
                FormattableString.Invariant($"and lengths {ElliottSlotSurrogate.MinimumRatio:0.00}–{ElliottSlotSurrogate.MaximumRatio:0.00} of resonance (stopped at x = {x * 1e3:0.###} mm, ") +
                FormattableString.Invariant($"L = {l * 1e3:0.###} mm, residual {r.Magnitude:G3}): use more slots or a gentler taper")));
        throw new ConvergenceException((
            FormattableString.Invariant($"slot {i + 1}: Newton on Elliott's equations stopped with residual {r.Magnitude:G3} at x = {x * 1e3:0.####} mm, L = {l * 1e3:0.####} mm ") +
            FormattableString.Invariant($"(active conductance {t:0.0000} asked of it): the coupling is too strong for this slot; use a gentler taper, more slots or coupling: none")),
            newtonIterations, r.Magnitude);
    }
}
