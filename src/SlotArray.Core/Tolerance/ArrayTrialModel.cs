using System.Numerics;
using SlotArray.Core.Design;
using SlotArray.Core.Fabrication;
using SlotArray.Core.Network;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Tolerance;

/// <summary>
/// A designed array under machining errors, rerun on every trial: each slot's admittance from the slot model (through
/// its <see cref="SlotSurrogate"/>) at its perturbed coupling, length and width and the trial's wall thickness and guide
/// width; the line network (<see cref="LineNetwork"/>) of the trial's guide (λg, β and loss of the perturbed
/// <see cref="RectangularWaveguide"/>) with the slots at their perturbed positions and the terminations where the design
/// put them; the design frequency.
/// </summary>
/// <remarks>
/// <para>Errors per trial, drawn in this fixed order from the trial's stream: guide width a, wall t, then for each slot
/// offset, length, position, width (broad-wall slots) or tilt, length, position, width, depth (edge slots). The offset
/// error is a signed error in x (the cutter's position across the broad wall); the systematic offset is a shift of
/// every slot toward +x (a fixture offset), the systematic length the same extra length on every slot.</para>
/// <para>Edge slots are cut by a cutter plunged square to the narrow wall at the slot's tilt θ to a depth D into each
/// broad wall, so their machining errors are the tilt δθ and the depth δD, not an offset. The tilt error changes the
/// coupling directly; a slot that wraps into the broad walls (L &gt; b/cos θ) has the cut path
/// L = b/cos θ + 2(D − t) (<see cref="Fabrication.Datums.EdgeSlotDepthOfCut"/>, the project's geometric approximation), so at
/// fixed depth its length also changes by δL = b sin|θ|/cos²θ · δ|θ|, and a depth error lengthens it by 2 δD. A slot that
/// does not wrap has no depth; its length is then the milled length alone. The length tolerance applies to both kinds
/// on top (a cut path longer or shorter than drawn).</para>
/// <para>Datums: positions are from the inner face of the end short (z = 0), which stays put; a centre feed's junction and
/// far short stay at their nominal places.</para>
/// <para>Coupled designs (<c>coupling: mutual</c>): each trial is solved on the coupled network of the pipeline
/// (<see cref="CoupledArrayNetwork"/>: the perturbed self admittances and positions on the line, the external mutual
/// impedances of the nominal slots). Holding the mutual impedances at their nominal values is a first-order
/// approximation: a machining error of a few hundredths of a millimetre changes a slot-to-slot distance of about λg/2 by
/// less than 0.1 %, while it moves the slot's own resonance (its self admittance) by far more.</para>
/// <para>S11 is referred to the nominal guide's TE10 wave impedance Z: a trial whose tube has wave impedance Z' presents
/// z_in Z'/Z at the feed flange (an impedance step between equal-height guides, the usual first approximation; D. M. Pozar,
/// <i>Microwave Engineering</i>, 4th ed., Wiley 2012, Sec. 3.3 for Z_TE, from memory).</para>
/// </remarks>
internal sealed class ArrayTrialModel : IToleranceTrialModel
{
    private readonly ArrayDesign design;
    private readonly ToleranceRequest tolerance;
    private readonly SlotSurrogate[] surrogates;
    private readonly double[] positions, signs, lengthPerTilt, lengthPerDepth;
    private readonly bool edge;
    private readonly double nominalImpedance;

    private readonly Coupling.CouplingMatrix? mutual;

    private ArrayTrialModel(ArrayDesign design, ToleranceRequest tolerance, SlotSurrogate[] surrogates, bool coupled)
    {
        this.design = design;
        mutual = coupled ? CoupledArrayNetwork.MutualImpedances(design, design.DesignFrequency) : null;
        this.tolerance = tolerance;
        this.surrogates = surrogates;
        positions = design.Slots.Select(s => s.Position.Meters).ToArray();
        signs = design.Slots.Select(s => (double)Math.Sign(s.Coupling)).ToArray();
        edge = design.CouplingKind == SlotCouplingKind.Tilt;
        lengthPerTilt = design.Slots.Select(s => LengthPerTilt(design, s)).ToArray();
        lengthPerDepth = design.Slots.Select(s => LengthPerDepth(design, s)).ToArray();
        nominalImpedance = design.Guide.WaveImpedance(design.DesignFrequency);
        var y0 = surrogates.Select(s => s.Nominal).ToArray();
        NominalAdmittances = Array.AsReadOnly(y0);
        Nominal = Solve(y0, positions, 0);
    }

    /// <summary>
    /// Builds the model: one surrogate per distinct (|coupling|, length) of the design, in parallel over
    /// <paramref name="options"/>' threads (the surrogates do not depend on the thread count).
    /// </summary>
    /// <param name="design">The nominal design.</param>
    /// <param name="slot">The slot model the design used.</param>
    /// <param name="factory">Builds the slot model for a perturbed guide or width.</param>
    /// <param name="tolerance">The machining tolerances.</param>
    /// <param name="options">Surrogate nodes, threads, normal range.</param>
    /// <param name="coupled">Solve every trial on the coupled network (<c>coupling: mutual</c>, <see cref="CoupledArrayNetwork"/>),
    /// as the pipeline analyses such a design; else on the line network of isolated slots.</param>
    public static ArrayTrialModel Build(ArrayDesign design, IShuntSlotModel slot, SlotModelFactory factory, ToleranceRequest tolerance,
        ToleranceOptions? options = null, bool coupled = false)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(slot);
        ArgumentNullException.ThrowIfNull(factory);
        ArgumentNullException.ThrowIfNull(tolerance);
        options ??= ToleranceOptions.Default;
        options.Validate();
        CheckApplies(design, tolerance);
        double Range(MachiningTolerance t) => t.Distribution == ErrorDistribution.Normal ? options.NormalRange * t.Value.Meters : t.Value.Meters;
        bool edge = design.CouplingKind == SlotCouplingKind.Tilt;
        double tiltRange = tolerance.Tilt.Range(options.NormalRange);
        double couplingRange = edge ? tiltRange : Range(tolerance.Offset) + Math.Abs(tolerance.SystematicOffset.Meters);
        double lengthRange = Range(tolerance.Length) + Math.Abs(tolerance.SystematicLength.Meters);
        var keys = design.Slots.Select(s => (Coupling: Math.Abs(s.Coupling), Length: s.Length.Meters,
            LengthRange: lengthRange + LengthPerDepth(design, s) * Range(tolerance.Depth) + LengthPerTilt(design, s) * tiltRange)).ToArray();
        var distinct = keys.Distinct().ToArray();
        var built = new SlotSurrogate[distinct.Length];
        Parallel.For(0, distinct.Length, new ParallelOptions { MaxDegreeOfParallelism = options.Threads }, i =>
        {
            var k = distinct[i];
            built[i] = new SlotSurrogate(slot, factory, k.Coupling, Length.FromMeters(k.Length), design.DesignFrequency,
                couplingRange, k.LengthRange, Range(tolerance.Width), Range(tolerance.Wall), Range(tolerance.GuideWidth),
                options.SurrogateNodes);
        });
        var index = distinct.Select((k, i) => (k, i)).ToDictionary(p => p.k, p => p.i);
        return new ArrayTrialModel(design, tolerance, keys.Select(k => built[index[k]]).ToArray(), coupled);
    }

    /// <summary>
    /// dL/d|θ| of an edge slot at fixed depth, m/rad: b sin|θ|/cos²θ when it wraps into the broad walls, else 0 (and 0
    /// for broad-wall slots); see remarks.
    /// </summary>
    private static double LengthPerTilt(ArrayDesign design, SlotDesign s)
    {
        if (LengthPerDepth(design, s) == 0) return 0;
        double c = Math.Cos(s.Coupling);
        return design.Guide.NarrowWall.Meters * Math.Sin(Math.Abs(s.Coupling)) / (c * c);
    }

    /// <summary>dL/dD of an edge slot: 2 when it wraps into the broad walls (the cut runs D − t into each), else 0.</summary>
    private static double LengthPerDepth(ArrayDesign design, SlotDesign s)
        => design.CouplingKind == SlotCouplingKind.Tilt
            && Fabrication.Datums.EdgeSlotDepthOfCut(s.Length, Angle.FromRadians(s.Coupling), design.Guide.NarrowWall, design.Guide.WallThickness) is not null
            ? 2.0 : 0.0;

    /// <summary>Refuses errors that the design's slots do not have: an offset on edge slots, a tilt or depth on broad-wall slots.</summary>
    private static void CheckApplies(ArrayDesign design, ToleranceRequest t)
    {
        if (design.CouplingKind == SlotCouplingKind.Tilt)
        {
            if (t.Offset.Value.Meters != 0 || t.SystematicOffset.Meters != 0)
                throw new ArgumentException("edge slots have no offset error: give their tilt and depth-of-cut tolerances (tolerance.tilt, tolerance.depth)", nameof(t));
        }
        else if (t.Tilt.Value.Radians != 0 || t.Depth.Value.Meters != 0)
            throw new ArgumentException("broad-wall slots have no tilt or depth-of-cut error: give their offset tolerance (tolerance.offset)", nameof(t));
    }

    /// <inheritdoc />
    public Frequency Frequency => design.DesignFrequency;

    /// <inheritdoc />
    public TrialNetwork Nominal { get; }

    /// <summary>The design.</summary>
    public ArrayDesign Design => design;

    /// <summary>The surrogate of each slot (slots of equal |coupling| and length share one).</summary>
    public IReadOnlyList<SlotSurrogate> Surrogates => surrogates;

    /// <summary>Number of real slot-model solves spent on the surfaces.</summary>
    public int SurrogateSamples => surrogates.Distinct().Sum(s => s.Surface.SampleCount);

    /// <summary>y_n of the nominal slots (the slot model's values).</summary>
    public IReadOnlyList<Complex> NominalAdmittances { get; }

    /// <summary>z_n of the nominal slots, m.</summary>
    public IReadOnlyList<double> NominalPositions => positions;

    /// <summary>Whether the slots are edge slots (errors tilt and depth) rather than broad-wall slots (error offset).</summary>
    public bool EdgeSlots => edge;

    /// <summary>dL/d|θ| of slot n at fixed depth, m/rad (0 unless an edge slot that wraps into the broad walls).</summary>
    public double LengthPerTiltError(int slot) => lengthPerTilt[slot];

    /// <summary>dL/dD of slot n: 2 for an edge slot that wraps into the broad walls, else 0.</summary>
    public double LengthPerDepthError(int slot) => lengthPerDepth[slot];

    /// <inheritdoc />
    public TrialNetwork Trial(ref TrialRandom random)
    {
        double da = random.Draw(tolerance.GuideWidth);
        double dt = random.Draw(tolerance.Wall);
        int n = positions.Length;
        var y = new Complex[n];
        var z = new double[n];
        var tilts = edge ? new double[n] : null;
        for (int i = 0; i < n; i++)
        {
            double dx = edge ? random.Draw(tolerance.Tilt) : random.Draw(tolerance.Offset) + tolerance.SystematicOffset.Meters;
            double dl = random.Draw(tolerance.Length) + tolerance.SystematicLength.Meters;
            double dz = random.Draw(tolerance.Position);
            double dw = random.Draw(tolerance.Width);
            // |c| grows when the error points away from the centreline (the direction across the narrow wall) on the slot's side.
            double dc = signs[i] * dx;
            if (edge) dl += lengthPerTilt[i] * dc + lengthPerDepth[i] * random.Draw(tolerance.Depth);
            y[i] = surrogates[i].Admittance(dc, dl, dw, dt, da);
            z[i] = positions[i] + dz;
            if (tilts is not null) tilts[i] = design.Slots[i].Coupling + signs[i] * dc;
        }
        return Solve(y, z, da, tilts);
    }

    /// <summary>
    /// The line network at the design frequency with the given slot admittances and positions and a guide whose inside
    /// width is off by <paramref name="guideWidthError"/> (m); terminations at their nominal places. Edge slots: the
    /// excitations are split into co- and cross-polarised sources at the slots' signed tilts <paramref name="tilts"/>
    /// (rad; the nominal tilts when null), as <see cref="ArrayFigures"/> splits them for the design's figures.
    /// </summary>
    public TrialNetwork Solve(Complex[] admittances, double[] slotPositions, double guideWidthError, double[]? tilts = null)
    {
        ArgumentNullException.ThrowIfNull(admittances);
        ArgumentNullException.ThrowIfNull(slotPositions);
        var guide = guideWidthError == 0 ? design.Guide : design.Guide with { BroadWall = design.Guide.BroadWall + Length.FromMeters(guideWidthError) };
        var near = design.NearTermination with { Distance = design.NearTermination.Distance + Length.FromMeters(slotPositions[0] - positions[0]) };
        var far = design.FarTermination is { } t
            ? t with { Distance = t.Distance - Length.FromMeters(slotPositions[^1] - positions[^1]) }
            : null;
        // An end feed's reference plane is the last slot's centre: it moves with that slot (|S11| is unchanged by the
        // millimetre-fraction shift, up to the wall loss over it).
        double feed = far is null ? Math.Max(design.FeedPlane.Meters, slotPositions[^1]) : design.FeedPlane.Meters;
        NetworkSolution sol;
        if (mutual is null)
            sol = new LineNetwork(guide, slotPositions, near, far, feed, design.JunctionRatio).Solve(design.DesignFrequency, admittances, signs, peakVoltage: false);
        else
        {
            var slots = design.Slots.Select((s, i) => s with { Position = Length.FromMeters(slotPositions[i]) }).ToArray();
            var trial = design with { Guide = guide, Slots = slots, NearTermination = near, FarTermination = far, FeedPlane = Length.FromMeters(feed) };
            sol = CoupledArrayNetwork.Solve(trial, admittances, mutual, design.DesignFrequency);
        }
        Complex s11 = sol.S11;
        if (guideWidthError != 0)
        {
            double ratio = guide.WaveImpedance(design.DesignFrequency) / nominalImpedance;
            Complex zin = (1 + s11) / (1 - s11) * ratio;
            s11 = (zin - 1) / (zin + 1);
        }
        if (!edge) return new TrialNetwork(slotPositions, sol.Excitations.ToArray(), s11, sol.RadiatedPower);
        var theta = tilts ?? design.Slots.Select(x => x.Coupling).ToArray();
        return new TrialNetwork(slotPositions, Patterns.CrossPolarPattern.CoPolarSources(sol.Excitations, theta), s11, sol.RadiatedPower,
            Patterns.CrossPolarPattern.CrossPolarSources(sol.Excitations, theta));
    }
}
