using SlotArray.Core.Design;
using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Slots;

/// <summary>Builds the longitudinal broad-wall slot model a spec asks for (<c>slots.model</c>).</summary>
public static class LongitudinalSlotModels
{
    /// <summary>
    /// The model of the given kind: <see cref="MomentMethodSlotModel"/> ("moment-method", finite wall) or
    /// <see cref="StevensonSlotModel"/> ("stevenson", whose length dependence is computed at the design frequency).
    /// </summary>
    public static IShuntSlotModel Create(SlotModelKind kind, RectangularWaveguide guide, Length width, Frequency designFrequency,
        MomentMethodOptions? options = null) => kind switch
        {
            SlotModelKind.MomentMethod => new MomentMethodSlotModel(guide, width, options),
            SlotModelKind.Stevenson => new StevensonSlotModel(guide, width, designFrequency, options),
            _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, "unknown longitudinal slot model"),
        };
}
