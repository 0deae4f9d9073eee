using System.Globalization;
using System.Numerics;
using SlotArray.Core.Network;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Design;

/// <summary>Options of the travelling-wave designer.</summary>
/// <param name="Form">Closed form of the isolated-slot start (default: the exact single shunt).</param>
/// <param name="Refine">Refine the conductances on the full network model (default true); false keeps the closed form.</param>
/// <param name="ToleranceDb">Refinement stops when every slot's radiated power is within this many dB of its target
/// (power dB; amplitude error is half); default 1e-4 dB, &gt; 0.</param>
/// <param name="MaximumIterations">Refinement iterations before <see cref="ConvergenceException"/>; default 100, ≥ 1.</param>
internal sealed record TravellingWaveOptions(
    TravellingWaveConductanceForm Form = TravellingWaveConductanceForm.SingleShunt,
    bool Refine = true,
    double ToleranceDb = 1e-4,
    int MaximumIterations = 100)
{
    /// <summary>The defaults.</summary>
    public static TravellingWaveOptions Default { get; } = new();
}

/// <summary>How a travelling-wave design's beam was put where it was asked (<see cref="TravellingWavePointing"/>).</summary>
internal enum PointingCorrection
{
    /// <summary>Resonant slots, the spacing as given: the beam lies where the loaded line puts it.</summary>
    None,
    /// <summary>Slot lengths detuned so that the slot voltages follow the unloaded progression e^{jβz_n}.</summary>
    LengthDetuning,
    /// <summary>Resonant slots, the spacing moved until the achieved beam lies where it was asked.</summary>
    Spacing,
}

/// <summary>How the network refinement went.</summary>
/// <param name="Iterations">Network solutions performed (0 when refinement was off).</param>
/// <param name="ResidualDb">Final largest |10 log10(P_n/T_n)| over the slots, power dB (P_n radiated in the network, T_n the target).</param>
/// <param name="History">That residual after each iteration, dB, first to last (the closed-form start first).</param>
internal sealed record TravellingWaveRefinement(int Iterations, double ResidualDb, IReadOnlyList<double> History);

/// <summary>A designed travelling-wave array and the figures of its design.</summary>
/// <param name="Design">The array: slots from the load-end datum, matched load at z = 0, feed plane beyond the last slot.</param>
/// <param name="LoadFraction">Fraction of the input power asked for the load, P_L.</param>
/// <param name="TargetPowers">T_n: power slot n (by index, from the datum) must radiate, fractions of the incident power (Σ T_n = 1 − P_L − wall loss − reflected).</param>
/// <param name="ClosedFormConductances">g_n of the closed-form start (by index), before refinement.</param>
/// <param name="Refinement">Convergence of the network refinement.</param>
/// <param name="AchievedErrorDb">Largest amplitude error |10 log10(P_n/T_n)|/2, dB, of the design re-analysed with the real slot model at the design frequency.</param>
/// <param name="Squint">Main-beam direction at the design frequency from the phase condition (positive toward the load end), or null if not in real space.</param>
/// <param name="ScanRate">dθ_b/df at the design frequency, rad/Hz, or null.</param>
internal sealed record TravellingWaveDesign(
    ArrayDesign Design,
    double LoadFraction,
    IReadOnlyList<double> TargetPowers,
    IReadOnlyList<double> ClosedFormConductances,
    TravellingWaveRefinement Refinement,
    double AchievedErrorDb,
    Angle? Squint,
    double? ScanRate) : StickDesign(Design)
{
    /// <summary>Largest departure of the slot excitations' phases from the travelling-wave progression at the design frequency, degrees (mean removed).</summary>
    public double PhaseErrorDegrees { get; init; }

    /// <summary>How the beam was put where the phase condition asks (<see cref="TravellingWavePointing"/>).</summary>
    public PointingCorrection Correction { get; init; }

    /// <summary>The direction asked for: the phase condition at the spacing given (or from <c>feed.beam</c>); null when not in real space.</summary>
    public Angle? AskedBeam { get; init; }

    /// <summary>Iterations of the pointing correction (0 when not corrected).</summary>
    public int PhaseIterations { get; init; }

    /// <summary>Scan rate in degrees per 100 MHz, or null.</summary>
    public double? ScanRateDegreesPer100MHz => ScanRate is { } r ? r * 180 / Math.PI * 1e8 : null;
}

/// <summary>
/// Travelling-wave (non-resonant) array of shunt slots: spacing d ≠ λg/2, alternating offsets or tilts, a matched load
/// beyond the last slot, each slot radiating its share P_n ∝ a_n² of the taper, and the fraction P_L of the input
/// power left for the load (small-g form, Elliott 1981, Ch. 8; see <c>TravellingWaveConductances</c>).
/// </summary>
/// <remarks>
/// <para>Layout and datum: the longitudinal datum is the inner face of the load-end flange, z = 0, where the matched
/// load is. Slot 1 is nearest the load, at z = <see cref="EndDistanceInSpacings"/>·d; slot n at z_1 + (n − 1)d; the
/// feed plane (the inner face of the feed flange) lies the same distance beyond slot N. The wave travels from the
/// feed toward the datum, so the beam squints toward the load end for θ_b &gt; 0 (architecture.md "Axes",
/// <see cref="TravellingWaveBeam"/>), the sign the pattern analysis (<see cref="ArrayFigures"/>) uses.</para>
/// <para>Method. (1) Closed-form start, slot by slot from the feed (<c>TravellingWaveConductances</c>):
/// T_n = c a_n² with the scale c found (bisection, 1e-12 relative) so that, with the section losses e^{−2αd}
/// and (single-shunt form) the reflections booked as lost, exactly P_L reaches the load. (2) Refinement on the full
/// network model: the same lossy line the analysis uses (<see cref="ArrayNetwork"/>'s line network, matched load,
/// resonant slots y_n = g_n at the design frequency), solved with all reflections and their phases. Each iteration
/// sets the targets T_n = a_n² (1 − P_L − W − R)/Σ a_m², with W and R the network's wall loss and reflected power,
/// and updates each slot as an isolated shunt would: the network's radiated power P_n and p(g_n) = 4g_n/(2 + g_n)²
/// give the effective arriving power A_n = P_n/p(g_n), and g_n ← g(p = T_n/A_n) by the single-shunt inversion.
/// At a fixed point P_n = T_n for every slot and, by the power balance, the load receives exactly P_L. The iteration
/// stops when max_n |10 log10(P_n/T_n)| &lt; <see cref="TravellingWaveOptions.ToleranceDb"/> and throws
/// <see cref="ConvergenceException"/> after <see cref="TravellingWaveOptions.MaximumIterations"/>; it contracts
/// because each slot's update is exact for its own power and the coupling through the slots' small reflections is
/// weak away from λg/2 spacing. Measured (WR-90 aluminium, 32 slots, Taylor 30 dB n̄ = 4, d = 0.45 λg, P_L = 5 %):
/// the closed-form start is 0.54 dB off in power; the residual then falls about tenfold every five iterations, not
/// monotonically (it oscillates with a period of about three iterations while the reflections settle), below 1e-4 dB
/// after about 20 iterations and below 1e-9 dB after 45. (3) Geometry: each g_n is turned
/// into a coupling (offset or tilt) and the length resonant at the design frequency by the slot model
/// (<see cref="IShuntSlotModel.ForConductance"/>), the coupling's sign alternating slot to slot (and flipped for a
/// negative a_n). (4) Check: the design is re-analysed with the slot model itself
/// (<see cref="TravellingWaveDesign.AchievedErrorDb"/>).</para>
/// <para>Isolated slots: external mutual coupling is not included.</para>
/// </remarks>
internal static class TravellingWaveDesigner
{
    /// <summary>Distance from the end slots to the load flange and to the feed flange, in slot spacings (1: one spacing d).</summary>
    public const double EndDistanceInSpacings = 1.0;

    /// <summary>
    /// Designs the stick (see remarks). Throws <see cref="InfeasibleDesignException"/> when a slot must absorb more than
    /// a shunt slot can (p &gt; 0.5) or more than the slot model's largest conductance, or the line loss alone takes
    /// more than 1 − P_L; <see cref="ConvergenceException"/> when the refinement does not converge.
    /// </summary>
    /// <param name="stick">The stick (feed type travelling-wave; amplitudes a_n non-zero, slot 1 nearest the load first;
    /// the slot model's guide must be the stick's).</param>
    /// <param name="options">Form, refinement switch and tolerances; null for <see cref="TravellingWaveOptions.Default"/>.</param>
    public static TravellingWaveDesign Design(StickRequest stick, TravellingWaveOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(stick);
        options ??= TravellingWaveOptions.Default;
        var slot = stick.Slot;
        var amplitudes = stick.Amplitudes;
        if (stick.Feed.Type != FeedType.TravellingWave)
            throw new ArgumentException($"the travelling-wave designer was given a {stick.Feed.Type} feed", nameof(stick));
        if (slot.Guide != stick.Guide)
            throw new ArgumentException($"the slot model is for the guide {slot.Guide.Designation}, not the request's {stick.Guide.Designation}", nameof(stick));
        if (!(options.ToleranceDb > 0)) throw new ArgumentOutOfRangeException(nameof(options), options.ToleranceDb, "the refinement tolerance must be positive (dB)");
        if (options.MaximumIterations < 1) throw new ArgumentOutOfRangeException(nameof(options), options.MaximumIterations, "at least one refinement iteration is needed");

        int n = stick.Count;
        TaperChecks.Require(stick, "travelling-wave");
        double loadFraction = stick.Feed.LoadFraction;
        if (!(loadFraction > 0 && loadFraction < 1))
            throw new InfeasibleDesignException(string.Create(CultureInfo.InvariantCulture,
                $"the load fraction {loadFraction * 100:0.###} % must lie between 0 % and 100 %: set feed.load, e.g. 5 %"));

        var f0 = stick.DesignFrequency;
        var guide = stick.Guide;
        var lambdaG = guide.GuideWavelength(f0);
        var spacing = stick.Feed.Spacing.Resolve(lambdaG);
        if (!(spacing.Meters > 0) || !double.IsFinite(spacing.Meters))
            throw new InfeasibleDesignException($"the slot spacing {spacing} is not a positive length: give feed.spacing > 0");
        var end = EndDistanceInSpacings * spacing;
        var positions = Enumerable.Range(0, n).Select(i => (end + (double)i * spacing).Meters).ToArray();
        double feedPlane = positions[^1] + end.Meters;
        double alpha = guide.ConductorAttenuation(f0);

        double sumSquares = amplitudes.Sum(a => a * a);
        var shape = amplitudes.Select(a => a * a / sumSquares).ToArray();
        var signs = Enumerable.Range(0, n).Select(i => (i % 2 == 0 ? 1.0 : -1.0) * Math.Sign(amplitudes[i])).ToArray();

        var (startG, startTargets) = ClosedForm(shape, loadFraction, options.Form, Math.Exp(-2 * alpha * spacing.Meters),
            Math.Exp(-2 * alpha * end.Meters));
        var g = startG.ToArray();
        var targets = startTargets;
        var history = new List<double>();
        if (options.Refine)
            targets = Refine(new LineNetwork(guide, positions, Termination.MatchedLoadAt(end), null, feedPlane), f0, signs, shape,
                loadFraction, g, history, options, DesignAdmittance(slot, f0));

        CheckConductances(g, slot, f0, loadFraction);
        var warnings = new List<DesignWarning>();
        var slots = new SlotDesign[n];
        for (int i = 0; i < n; i++)
        {
            var r = slot.ForConductance(g[i], f0);
            double coupling = signs[i] * Math.Abs(r.Coupling);
            slots[i] = new SlotDesign(i + 1, Length.FromMeters(positions[i]), coupling, r.ResonantLength, slot.Width, g[i], amplitudes[i]);
            foreach (var w in slot.Warnings(coupling, f0))
                if (!warnings.Contains(w)) warnings.Add(w);
        }
        var squint = TravellingWaveBeam.Direction(guide, spacing, f0);
        AddRuleWarnings(warnings, guide, f0, lambdaG, spacing, squint);

        var design = new ArrayDesign(stick.Name, f0, guide, lambdaG, spacing, FeedPosition.End, slot.CouplingKind, slot.Name,
            Array.AsReadOnly(slots), Termination.MatchedLoadAt(end), null, Length.FromMeters(feedPlane), 1, warnings.AsReadOnly());
        if (slot.DesignsOffResonance && options.Refine)
            (design, targets) = CompensatePhases(design, slot, signs, shape, loadFraction, g, history, options);
        Fabrication.SlotClearance.Require(design, stick.Cutter);

        var check = ArrayNetwork.Solve(design, slot, f0);
        double error = 0;
        for (int i = 0; i < n; i++)
            error = Math.Max(error, Math.Abs(5 * Math.Log10(check.RadiatedPowers[i] / targets[i])));
        if (error > 0.1)
            warnings.Add(new DesignWarning("travelling-wave-slot-model-residual", string.Create(CultureInfo.InvariantCulture,
                $"re-analysed with the slot model itself, the aperture amplitudes depart from the taper by up to {error:0.###} dB at {f0} (the model's resonant admittance differs from its tabulated resonance)")));

        // Compensated slots sit off the plain progression on purpose: their departure is measured in the far field.
        double phaseError = slot.DesignsOffResonance && options.Refine ? FarFieldPhaseErrorDegrees(check, design) : PhaseErrorDegrees(check, design);
        if (phaseError > 5)
            warnings.Add(new DesignWarning("travelling-wave-phase-ripple", string.Create(CultureInfo.InvariantCulture,
                $"the slot reflections add partially in phase at {spacing / lambdaG:0.###} guide wavelengths: the slot excitations depart from the travelling-wave phase progression by up to {phaseError:0.#} deg at {f0}, which raises the sidelobes (resonant slots set amplitudes, not phases); a spacing farther from 0.5 guide-wavelength reduces it")));

        var refinement = new TravellingWaveRefinement(history.Count, history.Count > 0 ? history[^1] : double.NaN, history.AsReadOnly());
        return new TravellingWaveDesign(design with { Warnings = warnings.AsReadOnly() }, loadFraction, Array.AsReadOnly(targets),
            Array.AsReadOnly(startG), refinement, error, squint, TravellingWaveBeam.ScanRate(guide, spacing, f0)) { PhaseErrorDegrees = phaseError };
    }

    /// <summary>
    /// Step (2) of the remarks: the network refinement of the conductances <paramref name="g"/> (updated in place) on the
    /// isolated-slot line, one residual per network solution appended to <paramref name="history"/>; returns the last targets T_n.
    /// </summary>
    private static double[] Refine(LineNetwork line, Frequency f0, double[] signs, double[] shape, double loadFraction, double[] g,
        List<double> history, TravellingWaveOptions options, Func<double, Complex> admittanceOf)
    {
        int n = g.Length;
        var y = new Complex[n];
        while (true)
        {
            for (int i = 0; i < n; i++) y[i] = admittanceOf(g[i]);
            var sol = line.Solve(f0, y, signs);
            int iterations = history.Count + 1;
            double budget = 1 - loadFraction - sol.WallLoss - sol.ReflectedPower;
            if (!(budget > 0))
                throw new InfeasibleDesignException(string.Create(CultureInfo.InvariantCulture,
                    $"wall loss {sol.WallLoss:0.###} and reflection {sol.ReflectedPower:0.###} leave nothing to radiate after the {loadFraction * 100:0.###} % for the load: shorten the array, use a better-conducting metal or leave less for the load"));
            var targets = shape.Select(s => s * budget).ToArray();
            double residual = 0;
            for (int i = 0; i < n; i++)
                residual = Math.Max(residual, Math.Abs(10 * Math.Log10(sol.RadiatedPowers[i] / targets[i])));
            history.Add(residual);
            if (residual < options.ToleranceDb) return targets;
            if (iterations >= options.MaximumIterations)
                throw new ConvergenceException(string.Create(CultureInfo.InvariantCulture,
                    $"the travelling-wave refinement did not bring every slot's radiated power within {options.ToleranceDb} dB of the taper (residual in power dB): a spacing close to 0.5 or 1 guide wavelength makes the slot reflections add up; move the spacing away from it"),
                    iterations, residual);
            for (int i = 0; i < n; i++)
            {
                double arriving = sol.RadiatedPowers[i] / TravellingWaveConductances.AbsorbedFraction(g[i]);
                double p = targets[i] / arriving;
                if (p > 0.5)
                    throw new InfeasibleDesignException(string.Create(CultureInfo.InvariantCulture,
                        $"slot {i + 1} must absorb p = {p:0.###} of the power arriving at it (network model), beyond the 0.5 a shunt slot on a matched line can take: leave more power for the load (now {loadFraction * 100:0.###} %), use more slots or a gentler taper"));
                g[i] = TravellingWaveConductances.SingleShuntConductance(p);
            }
        }
    }

    /// <summary>
    /// Phase compensation for slots whose design cut carries a susceptance (<see cref="IShuntSlotModel.DesignsOffResonance"/>):
    /// such a slot's excitation leads or lags by the phase of its admittance, which a resonant design does not have, and
    /// the far field adds the slots in phase only where arg E_n + k z_n sin θ_b is the same for all (the array factor's
    /// sign, <see cref="Patterns.ArrayFactor"/>). Each slot is moved along the guide by δ_n = −φ_n/(β + k sin θ_b), φ_n its
    /// departure from the circular mean, which changes both the wave's phase at the slot (β) and its path to the far field
    /// (k sin θ_b) ([D]; moving slots to set their phases is the travelling-wave designer's usual lever, R. S. Elliott,
    /// <i>Antenna Theory and Design</i>, 1981, Ch. 8, from memory). The conductances are refined again on the moved
    /// positions (the powers), up to five passes or until every departure is below 0.5°; a shift is held within a quarter
    /// of the spacing and the passes stop where the slots would change order or leave the stick.
    /// </summary>
    private static (ArrayDesign Design, double[] Targets) CompensatePhases(ArrayDesign design, IShuntSlotModel slot, double[] signs, double[] shape,
        double loadFraction, double[] g, List<double> history, TravellingWaveOptions options)
    {
        var f0 = design.DesignFrequency;
        var guide = design.Guide;
        double beta = guide.PhaseConstant(f0), k = f0.FreeSpaceWavenumber;
        double sin = TravellingWaveBeam.Direction(guide, design.Spacing, f0) is { } b ? Math.Sin(b.Radians) : 0;
        int n = design.Count;
        double[] targets = [];
        double? kappa = null;
        for (int pass = 0; pass < 5; pass++)
        {
            var sol = ArrayNetwork.Solve(design, slot, f0);
            var z = design.Slots.Select(s => s.Position.Meters).ToArray();
            // The beam's sign convention: the one under which the slots' far-field phases cluster (a resonant design: all equal).
            kappa ??= new[] { beta + k * sin, beta - k * sin }.MinBy(kk => Spread(Departures(sol, z, kk - beta)));
            var phi = Departures(sol, z, kappa.Value - beta);
            if (Spread(phi) < 0.5 * Math.PI / 180) break;
            // A shift is held within a quarter of the spacing, and the compensation stops where it would reorder the slots.
            double reach = 0.25 * design.Spacing.Meters;
            var moved = z.Select((zz, i) => zz - Math.Clamp(phi[i] / kappa.Value, -reach, reach)).ToArray();
            if (moved.Zip(moved.Skip(1), (a, b) => b - a).Any(d => !(d > 0)) || moved[0] <= 0 || moved[^1] >= design.FeedPlane.Meters) break;
            var line = new LineNetwork(guide, moved, design.NearTermination, null, design.FeedPlane.Meters);
            targets = Refine(line, f0, signs, shape, loadFraction, g, history, options, DesignAdmittance(slot, f0));
            var slots = design.Slots.Select((s, i) =>
            {
                var r = slot.ForConductance(g[i], f0);
                return s with { Position = Length.FromMeters(moved[i]), Coupling = signs[i] * Math.Abs(r.Coupling), Length = r.ResonantLength, Conductance = g[i] };
            }).ToArray();
            design = design with { Slots = Array.AsReadOnly(slots) };
        }
        return (design, targets.Length == n ? targets : TargetsOf(design, slot, shape, loadFraction));
    }

    /// <summary>Departure of each slot's far-field phase arg E_n + k sin θ_b z_n from their circular mean, radians.</summary>
    private static double[] Departures(NetworkSolution sol, double[] z, double kSin)
    {
        var u = z.Select((zz, i) => Complex.FromPolarCoordinates(1, sol.Excitations[i].Phase + kSin * zz)).ToArray();
        var mean = u.Aggregate(Complex.Zero, (a, b) => a + b);
        return u.Select(x => (x / mean).Phase).ToArray();
    }

    private static double Spread(double[] phi) => phi.Max(Math.Abs);

    /// <summary>Largest departure, degrees, of the slots' far-field phases at the beam (the better of the two sign conventions, as <see cref="CompensatePhases"/> picks it).</summary>
    private static double FarFieldPhaseErrorDegrees(NetworkSolution sol, ArrayDesign design)
    {
        var f0 = design.DesignFrequency;
        double k = f0.FreeSpaceWavenumber;
        double sin = TravellingWaveBeam.Direction(design.Guide, design.Spacing, f0) is { } b ? Math.Sin(b.Radians) : 0;
        var z = design.Slots.Select(s => s.Position.Meters).ToArray();
        return Math.Min(Spread(Departures(sol, z, k * sin)), Spread(Departures(sol, z, -k * sin))) * 180 / Math.PI;
    }

    /// <summary>The targets T_n of the current design: its radiated total shared by the taper's shape.</summary>
    private static double[] TargetsOf(ArrayDesign design, IShuntSlotModel slot, double[] shape, double loadFraction)
    {
        var sol = ArrayNetwork.Solve(design, slot, design.DesignFrequency);
        double budget = 1 - loadFraction - sol.WallLoss - sol.ReflectedPower;
        return shape.Select(s => s * budget).ToArray();
    }

    /// <summary>
    /// The admittance a slot designed for conductance g presents at f0: g itself for a model whose design cut is resonant;
    /// the complex y of the cut <see cref="IShuntSlotModel.ForConductance"/> gives when the model says the cut may carry a
    /// susceptance (<see cref="IShuntSlotModel.DesignsOffResonance"/>), so the refinement balances the powers the slots
    /// really take.
    /// </summary>
    internal static Func<double, Complex> DesignAdmittance(IShuntSlotModel slot, Frequency f0)
    {
        if (!slot.DesignsOffResonance) return g => g;
        return g =>
        {
            if (g > slot.MaximumConductance(f0)) return g;
            var r = slot.ForConductance(g, f0);
            return slot.Admittance(r.Coupling, r.ResonantLength, f0);
        };
    }

    /// <summary>
    /// Largest departure, degrees, of the slot excitations' phases (alternation sign removed) from the travelling wave's
    /// progression e^{jβ z_n}, after removing their mean (circular mean of the departures).
    /// </summary>
    private static double PhaseErrorDegrees(NetworkSolution solution, ArrayDesign design)
    {
        double beta = design.Guide.PhaseConstant(design.DesignFrequency);
        var dev = new Complex[design.Count];
        Complex mean = 0;
        for (int i = 0; i < dev.Length; i++)
        {
            var e = solution.Excitations[i] * Math.Sign(design.Slots[i].Coupling) * Complex.FromPolarCoordinates(1, -beta * design.Slots[i].Position.Meters);
            dev[i] = e / e.Magnitude;
            mean += dev[i];
        }
        double worst = 0;
        foreach (var d in dev) worst = Math.Max(worst, Math.Abs((d / mean).Phase));
        return worst * 180 / Math.PI;
    }

    /// <summary>
    /// The closed-form start: conductances by slot index and the targets T_n = c·shape_n, c such that P_L reaches the load
    /// (bisection on c; the power past the last slot falls monotonically as c grows).
    /// </summary>
    private static (double[] G, double[] Targets) ClosedForm(double[] shape, double loadFraction, TravellingWaveConductanceForm form,
        double section, double endSection)
    {
        int n = shape.Length;
        // Feed first: slot n (index n − 1) is nearest the feed.
        double Load(double c, out TravellingWaveBudget? budget)
        {
            var powers = new double[n];
            for (int k = 0; k < n; k++) powers[k] = c * shape[n - 1 - k] / endSection;
            try
            {
                budget = TravellingWaveConductances.FromFeed(powers, form, section, k => n - k);
                return budget.PowerPastLastSlot * endSection * endSection;
            }
            catch (InfeasibleDesignException)
            {
                budget = null;
                return double.NegativeInfinity;
            }
        }
        if (Load(0, out _) <= loadFraction)
            throw new InfeasibleDesignException(string.Create(CultureInfo.InvariantCulture,
                $"the wall loss of the line alone leaves no more than {loadFraction * 100:0.###} % for the load: shorten the array, use a better-conducting metal or leave less for the load"));
        double lo = 0, hi = 1;
        while (Load(hi, out _) > loadFraction) hi *= 2;   // c = 1 radiates everything: never loops long
        for (int it = 0; it < 200 && hi - lo > 1e-12 * hi; it++)
        {
            double mid = 0.5 * (lo + hi);
            if (Load(mid, out _) > loadFraction) lo = mid; else hi = mid;
        }
        double loadAt = Load(lo, out var b);
        if (b is null || Math.Abs(loadAt - loadFraction) > 1e-6)
        {
            // The root lies where the form is infeasible: report the first slot that fails there.
            var powers = new double[n];
            for (int k = 0; k < n; k++) powers[k] = hi * shape[n - 1 - k] / endSection;
            TravellingWaveConductances.FromFeed(powers, form, section, k => n - k);
            throw new InfeasibleDesignException(string.Create(CultureInfo.InvariantCulture,
                $"no slot conductances leave {loadFraction * 100:0.###} % of the power for the load with this taper: leave more power for the load or use more slots"));
        }
        var g = new double[n];
        var t = new double[n];
        for (int k = 0; k < n; k++) g[n - 1 - k] = b.Conductances[k];
        for (int i = 0; i < n; i++) t[i] = lo * shape[i];
        return (g, t);
    }

    private static void CheckConductances(double[] g, IShuntSlotModel slot, Frequency f0, double loadFraction)
    {
        double gMax = slot.MaximumConductance(f0);
        int worst = 0;
        for (int i = 1; i < g.Length; i++) if (g[i] > g[worst]) worst = i;
        if (g[worst] <= gMax) return;
        int over = g.Count(v => v > gMax);
        throw new InfeasibleDesignException(string.Create(CultureInfo.InvariantCulture,
            $"slot {worst + 1} needs g = {g[worst]:0.000}, above the {gMax:0.000} the {slot.Name} can give in {slot.Guide.Designation} at {f0} ({over} of {g.Length} slots exceed it): leave more power for the load (now {loadFraction * 100:0.###} %), use more slots or a gentler taper"));
    }

    private static void AddRuleWarnings(List<DesignWarning> warnings, RectangularWaveguide guide, Frequency f0, Length lambdaG, Length spacing, Angle? squint)
    {
        double sp = spacing / lambdaG;
        double nearest = Math.Round(2 * sp) / 2;
        if (nearest > 0 && Math.Abs(sp - nearest) < 0.02)
            warnings.Add(new DesignWarning("travelling-wave-spacing-resonant", string.Create(CultureInfo.InvariantCulture,
                $"slot spacing {spacing} is {sp:0.0000} guide wavelengths, within 0.02 of {nearest:0.0}: the slot reflections add nearly in phase at {f0} and the input match suffers; move the spacing away from a multiple of half a guide wavelength")));
        if (squint is null)
            warnings.Add(new DesignWarning("travelling-wave-no-beam", string.Create(CultureInfo.InvariantCulture,
                $"at spacing {spacing} the travelling-wave phase condition has no beam in real space at {f0} (sin θ = λ/λg − λ/(2d) lies outside −1…1): change the spacing")));
        else if (TravellingWaveBeam.HasGratingLobe(guide, spacing, f0))
            warnings.Add(new DesignWarning("grating-lobe", string.Create(CultureInfo.InvariantCulture,
                $"spacing {spacing} with the beam at {squint.Value.Degrees:0.##} deg: d(1 + |sin θ|) ≥ λ at {f0}, so a grating lobe enters real space")));
    }
}
