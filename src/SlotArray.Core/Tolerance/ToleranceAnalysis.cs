using SlotArray.Core.Design;
using SlotArray.Core.Fabrication;
using SlotArray.Core.Stick;

namespace SlotArray.Core.Tolerance;

/// <summary>Everything the tolerance analysis computes.</summary>
/// <param name="Tolerance">The tolerances that were applied (trials and seed as run).</param>
/// <param name="MonteCarlo">Statistics of the trials.</param>
/// <param name="Sensitivities">Per-slot sensitivities, ranked.</param>
/// <param name="SurrogateSamples">Real slot-model solves spent on the surrogates' surfaces.</param>
public sealed record ToleranceResult(ToleranceRequest Tolerance, MonteCarloResult MonteCarlo, IReadOnlyList<SlotSensitivity> Sensitivities,
    int SurrogateSamples);

/// <summary>
/// The tolerance stage of the pipeline (architecture.md): the nominal design of <see cref="ArrayPipeline.Run"/> under
/// the request's machining tolerances, by Monte Carlo with the slot model (through per-slot surrogates,
/// <see cref="SlotSurrogate"/>) and the line network on every trial, plus per-slot sensitivities.
/// </summary>
internal static class ToleranceAnalysis
{
    /// <summary>
    /// The sidelobe target, by the one rule the requirement verdicts also use (<see cref="Verdicts.SidelobeTarget"/>):
    /// <c>requirements.sidelobes</c>, else the taper's design level, else the peak sidelobe of its own weights; 0 dB
    /// (every build meets it) for a taper without sidelobes.
    /// </summary>
    /// <param name="request">The request.</param>
    public static double TargetDb(ArrayRequest request)
    {
        ArgumentNullException.ThrowIfNull(request);
        return Verdicts.SidelobeTarget.Of(request)?.LevelDb ?? 0;
    }

    /// <summary>
    /// The slot-model factory of a request: the same slot source for a perturbed guide or slot width (a table's y
    /// shifted by the built-in model's change; <see cref="SlotSource.ModelFor"/>).
    /// </summary>
    /// <param name="request">The request.</param>
    /// <param name="source">The run's slot source; the request's own when null.</param>
    public static SlotModelFactory FactoryFor(ArrayRequest request, SlotSource? source = null)
    {
        ArgumentNullException.ThrowIfNull(request);
        var from = source ?? SlotSource.For(request);
        return (guide, width) => ArrayPipeline.SlotModelFor(request with { Guide = guide, Slots = request.Slots with { Width = width } }, from);
    }

    /// <summary>
    /// The nominal design by the pipeline's own stages (taper, slot model, designer: <see cref="ArrayPipeline"/>) without
    /// its band sweep, which the tolerance analysis at the design frequency does not need: the design <c>design</c>
    /// delivers (<see cref="ArrayPipeline.DeliveredDesign"/>, the coupled one with <c>coupling: mutual</c>).
    /// </summary>
    /// <param name="request">The request.</param>
    /// <param name="source">The run's slot source; the request's own when null.</param>
    /// <exception cref="InfeasibleDesignException">The request cannot be realised.</exception>
    public static (ArrayDesign Design, Slots.IShuntSlotModel Slot) Design(ArrayRequest request, SlotSource? source = null)
    {
        ArgumentNullException.ThrowIfNull(request);
        var taper = Tapers.TaperSynthesis.Synthesize(request.Taper, request.Slots.Count);
        var slot = ArrayPipeline.SlotModelFor(request, source);
        var design = ArrayPipeline.DeliveredDesign(request, slot, taper);
        SlotTableRangeCheck.Check(design, slot);
        return (design, slot);
    }

    /// <summary>Runs the analysis of a pipeline result.</summary>
    /// <param name="nominal">The pipeline's result for the request.</param>
    /// <param name="tolerance">The tolerances; the request's when null.</param>
    /// <param name="options">Grids, surrogate nodes and threads.</param>
    /// <param name="progress">Called with the trials done so far (from worker threads), or null.</param>
    /// <exception cref="ArgumentException">Neither the request nor the caller gives tolerances.</exception>
    public static ToleranceResult Run(ArrayResult nominal, ToleranceRequest? tolerance = null, ToleranceOptions? options = null,
        Action<int>? progress = null)
    {
        ArgumentNullException.ThrowIfNull(nominal);
        return Run(nominal.Request, nominal.Design, nominal.SlotModel, tolerance, options, progress);
    }

    /// <summary>Runs the analysis of a design.</summary>
    /// <param name="request">The request the design answers (tolerances, sidelobe target, slot-model kind).</param>
    /// <param name="design">The nominal design.</param>
    /// <param name="slot">The slot model the design used.</param>
    /// <param name="tolerance">The tolerances; the request's when null.</param>
    /// <param name="options">Grids, surrogate nodes and threads.</param>
    /// <param name="progress">Called with the trials done so far (from worker threads), or null.</param>
    /// <param name="source">The run's slot source (for the perturbed slot models); the request's own when null.</param>
    /// <exception cref="ArgumentException">Neither the request nor the caller gives tolerances.</exception>
    public static ToleranceResult Run(ArrayRequest request, ArrayDesign design, Slots.IShuntSlotModel slot, ToleranceRequest? tolerance = null,
        ToleranceOptions? options = null, Action<int>? progress = null, SlotSource? source = null)
    {
        ArgumentNullException.ThrowIfNull(request);
        var tol = tolerance ?? request.Tolerance
            ?? throw new ArgumentException("the spec has no tolerance: block; add one (e.g. offset: 0.02 mm, length: 0.02 mm)", nameof(tolerance));
        options ??= ToleranceOptions.Default;
        var model = ArrayTrialModel.Build(design, slot, FactoryFor(request, source), tol, options, request.Coupling == CouplingMode.Mutual);
        var mc = ToleranceMonteCarlo.Run(model, tol.Trials, tol.Seed, TargetDb(request), options, progress);
        options.Cancellation.ThrowIfCancellationRequested();
        var sens = ToleranceSensitivities.Compute(model, options);
        return new ToleranceResult(tol, mc, sens, model.SurrogateSamples);
    }
}
