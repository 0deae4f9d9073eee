using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Slots;

/// <summary>Builds the longitudinal broad-wall slot model a spec asks for (<c>slots.model</c>).</summary>
internal static class LongitudinalSlotModels
{
    /// <summary>
    /// The model of the given kind: <see cref="MomentMethodSlotModel"/> ("moment-method", finite wall) or
    /// <see cref="StevensonSlotModel"/> ("stevenson", whose length dependence is computed at the design frequency).
    /// </summary>
    /// <param name="kind">Which model.</param>
    /// <param name="guide">The guide.</param>
    /// <param name="width">Slot width.</param>
    /// <param name="designFrequency">Design frequency (the Stevenson model's length dependence is computed there).</param>
    /// <param name="options">Truncations of the moment method; the defaults when null.</param>
    /// <param name="cache">Where resonant characterisations are kept (injected by the composition root); a private one when null.</param>
    public static IShuntSlotModel Create(SlotModelKind kind, RectangularWaveguide guide, Length width, Frequency designFrequency,
        MomentMethodOptions? options = null, ResonantCharacterisationCache? cache = null) => kind switch
        {
            SlotModelKind.MomentMethod => new MomentMethodSlotModel(guide, width, options, cache),
            SlotModelKind.Stevenson => new StevensonSlotModel(guide, width, designFrequency, options, cache),
            _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, "unknown longitudinal slot model"),
        };
}
