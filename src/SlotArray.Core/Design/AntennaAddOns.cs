using SlotArray.Core.Marine;
using SlotArray.Core.Network;
using SlotArray.Core.Stick;

namespace SlotArray.Core.Design;

/// <summary>
/// What the antenna adds to the stick, each null when the spec does not ask for it: the polarisation filter in front of
/// the slots, the flare that sets the vertical beam, and the beam's pointing over the operating range.
/// </summary>
/// <param name="Filter">The polarisation filter (<c>filter</c>) and the cross-polar levels before and after it; null without a
/// filter or without a cross-polarised cut. When set, the result's figures at the design frequency and across the band are
/// those behind the filter.</param>
/// <param name="Flare">The flare (<c>flare</c>): vertical beam, throat loss and the antenna's total gain; null without a flare.</param>
/// <param name="Pointing">The beam over the operating range (<c>environment.temperature</c>,
/// <c>transmitter.frequency_tolerance</c>); null when no range is given.</param>
internal sealed record AntennaAddOns(FilterOutcome? Filter, FlareOutcome? Flare, PointingBudget? Pointing)
{
    /// <summary>No filter, no flare, no operating range.</summary>
    public static AntennaAddOns None { get; } = new(null, null, null);

    /// <summary>The validity limits the filter and the flare met, in order.</summary>
    public IEnumerable<DesignWarning> Warnings => (Filter?.Warnings ?? []).Concat(Flare?.Warnings ?? []);

    /// <summary>
    /// The add-ons the request asks for, applied to a stick's analysed figures: the filter first
    /// (<see cref="CrossPolarFilterDesign.Apply"/>: the figures returned are those behind it), then the flare on the
    /// filtered figures at the design frequency (<see cref="FlareDesign.Analyse"/>), then the pointing budget over the
    /// filtered band (<see cref="PointingBudget.Of"/>, with the phase condition of <see cref="TravellingWaveBeam"/>).
    /// </summary>
    /// <param name="request">The request (its filter, flare, operating range and requirements).</param>
    /// <param name="design">The stick as cut.</param>
    /// <param name="atDesign">The stick's figures at the design frequency.</param>
    /// <param name="band">The stick's figures at each sweep frequency.</param>
    public static (FrequencyFigures AtDesign, IReadOnlyList<FrequencyFigures> Band, AntennaAddOns AddOns) Of(ArrayRequest request, ArrayDesign design,
        FrequencyFigures atDesign, IReadOnlyList<FrequencyFigures> band)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(design);
        if (request.Filter is null && request.Flare is null && request.Operating is null) return (atDesign, band, None);
        FilterOutcome? filter = null;
        if (request.Filter is { } asked)
            (atDesign, band, filter) = CrossPolarFilterDesign.Apply(asked, request.Requirements.CrossPolarDb, atDesign, band,
                atDesign.Metrics.BeamDirection, design.Spacing);
        var flare = request.Flare is { } fl ? FlareDesign.Analyse(fl, request.Guide, atDesign, request.Requirements.VerticalBeamwidth) : null;
        var pointing = request.Operating is { } range
            ? PointingBudget.Of(range, design, atDesign, band, f => TravellingWaveBeam.Direction(design.Guide, design.Spacing, f))
            : null;
        return (atDesign, band, new AntennaAddOns(filter, flare, pointing));
    }
}
