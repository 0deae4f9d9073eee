using System.Globalization;
using SlotArray.Core.Network;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;

namespace SlotArray.Core.Design;

/// <summary>Options of the coupled travelling-wave designer.</summary>
/// <param name="Coupling">The mutual-impedance model; null: <see cref="CoupledSlotImpedances.HalfCosineCentreReferred"/>.</param>
/// <param name="ToleranceDb">Stop when every slot's |e_n|² is within this many dB of its share of the taper (power dB); default 1e-4, &gt; 0.</param>
/// <param name="MaximumIterations">Coupled solutions before <see cref="ConvergenceException"/>; default 100, ≥ 1.</param>
/// <param name="CorrectPhase">Also move each slot's length off isolated resonance so that the slot-voltage phases follow the
/// travelling-wave progression e^{jβz_n} (default true).</param>
/// <param name="ToleranceDegrees">With <paramref name="CorrectPhase"/>: stop only when every slot-voltage phase is within this many
/// degrees of the progression (mean removed); default 0.01, &gt; 0.</param>
internal sealed record CoupledTravellingWaveOptions(MutualImpedanceModel? Coupling = null, double ToleranceDb = 1e-4, int MaximumIterations = 100,
    bool CorrectPhase = true, double ToleranceDegrees = 0.01)
{
    /// <summary>The defaults.</summary>
    public static CoupledTravellingWaveOptions Default { get; } = new();

    /// <summary>Receives one report per coupled solution (done of at most <see cref="MaximumIterations"/>); null for none.</summary>
    public IProgress<WorkProgress>? Progress { get; init; }

    /// <summary>Stops the iteration with an <see cref="OperationCanceledException"/>.</summary>
    public CancellationToken Cancellation { get; init; }
}

/// <summary>A travelling-wave design corrected for the external mutual coupling, and the isolated-slot design it started from.</summary>
/// <param name="Design">The coupled design (same layout, terminations and signs as <see cref="Uncoupled"/>; offsets and lengths re-chosen).</param>
/// <param name="Uncoupled">The isolated-slot design of <see cref="TravellingWaveDesigner"/> (the start).</param>
/// <param name="Iterations">Coupled network solutions performed.</param>
/// <param name="ResidualDb">Final largest |10 log10(P̃_n/T_n)|, power dB (see <see cref="CoupledTravellingWaveDesigner"/>).</param>
/// <param name="History">That residual after each coupled solution, first (the isolated-slot design) to last.</param>
/// <param name="AtDesign">The coupled network solution of <see cref="Design"/> at the design frequency (the last iterate).</param>
/// <param name="PhaseErrorDegrees">Largest departure of the slot-voltage phases of <see cref="AtDesign"/> from the progression e^{jβz_n}
/// (alternation sign and mean removed), degrees.</param>
internal sealed record CoupledTravellingWaveDesign(
    ArrayDesign Design,
    TravellingWaveDesign Uncoupled,
    int Iterations,
    double ResidualDb,
    IReadOnlyList<double> History,
    NetworkSolution AtDesign,
    double PhaseErrorDegrees) : StickDesign(Design);

/// <summary>
/// Travelling-wave array of longitudinal broad-wall slots designed with the external mutual coupling included: the
/// isolated-slot design of <see cref="TravellingWaveDesigner"/> refined by a fixed point driven by the coupled network
/// (<see cref="CoupledArrayNetwork"/>, matched load) instead of the isolated-slot line.
/// </summary>
/// <remarks>
/// <para>Why not Elliott's equal-voltage form: R. S. Elliott's design equations (IEEE Trans. AP-31, 48–53, 1983, eqs.
/// (E1), (E2)) fix the mode voltages V_n by the feed; for a standing-wave array they are equal
/// in magnitude. On a travelling-wave line they are set by the line itself (the power taken by the slots feed-side of
/// slot n), so they are unknowns of the same system. The coupled network solves exactly that system (line and slot
/// voltages together), and this designer iterates on it.</para>
/// <para>Method. The aperture taper is applied to the slot voltages e_n (the excitations of the coupled solution), which
/// are what the pattern sums. Each iteration (1) solves the coupled network at f0 for the current geometry;
/// (2) sets the targets T_n = s_n (1 − P_L − W − R), s_n = a_n²/Σa², with W, R the wall loss and reflected power of
/// that solution; (3) forms P̃_n = |e_n|² ΣP_m/Σ|e_m|², the slot-voltage powers scaled to the radiated total, so that
/// P̃_n = T_n for every slot means the slot voltages follow the taper and, by the power balance
/// (P_L = 1 − ΣP − W − R), the load receives exactly P_L; (4) updates each slot's conductance as
/// <see cref="TravellingWaveDesigner"/> does, g_n ← g(p = T_n/A_n) with A_n = P̃_n/p(g_n) and the single-shunt p(g) =
/// 4g/(2 + g)², and turns g_n into an offset and resonant length with the isolated-slot model
/// (<see cref="IShuntSlotModel.ForConductance"/>), the offset's sign kept from the start. It stops when
/// max_n |10 log10(P̃_n/T_n)| &lt; <see cref="CoupledTravellingWaveOptions.ToleranceDb"/>.</para>
/// <para>Phases (<see cref="CoupledTravellingWaveOptions.CorrectPhase"/>, default on). The mutual reactance and the line
/// reflections turn each slot voltage off the progression e^{jβz_n}. Each iteration measures the departure δ_n (alternation
/// sign and circular mean removed) and moves slot n's length by −δ_n/(d arg y_n/dl), the slope of the isolated slot's
/// admittance phase from the slot model (central difference): with the line and the neighbours fixed, w_n turns with y_n to
/// first order through the self term f_n²/y_n of the Galerkin equation (Elliott 1983). The length
/// shift is kept per slot and added to the resonant length of the updated conductance; the amplitude step absorbs the
/// |y_n| lost off resonance, since it is driven by the measured |e_n|. Stop: the amplitude residual below
/// <see cref="CoupledTravellingWaveOptions.ToleranceDb"/> and every |δ_n| below
/// <see cref="CoupledTravellingWaveOptions.ToleranceDegrees"/>.</para>
/// <para>Convergence, measured (Stevenson-type test double, WR-90 aluminium, 24 slots, Taylor 30 dB n̄ = 4, d = 0.45 λg,
/// P_L = 5 %): amplitude residual 1.69 dB on the isolated-slot design, then falling about tenfold every eight iterations
/// (not monotonically), 6e-5 dB after 41 coupled solutions with phases within 4e-4 deg; amplitudes only: 34 solutions.
/// It is a fixed point, not a Newton step; it contracts because the mutual terms between slots 0.4–0.45 λg apart on
/// alternating offsets are small against the self terms, and has no proof of convergence beyond that.</para>
/// <para>Without coupling, with phases off, and with a slot whose resonant conductance is Stevenson's Γ0 f_r², P̃_n equals
/// the power into slot n, so the first iteration confirms the isolated-slot design and it is returned unchanged.</para>
/// </remarks>
internal static class CoupledTravellingWaveDesigner
{
    /// <summary>Largest length change of one phase-correction step, as a fraction of the slot's resonant length (0.05).</summary>
    public const double MaximumStepFraction = 0.05;

    /// <summary>Largest total detuning of a slot, as a fraction of its resonant length (0.25), before the design is refused.</summary>
    public const double MaximumDetuningFraction = 0.25;

    /// <summary>
    /// Largest shortfall of a released slot held at the slot's largest conductance (<c>releaseSaturated</c>), power dB: 0.1 dB
    /// (1.2 % in amplitude, below the spread a slot's machining tolerances give; common practice, no source).
    /// </summary>
    public const double MaximumHeldShortfallDb = 0.1;

    /// <summary>
    /// Designs the array (see remarks). Throws <see cref="InfeasibleDesignException"/> naming the slot when one must
    /// absorb more than a shunt slot can (p &gt; 0.5) or more than the slot model's largest conductance, and
    /// <see cref="ConvergenceException"/> when the fixed point does not reach the tolerance.
    /// </summary>
    /// <param name="stick">The stick (travelling-wave feed; the isolated-slot model of longitudinal, offset-coupled slots;
    /// amplitudes a_n non-zero, slot 1 nearest the load first).</param>
    /// <param name="options">Coupling model and tolerances; null for <see cref="CoupledTravellingWaveOptions.Default"/>.</param>
    public static CoupledTravellingWaveDesign Design(StickRequest stick, CoupledTravellingWaveOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(stick);
        options ??= CoupledTravellingWaveOptions.Default;
        var slot = stick.Slot;
        if (slot.CouplingKind != SlotCouplingKind.Offset)
            throw new ArgumentException("the coupled travelling-wave designer is for longitudinal (offset) slots", nameof(stick));
        var start = TravellingWaveDesigner.Design(stick);
        var f0 = stick.DesignFrequency;
        return Iterate(stick, options, start, d => CoupledArrayNetwork.Solve(d, slot, f0, options.Coupling), " under mutual coupling");
    }

    /// <summary>
    /// The fixed point of the remarks on a given network: <paramref name="solve"/> returns the network solution of a
    /// geometry at the design frequency (the coupled network here; the isolated-slot line for
    /// <see cref="TravellingWavePointing"/>, which corrects the phases of an uncoupled design the same way).
    /// </summary>
    /// <param name="stick">The stick (travelling-wave feed; amplitudes a_n, slot 1 first; the isolated-slot model).</param>
    /// <param name="options">Tolerances and the phase switch (<see cref="CoupledTravellingWaveOptions.Coupling"/> is not read).</param>
    /// <param name="start">The isolated-slot design to start from.</param>
    /// <param name="solve">Network solution of a geometry at the design frequency.</param>
    /// <param name="context">Words added to the error messages after "the power arriving at it", e.g. " under mutual coupling".</param>
    /// <param name="phaseSlope">κ of the phase progression e^{jκz_n} the slot voltages are brought to, rad/m; null: β of the guide.</param>
    /// <param name="releaseSaturated">When a detuned slot would need more conductance than the slot gives (detuning lowers the
    /// real part of its admittance), put it back to resonance, leave its phase free and hold it at the slot's largest
    /// conductance (its power may then fall short of its share by up to <see cref="MaximumHeldShortfallDb"/>) instead of
    /// refusing the design; the other slots still follow the progression (the caller then aims the progression's slope at
    /// the asked beam). Off for the coupled designer.</param>
    internal static CoupledTravellingWaveDesign Iterate(StickRequest stick, CoupledTravellingWaveOptions options, TravellingWaveDesign start,
        Func<ArrayDesign, NetworkSolution> solve, string context, double? phaseSlope = null, bool releaseSaturated = false)
    {
        ArgumentNullException.ThrowIfNull(stick);
        ArgumentNullException.ThrowIfNull(options);
        ArgumentNullException.ThrowIfNull(start);
        if (!(options.ToleranceDb > 0)) throw new ArgumentOutOfRangeException(nameof(options), options.ToleranceDb, "the tolerance must be positive (dB)");
        if (options.MaximumIterations < 1) throw new ArgumentOutOfRangeException(nameof(options), options.MaximumIterations, "at least one iteration is needed");
        var slot = stick.Slot;
        var amplitudes = stick.Amplitudes;
        var f0 = stick.DesignFrequency;
        double loadFraction = start.LoadFraction;
        int n = start.Design.Count;
        double sumSquares = amplitudes.Sum(a => a * a);
        var shape = amplitudes.Select(a => a * a / sumSquares).ToArray();
        var g = start.Design.Slots.Select(s => s.Conductance).ToArray();
        double gMax = slot.MaximumConductance(f0);
        var design = start.Design;
        var history = new List<double>();
        var lengthShift = new double[n];
        var free = new bool[n];
        double beta = phaseSlope ?? start.Design.Guide.PhaseConstant(f0);
        int iterations = 0;
        while (true)
        {
            options.Cancellation.ThrowIfCancellationRequested();
            var sol = solve(design);
            iterations++;
            options.Progress?.Report(new WorkProgress("coupled travelling-wave iterations", iterations, options.MaximumIterations));
            double budget = 1 - loadFraction - sol.WallLoss - sol.ReflectedPower;
            if (!(budget > 0))
                throw new InfeasibleDesignException(string.Create(CultureInfo.InvariantCulture,
                    $"wall loss {sol.WallLoss:0.###} and reflection {sol.ReflectedPower:0.###}{context} leave nothing to radiate after the {loadFraction * 100:0.###} % for the load: leave less for the load or move the spacing away from 0.5 guide wavelength"));
            double e2Sum = sol.Excitations.Sum(e => e.Magnitude * e.Magnitude);
            double scale = sol.RadiatedPower / e2Sum;
            var effective = sol.Excitations.Select(e => e.Magnitude * e.Magnitude * scale).ToArray();
            // A released slot held at the slot's largest conductance cannot follow its share: its shortfall is tracked apart
            // and accepted up to MaximumHeldShortfallDb.
            double residual = 0, held = 0;
            for (int i = 0; i < n; i++)
            {
                double error = Math.Abs(10 * Math.Log10(effective[i] / (shape[i] * budget)));
                if (free[i] && g[i] >= gMax) held = Math.Max(held, error);
                else residual = Math.Max(residual, error);
            }
            history.Add(Math.Max(residual, held));
            var departure = PhaseDepartures(sol, design, beta, free);
            double phaseError = departure.Max(Math.Abs) * 180 / Math.PI;
            if (residual < options.ToleranceDb && held <= MaximumHeldShortfallDb && (!options.CorrectPhase || phaseError < options.ToleranceDegrees))
            {
                // The isolated-slot designer's phase-ripple warning no longer applies once the phases are corrected.
                if (options.CorrectPhase)
                    design = design with { Warnings = [.. design.Warnings.Where(w => w.Code != "travelling-wave-phase-ripple"), .. FreeSlotsWarning(free, held, context)] };
                return new CoupledTravellingWaveDesign(design, start, iterations, Math.Max(residual, held), history.AsReadOnly(), sol, phaseError);
            }
            if (iterations >= options.MaximumIterations)
                throw new ConvergenceException(string.Create(CultureInfo.InvariantCulture,
                    $"the travelling-wave design{context} did not bring every slot voltage within {options.ToleranceDb} dB of the taper (residual in power dB; phases {phaseError:0.###} deg off the progression): strong coupling between neighbours; increase the spacing or use a gentler taper"),
                    iterations, Math.Max(residual, held));
            var step = new CorrectionStep(stick, options, context, loadFraction, gMax, shape, budget, effective, departure, releaseSaturated);
            design = design with { Slots = Array.AsReadOnly(NextSlots(step, design, g, lengthShift, free)) };
        }
    }

    /// <summary>What one iteration measured and the limits it works within, for <see cref="NextSlots"/>.</summary>
    private sealed record CorrectionStep(StickRequest Stick, CoupledTravellingWaveOptions Options, string Context, double LoadFraction,
        double MaximumConductance, double[] Shape, double Budget, double[] Effective, double[] Departure, bool ReleaseSaturated);

    /// <summary>
    /// The next geometry of the fixed point: each slot's conductance from its measured power (<paramref name="g"/> updated
    /// in place), its offset from the slot model, and with phase correction its length moved by the departure of its voltage
    /// phase (<paramref name="lengthShift"/> updated in place). A slot released by <see cref="CorrectionStep.ReleaseSaturated"/>
    /// is marked in <paramref name="free"/>, put back to resonance and its conductance held at the slot's largest.
    /// </summary>
    private static SlotDesign[] NextSlots(CorrectionStep step, ArrayDesign design, double[] g, double[] lengthShift, bool[] free)
    {
        var slot = step.Stick.Slot;
        var f0 = step.Stick.DesignFrequency;
        string context = step.Context;
        double loadFraction = step.LoadFraction, gMax = step.MaximumConductance;
        int n = design.Count;
        var slots = new SlotDesign[n];
        for (int i = 0; i < n; i++)
        {
            double arriving = step.Effective[i] / TravellingWaveConductances.AbsorbedFraction(g[i]);
            double p = step.Shape[i] * step.Budget / arriving;
            if (!(p > 0 && p <= 0.5))
                throw new InfeasibleDesignException(string.Create(CultureInfo.InvariantCulture,
                    $"slot {i + 1} must absorb p = {p:0.###} of the power arriving at it{context}, beyond the 0.5 a shunt slot on a matched line can take: leave more power for the load (now {loadFraction * 100:0.###} %), use more slots or a gentler taper"));
            g[i] = TravellingWaveConductances.SingleShuntConductance(p);
            if (g[i] > gMax && step.ReleaseSaturated && step.Options.CorrectPhase && (lengthShift[i] != 0 || free[i]))
            {
                // Detuning lowers the slot's real admittance, so it asks for more conductance than the slot gives: resonant
                // again, its phase left to the line, and the most conductance the slot has.
                free[i] = true;
                lengthShift[i] = 0;
                g[i] = gMax;
            }
            if (g[i] > gMax)
                throw new InfeasibleDesignException(string.Create(CultureInfo.InvariantCulture,
                    $"slot {i + 1} needs g = {g[i]:0.000}{context}, above the {gMax:0.000} the {slot.Name} can give at {f0}: leave more power for the load (now {loadFraction * 100:0.###} %), use more slots or a gentler taper"));
            var r = slot.ForConductance(g[i], f0);
            var s0 = design.Slots[i];
            if (step.Options.CorrectPhase && !free[i])
            {
                // A secant step of arg y(l) can overshoot far from resonance: take at most 5 % of the length per
                // iteration, and refuse a slot detuned by more than a quarter of its resonant length (its admittance
                // phase then saturates near ±90° and no length gives the phase asked).
                double resonant = r.ResonantLength.Meters, change = LengthForPhase(slot, r.Coupling, resonant + lengthShift[i], -step.Departure[i], f0, i);
                lengthShift[i] += Math.Clamp(change, -MaximumStepFraction * resonant, MaximumStepFraction * resonant);
                if (Math.Abs(lengthShift[i]) > MaximumDetuningFraction * resonant)
                    throw new InfeasibleDesignException(string.Create(CultureInfo.InvariantCulture,
                        $"slot {i + 1} would have to be detuned by more than {MaximumDetuningFraction:P0} of its resonant length ({resonant * 1e3:0.###} mm) to turn its phase by {-step.Departure[i] * 180 / Math.PI:0.#} deg{context}: move the spacing away from 0.5 guide-wavelength"));
            }
            slots[i] = s0 with
            {
                Coupling = Math.Sign(s0.Coupling) * Math.Abs(r.Coupling),
                Length = Quantities.Length.FromMeters(r.ResonantLength.Meters + lengthShift[i]),
                Conductance = g[i],
            };
        }
        return slots;
    }

    /// <summary>The note that names the slots left resonant with their phase free (<see cref="NextSlots"/>); none when there are none.</summary>
    private static IEnumerable<DesignWarning> FreeSlotsWarning(bool[] free, double heldDb, string context)
    {
        var names = Enumerable.Range(0, free.Length).Where(i => free[i]).Select(i => (i + 1).ToString(CultureInfo.InvariantCulture)).ToList();
        if (names.Count == 0) yield break;
        yield return new DesignWarning("travelling-wave-phase-free-slots", string.Create(CultureInfo.InvariantCulture,
            $"slot{(names.Count > 1 ? "s" : "")} {string.Join(", ", names)} would need more conductance than the slot gives if detuned for phase{context}: left resonant with {(names.Count > 1 ? "their" : "its")} phase free (at most {heldDb:0.###} dB below {(names.Count > 1 ? "their shares" : "its share")} of the power, held at the slot's largest conductance); the other slots follow the progression, whose slope was aimed at the asked beam"));
    }

    /// <summary>
    /// Phase of each slot voltage (alternation sign removed) against the progression e^{jβz_n}, after removing the
    /// circular mean of the slots that follow it, radians; 0 for a slot whose phase is free.
    /// </summary>
    private static double[] PhaseDepartures(NetworkSolution solution, ArrayDesign design, double beta, bool[] free)
    {
        int n = design.Count;
        var dev = new System.Numerics.Complex[n];
        System.Numerics.Complex mean = 0;
        for (int i = 0; i < n; i++)
        {
            var e = solution.Excitations[i] * Math.Sign(design.Slots[i].Coupling)
                * System.Numerics.Complex.FromPolarCoordinates(1, -beta * design.Slots[i].Position.Meters);
            dev[i] = e / e.Magnitude;
            if (!free[i]) mean += dev[i];
        }
        return [.. dev.Select((d, i) => free[i] ? 0 : (d / mean).Phase)];
    }

    /// <summary>
    /// Length change that turns the isolated slot's admittance phase by <paramref name="turn"/> (one secant step of
    /// arg y(l) from the slot model): with the coupling and the line fixed, the slot voltage w_n turns with y_n to first
    /// order (the self term f_n²/y_n of the Galerkin equation, Elliott 1983).
    /// </summary>
    private static double LengthForPhase(IShuntSlotModel slot, double coupling, double length, double turn, Quantities.Frequency f, int index)
    {
        double h = 1e-6 * length;
        double slope = (slot.Admittance(coupling, Quantities.Length.FromMeters(length + h), f).Phase
            - slot.Admittance(coupling, Quantities.Length.FromMeters(length - h), f).Phase) / (2 * h);
        if (!(Math.Abs(slope) > 0) || !double.IsFinite(slope))
            throw new InfeasibleDesignException(string.Create(CultureInfo.InvariantCulture,
                $"slot {index + 1}: the slot model's admittance phase does not change with length at {length * 1e3:0.###} mm, so its phase cannot be corrected: use CorrectPhase = false"));
        return turn / slope;
    }
}
