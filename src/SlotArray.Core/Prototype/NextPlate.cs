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
public static class NextPlate
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

    /// <summary>Whether a dimension changed between plates by more than <paramref name="resolution"/> (default 5 µm).</summary>
    public static bool Changed(Length before, Length after, double resolution = TrimPlan.Resolution) => Math.Abs(after.Meters - before.Meters) > resolution;
}
