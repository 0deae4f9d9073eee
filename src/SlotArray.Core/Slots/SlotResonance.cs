using SlotArray.Core.Quantities;

namespace SlotArray.Core.Slots;

/// <summary>A slot at resonance (Im y = 0): its coupling parameter, length and normalised conductance.</summary>
/// <param name="Coupling">Offset (m) or tilt (rad), as the model's <see cref="SlotCouplingKind"/> says; signed.</param>
/// <param name="ResonantLength">Equivalent rectangular length at which Im y = 0.</param>
/// <param name="Conductance">Resonant conductance g_r = G/G0 (normalised to the TE10 admittance).</param>
internal readonly record struct SlotResonance(double Coupling, Length ResonantLength, double Conductance);
