using System.Numerics;
using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Slots;

/// <summary>
/// A measured (tabulated) slot moved to a slightly different guide or slot width by a model's change: y = y_base +
/// (y_model(changed) − y_model(as measured)). The tolerance analysis uses it to take the sensitivities to the slot width,
/// the wall and the guide width, which a table of one guide and width does not hold, from the built-in model.
/// Resonance and the inverse are the base's (the tolerance analysis only asks for y).
/// </summary>
/// <param name="baseModel">The tabulated slot (as measured).</param>
/// <param name="changed">The built-in model in the changed guide or width.</param>
/// <param name="asMeasured">The built-in model in the guide and width of the table.</param>
internal sealed class ShiftedSlotModel(IShuntSlotModel baseModel, IShuntSlotModel changed, IShuntSlotModel asMeasured) : IShuntSlotModel
{
    /// <inheritdoc />
    public RectangularWaveguide Guide => changed.Guide;

    /// <inheritdoc />
    public Length Width => changed.Width;

    /// <inheritdoc />
    public SlotCouplingKind CouplingKind => baseModel.CouplingKind;

    /// <inheritdoc />
    public string Name => baseModel.Name;

    /// <inheritdoc />
    public SlotDataRange Range => baseModel.Range;

    /// <inheritdoc />
    public double MaximumCoupling => baseModel.MaximumCoupling;

    /// <inheritdoc />
    public Complex Admittance(double coupling, Length length, Frequency f)
        => baseModel.Admittance(coupling, length, f) + changed.Admittance(coupling, length, f) - asMeasured.Admittance(coupling, length, f);

    /// <summary>The base's resonance (the shift is not applied; see the class remarks).</summary>
    public SlotResonance Resonance(double coupling, Frequency f) => baseModel.Resonance(coupling, f);

    /// <summary>The base's inverse (the shift is not applied; see the class remarks).</summary>
    public SlotResonance ForConductance(double conductance, Frequency f) => baseModel.ForConductance(conductance, f);

    /// <inheritdoc />
    public double MaximumConductance(Frequency f) => baseModel.MaximumConductance(f);

    /// <inheritdoc />
    public IReadOnlyList<DesignWarning> Warnings(double coupling, Frequency f) => baseModel.Warnings(coupling, f);
}
