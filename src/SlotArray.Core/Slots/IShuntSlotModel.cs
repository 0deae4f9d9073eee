using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Slots;

/// <summary>
/// The designers' view of a slot source: the port <see cref="ISlotAdmittance"/> plus its resonance and the inverse the
/// designers need. A radiating slot that loads the guide as a shunt admittance: longitudinal broad-wall slots (offset) and
/// inclined narrow-wall edge slots (tilt) both implement it, so array designers need not care which they hold.
/// All admittances are normalised to the guide's TE10 characteristic admittance: y = Y/G0.
/// Lengths are equivalent rectangular lengths; round-ended cuts are converted in Fabrication.
/// </summary>
internal interface IShuntSlotModel : ISlotAdmittance
{
    /// <summary>Largest |coupling| the model accepts (m or rad).</summary>
    double MaximumCoupling { get; }

    /// <summary>The built-in models' range: |coupling| up to <see cref="MaximumCoupling"/>, any length and frequency.</summary>
    SlotDataRange ISlotAdmittance.Range => SlotDataRange.UpTo(MaximumCoupling);

    /// <summary>The resonance (Im y = 0) of a slot of the given coupling at frequency f.</summary>
    SlotResonance Resonance(double coupling, Frequency f);

    /// <summary>
    /// The positive coupling and the length that make a resonant slot of conductance g at frequency f.
    /// Throws <see cref="InfeasibleDesignException"/> when g exceeds <see cref="MaximumConductance"/>.
    /// </summary>
    SlotResonance ForConductance(double conductance, Frequency f);

    /// <summary>The largest resonant conductance the model can give at frequency f (at <see cref="MaximumCoupling"/>).</summary>
    double MaximumConductance(Frequency f);

    /// <summary>
    /// Whether the cut <see cref="ForConductance"/> returns may present a susceptance as well (an edge slot whose
    /// background susceptance leaves no purely conductive depth at small tilts): designers then work with the complex
    /// admittance of that cut instead of its conductance alone. False for models whose design cut is resonant.
    /// </summary>
    bool DesignsOffResonance => false;
}
