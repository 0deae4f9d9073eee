using System.Numerics;
using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Slots;

/// <summary>
/// A radiating slot that loads the guide as a shunt admittance: longitudinal broad-wall slots (offset) and
/// inclined narrow-wall edge slots (tilt) both implement it, so array designers need not care which they hold.
/// All admittances are normalised to the guide's TE10 characteristic admittance: y = Y/G0.
/// Lengths are equivalent rectangular lengths; round-ended cuts are converted in Fabrication.
/// </summary>
public interface IShuntSlotModel
{
    /// <summary>The guide the slot is cut in (dimensions, wall thickness).</summary>
    RectangularWaveguide Guide { get; }

    /// <summary>Slot width (across its length).</summary>
    Length Width { get; }

    /// <summary>Whether the coupling parameter is an offset (m) or a tilt (rad).</summary>
    SlotCouplingKind CouplingKind { get; }

    /// <summary>Short name of the model for reports, e.g. "moment-method (finite wall)".</summary>
    string Name { get; }

    /// <summary>Largest |coupling| the model accepts (m or rad).</summary>
    double MaximumCoupling { get; }

    /// <summary>Normalised shunt admittance y = Y/G0 of a slot of the given coupling and length at frequency f.</summary>
    Complex Admittance(double coupling, Length length, Frequency f);

    /// <summary>The resonance (Im y = 0) of a slot of the given coupling at frequency f.</summary>
    SlotResonance Resonance(double coupling, Frequency f);

    /// <summary>
    /// The positive coupling and the length that make a resonant slot of conductance g at frequency f.
    /// Throws <see cref="InfeasibleDesignException"/> when g exceeds <see cref="MaximumConductance"/>.
    /// </summary>
    SlotResonance ForConductance(double conductance, Frequency f);

    /// <summary>The largest resonant conductance the model can give at frequency f (at <see cref="MaximumCoupling"/>).</summary>
    double MaximumConductance(Frequency f);

    /// <summary>Validity limits met at the given coupling and frequency (empty when none).</summary>
    IReadOnlyList<DesignWarning> Warnings(double coupling, Frequency f);
}
