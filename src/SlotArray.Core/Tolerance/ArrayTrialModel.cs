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
/// offset, length, position, width. The offset error is a signed error in x (the cutter's position across the broad
/// wall; for an edge slot, the error at the slot's end, i.e. a tilt error δx/(L/2)); the systematic offset is a shift of
/// every slot toward +x (a fixture offset), the systematic length the same extra length on every slot.</para>
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
public sealed class ArrayTrialModel : IToleranceTrialModel
{
    private readonly ArrayDesign design;
    private readonly ToleranceRequest tolerance;
    private readonly SlotSurrogate[] surrogates;
    private readonly double[] positions, signs, couplingPerOffset;
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
        couplingPerOffset = design.Slots.Select(s => CouplingPerOffset(design, s)).ToArray();
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
        double Range(MachiningTolerance t) => t.Distribution == ErrorDistribution.Normal ? options.NormalRange * t.Value.Meters : t.Value.Meters;
        double offsetRange = Range(tolerance.Offset) + Math.Abs(tolerance.SystematicOffset.Meters);
        double lengthRange = Range(tolerance.Length) + Math.Abs(tolerance.SystematicLength.Meters);
        var keys = design.Slots.Select(s => (Coupling: Math.Abs(s.Coupling), Length: s.Length.Meters, PerOffset: CouplingPerOffset(design, s))).ToArray();
        var distinct = keys.Distinct().ToArray();
        var built = new SlotSurrogate[distinct.Length];
        Parallel.For(0, distinct.Length, new ParallelOptions { MaxDegreeOfParallelism = options.Threads }, i =>
        {
            var k = distinct[i];
            built[i] = new SlotSurrogate(slot, factory, k.Coupling, Length.FromMeters(k.Length), design.DesignFrequency,
                offsetRange * k.PerOffset, lengthRange, Range(tolerance.Width), Range(tolerance.Wall), Range(tolerance.GuideWidth),
                options.SurrogateNodes);
        });
        var index = distinct.Select((k, i) => (k, i)).ToDictionary(p => p.k, p => p.i);
        return new ArrayTrialModel(design, tolerance, keys.Select(k => built[index[k]]).ToArray(), coupled);
    }

    /// <summary>Coupling change per metre of offset error: 1 for an offset, 1/(L/2) rad/m for a tilt (error at the slot end).</summary>
    private static double CouplingPerOffset(ArrayDesign design, SlotDesign s)
        => design.CouplingKind == SlotCouplingKind.Offset ? 1.0 : 2.0 / s.Length.Meters;

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

    /// <summary>dc/dx of slot n: coupling change per metre of offset error.</summary>
    public double CouplingPerOffsetError(int slot) => couplingPerOffset[slot];

    /// <inheritdoc />
    public TrialNetwork Trial(ref TrialRandom random)
    {
        double da = random.Draw(tolerance.GuideWidth);
        double dt = random.Draw(tolerance.Wall);
        int n = positions.Length;
        var y = new Complex[n];
        var z = new double[n];
        for (int i = 0; i < n; i++)
        {
            double dx = random.Draw(tolerance.Offset) + tolerance.SystematicOffset.Meters;
            double dl = random.Draw(tolerance.Length) + tolerance.SystematicLength.Meters;
            double dz = random.Draw(tolerance.Position);
            double dw = random.Draw(tolerance.Width);
            // |c| grows when the error points away from the centreline on the slot's side.
            y[i] = surrogates[i].Admittance(signs[i] * dx * couplingPerOffset[i], dl, dw, dt, da);
            z[i] = positions[i] + dz;
        }
        return Solve(y, z, da);
    }

    /// <summary>
    /// The line network at the design frequency with the given slot admittances and positions and a guide whose inside
    /// width is off by <paramref name="guideWidthError"/> (m); terminations at their nominal places.
    /// </summary>
    public TrialNetwork Solve(Complex[] admittances, double[] slotPositions, double guideWidthError)
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
        return new TrialNetwork(slotPositions, sol.Excitations.ToArray(), s11, sol.RadiatedPower);
    }
}
