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
internal sealed record AnalysisOptions(int SweepPoints = 201, double BandSearchFraction = 0.15,
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

    /// <summary><c>coupling: mutual</c> standing-wave designs: the limits of Elliott's iteration (<see cref="ElliottDesigner"/>); progress and cancellation are this run's.</summary>
    public ElliottOptions Elliott { get; init; } = ElliottOptions.Default;
}

/// <summary>Everything one run computes: the taper, the slot model, the design and its analysis across the band.</summary>
/// <param name="Request">What was asked.</param>
/// <param name="Taper">The synthesised aperture taper (target amplitudes).</param>
/// <param name="SlotModel">The slot model the design used and the analysis re-used.</param>
/// <param name="Design">Per-slot geometry and the terminations, as cut (with the prototype margin).</param>
/// <param name="Procedure">How the design was made (isolated-slot or coupled, standing or travelling wave) and what that
/// procedure alone reports; for a coupled procedure <paramref name="Design"/> is the coupled design and the sweep, the
/// figures and the bands come from the coupled analysis.</param>
/// <param name="Sweep">Network solutions across the analysis band, and at the design frequency.</param>
/// <param name="AtDesign">Pattern, directivity and gain at the design frequency.</param>
/// <param name="SweepFigures">Pattern, directivity and gain at each sweep frequency.</param>
/// <param name="BandVswr15">The continuous band with VSWR ≤ 1.5 containing the design frequency, or null.</param>
/// <param name="BandVswr2">The continuous band with VSWR ≤ 2 containing the design frequency, or null.</param>
/// <param name="MatchSweep">The input match alone (network, no pattern) over the match span (<see cref="MatchSpan"/>; by
/// default wide enough to show the VSWR band edges), with the analysis that made <paramref name="Sweep"/>.</param>
/// <param name="AddOns">What the antenna adds to the stick (filter, flare, pointing budget), each null when not asked for;
/// with a filter, <paramref name="AtDesign"/> and <paramref name="SweepFigures"/> are the figures behind it.</param>
/// <param name="Warnings">Every validity limit met on the way (taper, slot model, designer), in order, without repeats.</param>
internal sealed record ArrayResult(
    ArrayRequest Request,
    TaperResult Taper,
    IShuntSlotModel SlotModel,
    ArrayDesign Design,
    DesignProcedure Procedure,
    FrequencySweep Sweep,
    FrequencyFigures AtDesign,
    IReadOnlyList<FrequencyFigures> SweepFigures,
    MatchBand? BandVswr15,
    MatchBand? BandVswr2,
    FrequencySweep MatchSweep,
    AntennaAddOns AddOns,
    IReadOnlyList<DesignWarning> Warnings);

/// <summary>
/// The pipeline of architecture.md as one pure function: request → taper → slot model → designer → network
/// analysis across the band → pattern, directivity and gain. Each stage is a pure function of the previous
/// stage's immutable result, so the tolerance analysis can re-run <see cref="Analyse"/> on perturbed designs.
/// </summary>
internal static class ArrayPipeline
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
    /// The design <see cref="Run"/> delivers, without its band analysis or prototype margin: with <c>coupling: mutual</c>
    /// the coupled design (Elliott's for a standing-wave feed, <see cref="CoupledTravellingWaveDesigner"/> for a
    /// travelling-wave feed), else <see cref="Synthesise"/>'s (with <c>feed.load: auto</c> resolved,
    /// <see cref="TravellingWaveLoad.Resolve"/>). The tolerance analysis perturbs this design, so that its nominal figures
    /// are the key figures.
    /// </summary>
    /// <exception cref="InfeasibleDesignException">The request cannot be realised.</exception>
    public static ArrayDesign DeliveredDesign(ArrayRequest request, IShuntSlotModel slot, TaperResult taper)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(taper);
        request = TravellingWaveLoad.Resolve(request, slot, taper.Weights);
        return DesignStick(StickRequest.Of(request, slot, taper.Weights), request.Coupling).Design;
    }

    /// <summary>The isolated-slot design the feed type calls for (<see cref="DesignStick"/> without coupling).</summary>
    public static ArrayDesign Synthesise(ArrayRequest request, IShuntSlotModel slot, TaperResult taper)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(taper);
        return DesignStick(StickRequest.Of(request, slot, taper.Weights), CouplingMode.None).Design;
    }

    /// <summary>
    /// Designs one stick with the designer its feed and coupling call for: standing-wave <see cref="StandingWaveDesigner"/>,
    /// travelling-wave <see cref="TravellingWaveDesigner"/> with its beam put where asked (<see cref="TravellingWavePointing"/>); with <paramref name="coupling"/> mutual <see cref="ElliottDesigner"/>
    /// or <see cref="CoupledTravellingWaveDesigner"/> (reporting progress and stopping on <paramref name="options"/>' token).
    /// </summary>
    /// <exception cref="InfeasibleDesignException">The stick cannot be realised; the message says what to change.</exception>
    public static StickDesign DesignStick(StickRequest stick, CouplingMode coupling, AnalysisOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(stick);
        var result = DesignStickWith(stick, coupling, options ?? AnalysisOptions.Default);
        // Every later coupled analysis of the design (sweep, tolerance, compare) uses the request's exterior calibration.
        return result.Design.MutualCouplingScale == stick.MutualCouplingScale
            ? result
            : result with { Design = result.Design with { MutualCouplingScale = stick.MutualCouplingScale } };
    }

    private static StickDesign DesignStickWith(StickRequest stick, CouplingMode coupling, AnalysisOptions options)
    {
        bool travelling = stick.Feed.Type == FeedType.TravellingWave;
        if (coupling == CouplingMode.Mutual)
            return travelling
                ? CoupledTravellingWaveDesigner.Design(stick, CoupledTravellingWaveOptions.Default with
                {
                    Coupling = stick.MutualCouplingScale == System.Numerics.Complex.One ? null : CoupledSlotImpedances.Scaled(stick.MutualCouplingScale),
                    Progress = options.Progress,
                    Cancellation = options.Cancellation,
                })
                : ElliottDesigner.Design(stick, options.Elliott with { Progress = options.Progress, Cancellation = options.Cancellation });
        return stick.Feed.Type switch
        {
            FeedType.StandingWave => StandingWaveDesigner.Design(stick),
            FeedType.TravellingWave => TravellingWavePointing.Design(stick),
            _ => throw new InfeasibleDesignException($"the '{stick.Feed.Type}' feed has no designer: use a standing-wave or travelling-wave feed"),
        };
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
    /// what a prototype showed, <see cref="Prototype.CalibratedSlotModel"/>). A travelling-wave request with
    /// <c>feed.load: auto</c> is designed with its smallest feasible load (<see cref="TravellingWaveLoad.Resolve"/>); an
    /// infeasible one is refused with the nearest feasible load and count (<see cref="TravellingWaveLoad.Explained"/>).
    /// </summary>
    /// <exception cref="InfeasibleDesignException">The request cannot be realised; the message says what to change.</exception>
    public static ArrayResult RunWithSlotModel(ArrayRequest request, IShuntSlotModel slot, AnalysisOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(slot);
        options ??= AnalysisOptions.Default;
        var taper = TaperSynthesis.Synthesize(request.Taper, request.Slots.Count);
        return TravellingWaveLoad.Explained(request,
            r => TravellingWavePointing.Design(StickRequest.Of(r, slot, TaperSynthesis.Synthesize(r.Taper, r.Slots.Count).Weights)),
            () => RunResolved(TravellingWaveLoad.Resolve(request, slot, taper.Weights), slot, options, taper));
    }

    private static ArrayResult RunResolved(ArrayRequest request, IShuntSlotModel slot, AnalysisOptions options, TaperResult taper)
    {
        var stick = DesignStick(StickRequest.Of(request, slot, taper.Weights), request.Coupling, options);
        options.Cancellation.ThrowIfCancellationRequested();
        SlotClearance.Require(stick.Design, request.Slots.Cutter);
        var design = PrototypeMargin.Apply(stick.Design, request.PrototypeMargin);
        return stick is ElliottResult or CoupledTravellingWaveDesign
            ? AnalyseCoupled(request, taper, slot, stick, design, options)
            : AnalyseIsolated(request, taper, slot, stick, design, options);
    }

    /// <summary>
    /// An isolated-slot design (<c>coupling: none</c>) as cut: the band through the isolated-slot network
    /// (<see cref="ArrayNetwork"/>) with pattern figures at every point, the VSWR bands found by search, the match sweep.
    /// </summary>
    private static ArrayResult AnalyseIsolated(ArrayRequest request, TaperResult taper, IShuntSlotModel slot, StickDesign stick,
        ArrayDesign design, AnalysisOptions options)
    {
        var outside = SlotTableRangeCheck.Check(design, slot);
        var analysis = AnalysisModel(request, design, slot, options);
        var (sweep, atDesign, points) = Analyse(request, design, analysis, options);
        (atDesign, points, var addOns) = AntennaAddOns.Of(request, design, atDesign, points);
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
            .Concat(outside).Concat(addOns.Warnings).DistinctBy(w => w.Message).ToList();
        var (mLo, mHi) = MatchSpan.Resolve(request, options, b15, b2);
        RequireMatchPoints(options);
        var match = ArrayNetwork.Sweep(design, analysis, mLo, mHi, options.MatchPoints);
        DesignProcedure procedure = stick is TravellingWaveDesign tw ? new TravellingWaveProcedure(tw) : new StandingWaveProcedure();
        return new ArrayResult(request, taper, slot, design, procedure, sweep, atDesign, points, b15, b2, match, addOns, warnings);
    }

    /// <summary>
    /// A coupled design (<c>coupling: mutual</c>: <see cref="ElliottDesigner"/> or <see cref="CoupledTravellingWaveDesigner"/>)
    /// as cut: the band analysed with the coupled network (<see cref="CoupledArrayNetwork"/>), VSWR bands from that sweep,
    /// and the comparison with the isolated-slot design it started from. For a travelling wave the procedure carries the
    /// isolated-slot designer's layout figures (targets, squint, scan rate) with its design replaced by the coupled one.
    /// </summary>
    private static ArrayResult AnalyseCoupled(ArrayRequest request, TaperResult taper, IShuntSlotModel slot, StickDesign stick,
        ArrayDesign design, AnalysisOptions options)
    {
        var outside = SlotTableRangeCheck.Check(design, slot);
        var analysis = AnalysisModel(request, design, slot, options);
        var sweep = CoupledArrayNetwork.Sweep(design, analysis, request.BandLow, request.BandHigh, options.SweepPoints);
        var (atDesign, points) = ArrayFigures.ForSweep(design, sweep);
        (atDesign, points, var addOns) = AntennaAddOns.Of(request, design, atDesign, points);
        DesignProcedure procedure = stick switch
        {
            ElliottResult elliott => new ElliottProcedure(ElliottComparison.Of(elliott, analysis,
                AnalysisModel(request, elliott.Uncoupled, slot, options), request.BandLow, request.BandHigh)),
            CoupledTravellingWaveDesign coupled => new CoupledTravellingWaveProcedure(coupled.Uncoupled with
                {
                    Design = design,
                    Correction = CoupledTravellingWaveOptions.Default.CorrectPhase ? PointingCorrection.LengthDetuning : PointingCorrection.None,
                    AskedBeam = coupled.Uncoupled.Squint,
                    PhaseErrorDegrees = coupled.PhaseErrorDegrees,
                    PhaseIterations = coupled.Iterations,
                },
                CoupledTravellingWaveComparison.Of(coupled, analysis, AnalysisModel(request, coupled.Uncoupled.Design, slot, options),
                    request.BandLow, request.BandHigh)),
            _ => throw new ArgumentException($"{stick.GetType().Name} is not a coupled design", nameof(stick)),
        };
        var warnings = taper.Warnings.Concat(design.Warnings).Concat(outside).Concat(addOns.Warnings).DistinctBy(w => w.Message).ToList();
        var (lo, hi) = MatchSpan.Resolve(request, options, sweep.Band(1.5), sweep.Band(2.0));
        RequireMatchPoints(options);
        var match = CoupledArrayNetwork.Sweep(design, analysis, lo, hi, options.MatchPoints);
        return new ArrayResult(request, taper, slot, design, procedure, sweep, atDesign, points, sweep.Band(1.5), sweep.Band(2.0), match, addOns, warnings);
    }

    private static void RequireMatchPoints(AnalysisOptions options)
    {
        if (options.MatchPoints < 2) throw new ArgumentOutOfRangeException(nameof(options), options.MatchPoints, "the match sweep needs at least 2 points");
    }
}
