using SlotArray.Core.Design;
using SlotArray.Core.Fabrication;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;

namespace SlotArray.Core.Prototype;

/// <summary>
/// The next plate: the same request designed again on the slot model corrected by what the prototype showed
/// (<see cref="CalibratedSlotModel"/> with the fitted length and conductance scales), in the guide whose wavelength the
/// fit found (when it resolved it), with mutual coupling in the design for longitudinal slots (the fitted model is the
/// coupled network; a design without coupling misses by exactly that, architecture.md), and without a prototype margin.
/// The per-slot errors are this plate's machining, not the next one's, so they do not enter.
/// </summary>
internal static class NextPlate
{
    /// <summary>The request and the slot model of the next plate.</summary>
    /// <param name="request">The prototype's request.</param>
    /// <param name="slot">The design's slot model (uncorrected).</param>
    /// <param name="diagnosis">The prototype's diagnosis.</param>
    public static (ArrayRequest Request, IShuntSlotModel Slot) For(ArrayRequest request, IShuntSlotModel slot, PrototypeDiagnosis diagnosis)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(slot);
        ArgumentNullException.ThrowIfNull(diagnosis);
        var inner = slot is FrequencyInterpolatedSlotModel fi ? fi.Inner : slot;
        var e = diagnosis.Errors;
        var next = request with
        {
            Coupling = request.Slots.Type == SlotType.Longitudinal ? CouplingMode.Mutual : request.Coupling,
            PrototypeMargin = 0,
        };
        // The guide changes only when the fit resolved its wavelength error (the interval excludes zero); the slot model
        // is then rebuilt for that guide.
        if (diagnosis.GuideWavelengthScale is { } g && !g.Contains(0))
        {
            next = next with { Guide = next.Guide with { BroadWall = diagnosis.Model.Apply(e).Guide.BroadWall } };
            inner = ArrayPipeline.SlotModelFor(next);
        }
        return (next, new CalibratedSlotModel(inner, e.LengthScale, e.ConductanceScale));
    }

    /// <summary>Designs and analyses the next plate.</summary>
    /// <exception cref="InfeasibleDesignException">The corrected request cannot be realised.</exception>
    public static ArrayResult Design(ArrayRequest request, IShuntSlotModel slot, PrototypeDiagnosis diagnosis, AnalysisOptions? options = null)
    {
        var (next, corrected) = For(request, slot, diagnosis);
        return ArrayPipeline.RunWithSlotModel(next, corrected, options);
    }

    /// <summary>
    /// The next plate's fabrication plan, its changes flagged against the plate that was cut
    /// (<see cref="FabricationPlan.WithChangesFrom"/>: every feature, slot or the tube length that moved), so that its cut
    /// list marks what the shop must do differently.
    /// </summary>
    /// <param name="next">The next plate (<see cref="Design"/>).</param>
    /// <param name="cut">The plate that was cut: its design run, as rebuilt from its spec.</param>
    public static FabricationPlan Plan(ArrayResult next, ArrayResult cut)
    {
        ArgumentNullException.ThrowIfNull(next);
        ArgumentNullException.ThrowIfNull(cut);
        static FabricationPlan Of(ArrayResult r) => FabricationPlan.Build(r.Design, r.Request.Feed.Type, r.Request.Slots.Cutter, r.Request.Tolerance);
        return Of(next).WithChangesFrom(Of(cut));
    }

    /// <summary>
    /// The revision after <paramref name="previous"/> in the drawing-revision sequence A, B, … Z, AA, AB, … ZZ (letters I
    /// and O included; common practice, no source).
    /// </summary>
    /// <param name="previous">One or two capital letters.</param>
    /// <exception cref="ArgumentException">Not one or two capital letters, or ZZ (no next revision).</exception>
    public static string NextRevision(string previous)
    {
        ArgumentNullException.ThrowIfNull(previous);
        if (previous.Length is < 1 or > 2 || previous.Any(c => c is < 'A' or > 'Z'))
            throw new ArgumentException($"a revision is one or two capital letters, got '{previous}'", nameof(previous));
        if (previous == "ZZ") throw new ArgumentException("revision ZZ is the last: start a new drawing number", nameof(previous));
        if (previous[^1] != 'Z') return previous[..^1] + (char)(previous[^1] + 1);
        return previous.Length == 1 ? "AA" : (char)(previous[0] + 1) + "A";
    }

    /// <summary>Whether a dimension changed between plates by more than <paramref name="resolution"/> (default 5 µm).</summary>
    public static bool Changed(Length before, Length after, double resolution = TrimPlan.Resolution) => Math.Abs(after.Meters - before.Meters) > resolution;
}
