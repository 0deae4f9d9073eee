namespace SlotArray.Core.Prototype;

/// <summary>
/// What may have gone wrong between the design and the plate, as the parameters the fit adjusts on the design's own
/// network model (<see cref="PrototypeModel"/>).
/// </summary>
/// <param name="LengthScale">Uniform fractional error of every slot's electrical length: 0.006 means the slots behave
/// 0.6 % longer than cut (a resonance about 0.6 % low in frequency).</param>
/// <param name="ConductanceScale">Uniform factor on every slot's admittance y (1: none; 1.1: every slot couples 10 % more
/// power than the model says, as from a thinner wall or a wider slot).</param>
/// <param name="GuideWavelengthScale">Fractional error of the guide wavelength λg (guide width, filling, temperature):
/// 0.002 means λg is 0.2 % longer than the model's.</param>
/// <param name="SlotLengthErrors">Per-slot length error, m (positive: the slot is longer than cut), in slot order.</param>
/// <param name="SlotCouplingErrors">Per-slot coupling error in the coupling's own unit (offset, m, positive away from the
/// centreline; or tilt, rad, positive away from zero), in slot order.</param>
internal sealed record PrototypeErrors(double LengthScale, double ConductanceScale, double GuideWavelengthScale,
    IReadOnlyList<double> SlotLengthErrors, IReadOnlyList<double> SlotCouplingErrors)
{
    /// <summary>No error on <paramref name="count"/> slots.</summary>
    public static PrototypeErrors None(int count) => new(0, 1, 0, new double[count], new double[count]);

    /// <summary>Number of slots.</summary>
    public int Count => SlotLengthErrors.Count;
}
