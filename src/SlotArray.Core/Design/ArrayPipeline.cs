using SlotArray.Core.Fabrication;
using SlotArray.Core.Network;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.Core.Tapers;

namespace SlotArray.Core.Design;

/// <summary>How finely the pipeline analyses a design.</summary>
/// <param name="SweepPoints">Frequencies across the analysis band (≥ 2); default 201.</param>
/// <param name="BandSearchFraction">
/// How far either side of the design frequency the VSWR bands are searched, as a fraction of it; default 0.15. The search
/// never goes below <see cref="LowestSearchAboveCutoff"/> times the TE10 cutoff. 0: no search (both bands null), for runs
/// that need the design and the sweep but not the bands.
/// </param>
/// <param name="AdmittanceStep">
/// Node spacing (fraction of the design frequency) of the <see cref="FrequencyInterpolatedSlotModel"/> through which the
/// analysis evaluates each slot's y(f); default <see cref="FrequencyInterpolatedSlotModel.DefaultStep"/>; 0: solve the
/// slot model directly at every frequency.
/// </param>
public sealed record AnalysisOptions(int SweepPoints = 201, double BandSearchFraction = 0.15,
    double AdmittanceStep = FrequencyInterpolatedSlotModel.DefaultStep)
{
    /// <summary>The defaults.</summary>
    public static AnalysisOptions Default { get; } = new();

    /// <summary>Lower edge of the match sweep (<see cref="ArrayResult.MatchSweep"/>); null: <see cref="MatchSpan.Default"/>.</summary>
    public Frequency? MatchLow { get; init; }

    /// <summary>Upper edge of the match sweep; null: <see cref="MatchSpan.Default"/>.</summary>
    public Frequency? MatchHigh { get; init; }

    /// <summary>Frequencies of the match sweep, ≥ 2; default <see cref="MatchSpan.DefaultPoints"/>.</summary>
    public int MatchPoints { get; init; } = MatchSpan.DefaultPoints;

    /// <summary>
    /// Lowest frequency of the band search as a multiple of the TE10 cutoff, 1.001: below, λg and the slot models diverge
    /// (a margin of 0.1 %, common practice, no source).
    /// </summary>
    public const double LowestSearchAboveCutoff = 1.001;

    /// <summary>Receives the progress of the long steps (band sweep, coupled iterations); null for none. Called from worker threads.</summary>
    public IProgress<WorkProgress>? Progress { get; init; }

    /// <summary>Stops the run between steps, iterations and sweep points with an <see cref="OperationCanceledException"/>.</summary>
    public CancellationToken Cancellation { get; init; }
}

/// <summary>Everything one run computes: the taper, the slot model, the design and its analysis across the band.</summary>
/// <param name="Request">What was asked.</param>
/// <param name="Taper">The synthesised aperture taper (target amplitudes).</param>
/// <param name="SlotModel">The slot model the design used and the analysis re-used.</param>
/// <param name="Design">Per-slot geometry and the terminations.</param>
/// <param name="Sweep">Network solutions across the analysis band, and at the design frequency.</param>
/// <param name="AtDesign">Pattern, directivity and gain at the design frequency.</param>
/// <param name="SweepFigures">Pattern, directivity and gain at each sweep frequency.</param>
/// <param name="BandVswr15">The continuous band with VSWR ≤ 1.5 containing the design frequency, or null.</param>
/// <param name="BandVswr2">The continuous band with VSWR ≤ 2 containing the design frequency, or null.</param>
/// <param name="Warnings">Every validity limit met on the way (taper, slot model, designer), in order, without repeats.</param>
public sealed record ArrayResult(
    ArrayRequest Request,
    TaperResult Taper,
    IShuntSlotModel SlotModel,
    ArrayDesign Design,
    FrequencySweep Sweep,
    FrequencyFigures AtDesign,
    IReadOnlyList<FrequencyFigures> SweepFigures,
    MatchBand? BandVswr15,
    MatchBand? BandVswr2,
    IReadOnlyList<DesignWarning> Warnings)
{
    /// <summary>Travelling-wave feed: the designer's figures (targets, refinement, squint, scan rate); null for a standing-wave feed.</summary>
    public TravellingWaveDesign? TravellingWave { get; init; }

    /// <summary>
    /// <c>coupling: mutual</c> only: Elliott's design with its iteration history, and the coupled and isolated-slot
    /// designs side by side under the coupled analysis; null for <c>coupling: none</c>. When set, <see cref="Design"/> is
    /// the coupled design and <see cref="Sweep"/>, the figures and the bands come from the coupled analysis.
    /// </summary>
    public ElliottComparison? Coupling { get; init; }

    /// <summary>
    /// <c>coupling: mutual</c> with a travelling-wave feed: the coupled travelling-wave design
    /// (<see cref="CoupledTravellingWaveDesigner"/>) and the isolated-slot design side by side under the coupled analysis;
    /// null otherwise. When set, <see cref="Design"/> is the coupled design and the sweep, figures and bands come from the
    /// coupled analysis.
    /// </summary>
    public CoupledTravellingWaveComparison? CoupledTravellingWave { get; init; }

    /// <summary>
    /// The input match alone (network, no pattern) over the match span (<see cref="MatchSpan"/>; by default wide
    /// enough to show the VSWR band edges), with the analysis that made <see cref="Sweep"/>; null when not computed.
    /// </summary>
    public FrequencySweep? MatchSweep { get; init; }

    /// <summary>
    /// The polarisation filter (<c>filter</c>) and the cross-polar levels before and after it; null without a filter or
    /// without a cross-polarised cut. When set, <see cref="AtDesign"/> and <see cref="SweepFigures"/> are the figures
    /// behind the filter.
    /// </summary>
    public Marine.FilterOutcome? Filter { get; init; }

    /// <summary>The flare (<c>flare</c>): vertical beam, throat loss and the antenna's total gain; null without a flare.</summary>
    public Marine.FlareOutcome? Flare { get; init; }

    /// <summary>The beam over the operating range (temperature, transmitter frequency tolerance); null when no range is given.</summary>
    public Marine.PointingBudget? Pointing { get; init; }
}

/// <summary>
/// The pipeline of architecture.md as one pure function: request → taper → slot model → designer → network
/// analysis across the band → pattern, directivity and gain. Each stage is a pure function of the previous
/// stage's immutable result, so the tolerance analysis can re-run <see cref="Analyse"/> on perturbed designs.
/// </summary>
public static class ArrayPipeline
{
    /// <summary>
    /// The slot model for the request from <paramref name="source"/> (chosen at the composition root; when null, the
    /// source the request asks for, <see cref="SlotSource.For"/>, with a cache of its own).
    /// </summary>
    /// <exception cref="InfeasibleDesignException">The slot type has no designer yet.</exception>
    public static IShuntSlotModel SlotModelFor(ArrayRequest request, SlotSource? source = null)
    {
        ArgumentNullException.ThrowIfNull(request);
        return (source ?? SlotSource.For(request)).ModelFor(request);
    }

    /// <summary>
    /// The design <see cref="Run"/> delivers, without its band analysis: with <c>coupling: mutual</c> the coupled design
    /// (Elliott's for a standing-wave feed, <see cref="CoupledTravellingWaveDesigner"/> for a travelling-wave feed), else
    /// <see cref="Synthesise"/>'s. The tolerance analysis perturbs this design, so that its nominal figures are the key figures.
    /// </summary>
    /// <exception cref="InfeasibleDesignException">The request cannot be realised.</exception>
    public static ArrayDesign DeliveredDesign(ArrayRequest request, IShuntSlotModel slot, TaperResult taper)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(taper);
        request = TravellingWaveLoad.Resolve(request, slot, taper.Weights);
        if (request.Coupling != CouplingMode.Mutual) return Synthesise(request, slot, taper);
        return request.Feed.Type == FeedType.TravellingWave
            ? CoupledTravellingWaveDesigner.Design(request, slot, taper.Weights).Design
            : ElliottDesigner.Design(request, slot, taper.Weights).Design;
    }

    /// <summary>The designer the feed type calls for.</summary>
    public static ArrayDesign Synthesise(ArrayRequest request, IShuntSlotModel slot, TaperResult taper)
        => SynthesiseWithFigures(request, slot, taper).Design;

    /// <summary>
    /// The designer the feed type calls for (standing-wave: <see cref="StandingWaveDesigner"/>; travelling-wave:
    /// <see cref="TravellingWaveDesigner"/> with its phases corrected by <see cref="TravellingWavePointing"/>), with the
    /// travelling-wave designer's own figures (null for a standing wave).
    /// </summary>
    public static (ArrayDesign Design, TravellingWaveDesign? TravellingWave) SynthesiseWithFigures(ArrayRequest request, IShuntSlotModel slot,
        TaperResult taper)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(taper);
        switch (request.Feed.Type)
        {
            case FeedType.StandingWave:
                return (StandingWaveDesigner.Design(request, slot, taper.Weights), null);
            case FeedType.TravellingWave:
                var tw = TravellingWavePointing.Design(request, slot, taper.Weights);
                return (tw.Design, tw);
            default:
                throw new InfeasibleDesignException($"the '{request.Feed.Type}' feed has no designer: use a standing-wave or travelling-wave feed");
        }
    }

    /// <summary>
    /// The slot model the analysis evaluates: <paramref name="slot"/> behind a <see cref="FrequencyInterpolatedSlotModel"/>
    /// on the design frequency's grid (its nodes for the request's band computed in parallel), or
    /// <paramref name="slot"/> itself when <see cref="AnalysisOptions.AdmittanceStep"/> is 0.
    /// </summary>
    public static IShuntSlotModel AnalysisModel(ArrayRequest request, ArrayDesign design, IShuntSlotModel slot, AnalysisOptions options)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(options);
        if (options.AdmittanceStep == 0 || slot is FrequencyInterpolatedSlotModel) return slot;
        var model = new FrequencyInterpolatedSlotModel(slot, design.DesignFrequency, options.AdmittanceStep);
        model.Prepare([.. design.Slots.Select(s => (s.Coupling, s.Length))], request.BandLow, request.BandHigh);
        return model;
    }

    /// <summary>Network and pattern analysis of a design across the request's band (through <see cref="AnalysisModel"/>).</summary>
    public static (FrequencySweep Sweep, FrequencyFigures AtDesign, IReadOnlyList<FrequencyFigures> Points) Analyse(
        ArrayRequest request, ArrayDesign design, IShuntSlotModel slot, AnalysisOptions options)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(options);
        if (options.SweepPoints < 2) throw new ArgumentOutOfRangeException(nameof(options), options.SweepPoints, "a sweep needs at least 2 points");
        slot = AnalysisModel(request, design, slot, options);
        var sweep = ArrayNetwork.Sweep(design, slot, request.BandLow, request.BandHigh, options.SweepPoints);
        // ArrayFigures.ForSweep point by point, in parallel: each point's figures are a pure function of its network
        // solution, so the order of evaluation cannot change them.
        var top = sweep.Points.Count > 0 && sweep.Points[^1].Frequency > design.DesignFrequency ? sweep.Points[^1].Frequency : design.DesignFrequency;
        var grid = ArrayFigures.DefaultGrid(design, top);
        var points = new FrequencyFigures[sweep.Points.Count];
        int done = 0;
        Parallel.For(0, points.Length, new ParallelOptions { CancellationToken = options.Cancellation }, i =>
        {
            points[i] = ArrayFigures.At(design, sweep.Points[i], grid);
            options.Progress?.Report(new WorkProgress("band sweep", Interlocked.Increment(ref done), points.Length));
        });
        return (sweep, ArrayFigures.At(design, sweep.AtDesign, grid), Array.AsReadOnly(points));
    }

    /// <summary>
    /// Runs the whole pipeline with the slot source chosen by the caller (the request's own when null); a failure inside
    /// its parallel stages surfaces as itself (<see cref="ParallelFailures"/>).
    /// </summary>
    /// <exception cref="InfeasibleDesignException">The request cannot be realised; the message says what to change.</exception>
    /// <exception cref="ConvergenceException">A solver did not converge; the message names the slot or stage.</exception>
    public static ArrayResult Run(ArrayRequest request, AnalysisOptions? options = null, SlotSource? source = null)
    {
        ArgumentNullException.ThrowIfNull(request);
        return ParallelFailures.Unwrapped(() => RunStages(request, options ?? AnalysisOptions.Default, source));
    }

    private static ArrayResult RunStages(ArrayRequest request, AnalysisOptions options, SlotSource? source)
    {
        if (request.Coupling == CouplingMode.Mutual && request.Slots.Type != SlotType.Longitudinal)
            throw new InfeasibleDesignException(
                $"coupling: mutual is implemented for arrays of longitudinal slots only; {request.Slots.Type} slots have no coupled designer yet: use coupling: none");
        return RunWithSlotModel(request, SlotModelFor(request, source), options);
    }

    /// <summary>
    /// Runs the whole pipeline with a given slot model in place of the one the request names (e.g. a model corrected by
    /// what a prototype showed, <see cref="Prototype.CalibratedSlotModel"/>).
    /// </summary>
    /// <exception cref="InfeasibleDesignException">The request cannot be realised; the message says what to change.</exception>
    public static ArrayResult RunWithSlotModel(ArrayRequest request, IShuntSlotModel slot, AnalysisOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(slot);
        options ??= AnalysisOptions.Default;
        var taper = TaperSynthesis.Synthesize(request.Taper, request.Slots.Count);
        return TravellingWaveLoad.Explained(request, r => TravellingWavePointing.Design(r, slot, TaperSynthesis.Synthesize(r.Taper, r.Slots.Count).Weights),
            () => RunResolved(TravellingWaveLoad.Resolve(request, slot, taper.Weights), slot, options, taper));
    }

    private static ArrayResult RunResolved(ArrayRequest request, IShuntSlotModel slot, AnalysisOptions options, TaperResult taper)
    {
        if (request.Coupling == CouplingMode.Mutual) return RunCoupled(request, options, taper, slot);
        var (design, travelling) = SynthesiseWithFigures(request, slot, taper);
        SlotClearance.Require(design, request.Slots.Cutter);
        options.Cancellation.ThrowIfCancellationRequested();
        design = PrototypeMargin.Apply(design, request.PrototypeMargin);
        var outside = SlotTableRangeCheck.Check(design, slot);
        var analysis = AnalysisModel(request, design, slot, options);
        var (sweep, atDesign, points) = Analyse(request, design, analysis, options);
        Marine.FilterOutcome? filter = null;
        if (request.Filter is { } asked)
            (atDesign, points, filter) = Marine.CrossPolarFilterDesign.Apply(asked, request.Requirements.CrossPolarDb, atDesign, points,
                atDesign.Metrics.BeamDirection, design.Spacing);
        var flare = request.Flare is { } fl ? Marine.FlareDesign.Analyse(fl, request.Guide, atDesign, request.Requirements.VerticalBeamwidth) : null;
        var f0 = request.DesignFrequency;
        MatchBand? b15 = null, b2 = null;
        if (options.BandSearchFraction > 0)
        {
            var lo = Frequency.FromHertz(Math.Max(f0.Hertz * (1 - options.BandSearchFraction),
                Math.Min(request.BandLow.Hertz, request.Guide.CutoffTe10.Hertz * AnalysisOptions.LowestSearchAboveCutoff)));
            var hi = Frequency.FromHertz(f0.Hertz * (1 + options.BandSearchFraction));
            var step = Frequency.FromHertz(f0.Hertz * 1e-3);
            b15 = ArrayNetwork.FindBand(design, analysis, 1.5, lo, hi, step);
            b2 = ArrayNetwork.FindBand(design, analysis, 2.0, lo, hi, step);
        }
        var warnings = taper.Warnings.Concat(design.Warnings).Concat(slot.Warnings(design.Slots.Max(s => Math.Abs(s.Coupling)), f0))
            .Concat(outside).Concat(filter?.Warnings ?? []).Concat(flare?.Warnings ?? []).DistinctBy(w => w.Message).ToList();
        var (mLo, mHi) = MatchSpan.Resolve(request, options, b15, b2);
        if (options.MatchPoints < 2) throw new ArgumentOutOfRangeException(nameof(options), options.MatchPoints, "the match sweep needs at least 2 points");
        var match = ArrayNetwork.Sweep(design, analysis, mLo, mHi, options.MatchPoints);
        return new ArrayResult(request, taper, slot, design, sweep, atDesign, points, b15, b2, warnings) { TravellingWave = travelling, MatchSweep = match, Filter = filter, Flare = flare,
            Pointing = request.Operating is { } range ? Marine.PointingBudget.Of(range, design, atDesign, points, PhaseCondition(design)) : null };
    }

    /// <summary>
    /// <c>coupling: mutual</c>: Elliott's design (<see cref="ElliottDesigner"/>), the band analysed with the coupled
    /// network (<see cref="CoupledArrayNetwork"/>), VSWR bands from that sweep, and the comparison with the isolated-slot design.
    /// </summary>
    private static ArrayResult RunCoupled(ArrayRequest request, AnalysisOptions options, TaperResult taper, IShuntSlotModel slot)
    {
        if (request.Feed.Type == FeedType.TravellingWave) return RunCoupledTravelling(request, options, taper, slot);
        var elliott = ElliottDesigner.Design(request, slot, taper.Weights,
            ElliottOptions.Default with { Progress = options.Progress, Cancellation = options.Cancellation });
        options.Cancellation.ThrowIfCancellationRequested();
        var design = elliott.Design;
        SlotClearance.Require(design, request.Slots.Cutter);
        design = PrototypeMargin.Apply(design, request.PrototypeMargin);
        var outside = SlotTableRangeCheck.Check(design, slot);
        var analysis = AnalysisModel(request, design, slot, options);
        var sweep = CoupledArrayNetwork.Sweep(design, analysis, request.BandLow, request.BandHigh, options.SweepPoints);
        var (atDesign, points) = ArrayFigures.ForSweep(design, sweep);
        var comparison = ElliottComparison.Of(elliott, analysis, AnalysisModel(request, elliott.Uncoupled, slot, options),
            request.BandLow, request.BandHigh);
        var warnings = taper.Warnings.Concat(design.Warnings).Concat(outside).DistinctBy(w => w.Message).ToList();
        return new ArrayResult(request, taper, slot, design, sweep, atDesign, points, sweep.Band(1.5), sweep.Band(2.0), warnings)
        {
            Coupling = comparison,
            MatchSweep = CoupledMatchSweep(request, options, design, analysis, sweep),
        };
    }

    /// <summary>
    /// <c>coupling: mutual</c> with a travelling-wave feed: <see cref="CoupledTravellingWaveDesigner"/>, the band analysed
    /// with the coupled network (matched load), VSWR bands from that sweep, and the comparison with the isolated-slot
    /// design. <see cref="ArrayResult.TravellingWave"/> carries the isolated-slot designer's layout figures (targets,
    /// squint, scan rate) with its design replaced by the coupled one.
    /// </summary>
    private static ArrayResult RunCoupledTravelling(ArrayRequest request, AnalysisOptions options, TaperResult taper, IShuntSlotModel slot)
    {
        var result = CoupledTravellingWaveDesigner.Design(request, slot, taper.Weights,
            CoupledTravellingWaveOptions.Default with { Progress = options.Progress, Cancellation = options.Cancellation });
        options.Cancellation.ThrowIfCancellationRequested();
        var design = result.Design;
        SlotClearance.Require(design, request.Slots.Cutter);
        design = PrototypeMargin.Apply(design, request.PrototypeMargin);
        var outside = SlotTableRangeCheck.Check(design, slot);
        var analysis = AnalysisModel(request, design, slot, options);
        var sweep = CoupledArrayNetwork.Sweep(design, analysis, request.BandLow, request.BandHigh, options.SweepPoints);
        var (atDesign, points) = ArrayFigures.ForSweep(design, sweep);
        var comparison = CoupledTravellingWaveComparison.Of(result, analysis, AnalysisModel(request, result.Uncoupled.Design, slot, options),
            request.BandLow, request.BandHigh);
        var warnings = taper.Warnings.Concat(design.Warnings).Concat(outside).DistinctBy(w => w.Message).ToList();
        return new ArrayResult(request, taper, slot, design, sweep, atDesign, points, sweep.Band(1.5), sweep.Band(2.0), warnings)
        {
            TravellingWave = result.Uncoupled with { Design = design } with
            {
                Correction = CoupledTravellingWaveOptions.Default.CorrectPhase ? PointingCorrection.LengthDetuning : PointingCorrection.None,
                AskedBeam = result.Uncoupled.Squint,
                PhaseErrorDegrees = result.PhaseErrorDegrees,
                PhaseIterations = result.Iterations,
            },
            CoupledTravellingWave = comparison,
            MatchSweep = CoupledMatchSweep(request, options, design, analysis, sweep),
            Pointing = request.Operating is { } range ? Marine.PointingBudget.Of(range, design, atDesign, points, PhaseCondition(design)) : null,
        };
    }

    /// <summary>The beam the phase condition gives a design's guide and spacing at a frequency (<see cref="TravellingWaveBeam"/>; broadside for a standing wave).</summary>
    private static Func<Frequency, Angle?> PhaseCondition(ArrayDesign design) => f => TravellingWaveBeam.Direction(design.Guide, design.Spacing, f);

    /// <summary>The match sweep of a coupled design, through the coupled network, over <see cref="MatchSpan.Resolve"/>.</summary>
    private static FrequencySweep CoupledMatchSweep(ArrayRequest request, AnalysisOptions options, ArrayDesign design, IShuntSlotModel analysis, FrequencySweep sweep)
    {
        var (lo, hi) = MatchSpan.Resolve(request, options, sweep.Band(1.5), sweep.Band(2.0));
        if (options.MatchPoints < 2) throw new ArgumentOutOfRangeException(nameof(options), options.MatchPoints, "the match sweep needs at least 2 points");
        return CoupledArrayNetwork.Sweep(design, analysis, lo, hi, options.MatchPoints);
    }
}
