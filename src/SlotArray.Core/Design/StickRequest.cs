using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.Core.Tapers;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Design;

/// <summary>
/// One stick (a guide with a line of slots) as its designer needs it, and nothing more of the spec: the guide, the design
/// frequency, the slot count, the feed, the aperture amplitudes and the slot source. A linear array is one stick; a planar
/// array will be many, each asked for with its own request.
/// </summary>
/// <param name="Name">Name of the stick (the array's name for a linear array), used in titles and file names.</param>
/// <param name="Guide">The guide the slots are cut in.</param>
/// <param name="DesignFrequency">Frequency at which the slots are resonant and the stick matched.</param>
/// <param name="Count">Number of slots, ≥ 2.</param>
/// <param name="Feed">Standing-wave or travelling-wave feed, spacing, termination.</param>
/// <param name="Amplitudes">Aperture amplitude a_n of each slot, slot 1 (nearest the datum) first; any signs, none zero.</param>
/// <param name="Slot">The slot source: the admittance model the designer inverts (its guide must be <paramref name="Guide"/>).</param>
internal sealed record StickRequest(string Name, RectangularWaveguide Guide, Frequency DesignFrequency, int Count, FeedRequest Feed,
    IReadOnlyList<double> Amplitudes, IShuntSlotModel Slot)
{
    /// <summary>End-mill diameter for round-ended slots, checked against the slot footprints; null for square ends.</summary>
    public Length? Cutter { get; init; }

    /// <summary>The taper family the amplitudes come from, named in the designers' messages; <see cref="TaperType.Given"/> by default.</summary>
    public TaperType Taper { get; init; } = TaperType.Given;

    /// <summary>Complex factor on the exterior mutual impedances (<see cref="ArrayRequest.MutualCouplingScale"/>); 1 by default.</summary>
    public System.Numerics.Complex MutualCouplingScale { get; init; } = System.Numerics.Complex.One;

    /// <summary>The one stick of a linear-array request, with the slot model and amplitudes chosen for it.</summary>
    /// <param name="request">The array request (name, guide, frequency, slot count, cutter, feed, taper family).</param>
    /// <param name="slot">The slot model (chosen at the composition root, <see cref="SlotSource"/>).</param>
    /// <param name="amplitudes">The aperture amplitudes, e.g. the synthesised taper's weights.</param>
    public static StickRequest Of(ArrayRequest request, IShuntSlotModel slot, IReadOnlyList<double> amplitudes)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(slot);
        ArgumentNullException.ThrowIfNull(amplitudes);
        return new StickRequest(request.Name, request.Guide, request.DesignFrequency, request.Slots.Count, request.Feed, amplitudes, slot)
        {
            Cutter = request.Slots.Cutter,
            Taper = request.Taper.Type,
            MutualCouplingScale = request.MutualCouplingScale,
        };
    }
}
